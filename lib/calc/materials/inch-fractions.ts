/**
 * Writes a length in inches as whole inches and a fraction to 1/16 in, the way lumber sizes are named.
 * @param lengthIn length (in), ≥ 0
 * @returns e.g. "11-7/8", "5-1/8", "12"
 * @example inchFraction(11.875) // "11-7/8"
 * Reference: trade convention for member size labels (common practice).
 */
export function inchFraction(lengthIn: number): string {
  const sixteenths = Math.round(lengthIn * 16);
  const whole = Math.floor(sixteenths / 16);
  let numerator = sixteenths % 16;
  if (numerator === 0) return String(whole);
  let denominator = 16;
  while (numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  return whole === 0 ? `${numerator}/${denominator}` : `${whole}-${numerator}/${denominator}`;
}
