import { PLATE_THICKNESS_IN } from '@/lib/calc/framing/lumber';
import { pickStock, type StockPick } from '@/lib/calc/framing/stock';
import { formatNumberTrimmed as n } from '@/lib/format/number';
import { requirePositive } from './input-guards';

const IN_PER_FT = 12;

/**
 * How far a temporary wall runs past each end of the opening, ft: one stud bay or so beyond the jacks, so
 * the joists at the ends stay carried while the posts go in (common practice).
 */
export const SHORING_END_RUN_FT = 1;

/**
 * The order the trade follows with temporary walls (common practice), shown with every shoring plan.
 * Reference: common practice; DESIGN.md §8 (shore before removing any bearing element).
 */
export const SHORING_SEQUENCE: readonly string[] = Object.freeze([
  'Clear and protect the floor where each temporary wall stands; lay its sill or bottom plate across the joists below.',
  'Build each wall: bottom plate, studs at the spacing given, top plate; brace it diagonally so it cannot rack or kick out.',
  'Snug the top plate to the ceiling with shims or wedges under the studs — do not jack: jacking cracks plaster and lifts the floor above.',
  'Temporary walls carry vertical load only: they never take the place of ceiling joists that tie the rafters.',
  'Only then open the wall and take out the bearing studs and plates.',
  'Keep the shoring in place until the posts, the footing (poured, cured and inspected) and every hanger are in — the job checklist gates this.',
  'Take the temporary walls down by easing the shims, one wall at a time, and watch for movement.',
]);

/** Studs and plates of one temporary stud wall. */
export interface StudWallTakeoff {
  lengthFt: number;
  studCount: number;
  /** Stud length between a single bottom and a single top plate, in. */
  studLengthIn: number;
  studStock: StockPick;
  /** Plate length (one bottom, one top), in. */
  plateLengthIn: number;
  plates: number;
  plateStock: StockPick;
}

/**
 * The studs and plates of a temporary stud wall: studs at every spacing along the wall plus one at the end
 * (count = floor(L / s) + 1, at least 2), one bottom and one top plate, studs cut to height − 2 × 1.5 in.
 * @param lengthFt length of the temporary wall (ft), usually the opening plus SHORING_END_RUN_FT each end
 * @param studSpacingIn stud spacing on centre (in)
 * @param heightFt floor to ceiling where the wall stands (ft)
 * @returns counts, stud and plate lengths (in) and the stock to buy
 * @throws CalcInputError for a non-positive length, spacing or height
 * @example studWallTakeoff(14, 16, 8).studCount // 11
 * Reference: common practice (stud layout, single top plate on a temporary wall); NDS Supplement 2018
 *   Table 1B (1.5 in dressed plate).
 */
export function studWallTakeoff(lengthFt: number, studSpacingIn: number, heightFt: number): StudWallTakeoff {
  requirePositive('lengthFt', lengthFt, 'Wall length');
  requirePositive('studSpacingIn', studSpacingIn, 'Stud spacing');
  requirePositive('heightFt', heightFt, 'Wall height');
  const lengthIn = lengthFt * IN_PER_FT;
  const studCount = Math.max(2, Math.floor(lengthIn / studSpacingIn + 1e-9) + 1);
  const studLengthIn = heightFt * IN_PER_FT - 2 * PLATE_THICKNESS_IN;
  const sawn = { precut: false, engineered: false };
  return {
    lengthFt,
    studCount,
    studLengthIn,
    studStock: pickStock(studLengthIn, studCount, { precut: true, engineered: false }),
    plateLengthIn: lengthIn,
    plates: 2,
    plateStock: pickStock(Math.min(lengthIn, 240), 2 * Math.ceil(lengthIn / 240 - 1e-9), sawn),
  };
}

/** Rented adjustable shores under one temporary wall's beam. */
export interface ShoreLayout {
  ratedCapacityLb: number;
  loadPlf: number;
  /** Largest spacing the rated capacity allows = capacity ÷ load (ft). */
  maxSpacingFt: number;
  count: number;
  /** Spacing used with that count over the wall length (ft). */
  spacingFt: number;
  loadPerShoreLb: number;
  pass: boolean;
  summary: string;
  warnings: string[];
}

/**
 * Adjustable shores at the rated capacity the user reads off the shore (at the height it is extended to):
 * each carries w × s; s ≤ capacity ÷ w; count = ceil(L / s) + 1 so both ends are carried.
 * @param loadPlf line load on the temporary wall (plf)
 * @param ratedCapacityLb capacity read off the shore at its working height (lb)
 * @param lengthFt length of the temporary wall (ft)
 * @returns spacing (ft), count and load per shore (lb), with what is not checked
 * @throws CalcInputError for a non-positive load, capacity or length
 * @example rentedShores(600, 3000, 12).count // 4 (max spacing 5 ft)
 * Reference: common practice (shores under a continuous beam, spacing from the shore's rated capacity).
 */
export function rentedShores(loadPlf: number, ratedCapacityLb: number, lengthFt: number): ShoreLayout {
  requirePositive('loadPlf', loadPlf, 'Shoring load');
  requirePositive('ratedCapacityLb', ratedCapacityLb, 'Rated capacity');
  requirePositive('lengthFt', lengthFt, 'Wall length');
  const maxSpacingFt = ratedCapacityLb / loadPlf;
  const count = Math.ceil(lengthFt / maxSpacingFt - 1e-9) + 1;
  const spacingFt = lengthFt / (count - 1);
  const loadPerShoreLb = loadPlf * spacingFt;
  return {
    ratedCapacityLb,
    loadPlf,
    maxSpacingFt,
    count,
    spacingFt,
    loadPerShoreLb,
    pass: loadPerShoreLb <= ratedCapacityLb,
    summary: `${count} shores at ${n(spacingFt, 2)} ft or closer (${n(loadPlf, 1)} plf × ${n(spacingFt, 2)} ft = ${n(loadPerShoreLb, 0)} lb each, rated ${n(ratedCapacityLb, 0)} lb).`,
    warnings: [
      'Use the capacity printed on the shore for the height it is extended to: capacity drops as a shore is extended.',
      'The beam or doubled plate across the shore heads spans between shores and is not checked here; each shore stands on a pad or plank.',
    ],
  };
}
