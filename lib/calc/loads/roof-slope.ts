/**
 * Roof slope angle from the pitch (rise in 12 in of run).
 *
 * @param pitchIn12 rise per 12 in of horizontal run (0 = flat, 12 = 45°)
 * @returns θ in degrees
 * @example roofAngleDeg(6) // 26.565…
 * Reference: geometry, θ = atan(rise / run).
 */
export function roofAngleDeg(pitchIn12: number): number {
  return (Math.atan2(pitchIn12, 12) * 180) / Math.PI;
}

/**
 * Factor that turns a load per sloped roof area into a load per horizontal projection: 1 / cos θ
 * = √(12² + rise²) / 12 (√2 = 1.414 at 12 in 12).
 *
 * @param pitchIn12 rise per 12 in of horizontal run
 * @returns dimensionless multiplier ≥ 1
 * @example slopeToHorizontalFactor(12) // 1.41421…
 * Reference: ASCE 7 chapter 4 and Table C3.1-1a (roof dead load along the slope vs. horizontal projection).
 */
export function slopeToHorizontalFactor(pitchIn12: number): number {
  return Math.hypot(12, pitchIn12) / 12;
}
