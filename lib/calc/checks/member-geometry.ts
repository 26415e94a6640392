import type { MemberLoadingInput } from '@/shared/schemas/calc/member';

const IN_PER_FT = 12;
/** Two jack studs under each end (common practice), in. */
export const DEFAULT_BEARING_IN = 3;
/** Bearing on a centre post when none is given: a 4x4's 3-1/2 in face (NDS Supplement Table 1B), in. */
export const DEFAULT_CENTRE_BEARING_IN = 3.5;

/** One stretch of the member between supports (a span) or past one (an overhang), ft from the left end. */
export interface GeometryRegion {
  name: string;
  kind: 'span' | 'overhang';
  startFt: number;
  endFt: number;
  /**
   * Length the deflection limits divide (L in L/360): the span, or twice the overhang for a cantilevered end
   * (IBC Table 1604.3 footnote, from memory; confirm).
   */
  limitLengthFt: number;
}

/** Where the member's supports are and what its stretches are (ft), and how entered positions map onto it. */
export interface MemberGeometry {
  /** Length analysed, ft: left end to right end (support centres, or tips of overhangs). */
  lengthFt: number;
  /** Support centres, ft from the left end: two, or three with a centre post. */
  supportsFt: number[];
  /** Bearing length at each support, in, left to right. */
  bearingsIn: number[];
  regions: GeometryRegion[];
  /** True for a plain simple span (two supports at the ends): the fast simple-span analysis applies. */
  simple: boolean;
  /** Added to an entered position (ft from the face of the left support, or from the tip of a left overhang). */
  positionOffsetFt: number;
  /** Longest span between supports, ft (the glulam volume factor's length, on the safe side). */
  longestSpanFt: number;
}

/**
 * The member's geometry from its input. Entered lengths are what is measured on site: clear spans between
 * support faces, overhangs from the face of the support to the tip. Design lengths run to support centres
 * (half the bearing in from each face), so a span's design length is its clear span plus half the bearing
 * at each of its supports, and an overhang's is its length plus half its support's bearing. Positions of load
 * sources are entered from the face of the left support, or from the tip of the left overhang when there is
 * one.
 *
 * @param input member input (spans and overhangs ft, bearings in)
 * @returns supports, regions and lengths (ft), bearings (in)
 * @example memberGeometry({ ...input, clearSpanFt: 12, overhangRightFt: 2 }).supportsFt; // [0, 12.25]
 * Reference: DESIGN.md §5 (design span = clear span + half the bearing at each end); AWC Design Aid No. 6
 * (2007) overhanging and continuous beams.
 */
export function memberGeometry(
  input: Pick<
    MemberLoadingInput,
    | 'clearSpanFt'
    | 'bearingLeftIn'
    | 'bearingRightIn'
    | 'secondClearSpanFt'
    | 'centreBearingIn'
    | 'overhangLeftFt'
    | 'overhangRightFt'
  >,
): MemberGeometry {
  const bl = input.bearingLeftIn ?? DEFAULT_BEARING_IN;
  const br = input.bearingRightIn ?? DEFAULT_BEARING_IN;
  const continuous = input.secondClearSpanFt !== undefined;
  const bc = input.centreBearingIn ?? DEFAULT_CENTRE_BEARING_IN;
  const overhangLeftFt = input.overhangLeftFt ?? 0;
  const overhangRightFt = input.overhangRightFt ?? 0;
  const leftTipFt = overhangLeftFt > 0 ? overhangLeftFt + bl / 2 / IN_PER_FT : 0;
  const span1Ft = input.clearSpanFt + (bl + (continuous ? bc : br)) / 2 / IN_PER_FT;
  const supportsFt = [leftTipFt, leftTipFt + span1Ft];
  const bearingsIn = [bl, br];
  const regions: GeometryRegion[] = [];
  if (leftTipFt > 0) {
    regions.push({
      name: 'left overhang',
      kind: 'overhang',
      startFt: 0,
      endFt: leftTipFt,
      limitLengthFt: 2 * leftTipFt,
    });
  }
  regions.push({
    name: continuous ? 'left span' : 'span',
    kind: 'span',
    startFt: supportsFt[0],
    endFt: supportsFt[1],
    limitLengthFt: span1Ft,
  });
  let longestSpanFt = span1Ft;
  if (continuous) {
    const span2Ft = (input.secondClearSpanFt ?? 0) + (bc + br) / 2 / IN_PER_FT;
    supportsFt.push(supportsFt[1] + span2Ft);
    bearingsIn.splice(1, 0, bc);
    regions.push({
      name: 'right span',
      kind: 'span',
      startFt: supportsFt[1],
      endFt: supportsFt[2],
      limitLengthFt: span2Ft,
    });
    longestSpanFt = Math.max(span1Ft, span2Ft);
  }
  const lastSupportFt = supportsFt[supportsFt.length - 1];
  const rightTipFt = overhangRightFt > 0 ? overhangRightFt + br / 2 / IN_PER_FT : 0;
  if (rightTipFt > 0) {
    regions.push({
      name: 'right overhang',
      kind: 'overhang',
      startFt: lastSupportFt,
      endFt: lastSupportFt + rightTipFt,
      limitLengthFt: 2 * rightTipFt,
    });
  }
  return {
    lengthFt: lastSupportFt + rightTipFt,
    supportsFt,
    bearingsIn,
    regions,
    simple: regions.length === 1,
    positionOffsetFt: leftTipFt > 0 ? 0 : bl / 2 / IN_PER_FT,
    longestSpanFt,
  };
}
