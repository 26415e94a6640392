import type { GlulamSpeciesGroup } from '@/tables/glulam/stress-classes';

const REFERENCE_LENGTH_FT = 21;
const REFERENCE_DEPTH_IN = 12;
const REFERENCE_WIDTH_IN = 5.125;
/** Widths over 10-3/4 in (multiple-piece laminations) use 10.75 in (NDS 2018 §5.3.6). */
const MAX_WIDTH_IN = 10.75;
const EXPONENT_DENOMINATOR: Record<GlulamSpeciesGroup, number> = { western: 10, 'southern-pine': 20 };

/**
 * Glulam volume factor C_V = (21/L)^(1/x) (12/d)^(1/x) (5.125/b)^(1/x) ≤ 1.0, x = 10 for western species
 * and 20 for Southern Pine. Applies to F_bx only, and not together with C_L: F'_b takes the lesser of the
 * two. L is the length between points of zero moment (the span of a simple beam).
 * @param input.spanFt length between points of zero moment (ft), > 0
 * @param input.dIn depth (in); input.bIn width (in)
 * @param input.speciesGroup 'western' | 'southern-pine'
 * @returns C_V (dimensionless, ≤ 1.0)
 * @example glulamVolumeFactor({ spanFt: 18, dIn: 13.5, bIn: 6.75, speciesGroup: 'western' }) // 0.976
 * Reference: NDS 2018 §5.3.6, equation 5.3-1.
 */
export function glulamVolumeFactor(input: {
  spanFt: number;
  dIn: number;
  bIn: number;
  speciesGroup: GlulamSpeciesGroup;
}): number {
  const exponent = 1 / EXPONENT_DENOMINATOR[input.speciesGroup];
  const bIn = Math.min(input.bIn, MAX_WIDTH_IN);
  const product =
    (REFERENCE_LENGTH_FT / input.spanFt) * (REFERENCE_DEPTH_IN / input.dIn) * (REFERENCE_WIDTH_IN / bIn);
  return Math.min(1, product ** exponent);
}
