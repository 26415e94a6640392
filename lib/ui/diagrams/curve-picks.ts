import type { MemberCheckResult, SupportName } from '@/shared/schemas/calc/member';
import type { CurveKind } from './value-text';

export type DiagramSample = NonNullable<MemberCheckResult['diagram']>['samples'][number];

/** Which value a label shows: the curve's largest, its smallest, or its value at a support. */
export type PickRole = 'max' | 'min' | 'left-support' | 'centre-support' | 'right-support';

const SUPPORT_ROLES = {
  left: 'left-support',
  centre: 'centre-support',
  right: 'right-support',
} as const satisfies Record<SupportName, PickRole>;

/** A support to label: its name and position (ft, the samples' frame). */
export interface PickSupport {
  name: SupportName;
  atFt: number;
}

/** Positions this close (ft) are the same station. */
const SAME_X_FT = 1e-9;

/** A value chosen for labelling: design-frame position (ft), value (lb, lb·ft or in) and label priority. */
export interface CurvePick {
  role: PickRole;
  xFt: number;
  value: number;
  /** 0 first: the largest magnitude, then the other extreme, then the supports. */
  priority: number;
  /** The curve's largest or most negative value (at a support too). */
  extreme: boolean;
}

/** Values closer to zero than this fraction of the curve's largest magnitude are shown as zero. */
const ZERO_FRACTION = 1e-9;

/** The sampled values of one curve. */
export function curveValue(sample: DiagramSample, kind: CurveKind): number {
  if (kind === 'shear') return sample.shearLb;
  if (kind === 'moment') return sample.momentLbFt;
  return sample.deflectionIn;
}

/**
 * Picks the values worth a label on one curve: the largest positive and the most negative sample (each
 * only where it is not essentially zero), and the value at every support. At an end support the value is
 * the one on the span's side (where a shear jumps over the support of an overhang); at a centre support the
 * larger of the two sides. An extreme at a support is the support's label, with the extreme's priority (a
 * value reached both at a support and inside the span is labelled at the support). Values closer to zero
 * than 1e-9 × the curve's largest magnitude are returned as exactly 0.
 *
 * @param samples the engine's samples, analysis frame (ft, lb, lb·ft, in), sorted by xFt
 * @param kind which curve
 * @param supports the supports (ft, same frame); default the first and the last sample (a simple span)
 * @returns picks, priority order
 * @example pickCurveValues(result.diagram.samples, 'moment', memberFrame(result).supports) // [{ role: 'max', xFt: 7.1, value: 19870, priority: 0 }, …]
 */
export function pickCurveValues(
  samples: readonly DiagramSample[],
  kind: CurveKind,
  supports?: readonly PickSupport[],
): CurvePick[] {
  if (samples.length === 0) return [];
  const values = samples.map((s) => curveValue(s, kind));
  const largest = Math.max(...values.map(Math.abs));
  const snap = (v: number) => (Math.abs(v) <= ZERO_FRACTION * largest ? 0 : v);
  const last = samples.length - 1;
  const maxIndex = extremeIndex(values, Math.max(...values), ZERO_FRACTION * largest);
  const minIndex = extremeIndex(values, Math.min(...values), ZERO_FRACTION * largest);
  const extremes: CurvePick[] = [];
  if (snap(values[maxIndex]) > 0) extremes.push(pick('max', samples, values, maxIndex, snap));
  if (snap(values[minIndex]) < 0) extremes.push(pick('min', samples, values, minIndex, snap));
  extremes.sort((a, b) => Math.abs(b.value) - Math.abs(a.value));
  extremes.forEach((e, i) => (e.priority = i));
  const marks = supports ?? [
    { name: 'left' as const, atFt: samples[0].xFt },
    { name: 'right' as const, atFt: samples[last].xFt },
  ];
  const atSupports = marks.flatMap((m, i) => {
    const index = supportIndex(samples, values, m.atFt, i === 0, i === marks.length - 1);
    return index < 0 ? [] : [pick(SUPPORT_ROLES[m.name], samples, values, index, snap)];
  });
  const picks: CurvePick[] = [];
  for (const support of atSupports) {
    const same = extremes.find((e) => e.value === support.value && e.xFt === support.xFt);
    picks.push({ ...support, priority: same ? same.priority : 2, extreme: same !== undefined });
  }
  for (const e of extremes) {
    if (!atSupports.some((s) => s.value === e.value && s.xFt === e.xFt)) picks.push(e);
  }
  return picks.sort((a, b) => a.priority - b.priority);
}

/**
 * The sample to label at a support: of the samples at its station, the last one at the first support and
 * the first one at the last support (the span's side), else the larger in size; -1 when none is there.
 */
function supportIndex(
  samples: readonly DiagramSample[],
  values: readonly number[],
  atFt: number,
  first: boolean,
  lastSupport: boolean,
): number {
  const here: number[] = [];
  samples.forEach((s, i) => {
    if (Math.abs(s.xFt - atFt) <= SAME_X_FT * Math.max(1, Math.abs(atFt))) here.push(i);
  });
  if (here.length === 0) return -1;
  if (first && !lastSupport) return here[here.length - 1];
  if (lastSupport && !first) return here[0];
  return here.reduce((a, b) => (Math.abs(values[b]) > Math.abs(values[a]) ? b : a));
}

/** Index of the first sample at `target` (within `tol`), a support's sample when one is there. */
function extremeIndex(values: readonly number[], target: number, tol: number): number {
  const last = values.length - 1;
  const at = (i: number) => Math.abs(values[i] - target) <= tol;
  if (at(0)) return 0;
  if (at(last)) return last;
  return values.findIndex((_, i) => at(i));
}

function pick(
  role: PickRole,
  samples: readonly DiagramSample[],
  values: readonly number[],
  index: number,
  snap: (v: number) => number,
): CurvePick {
  return {
    role,
    xFt: samples[index].xFt,
    value: snap(values[index]),
    priority: 2,
    extreme: role === 'max' || role === 'min',
  };
}
