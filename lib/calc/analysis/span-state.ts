import type { Extremum, ShearSide } from './span-model';

/**
 * A span's response stored at its breakpoints (supports, point loads, ends of partial loads): shear just after
 * each breakpoint, moment, E·I·slope and E·I·deflection there, and the uniform load on each segment. Inside a
 * segment the response is an exact polynomial in t = x − x_i (V = V_i − w·t, M = M_i + V_i·t − w·t²/2, and so
 * on), so any value or extreme comes from the stored numbers alone. Responses are linear in the loads, so
 * states of load groups on the same breakpoints combine by weighted sums (`combineStates`): that is how one
 * set of load groups serves every load combination and every member size without a new analysis.
 *
 * Units: x in ft, shear lb, moment lb·ft, E·I·slope lb·ft², E·I·y lb·ft³ (y upward, so sagging is negative),
 * w plf. Arrays are indexed by breakpoint (wPlf by segment, one shorter).
 *
 * x runs from the member's left end: the left support of a simple span, or the tip of a left overhang. The
 * supports sit at `supportsFt` (two, or three for a beam continuous over a centre post), each a breakpoint.
 */
export interface SpanState {
  /** Length of the member analysed, ft (the design span of a simple span). */
  readonly spanFt: number;
  readonly xs: readonly number[];
  /** Support positions, ft from the left end, left to right. */
  readonly supportsFt: readonly number[];
  readonly vAfterLb: number[];
  readonly momentLbFt: number[];
  readonly eiSlope: number[];
  readonly eiY: number[];
  readonly wPlf: number[];
  /** Support reactions, lb upward, one per support, left to right. */
  readonly reactionsLb: number[];
}

/**
 * A state of zeros on the given breakpoints, to be filled by `combineStates`.
 * @param spanFt member length, ft; xs breakpoints, ft, sorted, xs[0] = 0 and the last = spanFt
 * @param supportsFt support positions, ft (default the two ends of a simple span)
 * @example const scratch = emptySpanState(12, [0, 12]);
 * Reference: AWC Design Aid No. 6 (2007) — superposition of load cases on a simple beam.
 */
export function emptySpanState(
  spanFt: number,
  xs: readonly number[],
  supportsFt: readonly number[] = [0, spanFt],
): SpanState {
  const n = xs.length;
  return {
    spanFt,
    xs,
    supportsFt,
    vAfterLb: zeros(n),
    momentLbFt: zeros(n),
    eiSlope: zeros(n),
    eiY: zeros(n),
    wPlf: zeros(n - 1),
    reactionsLb: zeros(supportsFt.length),
  };
}

/**
 * A state of zeros on the same member, breakpoints and supports as `like`.
 * @example const scratch = blankStateLike(prepared.unitSelfWeight);
 * Reference: AWC Design Aid No. 6 (2007) — superposition.
 */
export function blankStateLike(like: SpanState): SpanState {
  return emptySpanState(like.spanFt, like.xs, like.supportsFt);
}

/** n zeros in a packed array (new Array(n).fill(0) stays holey, slower to read and write in V8). */
function zeros(n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(0);
  return out;
}

/**
 * target = Σ coeffs[k] · states[k], all on the same breakpoints (the target's xs).
 * @param target state to overwrite (its arrays are reused, no allocation)
 * @param states states on the same breakpoints
 * @param coeffs dimensionless factors, one per state
 * @returns target
 * @example combineStates(scratch, [dead, live], [1, 0.75]);
 * Reference: AWC Design Aid No. 6 (2007) — superposition; ASCE 7 §2.4.1 load combinations.
 */
export function combineStates(
  target: SpanState,
  states: readonly SpanState[],
  coeffs: readonly number[],
): SpanState {
  const n = target.xs.length;
  const { vAfterLb, momentLbFt, eiSlope, eiY, wPlf, reactionsLb } = target;
  for (let i = 0; i < n; i++) {
    vAfterLb[i] = 0;
    momentLbFt[i] = 0;
    eiSlope[i] = 0;
    eiY[i] = 0;
  }
  for (let i = 0; i + 1 < n; i++) wPlf[i] = 0;
  const supports = reactionsLb.length;
  for (let r = 0; r < supports; r++) reactionsLb[r] = 0;
  for (let k = 0; k < states.length; k++) {
    const c = coeffs[k];
    if (c === 0) continue;
    const src = states[k];
    for (let i = 0; i < n; i++) {
      vAfterLb[i] += c * src.vAfterLb[i];
      momentLbFt[i] += c * src.momentLbFt[i];
      eiSlope[i] += c * src.eiSlope[i];
      eiY[i] += c * src.eiY[i];
    }
    for (let i = 0; i + 1 < n; i++) wPlf[i] += c * src.wPlf[i];
    for (let r = 0; r < supports; r++) reactionsLb[r] += c * src.reactionsLb[r];
  }
  return target;
}

