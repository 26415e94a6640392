/** Engineered lumber ply thickness, in (LVL, common practice). */
export const ENGINEERED_PLY_IN = 1.75;

/**
 * Plies of 1-3/4 in engineered lumber that make a member at least `widthIn` wide: 3.5 in is 2 plies, 5.25
 * in 3, a 5.5 in (2x6) wall wants 3 plies at 5-1/4 in (the nearest not wider than it, unless `atLeast`).
 * @param widthIn total width wanted, in
 * @param mode 'at-least': the fewest plies reaching the width; 'fits': the most plies not wider than it
 * @returns number of plies (≥ 1)
 * @example plyCount(3.5, 'at-least') // 2
 * Reference: common practice (LVL plies 1-3/4 in thick; two plies fill a 2x4 wall, three a 2x6 wall).
 */
export function plyCount(widthIn: number, mode: 'at-least' | 'fits'): number {
  if (!(widthIn > 0)) throw new RangeError('The width must be above 0 in');
  const exact = widthIn / ENGINEERED_PLY_IN;
  const plies = mode === 'at-least' ? Math.ceil(exact - 1e-9) : Math.floor(exact + 1e-9);
  return Math.max(1, plies);
}

/**
 * Ply joints to fasten along a built-up member: one between each pair of plies.
 * @param plies plies in the member
 * @returns joints (plies − 1, never below 0)
 * @example plyJoints(3) // 2
 * Reference: common practice (each ply fastened to the next).
 */
export function plyJoints(plies: number): number {
  return Math.max(0, Math.round(plies) - 1);
}
