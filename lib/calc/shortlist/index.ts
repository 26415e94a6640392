/**
 * Shortlist: every size of the chosen materials checked for one member, filtered by fit, sorted.
 * Reference: DESIGN.md §5 "Shortlist"; NDS 2018 §§3.3–3.5, 3.10.
 */
export { buildShortlist, NEAR_MISS_LIMIT } from './build-shortlist';
export { pieceWeightLb, sizeFitReason, type FitLimits } from './size-fits';