/** Index of the segment holding x (the last segment for x at or past the right end). */
function segmentOf(xs: readonly number[], x: number): number {
  let lo = 0;
  let hi = xs.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * Shear at x, lb. At a point load `side` picks just before or just after it; at the supports the value just
 * inside the span is returned.
 * @example stateShearLb(state, 3, 'after');
 * Reference: AWC Design Aid No. 6 (2007), shear diagrams.
 */
export function stateShearLb(s: SpanState, x: number, side: ShearSide = 'after'): number {
  const { xs } = s;
  let i = segmentOf(xs, x);
  if (side === 'before' && i > 0 && x === xs[i]) i -= 1;
  const t = Math.min(Math.max(x, xs[i]), xs[i + 1]) - xs[i];
  return s.vAfterLb[i] - s.wPlf[i] * t;
}

/**
 * Moment at x, lb·ft, sagging positive.
 * @example stateMomentLbFt(state, 6);
 * Reference: AWC Design Aid No. 6 (2007), moment diagrams.
 */
export function stateMomentLbFt(s: SpanState, x: number): number {
  const i = segmentOf(s.xs, x);
  const t = x - s.xs[i];
  return s.momentLbFt[i] + s.vAfterLb[i] * t - (s.wPlf[i] * t * t) / 2;
}

/**
 * E·I·slope at x, lb·ft² (y upward).
 * @example stateEiSlope(state, 0);
 * Reference: elastic curve E·I·y'' = M (AWC Design Aid No. 6, 2007).
 */
export function stateEiSlope(s: SpanState, x: number): number {
  const i = segmentOf(s.xs, x);
  return eiSlopeIn(s, i, x - s.xs[i]);
}

/**
 * E·I·y at x, lb·ft³ (y upward: a sagging beam gives negative values).
 * @example -stateEiY(state, 6) * 1728 / eiLbIn2; // downward deflection in in
 * Reference: elastic curve E·I·y'' = M (AWC Design Aid No. 6, 2007).
 */
export function stateEiY(s: SpanState, x: number): number {
  const i = segmentOf(s.xs, x);
  return eiYIn(s, i, x - s.xs[i]);
}

function eiSlopeIn(s: SpanState, i: number, t: number): number {
  return s.eiSlope[i] + s.momentLbFt[i] * t + (s.vAfterLb[i] * t * t) / 2 - (s.wPlf[i] * t * t * t) / 6;
}

function eiYIn(s: SpanState, i: number, t: number): number {
  const t2 = t * t;
  return (
    s.eiY[i] +
    s.eiSlope[i] * t +
    (s.momentLbFt[i] * t2) / 2 +
    (s.vAfterLb[i] * t2 * t) / 6 -
    (s.wPlf[i] * t2 * t2) / 24
  );
}

/**
 * Largest |shear| (signed value, lb) and where: shear is linear between breakpoints, so the extreme sits at
 * one side of a breakpoint.
 * @example stateMaxShear(state).value;
 * Reference: AWC Design Aid No. 6 (2007).
 */
export function stateMaxShear(s: SpanState): Extremum {
  let best: Extremum = { value: 0, atFt: 0 };
  for (let i = 0; i + 1 < s.xs.length; i++) {
    const after = s.vAfterLb[i];
    const before = after - s.wPlf[i] * (s.xs[i + 1] - s.xs[i]);
    if (Math.abs(after) > Math.abs(best.value)) best = { value: after, atFt: s.xs[i] };
    if (Math.abs(before) > Math.abs(best.value)) best = { value: before, atFt: s.xs[i + 1] };
  }
  return best;
}

/**
 * Largest |moment| (signed value, lb·ft) and where: at a breakpoint, or where the shear crosses zero inside
 * a segment, solved exactly (t = V_i / w, M = M_i + V_i²/2w).
 * @example stateMaxMoment(state).atFt;
 * Reference: AWC Design Aid No. 6 (2007) — maximum moment where the shear is zero.
 */
export function stateMaxMoment(s: SpanState): Extremum {
  const { xs } = s;
  let best: Extremum = { value: s.momentLbFt[0], atFt: 0 };
  for (let i = 0; i + 1 < xs.length; i++) {
    const next = s.momentLbFt[i + 1];
    if (Math.abs(next) > Math.abs(best.value)) best = { value: next, atFt: xs[i + 1] };
    const v0 = s.vAfterLb[i];
    const w = s.wPlf[i];
    const v1 = v0 - w * (xs[i + 1] - xs[i]);
    if ((v0 > 0 && v1 < 0) || (v0 < 0 && v1 > 0)) {
      const t = v0 / w;
      const m = s.momentLbFt[i] + (v0 * v0) / (2 * w);
      if (Math.abs(m) > Math.abs(best.value)) best = { value: m, atFt: xs[i] + t };
    }
  }
  return best;
}

/** Sub-intervals per segment when looking for a zero slope (the slope is a cubic inside a segment). */
const SLOPE_SCAN_STEPS = 4;
/** Newton steps before the search gives up refining (it converges in a handful). */
const MAX_NEWTON_STEPS = 60;

/**
 * Largest |E·I·deflection| as a downward value (lb·ft³) and where: found where the slope is zero, solved on
 * the segment's cubic by Newton's method kept inside a sign-change bracket (the slope's derivative is the
 * moment, known exactly), to 1e-12 of the span, or at a free end (the tip of an overhang). Divide by E·I in
 * lb·ft² for ft, or take 1728 · value / (E·I in lb·in²) for in.
 * @example 1728 * stateMaxEiDeflection(state).value / eiLbIn2; // in
 * Reference: AWC Design Aid No. 6 (2007) — maximum deflection where the slope is zero, or at a free end.
 */
export function stateMaxEiDeflection(s: SpanState): Extremum {
  return stateMaxEiDeflectionBetween(s, 0, s.xs.length - 1);
}

/**
 * Largest |E·I·deflection| (downward value, lb·ft³) and where, between breakpoints xs[from] and xs[to]
 * (for one span or one overhang: its ends are supports or a free end): where the slope is zero inside, or
 * at either end.
 * @param from index of the first breakpoint; to index of the last
 * @example stateMaxEiDeflectionBetween(state, 0, 3).value;
 * Reference: AWC Design Aid No. 6 (2007) — maximum deflection where the slope is zero, or at a free end.
 */
export function stateMaxEiDeflectionBetween(s: SpanState, from: number, to: number): Extremum {
  const { xs } = s;
  const tol = 1e-12 * s.spanFt;
  let bestValue = -s.eiY[from];
  let bestAt = xs[from];
  if (Math.abs(s.eiY[to]) > Math.abs(bestValue)) {
    bestValue = -s.eiY[to];
    bestAt = xs[to];
  }
  if (bestValue === 0) bestAt = 0.5 * (xs[from] + xs[to]);
  for (let i = from; i < to; i++) {
    const h = xs[i + 1] - xs[i];
    const steps = momentKeepsSign(s, i, h) ? 1 : SLOPE_SCAN_STEPS;
    let tLo = 0;
    let sLo = eiSlopeIn(s, i, 0);
    for (let k = 1; k <= steps; k++) {
      const tHi = k === steps ? h : (k * h) / steps;
      const sHi = eiSlopeIn(s, i, tHi);
      if ((sLo <= 0 && sHi >= 0) || (sLo >= 0 && sHi <= 0)) {
        const t = slopeZero(s, i, tLo, sLo, tHi, tol);
        const down = -eiYIn(s, i, t);
        if (Math.abs(down) > Math.abs(bestValue)) {
          bestValue = down;
          bestAt = xs[i] + t;
        }
      }
      tLo = tHi;
      sLo = sHi;
    }
  }
  return { value: bestValue, atFt: bestAt };
}

/**
 * True when the moment keeps one sign over segment i (checked at both ends and where the shear is zero): the
 * slope is then monotonic there and has at most one zero, so one bracket suffices.
 */
function momentKeepsSign(s: SpanState, i: number, h: number): boolean {
  const m0 = s.momentLbFt[i];
  const v0 = s.vAfterLb[i];
  const w = s.wPlf[i];
  const m1 = m0 + v0 * h - (w * h * h) / 2;
  let lo = Math.min(m0, m1);
  let hi = Math.max(m0, m1);
  if (w !== 0 && v0 / w > 0 && v0 / w < h) {
    const mPeak = m0 + (v0 * v0) / (2 * w);
    lo = Math.min(lo, mPeak);
    hi = Math.max(hi, mPeak);
  }
  return lo >= 0 || hi <= 0;
}

/** Zero of the slope on segment i between tLo and tHi (a sign change), Newton inside the bracket. */
function slopeZero(s: SpanState, i: number, tLo: number, sLo: number, tHi: number, tol: number): number {
  if (sLo === 0) return tLo;
  let lo = tLo;
  let hi = tHi;
  const loNegative = sLo < 0;
  let t = 0.5 * (lo + hi);
  for (let step = 0; step < MAX_NEWTON_STEPS && hi - lo > tol; step++) {
    const slope = eiSlopeIn(s, i, t);
    if (slope === 0) return t;
    if (slope < 0 === loNegative) lo = t;
    else hi = t;
    const m = s.momentLbFt[i] + s.vAfterLb[i] * t - (s.wPlf[i] * t * t) / 2;
    const next = m === 0 ? NaN : t - slope / m;
    // A Newton step within the tolerance has converged, even when it lands on a bracket end (t was just made
    // one): taking the bisection instead there would restart the search far from the root.
    if (Math.abs(next - t) <= tol) return next;
    const nextT = next > lo && next < hi ? next : 0.5 * (lo + hi);
    if (Math.abs(nextT - t) <= tol) return nextT;
    t = nextT;
  }
  return t;
}
