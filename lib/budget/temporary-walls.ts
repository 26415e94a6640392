/** Plates in a temporary wall: one bottom plate and one top plate (common practice). */
export const TEMPORARY_WALL_PLATES = 2;
/** A temporary wall runs this far past each end of the opening, ft (common practice: a stud bay or so). */
export const TEMPORARY_WALL_PAST_END_FT = 1;

/**
 * Studs in a wall of `lengthFt` at `spacingIn` on centre: one at each end and one at every spacing between
 * (the last bay may be short).
 * @param lengthFt wall length, ft
 * @param spacingIn stud spacing on centre, in
 * @returns number of studs
 * @example studCount(10, 16) // 9 (120 in ÷ 16 = 7.5 bays → 8 bays, 9 studs)
 * Reference: common practice (studs at layout from one end, an end stud at the other).
 */
export function studCount(lengthFt: number, spacingIn: number): number {
  if (!(lengthFt > 0) || !(spacingIn > 0)) throw new RangeError('Length and spacing must be above 0');
  return Math.ceil((lengthFt * 12) / spacingIn - 1e-9) + 1;
}

export interface TemporaryWallTakeoff {
  side: 'A' | 'B';
  lengthFt: number;
  /** Spacing used, in on centre; null when no common layout carries the load (rent shores instead). */
  spacingIn: number | null;
  studs: number;
  /** Plate lumber, lf (top and bottom plate). */
  plateLf: number;
}

/**
 * Lumber for the temporary walls of a shoring plan: each wall as long as the opening plus a foot past each
 * end, studs at the widest common layout the plan found (24, 16, 12 or 8 in), a top and a bottom plate.
 * @param plan the engine's shoring plan (lib/calc planShoring)
 * @param openingFt clear span of the opening, ft
 * @returns per wall: length (ft), spacing (in), studs, plate (lf)
 * @example temporaryWalls(plan, 10)[0].studs // 11 for a 12 ft wall at 16 in
 * Reference: common practice (temporary walls at layout with plates top and bottom); spacing from the
 *   shoring plan's stud check (NDS 2018 §3.7.1).
 */
export function temporaryWalls(
  plan: { walls: readonly { side: 'A' | 'B'; check: { layoutSpacingIn: number | null } }[] },
  openingFt: number,
): TemporaryWallTakeoff[] {
  const lengthFt = openingFt + 2 * TEMPORARY_WALL_PAST_END_FT;
  return plan.walls.map((wall) => {
    const spacingIn = wall.check.layoutSpacingIn;
    return {
      side: wall.side,
      lengthFt,
      spacingIn,
      studs: spacingIn === null ? 0 : studCount(lengthFt, spacingIn),
      plateLf: spacingIn === null ? 0 : TEMPORARY_WALL_PLATES * lengthFt,
    };
  });
}
