import { CalcInputError, type BeamLoad } from '@/lib/calc/types';
import { findRoot } from './find-root';
import type { Extremum, ShearSide, SpanModel, SupportReaction } from './span-model';
import { splitSpanLoads, type PointPiece, type UniformPiece } from './span-loads';

/** Inputs of a simple span: design span ft, loads from the left support, stiffness E·I in lb·in². */
export interface SimpleSpanInput {
  spanFt: number;
  loads: readonly BeamLoad[];
  /** Modulus of elasticity (psi) times moment of inertia (in⁴). */
  eiLbIn2: number;
}

/** in³ per ft³ (1 ft = 12 in exactly): deflection in in = 1728 · (E·I·y in lb·ft³) / (E·I in lb·in²). */
const IN3_PER_FT3 = 12 * 12 * 12;
/** Sub-intervals per segment when looking for a zero slope; the slope is a cubic inside a segment. */
const SLOPE_SCAN_STEPS = 4;

/**
 * A simple span (pinned left, roller right) under any mix of full uniform, partial uniform and point loads,
 * solved by superposing each load's closed form written with singularity (Macaulay) functions:
 * V = R_A − ΣP⟨x−a⟩⁰ − Σw(⟨x−a⟩¹ − ⟨x−b⟩¹), M its integral, E·I·y'' = M with y(0) = y(L) = 0.
 * The largest moment is taken where the piecewise-linear shear crosses zero (solved exactly) or at a
 * breakpoint; the largest deflection where the slope is zero (bisection to 1e-12 of the span).
 *
 * @param input.spanFt design span, ft
 * @param input.loads loads in plf / lb positioned in ft from the left support
 * @param input.eiLbIn2 E (psi) × I (in⁴), lb·in²
 * @returns a SpanModel: shear lb, moment lb·ft, deflection in (downward positive)
 * @throws CalcInputError for a non-positive span or stiffness, or a load off the span
 * @example
 * const beam = createSimpleSpan({ spanFt: 10, eiLbIn2: 1.6e6 * 47.63, loads: [{ kind: 'point', pLb: 1000, atFt: 5 }] });
 * beam.maxMoment().value; // 2500 lb·ft = PL/4
 *
 * Reference: AWC Design Aid No. 6 (2007), simple beam cases 1, 4, 5, 7, 8, 9; AISC Manual Table 3-23.
 */
export function createSimpleSpan(input: SimpleSpanInput): SpanModel {
  const { spanFt, eiLbIn2 } = input;
  if (!Number.isFinite(eiLbIn2) || eiLbIn2 <= 0) {
    throw new CalcInputError('eiLbIn2', 'The stiffness E·I must be above 0');
  }
  const { points, uniforms } = splitSpanLoads(spanFt, input.loads);
  const L = spanFt;

  let totalLb = 0;
  let leftMomentLbFt = 0;
  for (const p of points) {
    totalLb += p.pLb;
    leftMomentLbFt += p.pLb * (L - p.aFt);
  }
  for (const u of uniforms) {
    const wTotal = u.wPlf * (u.bFt - u.aFt);
    totalLb += wTotal;
    leftMomentLbFt += wTotal * (L - 0.5 * (u.aFt + u.bFt));
  }
  const rA = leftMomentLbFt / L;
  const rB = totalLb - rA;

  const shear = (x: number, side: ShearSide = 'after'): number => shearAt(rA, points, uniforms, x, side);
  const moment = (x: number): number => momentAt(rA, points, uniforms, x);
  const c1 = -eiY(rA, points, uniforms, L, 0) / L;
  const slope = (x: number): number => eiSlope(rA, points, uniforms, x, c1);
  const deflection = (x: number): number => (-IN3_PER_FT3 * eiY(rA, points, uniforms, x, c1)) / eiLbIn2;

  const breaks = breakpoints(L, points, uniforms);
  let maxShearCache: Extremum | undefined;
  let maxMomentCache: Extremum | undefined;
  let maxDeflectionCache: Extremum | undefined;

  return {
    spanFt: L,
    reactions: (): readonly SupportReaction[] => [
      { atFt: 0, reactionLb: rA },
      { atFt: L, reactionLb: rB },
    ],
    shearLb: shear,
    momentLbFt: moment,
    deflectionIn: deflection,
    breakpointsFt: () => breaks,
    maxShear: () => (maxShearCache ??= findMaxShear(breaks, shear)),
    maxMoment: () => (maxMomentCache ??= findMaxMoment(breaks, shear, moment)),
    maxDeflection: () => (maxDeflectionCache ??= findMaxDeflection(breaks, slope, deflection)),
  };
}

function shearAt(
  rA: number,
  points: readonly PointPiece[],
  uniforms: readonly UniformPiece[],
  x: number,
  side: ShearSide,
): number {
  let v = rA;
  for (const p of points) {
    if (p.aFt < x || (side === 'after' && p.aFt === x)) v -= p.pLb;
  }
  for (const u of uniforms) {
    if (x > u.aFt) v -= u.wPlf * (Math.min(x, u.bFt) - u.aFt);
  }
  return v;
}

