import { percentOf, sumCents, type BasisPoints, type Cents } from './money';
import type { BudgetLine } from './types';

export interface MarkupRates {
  waste: BasisPoints;
  tax: BasisPoints;
  overhead: BasisPoints;
  profit: BasisPoints;
  contingency: BasisPoints;
}

export interface MarkupAmounts {
  /** Waste on lumber lines. */
  waste: Cents;
  /** Sales tax on taxable lines and their waste. */
  tax: Cents;
  /** Cost: every line, waste and tax. */
  cost: Cents;
  overhead: Cents;
  /** Profit on cost plus overhead. */
  profit: Cents;
  /** Contingency on cost, overhead and profit. */
  contingency: Cents;
  total: Cents;
}

/**
 * The markups stacked the way a remodeler prices: waste on the lumber, sales tax on materials and their
 * waste, overhead on the whole cost, profit on cost plus overhead, and the contingency on all of it. Each
 * step is rounded to the cent once.
 * @param lines priced lines (whole cents), each flagged lumber and taxable
 * @param rates basis points
 * @param fixed amounts the estimator set by hand (cents): they replace the computed step, and later steps
 *   build on them
 * @returns each markup and the total, cents
 * @example stackMarkups(lines, { waste: 1000, tax: 800, overhead: 1500, profit: 1000, contingency: 1000 }).total
 * Reference: common practice (estimating: waste, tax, overhead, profit, contingency in that order; the
 *   order and bases are the firm's, shown on every line).
 */
export function stackMarkups(
  lines: readonly BudgetLine[],
  rates: MarkupRates,
  fixed: Partial<Record<keyof MarkupRates, Cents>> = {},
): MarkupAmounts {
  const lumber = sumCents(lines.filter((l) => l.lumber).map((l) => l.amountCents));
  const taxable = sumCents(lines.filter((l) => l.taxable).map((l) => l.amountCents));
  const all = sumCents(lines.map((l) => l.amountCents));
  const waste = fixed.waste ?? percentOf(lumber, rates.waste);
  const tax = fixed.tax ?? percentOf(taxable + waste, rates.tax);
  const cost = all + waste + tax;
  const overhead = fixed.overhead ?? percentOf(cost, rates.overhead);
  const profit = fixed.profit ?? percentOf(cost + overhead, rates.profit);
  const contingency = fixed.contingency ?? percentOf(cost + overhead + profit, rates.contingency);
  return { waste, tax, cost, overhead, profit, contingency, total: cost + overhead + profit + contingency };
}
