import type { Cents } from './money';

export interface BudgetRange {
  lowCents: Cents;
  highCents: Cents;
  /** The size at each end. */
  lowLabel: string;
  highLabel: string;
  /** Why the range is what it is, in words. */
  basis: string;
}

/**
 * The budget range of a member: from the preliminary size to the next size up on the shortlist, since the
 * engineer's design may come back a size larger. Without a larger size that passes and fits, the range is
 * the preliminary size alone, and it says so.
 * @param preliminary the preliminary size's label and total (cents)
 * @param nextUp the next size up's label and total (cents), or null
 * @returns low and high (cents), their sizes, and the basis
 * @example budgetRange({ label: '2-ply 1-3/4 x 11-7/8', totalCents: 500_000 }, { label: '2-ply 1-3/4 x 14', totalCents: 540_000 }).highCents // 540000
 * Reference: common practice (budget a preliminary size with a range to the next size up until the
 *   engineer designs the member).
 */
export function budgetRange(
  preliminary: { label: string; totalCents: Cents },
  nextUp: { label: string; totalCents: Cents } | null,
): BudgetRange {
  if (!nextUp) {
    return {
      lowCents: preliminary.totalCents,
      highCents: preliminary.totalCents,
      lowLabel: preliminary.label,
      highLabel: preliminary.label,
      basis: `${preliminary.label} only: no larger size on the shortlist passes and fits`,
    };
  }
  const [low, high] =
    nextUp.totalCents < preliminary.totalCents ? [nextUp, preliminary] : [preliminary, nextUp];
  return {
    lowCents: low.totalCents,
    highCents: high.totalCents,
    lowLabel: low.label,
    highLabel: high.label,
    basis: `From the preliminary size (${preliminary.label}) to the next size up (${nextUp.label})`,
  };
}

export interface PricedOption {
  id: string;
  label: string;
  passes: boolean;
  totalCents: Cents;
  /** A price is missing from the price book: the total is not complete. */
  complete: boolean;
}

/**
 * Which priced option is the cheapest that passes its preliminary check, among complete budgets (a budget
 * missing a price cannot be called cheapest). Ties go to the first listed (the shortlist's order).
 * @param options priced options (cents)
 * @returns the id of the cheapest passing option, or null
 * @example cheapestPassing([{ id: 'a', label: 'A', passes: true, totalCents: 5, complete: true }]) // 'a'
 * Reference: DESIGN.md §5 "Shortlist" (cheapest from the price book).
 */
export function cheapestPassing(options: readonly PricedOption[]): string | null {
  let best: PricedOption | null = null;
  for (const option of options) {
    if (!option.passes || !option.complete) continue;
    if (!best || option.totalCents < best.totalCents) best = option;
  }
  return best?.id ?? null;
}

/**
 * The next size up from the preliminary size among sizes that pass: the shallowest deeper one, or at the
 * same depth the next wider (more plies), in the shortlist's order.
 * @param preliminary depth and width (in) of the preliminary size
 * @param passing passing sizes with ids, depth and width (in)
 * @returns the next size up, or null
 * @example nextSizeUp({ dIn: 11.875, bIn: 3.5 }, [{ id: 'b', dIn: 14, bIn: 3.5 }])?.id // 'b'
 * Reference: common practice (the next size up is the next deeper member, or one more ply).
 */
export function nextSizeUp<T extends { id: string; dIn: number; bIn: number }>(
  preliminary: { id?: string; dIn: number; bIn: number },
  passing: readonly T[],
): T | null {
  const larger = passing.filter(
    (s) =>
      s.id !== preliminary.id &&
      (s.dIn > preliminary.dIn + 1e-9 ||
        (Math.abs(s.dIn - preliminary.dIn) < 1e-9 && s.bIn > preliminary.bIn + 1e-9)),
  );
  larger.sort((a, b) => a.dIn - b.dIn || a.bIn - b.bIn);
  return larger[0] ?? null;
}
