import { formatFtIn, formatIn, formatLb } from '@/lib/format';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { chipAt, placeLabels, type Box, type LabelRequest, type PlacedLabel } from './label-placement';
import type { SpanScale } from './span-frame';
import { chipWidth, fitText, LABEL_HEIGHT } from './text-metrics';

const ROW_GAP = 4;
const BEAM_HEIGHT = 12;
const BEARING_HEIGHT = 10;
/** Least drawn width of a bearing, px, however short it is to scale. */
const BEARING_MIN = 4;

/** A dimension line from x1 to x2 at y, px, with its label chip. */
export interface DimensionLine {
  x1: number;
  x2: number;
  y: number;
  label: PlacedLabel;
}

/** The beam and what is under it, px (y downward); `bottom` is the lowest y used. */
export interface SupportLayout {
  beam: Box;
  /** Left and right bearings, to scale along x. */
  bearings: [Box, Box];
  /** Reaction and bearing-length chips. */
  labels: PlacedLabel[];
  /** Clear span between the support faces, design span between the bearing centres. */
  dimensions: [DimensionLine, DimensionLine];
  bottom: number;
}

function bearingBox(left: number, right: number, y: number): Box {
  const width = Math.max(BEARING_MIN, right - left);
  return { x: (left + right) / 2 - width / 2, y, width, height: BEARING_HEIGHT };
}

/** One row of end labels centred under the bearings; the end with the smaller reaction drops first. */
function endRow(
  texts: [string, string],
  ids: [string, string],
  xs: [number, number],
  leftFirst: boolean,
  y: number,
  widthPx: number,
) {
  const requests: LabelRequest[] = [0, 1].map((i) => ({
    id: ids[i],
    text: texts[i],
    anchorX: xs[i],
    anchorY: y,
    side: 'below',
    priority: (i === 0) === leftFirst ? 0 : 1,
  }));
  return placeLabels(requests, { x: 0, y, width: widthPx, height: LABEL_HEIGHT }).placed;
}

function dimension(
  id: string,
  text: string,
  x1: number,
  x2: number,
  y: number,
  widthPx: number,
): DimensionLine {
  const fitted = fitText(text, widthPx);
  const x = Math.min(
    Math.max((x1 + x2) / 2 - chipWidth(fitted) / 2, 0),
    Math.max(0, widthPx - chipWidth(fitted)),
  );
  return { x1, x2, y: y + LABEL_HEIGHT / 2, label: chipAt(id, fitted, x, y, (x1 + x2) / 2) };
}

/**
 * Lays out the beam from end to end (the length to buy), both bearings to scale with their lengths, the
 * largest reaction at each end ("R 5,381 lb") and two dimension lines: the clear span between the support
 * faces and the design span between the bearing centres, each saying which it is.
 *
 * @param result a member check result (spans ft, bearings in, reactions lb)
 * @param scale the span scale of the drawing
 * @param beamTop y of the beam's top edge, px
 * @example layoutSupports(result, spanScale(result.spans, 390), 120).dimensions[0].label.text // `clear span 14' 0"`
 */
export function layoutSupports(result: MemberCheckResult, scale: SpanScale, beamTop: number): SupportLayout {
  const { reactions, spans } = result;
  const widthPx = scale.widthPx;
  const bearingTop = beamTop + BEAM_HEIGHT;
  const reactionY = bearingTop + BEARING_HEIGHT + ROW_GAP;
  const bearingY = reactionY + LABEL_HEIGHT + ROW_GAP;
  const clearY = bearingY + LABEL_HEIGHT + ROW_GAP * 2;
  const designY = clearY + LABEL_HEIGHT + ROW_GAP;
  const xs: [number, number] = [scale.leftCentrePx, scale.rightCentrePx];
  const leftFirst = reactions.leftLb >= reactions.rightLb;
  return {
    beam: {
      x: scale.memberLeftPx,
      y: beamTop,
      width: scale.memberRightPx - scale.memberLeftPx,
      height: BEAM_HEIGHT,
    },
    bearings: [
      bearingBox(scale.memberLeftPx, scale.leftFacePx, bearingTop),
      bearingBox(scale.rightFacePx, scale.memberRightPx, bearingTop),
    ],
    labels: [
      ...endRow(
        [`R ${formatLb(reactions.leftLb)}`, `R ${formatLb(reactions.rightLb)}`],
        ['reaction-left', 'reaction-right'],
        xs,
        leftFirst,
        reactionY,
        widthPx,
      ),
      ...endRow(
        [`${formatIn(spans.bearingLeftIn)} bearing`, `${formatIn(spans.bearingRightIn)} bearing`],
        ['bearing-left', 'bearing-right'],
        xs,
        leftFirst,
        bearingY,
        widthPx,
      ),
    ],
    dimensions: [
      dimension(
        'clear-span',
        `clear span ${formatFtIn(spans.clearSpanFt * 12)}`,
        scale.leftFacePx,
        scale.rightFacePx,
        clearY,
        widthPx,
      ),
      dimension(
        'design-span',
        `design span ${formatFtIn(spans.designSpanFt * 12)}`,
        xs[0],
        xs[1],
        designY,
        widthPx,
      ),
    ],
    bottom: designY + LABEL_HEIGHT + ROW_GAP,
  };
}
