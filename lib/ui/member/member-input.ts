import { CalcInputError, parseLength } from '@/lib/calc';
import { parseNumberText } from '@/lib/ui/number-text';
import type { LoadSourceInput } from '@/shared/schemas/calc/loads';
import type { MemberCheckInputBody } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import { flaggedFields, type FlaggedField, type MeasuredTo, type MemberDraft } from './member-draft';
import type { SourceDraft } from './source-draft';

export type FieldErrors = Record<string, string[]>;
export type DraftReading = { input: MemberCheckInputBody; errors: FieldErrors };

/**
 * Finish thickness on each side of a clear span measured between finished faces, in: 1/2 in drywall, and
 * about 7/8 in for plaster on lath (common practice). The framing span is the finished span plus both.
 */
export const FINISH_PER_SIDE_IN: Record<MeasuredTo, number> = { framing: 0, drywall: 0.5, plaster: 0.875 };

/**
 * Reads a form field by field. Every field that can't be read gets a message under its path in `errors`
 * (the member draft, the framing list, what's above).
 */
export class DraftReader {
  readonly errors: FieldErrors = {};

  fail(path: string, message: string): undefined {
    (this.errors[path] ??= []).push(message);
    return undefined;
  }

  /** A length in ft (bare numbers are feet); empty → undefined, or an error when `required`. */
  feet(path: string, text: string, label: string, required = false): number | undefined {
    return this.length(path, text, label, 'ft', required);
  }

  /** A length in in (bare numbers are inches). */
  inches(path: string, text: string, label: string, required = false): number | undefined {
    return this.length(path, text, label, 'in', required);
  }

  private length(
    path: string,
    text: string,
    label: string,
    unit: 'ft' | 'in',
    required: boolean,
  ): number | undefined {
    if (text.trim() === '') return required ? this.fail(path, `Enter the ${label}, e.g. 13' 6"`) : undefined;
    return this.parsedLength(path, text, capitalize(label), unit);
  }

  /**
   * A length as typed, empty text included (the parser's own message then), in `unit` (bare numbers are
   * that unit); a message under `path` when it can't be read.
   */
  parsedLength(path: string, text: string, label: string, unit: 'ft' | 'in'): number | undefined {
    try {
      const inches = parseLength(text, path, { defaultUnit: unit, label });
      return unit === 'ft' ? inches / 12 : inches;
    } catch (error) {
      if (error instanceof CalcInputError) return this.fail(path, error.message);
      throw error;
    }
  }

  /** A plain number (decimals, fractions, mixed numbers). */
  number(path: string, text: string, label: string, required = false): number | undefined {
    const read = parseNumberText(text);
    if (read.kind === 'number') return read.value;
    if (read.kind === 'empty') return required ? this.fail(path, `Enter the ${label}`) : undefined;
    return this.fail(path, `${capitalize(label)}: enter a number, like 15 or 6 1/2`);
  }
}

const capitalize = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

function readSource(r: DraftReader, s: SourceDraft, i: number): LoadSourceInput | null {
  const p = `sources.${i}`;
  const base = { label: s.label.trim() || undefined, flag: s.flag };
  const extent = () =>
    s.partial
      ? {
          startFt: r.feet(`${p}.start`, s.start, 'start of the load', true),
          endFt: r.feet(`${p}.end`, s.end, 'end of the load', true),
        }
      : {};
  switch (s.kind) {
    case 'roof':
      return {
        kind: 'roof',
        ...base,
        ...extent(),
        tributaryFt: r.feet(`${p}.tributary`, s.tributary, 'tributary width', true) as number,
        deadPsf: r.number(`${p}.deadPsf`, s.deadPsf, 'roof dead load', true) as number,
        deadAlongSlope: s.deadAlongSlope,
        roofLivePsf: r.number(`${p}.livePsf`, s.livePsf, 'roof live load', true) as number,
      };
    case 'ceiling':
    case 'floor':
      return {
        kind: s.kind,
        ...base,
        ...extent(),
        tributaryFt: r.feet(`${p}.tributary`, s.tributary, 'tributary width', true) as number,
        deadPsf: r.number(`${p}.deadPsf`, s.deadPsf, 'dead load', true) as number,
        livePsf: r.number(`${p}.livePsf`, s.livePsf, 'live load', true) as number,
        continuousOver: s.continuousOver,
      };
    case 'wall-above':
      return s.wallByHeight
        ? {
            kind: 'wall-above',
            ...base,
            ...extent(),
            heightFt: r.feet(`${p}.wallHeight`, s.wallHeight, 'wall height', true),
            deadPsf: r.number(`${p}.deadPsf`, s.deadPsf, 'wall dead load', true),
          }
        : {
            kind: 'wall-above',
            ...base,
            ...extent(),
            wPlf: r.number(`${p}.wallPlf`, s.wallPlf, 'wall load', true),
          };
    case 'point':
      return {
        kind: 'point',
        ...base,
        pointKind: s.pointKind,
        atFt: r.feet(`${p}.at`, s.at, 'position', true) as number,
        deadLb: r.number(`${p}.deadLb`, s.deadLb, 'dead load') ?? 0,
        liveLb: r.number(`${p}.liveLb`, s.liveLb, 'live load') ?? 0,
        roofLiveLb: r.number(`${p}.roofLiveLb`, s.roofLiveLb, 'roof live load') ?? 0,
        snowLb: r.number(`${p}.snowLb`, s.snowLb, 'snow load') ?? 0,
      };
  }
}

function flagsOf(draft: MemberDraft): Record<string, 'measured' | 'assumed' | 'default'> {
  const flags: Record<string, 'measured' | 'assumed' | 'default'> = {};
  for (const [field, flag] of Object.entries(draft.flags)) {
    if (flag) flags[flaggedFields[field as FlaggedField]] = flag;
  }
  return flags;
}

