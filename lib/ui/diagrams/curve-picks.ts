import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import type { CurveKind } from './value-text';

export type DiagramSample = NonNullable<MemberCheckResult['diagram']>['samples'][number];

/** Which value a label shows: the curve's largest, its smallest, or its value at a support. */
export type PickRole = 'max' | 'min' | 'left-support' | 'right-support';

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
 * only where it is not essentially zero), and the values at both supports. An extreme at a support is the
 * support's label, with the extreme's priority (a value reached both at a support and inside the span is
 * labelled at the support). Values closer to zero than 1e-9 × the curve's largest magnitude are
 * returned as exactly 0.
 *
 * @param samples the engine's samples, design frame (ft, lb, lb·ft, in), sorted by xFt
 * @param kind which curve
 * @returns picks, priority order
 * @example pickCurveValues(result.diagram.samples, 'moment') // [{ role: 'max', xFt: 7.1, value: 19870, priority: 0 }, …]
 */
export function pickCurveValues(samples: readonly DiagramSample[], kind: CurveKind): CurvePick[] {
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
  const supports = [
    pick('left-support', samples, values, 0, snap),
    pick('right-support', samples, values, last, snap),
  ];
  const picks: CurvePick[] = [];
  for (const support of supports) {
    const same = extremes.find((e) => e.value === support.value && e.xFt === support.xFt);
    picks.push({ ...support, priority: same ? same.priority : 2, extreme: same !== undefined });
  }
  for (const e of extremes) {
    if (!supports.some((s) => s.value === e.value && s.xFt === e.xFt)) picks.push(e);
  }
  return picks.sort((a, b) => a.priority - b.priority);
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
