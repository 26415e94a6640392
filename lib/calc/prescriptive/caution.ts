/**
 * The caution shown wherever a result is (DESIGN.md §8). Every engine result carries it.
 *
 * @example
 * result.caution === CAUTION_TEXT; // true
 *
 * Reference: Tributary product design, §8 "Cautions".
 */
export const CAUTION_TEXT =
  'Preliminary check only — not a structural design. A licensed engineer or your local building code decides ' +
  'the member. Shore the structure before removing any bearing element. Local codes and the building official govern.';
