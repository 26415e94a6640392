import type { Cents } from './money';

/** Groups a budget's lines fall in, in the order they are shown. */
export const lineGroups = [
  'member',
  'posts-and-footing',
  'hardware',
  'shoring',
  'labour',
  'demolition',
  'allowances',
  'protection',
  'finishes',
  'fees',
  'delivery',
  'old-house',
  'markups',
] as const;
export type LineGroup = (typeof lineGroups)[number];

/** What a line is to the client: work in the scope, an allowance, or a figure kept in the office. */
export type ClientView = 'scope' | 'allowance' | 'internal';

/** One line of a budget. Money in whole cents; quantity in the line's unit (a markup's is its percent). */
export interface BudgetLine {
  /** Stable id, the key of an override ("member", "labour/hang-joists", "markup/tax"). */
  id: string;
  group: LineGroup;
  label: string;
  quantity: number;
  /** Unit of the quantity as shown: "ply-lf", "each", "h", "sf", "%". */
  unit: string;
  /** Price of one unit, cents; null for a percentage line. */
  unitCents: Cents | null;
  amountCents: Cents;
  /** How the quantity was found, in words ("2 plies × 14 ft"). */
  basis: string;
  /** Price book item the unit price comes from. */
  priceKey: string | null;
  /** The price book has no price for it: the line counts 0 until it does. */
  missingPrice: boolean;
  /** Materials carry sales tax; lumber carries waste. */
  taxable: boolean;
  lumber: boolean;
  client: ClientView;
  /** Set when the estimator changed the line: the note and what it was before. */
  override: { note: string; computedCents: Cents } | null;
}

/** An estimator's change to one line; at least one of quantity, unit price or amount, and a note. */
export interface LineOverride {
  quantity?: number;
  unitCents?: Cents;
  amountCents?: Cents;
  note: string;
}
