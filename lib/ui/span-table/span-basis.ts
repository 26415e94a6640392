import { formatIn } from '@/lib/format';
import type { SpanBasis, SpanTableResult } from '@/shared/schemas/calc/span-table';

export type { SpanBasis };

/**
 * Which span a result's numbers are: `clear`, between the faces of the supports (what is measured on site),
 * or `design`, support centre to support centre (design span = clear span + half the bearing at each end).
 * The engine states it; its default is the clear span.
 *
 * @example spanBasisOf(result) // 'clear' unless design spans were asked for
 */
export function spanBasisOf(result: SpanTableResult): SpanBasis {
  return result.spanBasis ?? 'clear';
}

const NAMES: Record<SpanBasis, string> = { clear: 'Clear span', design: 'Design span' };

/** "Clear span" or "Design span". */
export function spanBasisName(basis: SpanBasis): string {
  return NAMES[basis];
}

/**
 * The sentence at the head of a span table saying which span each number is, how it is printed, and how
 * to get the other span from it.
 *
 * @param basis which span the numbers are
 * @param bearingIn bearing length at each end, in
 * @example spanBasisHeading('design', 3) // 'Each number is the largest design span …'
 */
export function spanBasisHeading(basis: SpanBasis, bearingIn: number): string {
  const bearing = formatIn(bearingIn);
  const printed = 'in feet-inches (12-3 is 12 ft 3 in), rounded down to the inch';
  return basis === 'clear'
    ? `Each number is the largest clear span, between the faces of the supports (what you measure on site), ` +
        `with ${bearing} of bearing at each end, ${printed}. The design span, support centre to centre, is ${bearing} longer.`
    : `Each number is the largest design span, support centre to support centre, ${printed}. ` +
        `The clear span between the supports (what you measure on site) is ${bearing} shorter: half the ${bearing} bearing at each end.`;
}
