import { PRECUT_STUDS, SAW_KERF_IN, STOCK_LENGTHS_FT } from '@/lib/calc/framing/lumber';

/** What to buy for one line of the framing list. */
export interface StockPick {
  /** "92-5/8 in precut stud", "12 ft", or "order to length" for engineered lumber. */
  label: string;
  /** Length of one stock piece, in. */
  lengthIn: number;
  /** How many stock pieces to buy for the line. */
  count: number;
}

/**
 * Shortest stock that yields the pieces: precut studs first when `precut` (stud-like pieces), otherwise sawn
 * stock lengths; several pieces come from one stock length when they fit with a saw kerf between them.
 * Pieces longer than 20 ft, and engineered lumber, are ordered to length (next whole foot).
 *
 * @param pieceLengthIn length of each piece, in
 * @param qty number of pieces
 * @param options precut: stud-like piece that may come from a precut stud; engineered: ordered to length
 * @returns stock label, stock length (in) and count to buy
 * @example pickStock(40, 4, { precut: true, engineered: false }) // { label: '92-5/8 in precut stud', lengthIn: 92.625, count: 2 }
 * Reference: common practice (lumber yard stock lengths and precut studs).
 */
export function pickStock(
  pieceLengthIn: number,
  qty: number,
  options: { precut: boolean; engineered: boolean },
): StockPick {
  if (!options.engineered) {
    const candidates = [
      ...(options.precut ? PRECUT_STUDS : []),
      ...STOCK_LENGTHS_FT.map((ft) => ({ lengthIn: ft * 12, label: `${ft} ft` })),
    ];
    for (const stock of candidates) {
      if (stock.lengthIn + 1e-9 >= pieceLengthIn) {
        const perStock = Math.floor((stock.lengthIn + SAW_KERF_IN) / (pieceLengthIn + SAW_KERF_IN) + 1e-9);
        return { label: stock.label, lengthIn: stock.lengthIn, count: Math.ceil(qty / perStock) };
      }
    }
  }
  const orderedIn = Math.ceil(pieceLengthIn / 12 - 1e-9) * 12;
  return { label: `order to length (${orderedIn / 12} ft)`, lengthIn: orderedIn, count: qty };
}
