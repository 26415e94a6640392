import type { MemberSize } from './types';

/** Upper bounds of dressed width (in) for each nominal width; timbers' dressed sizes are the larger ones. */
const NOMINAL_WIDTH_BOUNDS: readonly (readonly [number, number])[] = [
  [3.5, 4],
  [4.5, 5],
  [5.5, 6],
  [7.5, 8],
  [9.5, 10],
  [11.5, 12],
  [13.5, 14],
];

/**
 * The nominal width (in) a sawn member of actual depth dIn is classed under for size-specific values and
 * size factors. A measured depth between two dressed sizes falls in the wider class, whose factors are the
 * lower ones (conservative for old lumber measured on site).
 * @param dIn actual depth (in)
 * @returns nominal width (in): 4, 5, 6, 8, 10, 12, 14 or 16 (16 = wider than 14 in nominal)
 * @example nominalWidthForDepth(9.25) // 10
 * Reference: NDS Supplement 2018 Table 1B dressed sizes; Table 4A size factor rows.
 */
export function nominalWidthForDepth(dIn: number): number {
  for (const [maxIn, nominalIn] of NOMINAL_WIDTH_BOUNDS) if (dIn <= maxIn) return nominalIn;
  return 16;
}

/** Thickness class of one ply: 2 in and 3 in nominal, 4 in nominal, or a timber (5 in and thicker). */
export type ThicknessClass = 'two-three' | 'four' | 'timber';

/**
 * Thickness class of one ply of a member (b / plies): below 3 in actual is 2 in or 3 in nominal, below
 * 4-1/2 in is 4 in nominal, otherwise a timber.
 * @param size member size (bIn in in)
 * @example thicknessClass({ bIn: 4.5, plies: 3 }) // 'two-three'
 * Reference: NDS Supplement 2018 Table 1B dressed sizes; Table 4A (2–4 in thick) vs Table 4D (timbers).
 */
export function thicknessClass(size: Pick<MemberSize, 'bIn' | 'plies'>): ThicknessClass {
  const plyIn = size.bIn / size.plies;
  if (plyIn < 3) return 'two-three';
  if (plyIn < 4.5) return 'four';
  return 'timber';
}
