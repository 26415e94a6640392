import type { PointPiece, SpanLoads, UniformPiece } from './span-loads';

/**
 * Singularity (Macaulay) sums for a beam's response from its left end, x in ft: shear just after x, moment,
 * and E·I·slope and E·I·y without integration constants, for a force rA (lb, upward) at x = 0 plus point
 * pieces (lb, downward positive; an upward support reaction is a negative piece) and uniform pieces (plf).
 * V = rA − ΣP⟨x−a⟩⁰ − Σw(⟨x−a⟩¹ − ⟨x−b⟩¹), M = ∫V, E·I·y'' = M.
 *
 * Reference: AWC Design Aid No. 6 (2007) beam formulas, by superposition; elastic curve E·I·y'' = M.
 */

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
