import { formatNumber } from '@/lib/format';
import type { MemberLoadingInput } from '@/shared/schemas/calc/member';

/** Default joist spacing, in (common practice). */
export const DEFAULT_JOIST_SPACING_IN = 16;
/** Default least clear height under a dropped member, in: a 6 ft 8 in door (common practice). */
export const DEFAULT_MIN_HEADROOM_IN = 80;

/** What mounting asks for: depth fit, hangers (flush, raised), headroom in (dropped) and requirements in words. */
export interface MountResult {
  kind: 'dropped' | 'flush' | 'raised';
  /**
   * Flush: depth within the joist depth; dropped: headroom met; raised: depth within the attic clearance;
   * null when the needed input is missing.
   */
  depthFits: boolean | null;
  /** Flush: one hanger per joist framing in; raised: one hanger or strap per ceiling joist hung from it. */
  hangers: number | null;
  /** Dropped: clear height under the member, in. */
  headroomIn: number | null;
  /** Raised: rise above the ceiling line, and above the ceiling joists' tops (null without their depth), in. */
  depthAboveCeilingIn?: number | null;
  depthAboveJoistsIn?: number | null;
  /** Raised: bearing length each end needs, in. */
  endBearingRequiredIn?: number;
  requirements: string[];
}

/** Joists along the clear span(s) and overhangs at their spacing (one or both sides): per side and sides. */
function joistCount(input: MemberLoadingInput): { perSide: number; sides: number; spacingIn: number } {
  const spacingIn = input.joistSpacingIn ?? DEFAULT_JOIST_SPACING_IN;
  const clearFt =
    input.clearSpanFt +
    (input.secondClearSpanFt ?? 0) +
    (input.overhangLeftFt ?? 0) +
    (input.overhangRightFt ?? 0);
  const perSide = Math.max(0, Math.ceil((clearFt * 12) / spacingIn - 1e-9) - 1);
  const sides = (input.joistsBothSides ?? true) ? 2 : 1;
  return { perSide, sides, spacingIn };
}

/**
 * What mounting the member asks for.
 * - Flush: the depth must fit the joists, a hanger for each joist framing in (joists at their spacing along
 *   the clear span, one or both sides), and plies fastened so a side load reaches every ply.
 * - Dropped: headroom under the member.
 * - Raised into the attic, the ceiling joists hung from it: a hanger (joist framing into its side) or a strap
 *   over it (joist below it) for each ceiling joist; its depth above the ceiling line and above the joists'
 *   tops, which must fit under the roof framing; each end bearing on a post or jack studs carried down to
 *   the foundation with the bearing length the check needs; and the ceiling joists kept continuous as rafter
 *   ties where they tie the rafters.
 * Multi-ply members state the fastening needed in every case (a requirement, not a schedule).
 *
 * @param input member input (clearSpanFt ft; joist depth, spacing, heights, attic clearance in in)
 * @param dIn member depth, in; plies number of plies
 * @param endBearingRequiredIn bearing length the bearing check needs at the more loaded end, in
 * @returns mount result (counts, in)
 * @example mountRequirements({ ...input, mount: 'raised', atticClearanceIn: 30 }, 11.875, 2, 2.4).hangers;
 * Reference: DESIGN.md §5 "dropped, flush or raised" (common practice); NDS 2018 §3.10 (bearing); NDS 2018
 * §12 fasteners for ply-to-ply connection; IRC 2021 R802.5.2 (ceiling joists as rafter ties, from memory).
 */
export function mountRequirements(
  input: MemberLoadingInput,
  dIn: number,
  plies: number,
  endBearingRequiredIn: number,
): MountResult {
  const kind = input.mount ?? 'dropped';
  const requirements: string[] = [];
  if (kind === 'flush') {
    const { perSide, sides, spacingIn } = joistCount(input);
    const hangers = perSide * sides;
    requirements.push(
      `A joist hanger for each joist framing in: about ${hangers} (${perSide} per side at ${spacingIn} in on centre); hanger capacity and nailing per the hanger maker.`,
    );
    if (plies > 1) {
      requirements.push(
        `Plies fastened together so the load from joists on ${sides === 1 ? 'one side' : 'each side'} reaches every ply (side-loaded multi-ply member): the engineer or the manufacturer sets the nail, screw or bolt schedule.`,
      );
    }
    const depthFits = input.joistDepthIn === undefined ? null : dIn <= input.joistDepthIn + 1e-9;
    if (depthFits === false)
      requirements.push(`Member is ${dIn} in deep: deeper than the ${input.joistDepthIn} in joists.`);
    return { kind, depthFits, hangers, headroomIn: null, requirements };
  }
  if (kind === 'raised') return raisedRequirements(input, dIn, plies, endBearingRequiredIn);
  if (plies > 1) {
    requirements.push(
      'Plies fastened together as the engineer or the manufacturer specifies (top-loaded multi-ply member).',
    );
  }
  const minHeadroomIn = input.minHeadroomIn ?? DEFAULT_MIN_HEADROOM_IN;
  const headroomIn = input.underJoistsHeightIn === undefined ? null : input.underJoistsHeightIn - dIn;
  const depthFits = headroomIn === null ? null : headroomIn >= minHeadroomIn - 1e-9;
  if (depthFits === false) {
    requirements.push(
      `Clear height under the member ${headroomIn} in is below the ${minHeadroomIn} in wanted.`,
    );
  }
  return { kind, depthFits, hangers: null, headroomIn, requirements };
}

function raisedRequirements(
  input: MemberLoadingInput,
  dIn: number,
  plies: number,
  endBearingRequiredIn: number,
): MountResult {
  const requirements: string[] = [];
  const { perSide, sides, spacingIn } = joistCount(input);
  const hangers = perSide * sides;
  requirements.push(
    `A hanger or strap for each ceiling joist hung from the member: about ${hangers} (${perSide} per side at ${spacingIn} in on centre) — a hanger where the joist frames into its side, a strap over the top where the joist runs below it; capacity and nailing per the maker.`,
  );
  const depthAboveJoistsIn = input.joistDepthIn === undefined ? null : Math.max(0, dIn - input.joistDepthIn);
  requirements.push(
    `The member rises ${formatNumber(dIn, 3)} in above the ceiling line${
      depthAboveJoistsIn === null
        ? ''
        : ` (${formatNumber(depthAboveJoistsIn, 3)} in above the ceiling joists' tops)`
    }: it must clear the roof framing, insulation baffles and anything else in the attic along its length.`,
  );
  requirements.push(
    `Each end bears on a post or jack studs in the end wall with at least ${formatNumber(endBearingRequiredIn, 2)} in of bearing, carried down to the foundation; the top plate alone is not a seat for it.`,
  );
  requirements.push(
    'Where the ceiling joists tie the rafters (rafter ties at the plate), keep them continuous or spliced across: hanging them from the member must not cut the tie.',
  );
  if (plies > 1) {
    requirements.push(
      `Plies fastened together so the load of joists hung from ${sides === 1 ? 'one side' : 'each side'} reaches every ply: the engineer or the manufacturer sets the nail, screw or bolt schedule.`,
    );
  }
  const depthFits = input.atticClearanceIn === undefined ? null : dIn <= input.atticClearanceIn + 1e-9;
  if (depthFits === false) {
    requirements.push(
      `Member is ${dIn} in deep: more than the ${input.atticClearanceIn} in of clear height in the attic.`,
    );
  }
  return {
    kind: 'raised',
    depthFits,
    hangers,
    headroomIn: null,
    depthAboveCeilingIn: dIn,
    depthAboveJoistsIn,
    endBearingRequiredIn,
    requirements,
  };
}