function momentAt(
  rA: number,
  points: readonly PointPiece[],
  uniforms: readonly UniformPiece[],
  x: number,
): number {
  let m = rA * x;
  for (const p of points) {
    if (x > p.aFt) m -= p.pLb * (x - p.aFt);
  }
  for (const u of uniforms) {
    const da = Math.max(0, x - u.aFt);
    const db = Math.max(0, x - u.bFt);
    m -= 0.5 * u.wPlf * (da * da - db * db);
  }
  return m;
}

/** E·I·y(x) in lb·ft³ (upward positive) with the integration constant c1 (lb·ft²); y(0) = 0 by construction. */
function eiY(
  rA: number,
  points: readonly PointPiece[],
  uniforms: readonly UniformPiece[],
  x: number,
  c1: number,
): number {
  let y = (rA * x * x * x) / 6 + c1 * x;
  for (const p of points) {
    const d = Math.max(0, x - p.aFt);
    y -= (p.pLb * d * d * d) / 6;
  }
  for (const u of uniforms) {
    const da = Math.max(0, x - u.aFt);
    const db = Math.max(0, x - u.bFt);
    y -= (u.wPlf * (da * da * da * da - db * db * db * db)) / 24;
  }
  return y;
}

/** E·I·y'(x) in lb·ft². */
function eiSlope(
  rA: number,
  points: readonly PointPiece[],
  uniforms: readonly UniformPiece[],
  x: number,
  c1: number,
): number {
  let s = (rA * x * x) / 2 + c1;
  for (const p of points) {
    const d = Math.max(0, x - p.aFt);
    s -= (p.pLb * d * d) / 2;
  }
  for (const u of uniforms) {
    const da = Math.max(0, x - u.aFt);
    const db = Math.max(0, x - u.bFt);
    s -= (u.wPlf * (da * da * da - db * db * db)) / 6;
  }
  return s;
}

function breakpoints(L: number, points: readonly PointPiece[], uniforms: readonly UniformPiece[]): number[] {
  const xs = [0, L];
  for (const p of points) xs.push(p.aFt);
  for (const u of uniforms) xs.push(u.aFt, u.bFt);
  xs.sort((a, b) => a - b);
  return xs.filter((x, i) => i === 0 || x !== xs[i - 1]);
}

function pickLargest(candidates: readonly Extremum[]): Extremum {
  let best = candidates[0];
  for (const c of candidates) if (Math.abs(c.value) > Math.abs(best.value)) best = c;
  return best;
}

function findMaxShear(breaks: readonly number[], shear: (x: number, side: ShearSide) => number): Extremum {
  const candidates: Extremum[] = [];
  breaks.forEach((x, i) => {
    if (i > 0) candidates.push({ value: shear(x, 'before'), atFt: x });
    if (i < breaks.length - 1) candidates.push({ value: shear(x, 'after'), atFt: x });
  });
  return pickLargest(candidates);
}

function findMaxMoment(
  breaks: readonly number[],
  shear: (x: number, side: ShearSide) => number,
  moment: (x: number) => number,
): Extremum {
  const candidates: Extremum[] = breaks.map((x) => ({ value: moment(x), atFt: x }));
  for (let i = 0; i + 1 < breaks.length; i++) {
    const x0 = breaks[i];
    const x1 = breaks[i + 1];
    const v0 = shear(x0, 'after');
    const v1 = shear(x1, 'before');
    if ((v0 > 0 && v1 < 0) || (v0 < 0 && v1 > 0)) {
      const x = x0 + (v0 / (v0 - v1)) * (x1 - x0);
      candidates.push({ value: moment(x), atFt: x });
    }
  }
  return pickLargest(candidates);
}

function findMaxDeflection(
  breaks: readonly number[],
  slope: (x: number) => number,
  deflection: (x: number) => number,
): Extremum {
  const L = breaks[breaks.length - 1];
  const candidates: Extremum[] = [{ value: 0, atFt: L / 2 }];
  for (let i = 0; i + 1 < breaks.length; i++) {
    const step = (breaks[i + 1] - breaks[i]) / SLOPE_SCAN_STEPS;
    for (let k = 0; k < SLOPE_SCAN_STEPS; k++) {
      const lo = breaks[i] + k * step;
      const hi = k === SLOPE_SCAN_STEPS - 1 ? breaks[i + 1] : lo + step;
      const sLo = slope(lo);
      const sHi = slope(hi);
      if ((sLo <= 0 && sHi >= 0) || (sLo >= 0 && sHi <= 0)) {
        const x = findRoot(slope, lo, hi);
        candidates.push({ value: deflection(x), atFt: x });
      }
    }
  }
  return pickLargest(candidates);
}
