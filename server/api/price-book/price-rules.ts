import { unitKind, type PriceUnit } from '@/lib/budget';
import { MAX_PRICE_AMOUNT } from '@/shared/schemas/price-book';

/** A percentage is at most 100 % (10,000 basis points). */
const MAX_PERCENT_BP = 10_000;

/** What is wrong with an amount for its unit, or null. */
export function amountProblem(amount: number, unit: PriceUnit): string | null {
  if (!Number.isSafeInteger(amount) || amount < 0) return 'Must be a whole number of at least 0';
  if (unitKind(unit) === 'percent' && amount > MAX_PERCENT_BP) return 'A percentage is at most 100';
  if (amount > MAX_PRICE_AMOUNT) return 'Too large';
  return null;
}
