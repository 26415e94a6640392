import { formatFtIn } from '@/lib/format';
import type { LoadSource } from '@/shared/schemas/calc/loads';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import { emptyMemberDraft, flaggedFields, type FlaggedField, type MemberDraft } from './member-draft';
import { newSource, newSourceKey, type SourceDraft } from './source-draft';

const ft = (value: number | undefined) => (value === undefined ? '' : formatFtIn(value * 12));
const inch = (value: number | undefined) => (value === undefined ? '' : formatFtIn(value));
const num = (value: number | undefined) => (value === undefined ? '' : String(value));

/** A parsed load source as a draft to edit. */
export function sourceDraft(source: LoadSource): SourceDraft {
  const base: SourceDraft = {
    ...newSource(source.kind),
    key: newSourceKey(),
    label: source.label ?? '',
    flag: source.flag,
    note: '',
  };
  const extent =
    source.kind !== 'point' && (source.startFt !== undefined || source.endFt !== undefined)
      ? { partial: true, start: ft(source.startFt), end: ft(source.endFt) }
      : {};
  switch (source.kind) {
    case 'roof':
      return {
        ...base,
        ...extent,
        tributary: ft(source.tributaryFt),
        deadPsf: num(source.deadPsf),
        livePsf: num(source.roofLivePsf),
        deadAlongSlope: source.deadAlongSlope,
      };
    case 'ceiling':
    case 'floor':
      return {
        ...base,
        ...extent,
        tributary: ft(source.tributaryFt),
        deadPsf: num(source.deadPsf),
        livePsf: num(source.livePsf),
        continuousOver: source.continuousOver,
      };
    case 'wall-above':
      return source.wPlf !== undefined
        ? { ...base, ...extent, wallByHeight: false, wallPlf: num(source.wPlf) }
        : {
            ...base,
            ...extent,
            wallByHeight: true,
            wallHeight: ft(source.heightFt),
            deadPsf: num(source.deadPsf),
          };
    case 'point':
      return {
        ...base,
        pointKind: source.pointKind,
        at: ft(source.atFt),
        deadLb: num(source.deadLb),
        liveLb: num(source.liveLb),
        roofLiveLb: num(source.roofLiveLb),
        snowLb: num(source.snowLb),
      };
  }
}

/**
 * A saved member's input as a draft to edit. Lengths come back as ft-in text, the span as measured between
 * framing (the saved input is always the framing span).
 *
 * @example draftFromInput(member.input, job).clearSpan // `13' 6"`
 */
export function draftFromInput(input: MemberCheckInput, job: Job): MemberDraft {
  const empty = emptyMemberDraft(input.kind, job);
  const flags: MemberDraft['flags'] = {};
  for (const [draftField, inputField] of Object.entries(flaggedFields)) {
    const flag = input.flags?.[inputField];
    if (flag) flags[draftField as FlaggedField] = flag;
  }
  return {
    ...empty,
    label: input.label ?? empty.label,
    clearSpan: ft(input.clearSpanFt),
    bearingLeft: inch(input.bearingLeftIn) || empty.bearingLeft,
    bearingRight: inch(input.bearingRightIn) || empty.bearingRight,
    overhangLeft: ft(input.overhangLeftFt),
    overhangRight: ft(input.overhangRightFt),
    continuous: input.secondClearSpanFt !== undefined,
    secondSpan: ft(input.secondClearSpanFt),
    centreBearing: inch(input.centreBearingIn) || empty.centreBearing,
    edition: input.edition === job.loadStandard ? null : input.edition,
    groundSnow: num(input.snow?.groundSnowPsf ?? 0),
    thermal: input.snow?.thermalCondition ?? empty.thermal,
    roofPitch: num(input.roofPitchIn12) || empty.roofPitch,
    sources: input.sources.map(sourceDraft),
    selfWeight: input.selfWeight ?? true,
    materialId: input.materialId,
    sizeId: input.sizeId,
    gradeUnknown: input.gradeUnknown ?? false,
    wetService: input.wetService ?? false,
    temperature: num(input.temperatureF),
    braced: input.unbracedLengthFt === undefined,
    unbracedLength: ft(input.unbracedLengthFt),
    deflectionUse: input.deflectionUse ?? 'floor',
    deflectionCap: inch(input.deflectionCapIn),
    mount: input.mount ?? 'dropped',
    joistDepth: inch(input.joistDepthIn),
    underJoistsHeight: inch(input.underJoistsHeightIn),
    atticClearance: inch(input.atticClearanceIn),
    supportKind: input.supportKind ?? 'jacks',
    supportWidth: inch(input.supportWidthIn) || empty.supportWidth,
    plateMaterialId: input.plateMaterialId ?? empty.plateMaterialId,
    posts: input.posts
      ? {
          on: true,
          materialId: input.posts.materialId,
          sizeId: input.posts.sizeId,
          height: ft(input.posts.heightFt),
        }
      : empty.posts,
    flags,
  };
}
