/** Shown in place of a number that is not finite. */
export const NOT_A_NUMBER_TEXT = '—';

/** Puts a comma between each group of three digits of a digit string ("1250000" → "1,250,000"). */
function groupThousands(whole: string): string {
  if (whole.length <= 3) return whole;
  const head = whole.length % 3 || 3;
  let out = whole.slice(0, head);
  for (let i = head; i < whole.length; i += 3) out += `,${whole.slice(i, i + 3)}`;
  return out;
}

function signedGrouped(value: number, fixed: string): string {
  const dot = fixed.indexOf('.');
  const whole = dot < 0 ? fixed : fixed.slice(0, dot);
  const sign = value < 0 && Number(fixed) !== 0 ? '-' : '';
  return `${sign}${groupThousands(whole)}${dot < 0 ? '' : fixed.slice(dot)}`;
}

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
  return signedGrouped(value, Math.abs(value).toFixed(digits));
}

/**
 * Like formatNumber, but with at most `maxDecimals` decimals and trailing zeros dropped ("12.5", "1,250").
 *
 * @param value the number
 * @param maxDecimals most decimals shown (0–10)
 * @example formatNumberTrimmed(1250.04, 1) // "1,250"
 * Reference: display convention (US thousands separator).
 */
export function formatNumberTrimmed(value: number, maxDecimals: number): string {
  if (!Number.isFinite(value)) return NOT_A_NUMBER_TEXT;
  let fixed = Math.abs(value).toFixed(maxDecimals);
  if (maxDecimals > 0) {
    let end = fixed.length;
    while (fixed.charCodeAt(end - 1) === 48) end--;
    if (fixed.charCodeAt(end - 1) === 46) end--;
    fixed = fixed.slice(0, end);
  }
  return signedGrouped(value, fixed);
}
