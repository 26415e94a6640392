/**
 * Budget arithmetic (pure TypeScript, no I/O): a member's budget from the firm's price book in integer
 * cents, its range from the preliminary size to the next size up, and the pieces it is made of.
 * @example
 * import { buildMemberBudget, budgetRange } from '@/lib/budget';
 * Reference: common practice (remodeling estimates); DESIGN.md §7 "Budget lines".
 */
export * from './money';
export * from './price-catalogue';
export * from './price-lookup';
export * from './stock-length';
export * from './plies';
export * from './temporary-walls';
export * from './labour';
export * from './finish-patch';
export * from './markups';
export * from './facts';
export * from './types';
export * from './member-lines';
export * from './build-budget';
export * from './budget-range';
export * from './amount-text';
export * from './design-change';
