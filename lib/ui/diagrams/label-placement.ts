import { chipWidth, LABEL_HEIGHT } from './text-metrics';

/** An axis-aligned box, px, y downward. */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A label to place near a point of a drawing. Lower `priority` numbers are placed first and kept longest. */
export interface LabelRequest {
  id: string;
  text: string;
  anchorX: number;
  anchorY: number;
  /** Which side of the anchor the label should sit on; the other side is tried next. */
  side: 'above' | 'below';
  priority: number;
  /** Drawn with more weight (the maxima). */
  strong?: boolean;
}

/** A placed label: its chip box and what it labels. */
export interface PlacedLabel extends Box {
  id: string;
  text: string;
  anchorX: number;
  anchorY: number;
  strong: boolean;
}

/** Smallest clear space kept between two chips, px. */
export const LABEL_GAP = 3;
/** Space between an anchor and its chip, px. */
const ANCHOR_GAP = 3;
/** Step of the sideways search, px. */
const SHIFT_STEP = 4;

/** True when two boxes share any area or come closer than `gap` px to each other. */
export function boxesOverlap(a: Box, b: Box, gap = LABEL_GAP): boolean {
  return (
    a.x < b.x + b.width + gap &&
    b.x < a.x + a.width + gap &&
    a.y < b.y + b.height + gap &&
    b.y < a.y + a.height + gap
  );
}

const clamp = (v: number, lo: number, hi: number) => Math.min(Math.max(v, lo), Math.max(lo, hi));

/** Sideways offsets tried for a label, nearest first: 0, +4, −4, +8, −8 … up to ±its width. */
function shifts(width: number): number[] {
  const out = [0];
  for (let d = SHIFT_STEP; d <= width; d += SHIFT_STEP) out.push(d, -d);
  return out;
}

/**
 * Places labels so that no two chips overlap and every chip lies inside `bounds`: labels go in priority
 * order, each first on its preferred side of its anchor, centred, then slid along x (up to its own width)
 * and then on the other side; a label with no free place is dropped, so the lower-priority labels go first.
 *
 * @param requests labels with anchors in px
 * @param bounds the drawing area, px
 * @param obstacles boxes already drawn that labels must not cover, px
 * @returns placed chips (px) and the ids of the dropped labels
 * @example placeLabels([{ id: 'max', text: '7,200 lb·ft', anchorX: 195, anchorY: 30, side: 'above', priority: 0 }], { x: 0, y: 0, width: 390, height: 150 })
 */
export function placeLabels(
  requests: readonly LabelRequest[],
  bounds: Box,
  obstacles: readonly Box[] = [],
): { placed: PlacedLabel[]; dropped: string[] } {
  const placed: PlacedLabel[] = [];
  const dropped: string[] = [];
  const ordered = [...requests].sort((a, b) => a.priority - b.priority);
  const taken: Box[] = [...obstacles];
  for (const request of ordered) {
    const spot = findSpot(request, bounds, taken);
    if (spot) {
      taken.push(spot);
      placed.push(spot);
    } else {
      dropped.push(request.id);
    }
  }
  return { placed, dropped };
}

function findSpot(request: LabelRequest, bounds: Box, taken: readonly Box[]): PlacedLabel | null {
  const width = chipWidth(request.text);
  const height = LABEL_HEIGHT;
  if (width > bounds.width || height > bounds.height) return null;
  const other = request.side === 'above' ? 'below' : 'above';
  for (const side of [request.side, other]) {
    const wantY = side === 'above' ? request.anchorY - ANCHOR_GAP - height : request.anchorY + ANCHOR_GAP;
    const y = clamp(wantY, bounds.y, bounds.y + bounds.height - height);
    for (const dx of shifts(width)) {
      const x = clamp(request.anchorX - width / 2 + dx, bounds.x, bounds.x + bounds.width - width);
      const box = { x, y, width, height };
      if (!taken.some((t) => boxesOverlap(box, t))) {
        return {
          ...box,
          id: request.id,
          text: request.text,
          anchorX: request.anchorX,
          anchorY: request.anchorY,
          strong: request.strong ?? false,
        };
      }
    }
  }
  return null;
}

/**
 * A chip of `text` with its top-left corner at (x, y), px, labelling the point (anchorX, y).
 * @example chipAt('clear-span', `clear span 14' 0"`, 120, 200, 195)
 */
export function chipAt(
  id: string,
  text: string,
  x: number,
  y: number,
  anchorX: number,
  strong = false,
): PlacedLabel {
  return { id, text, x, y, width: chipWidth(text), height: LABEL_HEIGHT, anchorX, anchorY: y, strong };
}
