import type { RoofThermalCondition } from '@/shared/schemas/calc/loads';
import type { DeflectionUse } from '@/shared/schemas/calc/member';
import type { LoadStandard } from '@/shared/schemas/jobs';
import type { Job } from '@/shared/schemas/jobs';
import type { InputFlag, SourceDraft } from './source-draft';

export type MemberKind = 'header' | 'beam';
export type MountKind = 'dropped' | 'flush' | 'raised';
export type SupportKind = 'jacks' | 'post';
/** What the clear span was measured between: the framing, or the finished wall faces. */
export type MeasuredTo = 'framing' | 'drywall' | 'plaster';

/**
 * A member form as typed. Lengths and numbers stay text until they are read (member-input.ts); each scalar
 * input carries how it was obtained in `flags` (absent = default), each load source its own flag.
 */
export type MemberDraft = {
  kind: MemberKind;
  label: string;
  wall: string;
  clearSpan: string;
  measuredTo: MeasuredTo;
  bearingLeft: string;
  bearingRight: string;
  /** Past the left and right supports to the tip, ft (empty: no overhang). */
  overhangLeft: string;
  overhangRight: string;
  /** Continuous over a centre post into a second span. */
  continuous: boolean;
  secondSpan: string;
  centreBearing: string;
  /** null: the job's edition. */
  edition: LoadStandard | null;
  /** Ground snow, psf; prefilled from the job. */
  groundSnow: string;
  /** The roof's thermal condition for C_t (ASCE 7 Table 7.3-2). */
  thermal: RoofThermalCondition;
  roofPitch: string;
  sources: SourceDraft[];
  selfWeight: boolean;
  materialId: string;
  sizeId: string;
  gradeUnknown: boolean;
  wetService: boolean;
  temperature: string;
  braced: boolean;
  unbracedLength: string;
  deflectionUse: DeflectionUse;
  deflectionCap: string;
  mount: MountKind;
  joistDepth: string;
  underJoistsHeight: string;
  /** Raised: clear height in the attic from the ceiling line to the roof framing. */
  atticClearance: string;
  supportKind: SupportKind;
  supportWidth: string;
  plateMaterialId: string;
  posts: { on: boolean; materialId: string; sizeId: string; height: string };
  flags: Partial<Record<FlaggedField, InputFlag>>;
};

/** Scalar draft fields that carry a measured / assumed / default flag, with the input field each becomes. */
export const flaggedFields = {
  clearSpan: 'clearSpanFt',
  bearingLeft: 'bearingLeftIn',
  bearingRight: 'bearingRightIn',
  overhangLeft: 'overhangLeftFt',
  overhangRight: 'overhangRightFt',
  secondSpan: 'secondClearSpanFt',
  centreBearing: 'centreBearingIn',
  groundSnow: 'snow.groundSnowPsf',
  roofPitch: 'roofPitchIn12',
  materialId: 'materialId',
  sizeId: 'sizeId',
  temperature: 'temperatureF',
  unbracedLength: 'unbracedLengthFt',
  deflectionCap: 'deflectionCapIn',
  joistDepth: 'joistDepthIn',
  underJoistsHeight: 'underJoistsHeightIn',
  atticClearance: 'atticClearanceIn',
  supportWidth: 'supportWidthIn',
} as const;
export type FlaggedField = keyof typeof flaggedFields;

/** Fields read off a tape: typing in one makes it "measured"; other fields become "assumed". */
const tapeFields: ReadonlySet<FlaggedField> = new Set([
  'clearSpan',
  'bearingLeft',
  'bearingRight',
  'overhangLeft',
  'overhangRight',
  'secondSpan',
  'centreBearing',
  'joistDepth',
  'underJoistsHeight',
  'atticClearance',
  'supportWidth',
  'unbracedLength',
]);

/** The flag a field takes when the person types in it, unless they already set one. */
export function flagAfterEdit(field: FlaggedField, current: InputFlag | undefined): InputFlag {
  if (current && current !== 'default') return current;
  return tapeFields.has(field) ? 'measured' : 'assumed';
}

/** Houses built before this year default to plaster ceilings (common practice: drywall replaced plaster
 * and lath in most houses after the Second World War). */
export const PLASTER_ERA_BEFORE = 1950;

/** A new member of a kind on a job: the job's standard, snow and roof slope; typical sizes by kind. */
export function emptyMemberDraft(kind: MemberKind, job: Job): MemberDraft {
  const plaster = job.yearBuilt !== null && job.yearBuilt < PLASTER_ERA_BEFORE;
  return {
    kind,
    label: kind === 'header' ? 'New header' : 'New beam',
    wall: '',
    clearSpan: '',
    measuredTo: 'framing',
    bearingLeft: '3',
    bearingRight: '3',
    overhangLeft: '',
    overhangRight: '',
    continuous: false,
    secondSpan: '',
    centreBearing: '3-1/2',
    edition: null,
    groundSnow: String(job.groundSnowPsf),
    thermal: 'vented-attic-insulated-ceiling',
    roofPitch: String(job.roofPitchIn12),
    sources: [],
    selfWeight: true,
    materialId: kind === 'header' ? 'sawn-douglas-fir-larch-no2' : 'lvl-2.0e',
    sizeId: kind === 'header' ? '2-ply-2x10' : '2-ply-1.75x11.875',
    gradeUnknown: false,
    wetService: false,
    temperature: '',
    braced: true,
    unbracedLength: '',
    deflectionUse: plaster ? 'plaster-ceiling' : kind === 'header' ? 'gypsum-ceiling' : 'floor',
    deflectionCap: '',
    mount: 'dropped',
    joistDepth: '',
    underJoistsHeight: '',
    atticClearance: '',
    supportKind: 'jacks',
    supportWidth: '3-1/2',
    plateMaterialId: 'sawn-spruce-pine-fir-no1-no2',
    posts: { on: false, materialId: 'sawn-douglas-fir-larch-no2', sizeId: '3-ply-2x6', height: '8' },
    flags: {},
  };
}
