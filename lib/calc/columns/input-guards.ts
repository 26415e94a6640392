import { CalcInputError } from '@/lib/calc/types';

/**
 * Throws CalcInputError(field) unless value is a finite number above zero.
 * @example requirePositive('heightFt', 8) // passes
 * Reference: engine input contract (lib/calc/types.ts CalcInputError).
 */
export function requirePositive(field: string, value: number, label: string): void {
  if (!Number.isFinite(value) || value <= 0)
    throw new CalcInputError(field, `${label} must be a number above 0`);
}

/**
 * Throws CalcInputError(field) unless value is a finite number of zero or more.
 * @example requireNonNegative('loadLb', 0) // passes
 * Reference: engine input contract (lib/calc/types.ts CalcInputError).
 */
export function requireNonNegative(field: string, value: number, label: string): void {
  if (!Number.isFinite(value) || value < 0) throw new CalcInputError(field, `${label} cannot be negative`);
}
