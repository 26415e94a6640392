import type { MemberCheckResult, SupportName } from '@/shared/schemas/calc/member';

const IN_PER_FT = 12;

/** Side padding of every diagram, px: the member's ends sit this far in from the edges. */
export const DIAGRAM_PAD_PX = 12;

export type MemberSpans = MemberCheckResult['spans'];
/** What the frame is read from: the result's spans and its reactions (the engine's list of supports). */
export type FrameSource = Pick<MemberCheckResult, 'spans' | 'reactions'>;

/**
 * Three ways of measuring along a member, all in ft, left to right:
 * - analysis frame: 0 at the member's left end as the engine analyses it — the centre of the left bearing,
 *   or the tip of a left overhang — running over every span and overhang to `analysedLengthFt`. The
 *   engine's diagram samples (`diagram.samples[].xFt`), support positions (`reactions.bySupport[].atFt`) and
 *   takedown positions (`startFt`, `endFt`, `atFt`) are all in this frame. A uniform takedown line without
 *   start and end covers the whole analysed length.
 * - entered frame: what the user measures and types in the member input's load sources: from the face of
 *   the left support, or from the tip of a left overhang; entered = analysis − `enteredOffsetFt`.
 * - piece: the member as bought, `pieceStartFt` to `pieceEndFt` in the analysis frame (the outer face of an
 *   end bearing, or an overhang's tip), `lengthToBuyFt` long.
 */
export interface MemberFrame {
  analysedLengthFt: number;
  pieceStartFt: number;
  pieceEndFt: number;
  /** Subtracted from an analysis-frame position to give the position as entered. */
  enteredOffsetFt: number;
  /** True when positions are entered from the tip of a left overhang (else from the left support face). */
  fromLeftTip: boolean;
  supports: FrameSupport[];
}

/** One support: its name, the centre of its bearing (analysis frame, ft) and the bearing length (in). */
export interface FrameSupport {
  name: SupportName;
  atFt: number;
  bearingIn: number;
}

/** A support on the drawing, px: its bearing centre and both faces. */
export interface SupportMark extends FrameSupport {
  centrePx: number;
  leftFacePx: number;
  rightFacePx: number;
}

export interface SpanScale {
  widthPx: number;
  pxPerFt: number;
  frame: MemberFrame;
  /** x in px of an analysis-frame position (ft). */
  px(xFt: number): number;
  /** Ends of the piece, px. */
  memberLeftPx: number;
  memberRightPx: number;
  /** Every support, left to right. */
  supports: SupportMark[];
  /** Inner faces of the end supports (the ends of the first and the last clear span), px. */
  leftFacePx: number;
  rightFacePx: number;
  /** Bearing centres of the end supports, px. */
  leftCentrePx: number;
  rightCentrePx: number;
}

/** The supports as the spans give them (for a result stored without `reactions.bySupport`). */
function supportsFromSpans(spans: MemberSpans): FrameSupport[] {
  const leftAt = spans.overhangLeftFt ? spans.overhangLeftFt + spans.bearingLeftIn / 2 / IN_PER_FT : 0;
  const out: FrameSupport[] = [{ name: 'left', atFt: leftAt, bearingIn: spans.bearingLeftIn }];
  let at = leftAt + spans.designSpanFt;
  if (spans.secondDesignSpanFt !== undefined) {
    out.push({ name: 'centre', atFt: at, bearingIn: spans.centreBearingIn ?? spans.bearingRightIn });
    at += spans.secondDesignSpanFt;
  }
  out.push({ name: 'right', atFt: at, bearingIn: spans.bearingRightIn });
  return out;
}

/**
 * Where the member's supports and ends are along the analysis frame, from the engine's result: the analysed
 * length (`spans.memberLengthFt`, or the design span of a simple span), the support list
 * (`reactions.bySupport`, or the spans when a stored result lacks it) with each support's bearing, and the
 * ends of the piece (an overhang's tip, or the outer face of an end bearing).
 *
 * @param result a member check result (spans ft, bearings in, support positions ft)
 * @example memberFrame(check({ ...body, clearSpanFt: 12, secondClearSpanFt: 10 })).supports.map((s) => s.name) // ['left', 'centre', 'right']
 */
export function memberFrame(result: FrameSource): MemberFrame {
  const { spans } = result;
  const fromSpans = supportsFromSpans(spans);
  const engine = result.reactions.bySupport;
  const supports =
    engine && engine.length === fromSpans.length
      ? engine.map((s, i) => ({ name: s.support, atFt: s.atFt, bearingIn: fromSpans[i].bearingIn }))
      : fromSpans;
  const analysedLengthFt = spans.memberLengthFt ?? spans.designSpanFt;
  const fromLeftTip = (spans.overhangLeftFt ?? 0) > 0;
  const pieceStartFt = fromLeftTip ? 0 : -spans.bearingLeftIn / 2 / IN_PER_FT;
  const pieceEndFt =
    (spans.overhangRightFt ?? 0) > 0
      ? analysedLengthFt
      : analysedLengthFt + spans.bearingRightIn / 2 / IN_PER_FT;
  return {
    analysedLengthFt,
    pieceStartFt,
    pieceEndFt,
    enteredOffsetFt: fromLeftTip ? 0 : spans.bearingLeftIn / 2 / IN_PER_FT,
    fromLeftTip,
    supports,
  };
}

/**
 * Analysis-frame position (ft) → the position as the user enters it: ft from the face of the left support,
 * or from the tip of a left overhang.
 * @param xFt ft from the member's left end as analysed
 * @param frame the member's frame
 * @example toEnteredFt(9.1875, memberFrame(result)) // 9 with 4-1/2 in bearings and no overhang
 */
export function toEnteredFt(xFt: number, frame: MemberFrame): number {
  return xFt - frame.enteredOffsetFt;
}

/**
 * The horizontal scale shared by the four diagrams, so that they line up one under the other: the whole
 * piece (length to buy: every span and overhang) fills the width less the padding at each side, with every
 * support the engine analysed.
 * @param result the result's spans and reactions (ft, bearing lengths in in)
 * @param widthPx drawing width, px
 * @example spanScale(result, 390).supports.map((s) => s.centrePx) // x of each bearing centre
 */
export function spanScale(result: FrameSource, widthPx: number, padPx = DIAGRAM_PAD_PX): SpanScale {
  const frame = memberFrame(result);
  const lengthFt = Math.max(1e-9, frame.pieceEndFt - frame.pieceStartFt);
  const usable = Math.max(1, widthPx - 2 * padPx);
  const pxPerFt = usable / lengthFt;
  const px = (xFt: number) => padPx + (xFt - frame.pieceStartFt) * pxPerFt;
  const supports = frame.supports.map((s) => {
    const halfFt = s.bearingIn / 2 / IN_PER_FT;
    return { ...s, centrePx: px(s.atFt), leftFacePx: px(s.atFt - halfFt), rightFacePx: px(s.atFt + halfFt) };
  });
  const first = supports[0];
  const last = supports[supports.length - 1];
  return {
    widthPx,
    pxPerFt,
    frame,
    px,
    memberLeftPx: padPx,
    memberRightPx: padPx + usable,
    supports,
    leftFacePx: first.rightFacePx,
    rightFacePx: last.leftFacePx,
    leftCentrePx: first.centrePx,
    rightCentrePx: last.centrePx,
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
