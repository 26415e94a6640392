import { formatIn, formatNumber, formatPsi } from '@/lib/format';
import type { CheckResult } from '@/shared/schemas/calc/member';

/** A check's demand or capacity in its own unit: stresses in psi, deflections and lengths in inches. */
export function checkValueText(value: number, unit: string): string {
  if (unit === 'psi') return formatPsi(value);
  if (unit === 'in')
    return value < 1 ? `${formatNumber(value, 3)} in` : `${formatNumber(value, 2)} in (${formatIn(value)})`;
  return `${formatNumber(value, 2)} ${unit}`;
}

/** "passes" / "fails" with the ratio as a number, for a row and its screen-reader text. */
export function checkVerdictText(check: Pick<CheckResult, 'pass' | 'ratio'>): string {
  return `${check.pass ? 'Passes' : 'Fails'} at ${formatNumber(check.ratio, 2)}`;
}
