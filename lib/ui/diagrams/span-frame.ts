import type { MemberCheckResult } from '@/shared/schemas/calc/member';

const IN_PER_FT = 12;

/** Side padding of every diagram, px: the member's ends sit this far in from the edges. */
export const DIAGRAM_PAD_PX = 12;

export type MemberSpans = MemberCheckResult['spans'];

/**
 * Three ways of measuring along a member, all in ft, left to right:
 * - design frame: 0 at the centre of the left bearing, `designSpanFt` at the centre of the right one. The
 *   engine's diagram samples (`diagram.samples[].xFt`) and the positions of its takedown lines (`startFt`,
 *   `endFt`, `atFt`) are both in this frame: lib/calc prepareMember moves the input's source positions on by
 *   half the left bearing before the takedown and the analysis. A uniform takedown line without start and
 *   end covers the whole design span.
 * - clear frame: 0 at the face of the left support, what the user measures and types in the member input's
 *   load sources; clear = design − bearingLeftIn / 2 / 12.
 * - member frame: 0 at the left end of the piece, `lengthToBuyFt` at the right end; member = design +
 *   bearingLeftIn / 2 / 12.
 */
export interface SpanScale {
  widthPx: number;
  pxPerFt: number;
  /** x in px of a design-frame position (ft). */
  px(designFt: number): number;
  memberLeftPx: number;
  memberRightPx: number;
  /** Faces of the supports (the ends of the clear span), px. */
  leftFacePx: number;
  rightFacePx: number;
  /** Bearing centres (the ends of the design span), px. */
  leftCentrePx: number;
  rightCentrePx: number;
}

/**
 * Design-frame position (ft) → clear-frame position (ft from the face of the left support).
 * @param designFt ft from the centre of the left bearing
 * @param spans the result's spans (bearing lengths in in)
 * @example designToClearFt(9.1875, { bearingLeftIn: 4.5, ... }) // 9
 */
export function designToClearFt(designFt: number, spans: MemberSpans): number {
  return designFt - spans.bearingLeftIn / 2 / IN_PER_FT;
}

/**
 * The horizontal scale shared by the four diagrams, so that they line up one under the other: the whole
 * piece (length to buy) fills the width less the padding at each side.
 * @param spans the result's spans (ft, bearing lengths in in)
 * @param widthPx drawing width, px
 * @example spanScale(result.spans, 390).px(0) // x of the left bearing centre
 */
export function spanScale(spans: MemberSpans, widthPx: number, padPx = DIAGRAM_PAD_PX): SpanScale {
  const lengthFt = spans.clearSpanFt + (spans.bearingLeftIn + spans.bearingRightIn) / IN_PER_FT;
  const usable = Math.max(1, widthPx - 2 * padPx);
  const pxPerFt = usable / lengthFt;
  const halfLeftFt = spans.bearingLeftIn / 2 / IN_PER_FT;
  const px = (designFt: number) => padPx + (designFt + halfLeftFt) * pxPerFt;
  return {
    widthPx,
    pxPerFt,
    px,
    memberLeftPx: padPx,
    memberRightPx: padPx + usable,
    leftFacePx: padPx + (spans.bearingLeftIn / IN_PER_FT) * pxPerFt,
    rightFacePx: padPx + usable - (spans.bearingRightIn / IN_PER_FT) * pxPerFt,
    leftCentrePx: px(0),
    rightCentrePx: px(spans.designSpanFt),
  };
}

/** A linear map from a value domain onto a pixel range (either may run backwards). */
export function linearScale(
  domain: readonly [number, number],
  range: readonly [number, number],
): (value: number) => number {
  const span = domain[1] - domain[0];
  const k = span === 0 ? 0 : (range[1] - range[0]) / span;
  return (value) => range[0] + (value - domain[0]) * k;
}
