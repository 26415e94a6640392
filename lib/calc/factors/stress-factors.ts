/** One adjustment factor per design value, for factors that differ by property (C_M, C_t, C_i). */
export interface StressFactors {
  fb: number;
  ft: number;
  fv: number;
  fcPerp: number;
  fc: number;
  /** Applies to E and E_min. */
  e: number;
}

/** All factors 1.0. */
export const UNIT_STRESS_FACTORS: StressFactors = Object.freeze({
  fb: 1,
  ft: 1,
  fv: 1,
  fcPerp: 1,
  fc: 1,
  e: 1,
});
