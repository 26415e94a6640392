import type { GlulamSpeciesGroup } from '@/tables/glulam/stress-classes';

/**
 * Constants of the glulam volume factor: reference length 21 ft, depth 12 in, width 5-1/8 in; widths over
 * 10-3/4 in (multiple-piece laminations) use 10.75 in; exponent 1/x with x = 10 western, 20 Southern Pine.
 * Reference: NDS 2018 §5.3.6, equation 5.3-1.
 */
export const GLULAM_VOLUME_REFERENCE = Object.freeze({
  lengthFt: 21,
  depthIn: 12,
  widthIn: 5.125,
  maxWidthIn: 10.75,
  exponent: Object.freeze({ western: 1 / 10, 'southern-pine': 1 / 20 }) as Readonly<
    Record<GlulamSpeciesGroup, number>
  >,
});

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
  const ref = GLULAM_VOLUME_REFERENCE;
  const exponent = ref.exponent[input.speciesGroup];
  const bIn = Math.min(input.bIn, ref.maxWidthIn);
  const product = (ref.lengthFt / input.spanFt) * (ref.depthIn / input.dIn) * (ref.widthIn / bIn);
  return Math.min(1, product ** exponent);
}
