import { formatIn } from '@/lib/format/ft-in';
import type { Cents } from './money';

/** A member's shape as the change order compares it: its family, plies and section (in). */
export interface MemberShape {
  /** Shown in the difference ("2-ply 2x10 Douglas Fir-Larch No.2", "2-ply 1-3/4 x 9-1/4 LVL 2.0E"). */
  label: string;
  /** What the member is made of, in words the estimator reads ("Sawn lumber", "LVL", "Steel W shape"). */
  family: string;
  plies: number | null;
  bIn: number | null;
  dIn: number | null;
}

/**
 * What the designed member is compared with: the member and range a budget priced, and which budget that
 * is (`against`, in words; `sentBudgetId` when it is a budget sent to the client).
 */
export interface BudgetBaseline extends MemberShape {
  lowCents: Cents;
  highCents: Cents;
  against: string;
  sentBudgetId: string | null;
}

/** A budget sent to the client, frozen and dated, with the member it priced and that member's range. */
export interface SentMemberBudget {
  id: string;
  clientName: string;
  /** ISO date and time it was sent. */
  sentAt: string;
  shape: MemberShape;
  lowCents: Cents;
  highCents: Cents;
}

/**
 * The budget a change order compares with: the one sent to the client when there is one (the client agreed
 * to its numbers), else the preliminary range the estimator works from.
 * @example
 * changeBaseline(preliminary, { id: 's1', clientName: 'Pat', sentAt: '2026-11-30T10:00:00Z', shape, lowCents: 1, highCents: 2 }).against
 * // 'the budget sent to Pat on 2026-11-30'
 * Reference: common practice (a change order is priced against what the client was given).
 */
export function changeBaseline(
  preliminary: MemberShape & { lowCents: Cents; highCents: Cents },
  sent: SentMemberBudget | null,
): BudgetBaseline {
  if (!sent) return { ...preliminary, against: 'the preliminary range', sentBudgetId: null };
  return {
    ...sent.shape,
    lowCents: sent.lowCents,
    highCents: sent.highCents,
    against: `the budget sent to ${sent.clientName} on ${sent.sentAt.slice(0, 10)}`,
    sentBudgetId: sent.id,
  };
}

/** What a change order states: both members, how they differ, and the cost against the budget compared with. */
export interface DesignChange {
  /** Which budget it compares with, in words ("the budget sent to Pat on 2026-11-30"). */
  against: string;
  sentBudgetId: string | null;
  budgetedLabel: string;
  designedLabel: string;
  /** Each way the designed member differs, in words (depth 9-1/4" → 11-7/8"). */
  differences: string[];
  designedCents: Cents;
  /** The designed member's total less the compared range's high and low ends. */
  fromHighCents: Cents;
  fromLowCents: Cents;
  /** Whether the designed member's total falls outside the compared range. */
  outsideRange: boolean;
}

/** Sizes within 1/32 in are the same size (dressed sizes are given to 1/16 in, common practice). */
const SAME_IN = 1 / 32;

/**
 * The change order when the engineer's designed member differs from the budgeted one: how it differs
 * (material, plies, width, depth; a dimension the engineer left out is not compared) and its cost
 * against the budgeted range. Null when it is the member that was budgeted.
 * @param budgeted the member the compared budget priced (in), its range (cents) and which budget it is
 *   (`changeBaseline`)
 * @param designed the engineer's member (in) and its budget at the same choices (cents)
 * @returns the change, or null when there is none
 * @example
 * designChange(
 *   { label: '2-ply 2x10', family: 'Sawn lumber', plies: 2, bIn: 3, dIn: 9.25, lowCents: 400_00, highCents: 450_00,
 *     against: 'the preliminary range', sentBudgetId: null },
 *   { label: '2-ply 1-3/4 x 11-7/8 LVL', family: 'LVL', plies: 2, bIn: 3.5, dIn: 11.875, totalCents: 520_00 },
 * )?.fromHighCents // 7000
 * Reference: common practice (a change order prices the difference between what was budgeted and what
 *   the engineer designed).
 */
export function designChange(
  budgeted: BudgetBaseline,
  designed: MemberShape & { totalCents: Cents },
): DesignChange | null {
  const differences: string[] = [];
  if (budgeted.family !== designed.family)
    differences.push(`material ${budgeted.family} → ${designed.family}`);
  if (budgeted.plies !== null && designed.plies !== null && budgeted.plies !== designed.plies)
    differences.push(`plies ${budgeted.plies} → ${designed.plies}`);
  const compare = (what: string, a: number | null, b: number | null) => {
    if (a !== null && b !== null && Math.abs(a - b) > SAME_IN)
      differences.push(`${what} ${formatIn(a)} → ${formatIn(b)}`);
  };
  compare('width', budgeted.bIn, designed.bIn);
  compare('depth', budgeted.dIn, designed.dIn);
  if (differences.length === 0) return null;
  return {
    against: budgeted.against,
    sentBudgetId: budgeted.sentBudgetId,
    budgetedLabel: budgeted.label,
    designedLabel: designed.label,
    differences,
    designedCents: designed.totalCents,
    fromHighCents: designed.totalCents - budgeted.highCents,
    fromLowCents: designed.totalCents - budgeted.lowCents,
    outsideRange: designed.totalCents > budgeted.highCents || designed.totalCents < budgeted.lowCents,
  };
}
