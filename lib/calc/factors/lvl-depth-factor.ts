const REFERENCE_DEPTH_IN = 12;
/** Shallower members take the factor at 3-1/2 in, as manufacturers' literature commonly states (common practice). */
const MIN_DEPTH_IN = 3.5;

/**
 * Depth (volume) factor on F_b of LVL: (12/d)^n, with the exponent n the grade's published value (generic
 * grades: tables/lvl/generic-grades.ts). Above 1.0 for depths under 12 in, as published.
 * @param dIn member depth (in), > 0
 * @param exponent n (dimensionless), e.g. 0.136
 * @returns the factor (dimensionless)
 * @example lvlDepthFactor(16, 0.136) // 0.9616
 * Reference: NDS 2018 §8.3.6 (volume factor C_V of structural composite lumber, per the manufacturer).
 */
export function lvlDepthFactor(dIn: number, exponent: number): number {
  return (REFERENCE_DEPTH_IN / Math.max(dIn, MIN_DEPTH_IN)) ** exponent;
}
