import { formatFtIn, formatIn, formatLb } from '@/lib/format';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import {
  boxesOverlap,
  chipAt,
  placeLabels,
  type Box,
  type LabelRequest,
  type PlacedLabel,
} from './label-placement';
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
  /** Every bearing, left to right, to scale along x. */
  bearings: Box[];
  /** Reaction and bearing-length chips. */
  labels: PlacedLabel[];
  /**
   * Each clear span between its support faces and each overhang from its support's outer face to the tip,
   * then each design span between bearing centres.
   */
  dimensions: DimensionLine[];
  bottom: number;
}

function bearingBox(left: number, right: number, y: number): Box {
  const width = Math.max(BEARING_MIN, right - left);
  return { x: (left + right) / 2 - width / 2, y, width, height: BEARING_HEIGHT };
}

/**
 * One row of labels centred under the supports; the smaller reactions' labels go in first choice last, and a
 * label with no room for its text is tried again with its short text (`shorts`), else dropped.
 */
function supportRow(
  texts: readonly string[],
  shorts: readonly string[],
  ids: readonly string[],
  xs: readonly number[],
  ranks: readonly number[],
  y: number,
  widthPx: number,
) {
  const request = (i: number, text: string): LabelRequest => ({
    id: ids[i],
    text,
    anchorX: xs[i],
    anchorY: y,
    side: 'below',
    priority: ranks[i],
  });
  const bounds = { x: 0, y, width: widthPx, height: LABEL_HEIGHT };
  const full = placeLabels(
    texts.map((t, i) => request(i, t)),
    bounds,
  );
  const retry = full.dropped.map((id) => ids.indexOf(id)).map((i) => request(i, shorts[i]));
  return [...full.placed, ...placeLabels(retry, bounds, full.placed).placed];
}

/** A dimension to draw: its ends (px) and its label's texts, longest first. */
interface DimensionRequest {
  id: string;
  texts: string[];
  x1: number;
  x2: number;
}

/** What a row of dimensions holds: label chips and the lines' x ranges. */
interface DimensionRow {
  chips: Box[];
  lines: { x1: number; x2: number }[];
}

/** Least room between a short dimension's tick and a label set beside it, px. */
const BESIDE_GAP = 4;

/**
 * Where a dimension's label may go, first choice first: centred over a line it leaves room beside, else
 * beside the line; centred over the whole line (hiding its ticks) only when `cover`, as a last resort.
 */
function labelSpots(d: DimensionRequest, chipW: number, widthPx: number, cover: boolean): number[] {
  const centred = (d.x1 + d.x2) / 2 - chipW / 2;
  const roomy = chipW <= d.x2 - d.x1 - 2 * BESIDE_GAP;
  const spots = roomy ? [centred] : [];
  spots.push(d.x2 + BESIDE_GAP, d.x1 - BESIDE_GAP - chipW);
  if (!roomy && cover) spots.push(centred);
  return spots.filter((x) => x >= 0 && x + chipW <= widthPx);
}

function fitsRow(row: DimensionRow, chip: Box, d: DimensionRequest): boolean {
  if (row.chips.some((c) => boxesOverlap(c, chip))) return false;
  return row.lines.every(
    (l) =>
      // another line may touch this one at a shared support, never run under its label or along it
      !(chip.x < l.x2 - 1 && l.x1 + 1 < chip.x + chip.width) && !(d.x1 < l.x2 - 1 && l.x1 + 1 < d.x2),
  );
}

/**
 * Dimension lines in rows from `top`: each goes in the first row where one of its texts (longest first)
 * fits clear of the row's other labels and lines, else in a new row with the text that fits the drawing.
 */
function packDimensions(
  requests: readonly DimensionRequest[],
  top: number,
  widthPx: number,
): { dims: DimensionLine[]; bottom: number } {
  const rows: DimensionRow[] = [];
  const dims: DimensionLine[] = [];
  const rowY = (r: number) => top + r * (LABEL_HEIGHT + ROW_GAP);
  for (const d of requests) {
    const texts = d.texts.map((t) => fitText(t, widthPx));
    let placed: DimensionLine | null = null;
    for (let r = 0; r <= rows.length && !placed; r++) {
      const row = rows[r] ?? { chips: [], lines: [] };
      for (const text of texts) {
        const w = chipWidth(text);
        const spots = labelSpots(d, w, widthPx, text === texts[texts.length - 1]);
        const fresh = r === rows.length;
        const x = spots.find((sx) => fitsRow(row, { x: sx, y: rowY(r), width: w, height: LABEL_HEIGHT }, d));
        const fallback =
          fresh && text === texts[texts.length - 1]
            ? Math.max(0, Math.min(widthPx - w, (d.x1 + d.x2) / 2 - w / 2))
            : undefined;
        const at = x ?? fallback;
        if (at === undefined) continue;
        const label = chipAt(d.id, text, at, rowY(r), (d.x1 + d.x2) / 2);
        row.chips.push(label);
        row.lines.push({ x1: d.x1, x2: d.x2 });
        if (fresh) rows.push(row);
        placed = { x1: d.x1, x2: d.x2, y: rowY(r) + LABEL_HEIGHT / 2, label };
        break;
      }
    }
    if (placed) dims.push(placed);
  }
  return { dims, bottom: rowY(rows.length) };
}

