import type { LoadType } from '@/lib/calc/types';

/**
 * Load duration factor C_D for each load type, by the load's cumulative duration: dead (permanent) 0.9,
 * occupancy live (ten years) 1.0, snow (two months) 1.15, roof live (seven days, construction) 1.25.
 * A combination takes the factor of its shortest-duration load. C_D never applies to F_c⊥ or E: the member
 * checks apply it to F_b, F_v and F_c only.
 *
 * @example LOAD_DURATION_CD.S // 1.15
 * Reference: NDS 2018, Table 2.3.2 and §2.3.2.
 */
export const LOAD_DURATION_CD: Readonly<Record<LoadType, number>> = Object.freeze({
  D: 0.9,
  L: 1.0,
  S: 1.15,
  Lr: 1.25,
});
