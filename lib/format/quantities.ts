import { formatNumber } from '@/lib/format/number';

/**
 * Area load: "15 psf".
 * @param psf pounds per square foot
 * @param digits decimals, default 0
 * @example formatPsf(20.9) // "21 psf"
 * Reference: display convention.
 */
export function formatPsf(psf: number, digits = 0): string {
  return `${formatNumber(psf, digits)} psf`;
}

/**
 * Line load: "180 plf".
 * @param plf pounds per linear foot
 * @param digits decimals, default 0
 * @example formatPlf(201.25) // "201 plf"
 * Reference: display convention.
 */
export function formatPlf(plf: number, digits = 0): string {
  return `${formatNumber(plf, digits)} plf`;
}

/**
 * Force: "1,250 lb".
 * @param lb pounds (force)
 * @param digits decimals, default 0
 * @example formatLb(1250) // "1,250 lb"
 * Reference: display convention.
 */
export function formatLb(lb: number, digits = 0): string {
  return `${formatNumber(lb, digits)} lb`;
}

/**
 * Stress: "1,345 psi".
 * @param psi pounds per square inch
 * @param digits decimals, default 0
 * @example formatPsi(1345.2) // "1,345 psi"
 * Reference: display convention.
 */
export function formatPsi(psi: number, digits = 0): string {
  return `${formatNumber(psi, digits)} psi`;
}

/**
 * A demand/capacity ratio as a percent: 0.734 → "73%".
 * @param ratio dimensionless ratio (1 = at capacity)
 * @param digits decimals of the percent, default 0
 * @example formatRatio(0.677) // "68%"
 * Reference: display convention.
 */
export function formatRatio(ratio: number, digits = 0): string {
  return `${formatNumber(ratio * 100, digits)}%`;
}
