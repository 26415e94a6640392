/**
 * Packing of load labels into rows for the load diagram (px along x). A row holds intervals that keep
 * ROW_GAP px apart; a label must also stay clear of the other loads' arrows, which run down through every
 * row to the beam. Each label comes in variants, longest first (the full label, then a short one): the
 * first variant that fits clear in any row is used, and a label that fits nowhere goes in a new row in its
 * full form, over an arrow, and says so.
 */

/** Least clear space between two things in one row, px. */
const ROW_GAP = 6;
/** A label keeps this far from another load's arrow, px. */
const ARROW_CLEAR = 3;
/** Arrows this close to a label's own arrow count as its own (loads at one position), px. */
const SAME_ARROW = 1;
const SCAN_STEP = 4;

export interface Interval {
  left: number;
  right: number;
}

/**
 * Where a label went: its row (0 nearest the beam), its left edge, which variant (0 = full), and whether it
 * covers another load's arrow.
 */
export interface RowSpot {
  row: number;
  labelX: number;
  variant: number;
  crossesArrow: boolean;
}

/** A uniform load to pack: its band's ends and its label variants' widths, px. */
export interface BandItem {
  bandLeft: number;
  bandRight: number;
  labelWidths: readonly number[];
}

/** A point load to pack: its arrow's x and its label variants' widths, px. */
export interface ArrowItem {
  x: number;
  labelWidths: readonly number[];
}

const overlaps = (a: Interval, b: Interval) => a.left < b.right + ROW_GAP && b.left < a.right + ROW_GAP;

function clearOfArrows(left: number, right: number, arrows: readonly number[], ownX: number | null): boolean {
  return arrows.every(
    (x) =>
      (ownX !== null && Math.abs(x - ownX) <= SAME_ARROW) ||
      x < left - ARROW_CLEAR ||
      x > right + ARROW_CLEAR,
  );
}

/** Preferred x first, then a scan from `from` to `to`; each clamped into the drawing, duplicates dropped. */
function candidates(
  preferred: readonly number[],
  from: number,
  to: number,
  width: number,
  widthPx: number,
): number[] {
  const out: number[] = [];
  const seen = new Set<number>();
  const add = (x: number) => {
    const c = Math.min(Math.max(x, 0), Math.max(0, widthPx - width));
    const key = Math.round(c * 2);
    if (seen.has(key)) return;
    seen.add(key);
    out.push(c);
  };
  preferred.forEach(add);
  for (let x = from; x <= to; x += SCAN_STEP) add(x);
  return out;
}

interface Packable {
  labelWidths: readonly number[];
}

function pack<T extends Packable>(
  items: readonly T[],
  xsFor: (item: T, width: number) => number[],
  occupied: (item: T, labelX: number, width: number) => Interval,
  clear: (item: T, labelX: number, width: number) => boolean,
): RowSpot[] {
  const rows: Interval[][] = [];
  return items.map((item) => {
    for (let variant = 0; variant < item.labelWidths.length; variant++) {
      const width = item.labelWidths[variant];
      const xs = xsFor(item, width).filter((x) => clear(item, x, width));
      for (let row = 0; row <= rows.length && xs.length > 0; row++) {
        const taken = rows[row] ?? [];
        const labelX = xs.find((x) => !taken.some((t) => overlaps(t, occupied(item, x, width))));
        if (labelX !== undefined) {
          (rows[row] ??= []).push(occupied(item, labelX, width));
          return { row, labelX, variant, crossesArrow: false };
        }
      }
    }
    const width = item.labelWidths[0];
    const labelX = xsFor(item, width)[0];
    rows.push([occupied(item, labelX, width)]);
    return { row: rows.length - 1, labelX, variant: 0, crossesArrow: true };
  });
}

/**
 * Rows for uniform loads: each load's band and label share a row, the label over the band or, where the
 * band is short or crossed by arrows, just beside it; never over another load's arrow unless no place is clear.
 * @param items bands and label widths, px
 * @param arrowXs x of every point-load arrow, px
 * @param widthPx drawing width, px
 * @example packBands([{ bandLeft: 20, bandRight: 370, labelWidths: [140, 80] }], [], 390) // [{ row: 0, labelX: 20, variant: 0, crossesArrow: false }]
 */
export function packBands(
  items: readonly BandItem[],
  arrowXs: readonly number[],
  widthPx: number,
): RowSpot[] {
  return pack(
    items,
    (b, w) =>
      candidates(
        [b.bandLeft, b.bandRight - w, (b.bandLeft + b.bandRight - w) / 2],
        b.bandLeft - w,
        b.bandRight,
        w,
        widthPx,
      ),
    (b, x, w) => ({ left: Math.min(b.bandLeft, x), right: Math.max(b.bandRight, x + w) }),
    (_b, x, w) => clearOfArrows(x, x + w, arrowXs, null),
  );
}

/**
 * Rows for point-load labels, above the uniform loads: each label sits over its own arrow (centred, or to
 * one side of it) and clear of every other arrow, which would otherwise run down through it.
 * @param items arrows and label widths, px
 * @param widthPx drawing width, px
 * @example packArrows([{ x: 250, labelWidths: [150, 90] }], 390) // [{ row: 0, labelX: 175, variant: 0, crossesArrow: false }]
 */
export function packArrows(items: readonly ArrowItem[], widthPx: number): RowSpot[] {
  const arrowXs = items.map((a) => a.x);
  return pack(
    items,
    (a, w) =>
      candidates([a.x - w / 2, a.x - SCAN_STEP * 2, a.x - w + SCAN_STEP * 2], a.x - w, a.x, w, widthPx),
    (_a, x, w) => ({ left: x, right: x + w }),
    (a, x, w) => clearOfArrows(x, x + w, arrowXs, a.x),
  );
}
