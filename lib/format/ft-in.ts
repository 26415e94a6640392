import { NOT_A_NUMBER_TEXT } from '@/lib/format/number';

const SIXTEENTHS_PER_INCH = 16;
const INCHES_PER_FOOT = 12;

function greatestCommonDivisor(a: number, b: number): number {
  return b === 0 ? a : greatestCommonDivisor(b, a % b);
}

/** Whole inches and a reduced sixteenth fraction: (6, 8) → "6-1/2", (0, 8) → "1/2", (6, 0) → "6". */
function inchText(wholeInches: number, sixteenths: number): string {
  if (sixteenths === 0) return String(wholeInches);
  const divisor = greatestCommonDivisor(sixteenths, SIXTEENTHS_PER_INCH);
  const fraction = `${sixteenths / divisor}/${SIXTEENTHS_PER_INCH / divisor}`;
  return wholeInches === 0 ? fraction : `${wholeInches}-${fraction}`;
}

/**
 * A length in feet and inches to the nearest 1/16 in, fractions reduced: 162.5 → `13' 6-1/2"`,
 * 156 → `13' 0"`, 6.5 → `6-1/2"` (under a foot: inches only). Non-finite → "—".
 *
 * @param inches length in inches
 * @example formatFtIn(162.53) // `13' 6-1/2"`
 * Reference: tape-measure notation to 1/16 in (common practice).
 */
export function formatFtIn(inches: number): string {
  if (!Number.isFinite(inches)) return NOT_A_NUMBER_TEXT;
  const total = Math.round(Math.abs(inches) * SIXTEENTHS_PER_INCH);
  const sign = inches < 0 && total > 0 ? '-' : '';
  const perFoot = INCHES_PER_FOOT * SIXTEENTHS_PER_INCH;
  const feet = Math.floor(total / perFoot);
  const rest = total - feet * perFoot;
  const inchesPart = inchText(Math.floor(rest / SIXTEENTHS_PER_INCH), rest % SIXTEENTHS_PER_INCH);
  return feet === 0 ? `${sign}${inchesPart}"` : `${sign}${feet}' ${inchesPart}"`;
}

/**
 * A length in inches to the nearest 1/16 in, fractions reduced: 9.25 → `9-1/4"`, 92.625 → `92-5/8"`.
 *
 * @param inches length in inches
 * @example formatIn(104.625) // `104-5/8"`
 * Reference: tape-measure notation to 1/16 in (common practice).
 */
export function formatIn(inches: number): string {
  if (!Number.isFinite(inches)) return NOT_A_NUMBER_TEXT;
  const total = Math.round(Math.abs(inches) * SIXTEENTHS_PER_INCH);
  const sign = inches < 0 && total > 0 ? '-' : '';
  return `${sign}${inchText(Math.floor(total / SIXTEENTHS_PER_INCH), total % SIXTEENTHS_PER_INCH)}"`;
}

/**
 * A span as printed in span tables, feet-inches without marks, rounded down to the whole inch so a
 * printed span never exceeds the computed one: 147.9 → "12-3".
 *
 * @param inches span in inches (≥ 0)
 * @example formatSpanFtIn(185.2) // "15-5"
 * Reference: span-table notation "ft-in" as in IRC Table R502.3.1(2); rounding down is Tributary's choice.
 */
export function formatSpanFtIn(inches: number): string {
  if (!Number.isFinite(inches) || inches < 0) return NOT_A_NUMBER_TEXT;
  const wholeInches = Math.floor(inches + 1e-9);
  return `${Math.floor(wholeInches / INCHES_PER_FOOT)}-${wholeInches % INCHES_PER_FOOT}`;
}
