/** Roof slope (degrees) at which C_s reaches 0 on every curve. */
const ZERO_AT_DEG = 70;

/**
 * Slope up to which C_s stays 1.0, by thermal factor and surface: warm roofs (C_t ≤ 1.0) 30° for other
 * surfaces and 5° for unobstructed slippery ones; C_t = 1.1 37.5° / 10°; C_t ≥ 1.2 45° / 15°.
 * Breakpoints from memory of ASCE 7-16 Fig. 7.4-1 (same curves in ASCE 7-22); confirm in the standard.
 */
function flatUpToDeg(thermalCt: number, slippery: boolean): number {
  if (thermalCt <= 1.0) return slippery ? 5 : 30;
  if (thermalCt <= 1.1) return slippery ? 10 : 37.5;
  return slippery ? 15 : 45;
}

/**
 * Roof slope factor C_s: 1.0 up to the curve's breakpoint, then straight down to 0 at 70°:
 * C_s = (70° − θ) / (70° − θ_b).
 *
 * @param slopeDeg roof slope θ in degrees
 * @param thermalCt thermal factor C_t (selects the warm / cold-roof curve)
 * @param slippery true for an unobstructed slippery surface that lets snow slide off the eaves
 * @returns C_s, dimensionless, 0 to 1
 * @example roofSlopeFactor(45, 1.0, false) // 0.625
 * Reference: ASCE 7-16 §7.4 and Fig. 7.4-1 (ASCE 7-22 §7.4, Fig. 7.4-1); breakpoints from memory.
 */
export function roofSlopeFactor(slopeDeg: number, thermalCt: number, slippery: boolean): number {
  const breakDeg = flatUpToDeg(thermalCt, slippery);
  if (slopeDeg <= breakDeg) return 1;
  if (slopeDeg >= ZERO_AT_DEG) return 0;
  return (ZERO_AT_DEG - slopeDeg) / (ZERO_AT_DEG - breakDeg);
}
