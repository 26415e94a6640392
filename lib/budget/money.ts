/**
 * Money in integer cents and percentages in basis points (1 % = 100), so no sum of a budget ever carries a
 * binary fraction of a cent. A quantity (feet, hours, pieces) may be fractional; each line is rounded to the
 * cent once, half away from zero, and every total is a sum of whole cents.
 */

/** Whole cents. */
export type Cents = number;
/** Hundredths of a percent: 825 = 8.25 %. */
export type BasisPoints = number;

/**
 * Asserts a whole number of cents (a price read from the price book or an override).
 * @param value cents
 * @returns the same value
 * @throws RangeError when it is not a safe integer
 * @example wholeCents(1250) // 1250
 * Reference: integer money (no floating-point amounts), common practice in accounting software.
 */
export function wholeCents(value: number): Cents {
  if (!Number.isSafeInteger(value)) throw new RangeError(`Not a whole number of cents: ${value}`);
  return value;
}

/** Rounds half away from zero (a line of 0.5 ¢ becomes 1 ¢, −0.5 ¢ becomes −1 ¢). */
function roundHalfAway(value: number): number {
  // The 1e-9 absorbs binary noise such as 0.145 * 100 = 14.499999999999998.
  return Math.sign(value) * Math.floor(Math.abs(value) + 0.5 + 1e-9);
}

/**
 * A line's amount: unit price × quantity, rounded to the cent once.
 * @param unitCents price of one unit, cents (whole)
 * @param quantity units (ft, pieces, hours; may be fractional)
 * @returns cents (whole)
 * @example lineAmount(1899, 2.5) // 4748 (47.475 → 47.48)
 * Reference: rounding each extended line to the cent, common practice in estimating.
 */
export function lineAmount(unitCents: Cents, quantity: number): Cents {
  wholeCents(unitCents);
  if (!Number.isFinite(quantity)) throw new RangeError(`Not a quantity: ${quantity}`);
  return roundHalfAway(unitCents * quantity);
}

/**
 * A percentage of an amount, rounded to the cent: cents × basis points ÷ 10,000 in integer arithmetic.
 * @param baseCents the amount the percentage applies to, cents (whole)
 * @param rate basis points (825 = 8.25 %), whole
 * @returns cents (whole)
 * @example percentOf(100_000, 825) // 8250
 * Reference: integer money; percentages in basis points (common practice).
 */
export function percentOf(baseCents: Cents, rate: BasisPoints): Cents {
  wholeCents(baseCents);
  if (!Number.isSafeInteger(rate)) throw new RangeError(`Not a whole number of basis points: ${rate}`);
  const product = BigInt(baseCents) * BigInt(rate);
  const sign = product < 0n ? -1n : 1n;
  const magnitude = product * sign;
  const rounded = (magnitude + 5_000n) / 10_000n;
  return Number(rounded * sign);
}

/**
 * Sum of whole cents.
 * @param amounts cents
 * @returns cents
 * @example sumCents([100, 250]) // 350
 * Reference: integer money.
 */
export function sumCents(amounts: readonly Cents[]): Cents {
  let total = 0;
  for (const amount of amounts) total += wholeCents(amount);
  return wholeCents(total);
}