/**
 * The member check input a draft describes, with a message for every field that can't be read. The input
 * still goes through `memberCheckInputSchema` (live-check.ts); a span measured between finished faces is
 * widened to the framing by FINISH_PER_SIDE_IN on each side.
 *
 * @example readMemberDraft({ ...draft, clearSpan: '13-6' }, job).input.clearSpanFt // 13.5
 */
export function readMemberDraft(draft: MemberDraft, job: Job): DraftReading {
  const r = new DraftReader();
  const finishedSpanFt = r.feet('clearSpan', draft.clearSpan, 'clear span', true);
  const clearSpanFt =
    finishedSpanFt === undefined
      ? undefined
      : finishedSpanFt + (2 * FINISH_PER_SIDE_IN[draft.measuredTo]) / 12;
  const groundSnowPsf = r.number('groundSnow', draft.groundSnow, 'ground snow load') ?? 0;
  const sources = draft.sources.map((s, i) => readSource(r, s, i)).filter((s) => s !== null);
  if (draft.sources.length === 0)
    r.fail('sources', 'Add at least one load source: roof, ceiling, floor, wall or point load');
  const supportWidthIn = r.inches('supportWidth', draft.supportWidth, 'support width');
  const input: MemberCheckInputBody = {
    kind: draft.kind,
    label: draft.label.trim() || undefined,
    edition: draft.edition ?? job.loadStandard,
    clearSpanFt: clearSpanFt as number,
    bearingLeftIn: r.inches('bearingLeft', draft.bearingLeft, 'left bearing length'),
    bearingRightIn: r.inches('bearingRight', draft.bearingRight, 'right bearing length'),
    overhangLeftFt: r.feet('overhangLeft', draft.overhangLeft, 'left overhang'),
    overhangRightFt: r.feet('overhangRight', draft.overhangRight, 'right overhang'),
    secondClearSpanFt: draft.continuous
      ? r.feet('secondSpan', draft.secondSpan, 'second clear span', true)
      : undefined,
    centreBearingIn: draft.continuous
      ? r.inches('centreBearing', draft.centreBearing, 'centre bearing length')
      : undefined,
    roofPitchIn12: r.number('roofPitch', draft.roofPitch, 'roof slope'),
    snow:
      groundSnowPsf > 0
        ? { groundSnowPsf, roofType: job.roofType, thermalCondition: draft.thermal }
        : undefined,
    sources,
    selfWeight: draft.selfWeight,
    materialId: draft.materialId,
    sizeId: draft.sizeId,
    gradeUnknown: draft.gradeUnknown || undefined,
    wetService: draft.wetService || undefined,
    temperatureF: r.number('temperature', draft.temperature, 'temperature'),
    unbracedLengthFt: draft.braced
      ? undefined
      : r.feet('unbracedLength', draft.unbracedLength, 'unbraced length', true),
    deflectionUse: draft.deflectionUse,
    deflectionCapIn: r.inches('deflectionCap', draft.deflectionCap, 'deflection cap'),
    mount: draft.mount,
    joistDepthIn: r.inches('joistDepth', draft.joistDepth, 'joist depth', draft.mount === 'flush'),
    atticClearanceIn:
      draft.mount === 'raised'
        ? r.inches('atticClearance', draft.atticClearance, 'attic clearance')
        : undefined,
    underJoistsHeightIn: r.inches('underJoistsHeight', draft.underJoistsHeight, 'height to the joists'),
    supportKind: draft.supportKind,
    supportWidthIn,
    plateMaterialId: draft.supportKind === 'jacks' ? draft.plateMaterialId : undefined,
    posts: draft.posts.on
      ? {
          materialId: draft.posts.materialId,
          sizeId: draft.posts.sizeId,
          heightFt: r.feet('posts.height', draft.posts.height, 'post height', true) as number,
        }
      : undefined,
    flags: flagsOf(draft),
  };
  return { input, errors: r.errors };
}

/** Input paths the engine and the schema report, mapped to the draft field that shows the message. */
const inputToDraft: Record<string, string> = {
  clearSpanFt: 'clearSpan',
  bearingLeftIn: 'bearingLeft',
  bearingRightIn: 'bearingRight',
  overhangLeftFt: 'overhangLeft',
  overhangRightFt: 'overhangRight',
  secondClearSpanFt: 'secondSpan',
  centreBearingIn: 'centreBearing',
  roofPitchIn12: 'roofPitch',
  'snow.groundSnowPsf': 'groundSnow',
  temperatureF: 'temperature',
  unbracedLengthFt: 'unbracedLength',
  deflectionCapIn: 'deflectionCap',
  joistDepthIn: 'joistDepth',
  underJoistsHeightIn: 'underJoistsHeight',
  atticClearanceIn: 'atticClearance',
  supportWidthIn: 'supportWidth',
  'posts.heightFt': 'posts.height',
};
const sourceFieldToDraft: Record<string, string> = {
  tributaryFt: 'tributary',
  roofLivePsf: 'livePsf',
  startFt: 'start',
  endFt: 'end',
  heightFt: 'wallHeight',
  wPlf: 'wallPlf',
  atFt: 'at',
};

/** The draft path for an input path ("sources.2.tributaryFt" → "sources.2.tributary"). */
export function draftPathOf(inputPath: string): string {
  const source = /^sources\.(\d+)\.(\w+)/.exec(inputPath);
  if (source) return `sources.${source[1]}.${sourceFieldToDraft[source[2]] ?? source[2]}`;
  return inputToDraft[inputPath] ?? inputPath;
}
