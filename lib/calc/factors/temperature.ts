import { CalcInputError } from '@/lib/calc/types';
import { UNIT_STRESS_FACTORS, type StressFactors } from './stress-factors';

const NORMAL_MAX_F = 100;
const MIDDLE_MAX_F = 125;
const TABLE_MAX_F = 150;

/**
 * Temperature factors C_t for sustained elevated temperature, by range (°F) and moisture condition:
 * T ≤ 100: all 1.0; 100 < T ≤ 125: F_t, E 0.9, F_b, F_v, F_c, F_c⊥ 0.8 dry / 0.7 wet; 125 < T ≤ 150: F_t, E
 * 0.9, others 0.7 dry / 0.5 wet.
 * @param input.temperatureF sustained service temperature (°F)
 * @param input.wet wet service conditions
 * @returns factors per design value (dimensionless)
 * @throws CalcInputError('temperatureF') above 150 °F (outside the table)
 * @example temperatureFactors({ temperatureF: 120, wet: false }).fb // 0.8
 * Reference: NDS 2018 §2.3.3, Table 2.3.3.
 */
export function temperatureFactors(input: { temperatureF: number; wet: boolean }): StressFactors {
  const { temperatureF, wet } = input;
  if (temperatureF <= NORMAL_MAX_F) return UNIT_STRESS_FACTORS;
  if (temperatureF > TABLE_MAX_F) {
    throw new CalcInputError('temperatureF', 'NDS Table 2.3.3 covers sustained temperatures up to 150 °F');
  }
  const other = temperatureF <= MIDDLE_MAX_F ? (wet ? 0.7 : 0.8) : wet ? 0.5 : 0.7;
  return { fb: other, ft: 0.9, fv: other, fcPerp: other, fc: other, e: 0.9 };
}
