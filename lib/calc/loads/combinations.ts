import { loadDurationFactor } from '@/lib/calc/factors/load-duration';
import type { LoadCombination, LoadType } from '@/lib/calc/types';
import type { LoadStandard } from '@/shared/schemas/jobs';

/** A frozen combination whose C_D is that of its shortest-duration load (NDS Table 2.3.2). */
function combination(name: string, factors: Partial<Record<LoadType, number>>): LoadCombination {
  const CD = loadDurationFactor(Object.keys(factors) as LoadType[]);
  return Object.freeze({ name, factors: Object.freeze(factors), CD });
}

/**
 * ASCE 7-16 basic ASD combinations with the load types the engine carries (no wind, seismic, rain).
 * Roof live and snow never share a combination ("Lr or S").
 */
const ASCE_7_16: readonly LoadCombination[] = Object.freeze([
  combination('D', { D: 1 }),
  combination('D + L', { D: 1, L: 1 }),
  combination('D + Lr', { D: 1, Lr: 1 }),
  combination('D + S', { D: 1, S: 1 }),
  combination('D + 0.75L + 0.75Lr', { D: 1, L: 0.75, Lr: 0.75 }),
  combination('D + 0.75L + 0.75S', { D: 1, L: 0.75, S: 0.75 }),
]);

/**
 * ASCE 7-22 basic ASD combinations: the snow load is strength-level, so it enters as 0.7S
 * (0.75 × 0.7 = 0.525 in the combination with live load).
 */
const ASCE_7_22: readonly LoadCombination[] = Object.freeze([
  combination('D', { D: 1 }),
  combination('D + L', { D: 1, L: 1 }),
  combination('D + Lr', { D: 1, Lr: 1 }),
  combination('D + 0.7S', { D: 1, S: 0.7 }),
  combination('D + 0.75L + 0.75Lr', { D: 1, L: 0.75, Lr: 0.75 }),
  combination('D + 0.75L + 0.75(0.7S)', { D: 1, L: 0.75, S: 0.525 }),
]);

/**
 * The ASD load combinations for the job's load standard edition, as a fixed, frozen list (the same array
 * on every call; combinations whose loads are all zero stay in it, and the caller may skip them).
 * Each combination carries C_D from its shortest-duration load (NDS Table 2.3.2). C_D applies to F_b, F_v
 * and F_c only, never to F_c⊥ or E; the member checks enforce that.
 *
 * @param edition the job's load standard, 'ASCE 7-16' or 'ASCE 7-22'
 * @returns combinations with the factor on each load type (dimensionless) and C_D
 * @example asdCombinations('ASCE 7-22')[3] // { name: 'D + 0.7S', factors: { D: 1, S: 0.7 }, CD: 1.15 }
 * Reference: ASCE 7-16 §2.4.1 eqs. 1–4; ASCE 7-22 §2.4.1 eqs. 1, 2, 3a, 4a (0.7S); NDS 2018 Table 2.3.2.
 */
export function asdCombinations(edition: LoadStandard): readonly LoadCombination[] {
  return edition === 'ASCE 7-16' ? ASCE_7_16 : ASCE_7_22;
}
