/**
 * Short number text for takedown expressions: at most `maxDecimals` decimals, trailing zeros dropped,
 * thousands grouped with commas ("1,250", "12.5", "26.6").
 *
 * @param value any finite number
 * @param maxDecimals most decimals shown
 * @example expressionNumber(1250.04, 1) // "1,250"
 * Reference: display convention for the load takedown (no standard).
 */
export function expressionNumber(value: number, maxDecimals: number): string {
  const fixed = value.toFixed(maxDecimals);
  const trimmed = maxDecimals > 0 ? fixed.replace(/\.?0+$/, '') : fixed;
  const [whole, decimals] = trimmed.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return decimals === undefined ? grouped : `${grouped}.${decimals}`;
}
