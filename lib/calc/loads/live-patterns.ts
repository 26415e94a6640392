import type { LoadCombination, LoadType } from '@/lib/calc/types';

/** Regions (spans and overhangs) that carry most: more gives 2^n − 1 patterns per combination. */
const MAX_PATTERNED_REGIONS = 4;

/**
 * Factor on a variable load in a region of a patterned combination: 1 where the pattern loads it; off the
 * pattern, none of the occupancy or roof live load (ASCE 7 §4.3.3 partial loading) and half the snow
 * (ASCE 7 §7.5 partial loading: the remaining spans carry half the balanced snow load).
 *
 * @param type the load type (dead is never patterned); loaded whether the pattern loads this region
 * @returns the factor, dimensionless, applied on top of the combination's factor
 * @example patternFactor('S', false); // 0.5
 * Reference: ASCE 7-16 §4.3.3 and §7.5 (same sections in ASCE 7-22).
 */
export function patternFactor(type: LoadType, loaded: boolean): number {
  if (type === 'D' || loaded) return 1;
  return type === 'S' ? 0.5 : 0;
}

/**
 * The load patterns to try on a member of several regions: every non-empty set of the regions that carry a
 * variable load, the full set first. One region (a plain simple span) gives the one full pattern.
 *
 * @param loaded per region, whether any variable load lies on it
 * @returns sets of region indices, the first holding every loaded region
 * @example liveLoadPatterns([true, true]); // [[0, 1], [0], [1]]
 * Reference: ASCE 7-16 §4.3.3 (partial loading: the full intensity on parts of the member where that is
 * more unfavourable), §7.5 (snow).
 */
export function liveLoadPatterns(loaded: readonly boolean[]): number[][] {
  const regions = loaded.flatMap((isLoaded, i) => (isLoaded ? [i] : []));
  if (regions.length <= 1) return [regions];
  const count = Math.min(regions.length, MAX_PATTERNED_REGIONS);
  const full = (1 << count) - 1;
  const patterns: number[][] = [regions];
  for (let mask = full - 1; mask > 0; mask--) {
    patterns.push(regions.slice(0, count).filter((_, bit) => (mask >> bit) & 1));
  }
  return patterns;
}

/**
 * A combination's name for one pattern: the edition's name when every loaded region carries the variable
 * loads, else the name and where they are ("D + L (variable load on the left span)").
 * @example patternedName(combination, ['left span']); // 'D + L (variable load on the left span)'
 * Reference: ASCE 7-16 §2.4.1, §4.3.3.
 */
export function patternedName(combination: LoadCombination, regionNames: readonly string[] | null): string {
  if (regionNames === null) return combination.name;
  return `${combination.name} (variable load on the ${regionNames.join(' and the ')})`;
}
