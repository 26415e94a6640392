import { DESIGNED_MATERIAL_LABELS } from '@/shared/schemas/requests/reply';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';

/** The framing list's header: what the list needs of the member in the opening. */
export interface FramingHeader {
  label: string;
  depthIn: number;
  plies: number;
  engineered: boolean;
}

/** Most plies the framing list counts as pieces, and most jack studs a side (its own limits). */
const MAX_FRAMING_PLIES = 4;
const MAX_JACKS = 4;
/** Bearing one 2x jack stud gives under a header end, in (its 1-1/2 in face; common practice). */
const JACK_BEARING_IN = 1.5;

/**
 * The framing list's header from the engineer's member, or why it cannot be: the list needs the member's
 * depth, and counts at most 4 pieces. Anything but sawn lumber is ordered to length (engineered lumber,
 * steel, a flitch beam's plate), so no stock lengths are picked for it. The engineer's bearing lengths, when
 * given, set the jack studs a side: one per 1-1/2 in of bearing (common practice).
 * @example designedHeader({ material: 'lvl', designation: '2-ply 1-3/4 x 9-1/4 LVL', plies: 2, depthIn: 9.25, … })
 * // { header: { label: '2-ply 1-3/4 x 9-1/4 LVL (LVL)', depthIn: 9.25, plies: 2, engineered: true }, jacksPerSide: null }
 */
export function designedHeader(
  design: Pick<
    MemberDesign,
    'material' | 'designation' | 'plies' | 'depthIn' | 'bearingLeftIn' | 'bearingRightIn'
  >,
): { header: FramingHeader; jacksPerSide: number | null } | { problem: string } {
  if (design.depthIn === null)
    return {
      problem: 'The engineer’s member gives no depth: the framing list stays at the preliminary size.',
    };
  const plies = design.material === 'steel-w' ? 1 : (design.plies ?? 1);
  if (plies > MAX_FRAMING_PLIES)
    return {
      problem: `The engineer’s member has ${plies} plies; the framing list counts at most ${MAX_FRAMING_PLIES}. Cut it from the engineer’s document.`,
    };
  const bearingIn = Math.max(design.bearingLeftIn ?? 0, design.bearingRightIn ?? 0);
  const jacks = bearingIn > 0 ? Math.ceil(bearingIn / JACK_BEARING_IN - 1e-9) : null;
  if (jacks !== null && jacks > MAX_JACKS)
    return {
      problem: `The engineer’s ${bearingIn} in bearing needs ${jacks} jack studs a side; the framing list counts at most ${MAX_JACKS}. Frame it from the engineer’s document.`,
    };
  return {
    jacksPerSide: jacks,
    header: {
      label: `${design.designation} (${DESIGNED_MATERIAL_LABELS[design.material]})`,
      depthIn: design.depthIn,
      plies,
      engineered: design.material !== 'sawn',
    },
  };
}
