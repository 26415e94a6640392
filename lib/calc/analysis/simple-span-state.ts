import type { BeamLoad } from '@/lib/calc/types';
import { emptySpanState, type SpanState } from './span-state';
import { splitSpanLoads, type PointPiece, type SpanLoads, type UniformPiece } from './span-loads';

/**
 * The breakpoints of a simple span under several load sets: 0, the span, every point load and every end of a
 * partial uniform load, sorted and unique. States built on these breakpoints can be combined.
 * @param spanFt design span, ft
 * @param loadSets loads (ft, plf, lb), e.g. one set per load type
 * @returns breakpoints, ft
 * @throws CalcInputError for a load off the span
 * @example simpleSpanBreakpoints(10, [[{ kind: 'point', pLb: 500, atFt: 4 }]]); // [0, 4, 10]
 * Reference: AWC Design Aid No. 6 (2007) load cases.
 */
export function simpleSpanBreakpoints(spanFt: number, loadSets: readonly (readonly BeamLoad[])[]): number[] {
  const xs = [0, spanFt];
  // Positions come back clamped to [0, spanFt] (a uniform piece has aFt < bFt): only those inside the span add
  // a breakpoint, so full-span loads leave nothing to sort.
  for (const loads of loadSets) {
    const { points, uniforms } = splitSpanLoads(spanFt, loads);
    for (const p of points) if (p.aFt > 0 && p.aFt < spanFt) xs.push(p.aFt);
    for (const u of uniforms) {
      if (u.aFt > 0) xs.push(u.aFt);
      if (u.bFt < spanFt) xs.push(u.bFt);
    }
  }
  xs.sort((a, b) => a - b);
  return xs.filter((x, i) => i === 0 || x !== xs[i - 1]);
}

/**
 * The response of a simple span (pinned left, roller right) to loads, stored at breakpoints. Each load's
 * closed form is written with singularity (Macaulay) functions and superposed:
 * V = R_A − ΣP⟨x−a⟩⁰ − Σw(⟨x−a⟩¹ − ⟨x−b⟩¹), M = ∫V, E·I·y'' = M with y(0) = y(L) = 0.
 * @param spanFt design span, ft
 * @param loads loads from the left support (ft, plf, lb)
 * @param xs breakpoints, ft; default those of `loads`; must contain every breakpoint of `loads`
 * @returns the span state (lb, lb·ft, lb·ft², lb·ft³, plf)
 * @throws CalcInputError for a non-positive span or a load off the span
 * @example stateMaxMoment(simpleSpanState(12, [{ kind: 'uniform', wPlf: 400 }])).value; // 7200 = wl²/8
 * Reference: AWC Design Aid No. 6 (2007) cases 1, 4, 5, 7, 8, 9; AISC Manual Table 3-23.
 */
export function simpleSpanState(
  spanFt: number,
  loads: readonly BeamLoad[],
  xs: readonly number[] = simpleSpanBreakpoints(spanFt, [loads]),
): SpanState {
  const pieces = splitSpanLoads(spanFt, loads);
  const { points, uniforms } = pieces;
  const L = spanFt;
  let totalLb = 0;
  let aboutRightLbFt = 0;
  for (const p of points) {
    totalLb += p.pLb;
    aboutRightLbFt += p.pLb * (L - p.aFt);
  }
  for (const u of uniforms) {
    const wTotal = u.wPlf * (u.bFt - u.aFt);
    totalLb += wTotal;
    aboutRightLbFt += wTotal * (L - 0.5 * (u.aFt + u.bFt));
  }
  const rA = aboutRightLbFt / L;
  const c1 = -eiYNoConstant(rA, pieces, L) / L;
  const state = emptySpanState(L, xs);
  state.reactionsLb[0] = rA;
  state.reactionsLb[1] = totalLb - rA;
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    state.vAfterLb[i] = shearAfter(rA, points, uniforms, x);
    state.momentLbFt[i] = moment(rA, pieces, x);
    state.eiSlope[i] = eiSlope(rA, pieces, x) + c1;
    state.eiY[i] = eiYNoConstant(rA, pieces, x) + c1 * x;
    if (i + 1 < xs.length) state.wPlf[i] = segmentLoad(uniforms, x, xs[i + 1]);
  }
  return state;
}

// Singularity (Macaulay) sums for a beam's response from its left end, x in ft, for a force rA (lb, upward)
// at x = 0 plus point pieces (lb, downward positive; an upward support reaction is a negative piece) and
// uniform pieces (plf): V = rA − ΣP⟨x−a⟩⁰ − Σw(⟨x−a⟩¹ − ⟨x−b⟩¹), M = ∫V, E·I·y'' = M. They live beside
// simpleSpanState, which calls them at every breakpoint: a call across modules goes through an export getter
// under the server's CommonJS loader, which doubled the member check's time when they sat in a module of
// their own. supportedBeamState imports them.

/**
 * Shear just after x, lb.
 * @example shearAfter(500, [], [{ aFt: 0, bFt: 10, wPlf: 100 }], 5); // 0
 * Reference: AWC Design Aid No. 6 (2007), shear diagrams.
 */
export function shearAfter(
  rA: number,
  points: readonly PointPiece[],
  uniforms: readonly UniformPiece[],
  x: number,
): number {
  let v = rA;
  for (const p of points) if (p.aFt <= x) v -= p.pLb;
  for (const u of uniforms) if (x > u.aFt) v -= u.wPlf * (Math.min(x, u.bFt) - u.aFt);
  return v;
}

/**
 * Uniform load on the segment x0..x1, plf (every uniform piece covering it).
 * @example segmentLoad([{ aFt: 0, bFt: 10, wPlf: 100 }], 2, 3); // 100
 * Reference: AWC Design Aid No. 6 (2007) load cases.
 */
export function segmentLoad(uniforms: readonly UniformPiece[], x0: number, x1: number): number {
  let w = 0;
  for (const u of uniforms) if (u.aFt <= x0 && u.bFt >= x1) w += u.wPlf;
  return w;
}

/**
 * Moment at x, lb·ft, sagging positive.
 * @example moment(500, { points: [], uniforms: [{ aFt: 0, bFt: 10, wPlf: 100 }] }, 5); // 1250
 * Reference: AWC Design Aid No. 6 (2007), moment diagrams.
 */
export function moment(rA: number, { points, uniforms }: SpanLoads, x: number): number {
  let m = rA * x;
  for (const p of points) if (x > p.aFt) m -= p.pLb * (x - p.aFt);
  for (const u of uniforms) {
    const da = Math.max(0, x - u.aFt);
    const db = Math.max(0, x - u.bFt);
    m -= 0.5 * u.wPlf * (da * da - db * db);
  }
  return m;
}

/**
 * E·I·y' without the integration constant, lb·ft².
 * @example eiSlope(500, loads, 10);
 * Reference: elastic curve E·I·y'' = M.
 */
export function eiSlope(rA: number, { points, uniforms }: SpanLoads, x: number): number {
  let s = (rA * x * x) / 2;
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

/**
 * E·I·y without the integration constant term, lb·ft³; y(0) = 0 by construction.
 * @example eiYNoConstant(500, loads, 10);
 * Reference: elastic curve E·I·y'' = M.
 */
export function eiYNoConstant(rA: number, { points, uniforms }: SpanLoads, x: number): number {
  let y = (rA * x * x * x) / 6;
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