const ftIn = (ft: number) => formatFtIn(ft * 12);

/** The dimensions of a member, a level each: the clear spans, the overhangs, then the design spans. */
function dimensionRequests(
  result: MemberCheckResult,
  scale: SpanScale,
): [DimensionRequest[], DimensionRequest[], DimensionRequest[]] {
  const { spans } = result;
  const s = scale.supports;
  const two =
    s.length === 3 && spans.secondClearSpanFt !== undefined && spans.secondDesignSpanFt !== undefined;
  const clearFts = two ? [spans.clearSpanFt, spans.secondClearSpanFt ?? 0] : [spans.clearSpanFt];
  const designFts = two ? [spans.designSpanFt, spans.secondDesignSpanFt ?? 0] : [spans.designSpanFt];
  const measured: DimensionRequest[] = clearFts.map((ft, i) => ({
    id: two ? `clear-span-${i + 1}` : 'clear-span',
    texts: [`clear span ${ftIn(ft)}`, `clear ${ftIn(ft)}`],
    x1: s[i].rightFacePx,
    x2: s[i + 1].leftFacePx,
  }));
  const overhangs: DimensionRequest[] = [];
  if (spans.overhangLeftFt) {
    overhangs.push({
      id: 'overhang-left',
      texts: [`overhang ${ftIn(spans.overhangLeftFt)}`, ftIn(spans.overhangLeftFt)],
      x1: scale.memberLeftPx,
      x2: s[0].leftFacePx,
    });
  }
  if (spans.overhangRightFt) {
    overhangs.push({
      id: 'overhang-right',
      texts: [`overhang ${ftIn(spans.overhangRightFt)}`, ftIn(spans.overhangRightFt)],
      x1: s[s.length - 1].rightFacePx,
      x2: scale.memberRightPx,
    });
  }
  const design: DimensionRequest[] = designFts.map((ft, i) => ({
    id: two ? `design-span-${i + 1}` : 'design-span',
    texts: [`design span ${ftIn(ft)}`, `design ${ftIn(ft)}`],
    x1: s[i].centrePx,
    x2: s[i + 1].centrePx,
  }));
  return [measured, overhangs, design];
}

/** The largest reaction at each support, lb: the bearing check's at the ends, the engine's at a centre post. */
function supportReactions(result: MemberCheckResult, scale: SpanScale): number[] {
  const { reactions } = result;
  return scale.supports.map((s) => {
    if (s.name === 'left') return reactions.leftLb;
    if (s.name === 'right') return reactions.rightLb;
    return reactions.bySupport?.find((b) => b.support === s.name)?.largestLb ?? 0;
  });
}

/**
 * Lays out the beam from end to end (the length to buy, every span and overhang), every bearing to scale
 * with its length, the largest reaction at each support ("R 5,381 lb") and the dimension lines: each clear
 * span between its support faces and each overhang as measured, then each design span between bearing
 * centres, each saying which it is.
 *
 * @param result a member check result (spans ft, bearings in, reactions lb)
 * @param scale the span scale of the drawing
 * @param beamTop y of the beam's top edge, px
 * @example layoutSupports(result, spanScale(result, 390), 120).dimensions[0].label.text // `clear span 14' 0"`
 */
export function layoutSupports(result: MemberCheckResult, scale: SpanScale, beamTop: number): SupportLayout {
  const widthPx = scale.widthPx;
  const bearingTop = beamTop + BEAM_HEIGHT;
  const reactionY = bearingTop + BEARING_HEIGHT + ROW_GAP;
  const bearingY = reactionY + LABEL_HEIGHT + ROW_GAP;
  const xs = scale.supports.map((s) => s.centrePx);
  const reactionsLb = supportReactions(result, scale);
  const order = reactionsLb.map((_, i) => i).sort((a, b) => reactionsLb[b] - reactionsLb[a] || a - b);
  const ranks = reactionsLb.map((_, i) => order.indexOf(i));
  const ids = scale.supports.map((s) => s.name);
  const [measured, overhangs, design] = dimensionRequests(result, scale);
  const first = packDimensions(measured, bearingY + LABEL_HEIGHT + ROW_GAP * 2, widthPx);
  const middle = packDimensions(overhangs, first.bottom, widthPx);
  const second = packDimensions(design, middle.bottom, widthPx);
  return {
    beam: {
      x: scale.memberLeftPx,
      y: beamTop,
      width: scale.memberRightPx - scale.memberLeftPx,
      height: BEAM_HEIGHT,
    },
    bearings: scale.supports.map((s) => bearingBox(s.leftFacePx, s.rightFacePx, bearingTop)),
    labels: [
      ...supportRow(
        reactionsLb.map((lb) => `R ${formatLb(lb)}`),
        reactionsLb.map((lb) => formatLb(lb)),
        ids.map((id) => `reaction-${id}`),
        xs,
        ranks,
        reactionY,
        widthPx,
      ),
      ...supportRow(
        scale.supports.map((s) => `${formatIn(s.bearingIn)} bearing`),
        scale.supports.map((s) => formatIn(s.bearingIn)),
        ids.map((id) => `bearing-${id}`),
        xs,
        ranks,
        bearingY,
        widthPx,
      ),
    ],
    dimensions: [...first.dims, ...middle.dims, ...second.dims],
    bottom: second.bottom,
  };
}
