import { UNIT_STRESS_FACTORS, type StressFactors } from './stress-factors';

const INCISED: StressFactors = Object.freeze({ fb: 0.8, ft: 0.8, fv: 0.8, fcPerp: 1, fc: 0.8, e: 0.95 });

/**
 * Incising factors C_i for dimension lumber incised to take preservative treatment: E and E_min 0.95;
 * F_b, F_t, F_c, F_v 0.80; F_c⊥ 1.00. Not incised: all 1.0.
 * @param incised whether the member is incised (look for rows of small slits on treated lumber)
 * @returns factors per design value (dimensionless)
 * @example incisingFactors(true).fb // 0.8
 * Reference: NDS 2018 §4.3.8, Table 4.3.8.
 */
export function incisingFactors(incised: boolean): StressFactors {
  return incised ? INCISED : UNIT_STRESS_FACTORS;
}
