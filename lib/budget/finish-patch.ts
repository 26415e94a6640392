/**
 * Ceiling strip opened along the old wall line on each side, ft: a dropped member needs the strip where the
 * old top plate was; a flush or raised one opens the ceiling on both sides far enough to hang the joists
 * (common practice).
 */
export const CEILING_STRIP_FT = { dropped: 1, flush: 2, raised: 2 } as const;
/** Drywall taken off past each end of an opening, ft, to reach the king studs (common practice). */
export const WALL_PATCH_PAST_END_FT = 1;
/** Rough opening height under a header, ft: 82-1/2 in for a 6 ft 8 in door (common practice). */
export const DEFAULT_OPENING_HEIGHT_FT = 82.5 / 12;

export interface PatchInput {
  /** 'opening': a header in a wall that stays; 'wall-removed': the wall comes out under a beam. */
  work: 'opening' | 'wall-removed';
  mount: 'dropped' | 'flush' | 'raised';
  clearSpanFt: number;
  wallHeightFt: number;
  /** Member width and depth, in (a dropped beam is wrapped on its sides and bottom). */
  bIn: number;
  dIn: number;
  /** Rough opening height, ft (openings only); default 82-1/2 in. */
  openingHeightFt?: number;
  /** Ceiling strip opened on each side, ft; default by mount (CEILING_STRIP_FT). */
  ceilingStripFt?: number;
}

export interface PatchAreas {
  /** Wall drywall to patch, sq ft (both faces). */
  wallSf: number;
  /** Ceiling drywall to patch, sq ft (both sides of the old wall line). */
  ceilingSf: number;
  /** Drywall wrapping a dropped beam (sides and bottom), sq ft. */
  wrapSf: number;
  /** Flooring to patch along the old wall line, lf. */
  floorLf: number;
  /** Casing around an opening, lf (both faces). */
  trimLf: number;
}

/**
 * The finish work a member disturbs. An opening: both faces of the wall from floor to ceiling across the
 * opening and a foot past each end, less the opening itself, the floor across the opening where the plate
 * is cut out, and casing on both faces. A wall removed: the ceiling strip along its line on both sides (a
 * wider strip for a flush or raised member, whose joists are hung), the wall ends where it met other walls,
 * the flooring along the old wall line, and for a dropped beam its sides and bottom wrapped.
 * @param input kind of work, mount, spans and heights (ft), member size (in)
 * @returns areas (sq ft) and lengths (lf)
 * @example finishPatch({ work: 'wall-removed', mount: 'flush', clearSpanFt: 12, wallHeightFt: 8, bIn: 3.5, dIn: 9.25 }).ceilingSf // 48
 * Reference: common practice (finish patch along the work; strip widths and the 82-1/2 in rough opening
 *   are trade habits, overridable per budget).
 */
export function finishPatch(input: PatchInput): PatchAreas {
  const span = input.clearSpanFt;
  const strip = input.ceilingStripFt ?? CEILING_STRIP_FT[input.mount];
  const ceilingSf = input.mount === 'dropped' && input.work === 'opening' ? 0 : 2 * strip * span;
  if (input.work === 'opening') {
    const openingHeightFt = Math.min(input.openingHeightFt ?? DEFAULT_OPENING_HEIGHT_FT, input.wallHeightFt);
    const width = span + 2 * WALL_PATCH_PAST_END_FT;
    const wallSf = 2 * (width * input.wallHeightFt - span * openingHeightFt);
    return { wallSf, ceilingSf, wrapSf: 0, floorLf: span, trimLf: 2 * (2 * openingHeightFt + span) };
  }
  const wallEndsSf = 2 * 2 * WALL_PATCH_PAST_END_FT * input.wallHeightFt;
  const wrapSf = input.mount === 'dropped' ? ((input.bIn + 2 * input.dIn) / 12) * span : 0;
  return { wallSf: wallEndsSf, ceilingSf, wrapSf, floorLf: span, trimLf: 0 };
}
