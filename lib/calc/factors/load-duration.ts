import { CalcInputError, type LoadType } from '@/lib/calc/types';

/**
 * Load duration factor C_D by load type: dead (permanent) 0.9, occupancy live (ten years) 1.0, snow (two
 * months) 1.15, roof live (seven days, construction) 1.25.
 * Reference: NDS 2018 Table 2.3.2.
 */
export const LOAD_DURATION_FACTORS = {
  D: 0.9,
  L: 1.0,
  S: 1.15,
  Lr: 1.25,
} as const satisfies Record<LoadType, number>;

/** C_D for construction loads (seven days), used for temporary shoring. Reference: NDS 2018 Table 2.3.2. */
export const CONSTRUCTION_LOAD_DURATION_FACTOR = 1.25;

/**
 * Load duration factor for a combination of loads: the factor of the shortest-duration load in it, i.e. the
 * largest C_D among the load types present. C_D applies to F_b, F_t, F_v and F_c, never to F_c⊥ or E.
 * @param types load types present in the combination (at least one)
 * @returns C_D (dimensionless)
 * @throws CalcInputError('loadTypes') when no load type is given
 * @example loadDurationFactor(['D', 'S']) // 1.15
 * Reference: NDS 2018 §2.3.2 and Table 2.3.2.
 */
export function loadDurationFactor(types: readonly LoadType[]): number {
  if (types.length === 0)
    throw new CalcInputError('loadTypes', 'A load combination needs at least one load type');
  let CD = 0;
  for (const type of types) CD = Math.max(CD, LOAD_DURATION_FACTORS[type]);
  return CD;
}
