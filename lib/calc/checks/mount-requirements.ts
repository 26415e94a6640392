import type { MemberLoadingInput } from '@/shared/schemas/calc/member';

/** Default joist spacing, in (common practice). */
export const DEFAULT_JOIST_SPACING_IN = 16;
/** Default least clear height under a dropped member, in: a 6 ft 8 in door (common practice). */
export const DEFAULT_MIN_HEADROOM_IN = 80;

/** What mounting asks for: depth fit, hangers (flush), headroom in (dropped) and requirements in words. */
export interface MountResult {
  kind: 'dropped' | 'flush';
  /** Flush: depth within the joist depth; dropped: headroom met; null when the needed input is missing. */
  depthFits: boolean | null;
  /** Flush: one hanger per joist framing in. */
  hangers: number | null;
  /** Dropped: clear height under the member, in. */
  headroomIn: number | null;
  requirements: string[];
}

/**
 * What mounting the member flush with the joists or dropped below them asks for. Flush: the depth must fit
 * the joists, a hanger for each joist framing in (joists at their spacing along the clear span, one or both
 * sides), and plies fastened to each other so a side load reaches every ply. Dropped: headroom under the
 * member. Multi-ply members state the fastening needed in both cases (a requirement, not a schedule).
 *
 * @param input member input (clearSpanFt ft; joist depth, spacing, heights in in)
 * @param dIn member depth, in; plies number of plies
 * @returns mount result (counts, in)
 * @example mountRequirements({ ...input, mount: 'flush', joistDepthIn: 9.25 }, 9.25, 2).hangers;
 * Reference: DESIGN.md §5 "flush or dropped" (common practice); NDS 2018 §12 fasteners for ply-to-ply connection.
 */
export function mountRequirements(input: MemberLoadingInput, dIn: number, plies: number): MountResult {
  const kind = input.mount ?? 'dropped';
  const requirements: string[] = [];
  if (kind === 'flush') {
    const spacingIn = input.joistSpacingIn ?? DEFAULT_JOIST_SPACING_IN;
    const perSide = Math.max(0, Math.ceil((input.clearSpanFt * 12) / spacingIn - 1e-9) - 1);
    const sides = (input.joistsBothSides ?? true) ? 2 : 1;
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
