import { formatFtIn, formatNumber } from '@/lib/format';

/** The three curves drawn from the engine's samples. */
export type CurveKind = 'shear' | 'moment' | 'deflection';

/** Unit shown after each curve's values. */
export const CURVE_UNITS: Record<CurveKind, string> = { shear: 'lb', moment: 'lb·ft', deflection: 'in' };

/**
 * A curve value with its unit: shear "5,381 lb", moment "19,870 lb·ft", deflection "0.52 in" (three decimals
 * under 0.1 in so a small deflection does not read as zero). Exact zero shows without decimals ("0 in").
 * @param kind which curve
 * @param value lb, lb·ft or in
 * @example formatCurveValue('moment', 19870.4) // "19,870 lb·ft"
 */
export function formatCurveValue(kind: CurveKind, value: number): string {
  const unit = CURVE_UNITS[kind];
  if (value === 0) return `0 ${unit}`;
  if (kind !== 'deflection') return `${formatNumber(value)} ${unit}`;
  return `${formatNumber(value, Math.abs(value) < 0.1 ? 3 : 2)} ${unit}`;
}

/**
 * A position along the member as a tape reads it, ft-in to 1/16 in.
 * @param ft feet
 * @example formatPositionFt(7.1875) // `7' 2-1/4"`
 */
export function formatPositionFt(ft: number): string {
  return formatFtIn(ft * 12);
}
