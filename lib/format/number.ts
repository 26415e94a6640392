/** Shown in place of a number that is not finite. */
export const NOT_A_NUMBER_TEXT = '—';

/**
 * A number with a fixed count of decimals and thousands grouped by commas ("1,345.5"). Negative zero
 * shows as "0". Non-finite values show as "—".
 *
 * @param value the number
 * @param digits decimals shown (0–10), default 0
 * @example formatNumber(1345.46, 1) // "1,345.5"
 * Reference: display convention (US thousands separator).
 */
export function formatNumber(value: number, digits = 0): string {
  if (!Number.isFinite(value)) return NOT_A_NUMBER_TEXT;
  const fixed = Math.abs(value).toFixed(digits);
  const isZero = Number(fixed) === 0;
  const [whole, decimals] = fixed.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const sign = value < 0 && !isZero ? '-' : '';
  return decimals === undefined ? `${sign}${grouped}` : `${sign}${grouped}.${decimals}`;
}
