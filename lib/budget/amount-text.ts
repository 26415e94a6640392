import { amountScale, type PriceUnit } from './price-catalogue';

/**
 * A price book amount written out in its unit's decimals: cents as dollars ("12.50"), basis points as a
 * percentage ("8.25"), thousandths as a quantity ("0.35"), with trailing zeros of a quantity dropped.
 * @param amount the stored whole number
 * @param unit the item's unit
 * @returns the value as text, without a currency or percent sign
 * @example amountText(1250, 'lf') // '12.50'
 * Reference: Tributary price book convention (integer amounts).
 */
export function amountText(amount: number, unit: PriceUnit): string {
  const scale = amountScale(unit);
  const digits = scale === 100 ? 2 : 3;
  const sign = amount < 0 ? '-' : '';
  const magnitude = Math.abs(amount);
  const whole = Math.floor(magnitude / scale);
  const fraction = String(magnitude % scale).padStart(digits, '0');
  const text = `${sign}${whole}.${fraction}`;
  return digits === 3 ? text.replace(/\.?0+$/, '') : text;
}

/**
 * Reads a value typed or imported in its unit's decimals into the stored whole number, by string arithmetic
 * (no floating point): "12.5" dollars → 1250 cents. A dollar sign, a percent sign and thousands commas are
 * allowed; more decimals than the unit keeps, a minus sign or anything else is refused.
 * @param text the value ("12.50", "$1,250", "8.25%", "0.35")
 * @param unit the item's unit
 * @returns the whole number, or an error message
 * @example parseAmountText('$1,250.5', 'each') // { amount: 125050 }
 * Reference: Tributary price book convention (integer amounts).
 */
export function parseAmountText(text: string, unit: PriceUnit): { amount: number } | { error: string } {
  const scale = amountScale(unit);
  const digits = scale === 100 ? 2 : 3;
  const cleaned = text.trim().replace(/^\$/, '').replace(/%$/, '').replaceAll(',', '').trim();
  const match = cleaned.match(/^(\d+)(?:\.(\d*))?$/);
  if (!match) return { error: 'Not a number (write it like 12.50)' };
  const fraction = match[2] ?? '';
  if (fraction.length > digits) return { error: `At most ${digits} decimals` };
  if (match[1].length > 10) return { error: 'Too large' };
  const amount = Number(match[1]) * scale + Number(fraction.padEnd(digits, '0') || '0');
  if (!Number.isSafeInteger(amount)) return { error: 'Too large' };
  return { amount };
}
