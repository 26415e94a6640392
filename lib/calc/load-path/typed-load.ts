import { asdCombinations } from '@/lib/calc/loads';
import { LOAD_TYPES, type LoadCombination, type LoadType } from '@/lib/calc/types';
import type { TypedLoad } from '@/shared/schemas/calc/load-path';
import type { LoadStandard } from '@/shared/schemas/jobs';

/**
 * A load of zero of every type (lb).
 * @example zeroLoad().D // 0
 * Reference: ASCE 7 §2.4.1 (load types D, L, Lr, S).
 */
export function zeroLoad(): Record<LoadType, number> {
  return { D: 0, L: 0, Lr: 0, S: 0 };
}

/**
 * The sum of loads by type (lb).
 * @example addLoads({ D: 100 }, { D: 50, L: 200 }) // { D: 150, L: 200, Lr: 0, S: 0 }
 * Reference: superposition of unfactored loads (ASCE 7 §2.4.1 combines them afterwards).
 */
export function addLoads(...loads: readonly Partial<TypedLoad>[]): Record<LoadType, number> {
  const sum = zeroLoad();
  for (const load of loads) for (const t of LOAD_TYPES) sum[t] += load[t] ?? 0;
  return sum;
}

/** The combinations that apply to a load: one naming a type the load does not carry is skipped (another governs). */
function applicable(load: TypedLoad, edition: LoadStandard): LoadCombination[] {
  return asdCombinations(edition).filter((c) =>
    (Object.keys(c.factors) as LoadType[]).every((t) => t === 'D' || (load[t] ?? 0) > 0),
  );
}

/** One ASD combination of a load: its name, C_D and the combined load (lb). */
export interface CombinedLoad {
  combination: string;
  CD: number;
  lb: number;
}

/**
 * Every ASD combination of the edition that applies to the load, combined (lb). A combination naming a
 * variable load the element does not carry is skipped: it would only repeat "D" with a larger C_D.
 * @param load unfactored load by type (lb)
 * @param edition the job's load standard
 * @example combineLoad({ D: 1000, L: 2000 }, 'ASCE 7-22').map((c) => c.lb) // [1000, 3000]
 * Reference: ASCE 7-16 / 7-22 §2.4.1; NDS 2018 Table 2.3.2 (C_D).
 */
export function combineLoad(load: TypedLoad, edition: LoadStandard): CombinedLoad[] {
  return applicable(load, edition).map((c) => ({
    combination: c.name,
    CD: c.CD,
    lb: LOAD_TYPES.reduce((sum, t) => sum + (c.factors[t] ?? 0) * (load[t] ?? 0), 0),
  }));
}

/**
 * The combination that gives the largest load (lb) — what bears on soil, where C_D does not apply.
 * @example governingLoad({ D: 1000, L: 2000 }, 'ASCE 7-16') // { combination: 'D + L', CD: 1, lb: 3000 }
 * Reference: ASCE 7-16 / 7-22 §2.4.1.
 */
export function governingLoad(load: TypedLoad, edition: LoadStandard): CombinedLoad {
  return combineLoad(load, edition).reduce((best, c) => (c.lb > best.lb ? c : best));
}
