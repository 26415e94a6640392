/** How the firm's yard sells engineered lumber (price book: yard/*). Lengths in ft, depth in in. */
export interface YardRules {
  /** Longest length the yard keeps in stock, ft. */
  stockedLengthFt: number;
  /** Deepest member the yard keeps in stock, in. */
  stockedDepthIn: number;
  /** Longest length made to order, ft. */
  longestLengthFt: number;
  /** Lead time of a special order, days. */
  leadTimeDays: number;
}

export interface StockLength {
  /** Length bought, ft: the length needed rounded up to an even foot. */
  buyFt: number;
  /** Bought from stock, or a special order with a lead time. */
  supply: 'stock' | 'special-order';
  /** Days to wait for it (0 from stock). */
  leadTimeDays: number;
  /** Why it is a special order, or that it is too long to be made at all. */
  note: string | null;
  /** False when even a special order is too long: the member must be spliced over a support or redesigned. */
  available: boolean;
}

/**
 * The length to buy, rounded up to what is sold: engineered lumber (LVL, and sawn stock) comes in even foot
 * lengths, so 13 ft 2 in buys 14 ft. Yards keep lengths up to a limit and depths up to a limit in stock;
 * anything longer or deeper is a special order with a lead time; past the longest length made it is not
 * available at all.
 * @param neededFt length to buy from the check (clear span + both bearings), ft
 * @param depthIn member depth, in
 * @param rules the firm's yard rules
 * @returns length bought (ft), supply, lead time (days)
 * @example stockLength(13.17, 11.875, { stockedLengthFt: 24, stockedDepthIn: 14, longestLengthFt: 48, leadTimeDays: 10 }).buyFt // 14
 * Reference: common practice (engineered lumber and sawn lumber sold in even lengths; stock and special
 *   order lengths vary by yard, hence the firm's own rules).
 */
export function stockLength(neededFt: number, depthIn: number, rules: YardRules): StockLength {
  if (!(neededFt > 0)) throw new RangeError('The length needed must be above 0 ft');
  // A hair of tolerance so 14.0000000001 ft (a sum of inches) still buys 14 ft.
  const buyFt = Math.max(2, 2 * Math.ceil(neededFt / 2 - 1e-9));
  if (buyFt > rules.longestLengthFt) {
    return {
      buyFt,
      supply: 'special-order',
      leadTimeDays: rules.leadTimeDays,
      note: `${buyFt} ft is longer than the ${rules.longestLengthFt} ft made: splice over a support or ask the engineer`,
      available: false,
    };
  }
  const reasons: string[] = [];
  if (buyFt > rules.stockedLengthFt) reasons.push(`longer than the ${rules.stockedLengthFt} ft stocked`);
  if (depthIn > rules.stockedDepthIn + 1e-9)
    reasons.push(`deeper than the ${rules.stockedDepthIn} in stocked`);
  if (reasons.length === 0) return { buyFt, supply: 'stock', leadTimeDays: 0, note: null, available: true };
  return {
    buyFt,
    supply: 'special-order',
    leadTimeDays: rules.leadTimeDays,
    note: `Special order (${reasons.join(', ')}): ${rules.leadTimeDays} days lead time`,
    available: true,
  };
}
