import type { BeamLoad } from '@/lib/calc/types';
import { emptySpanState, type SpanState } from './span-state';
import { eiSlope, eiYNoConstant, moment, segmentLoad, shearAfter } from './macaulay';
import { splitSpanLoads } from './span-loads';

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
