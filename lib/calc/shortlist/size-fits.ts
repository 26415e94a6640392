import type { MemberSize } from '@/lib/calc/materials';

/** Limits on what can be built and carried in; any may be absent. Dimensions in in, weight lb, length ft. */
export interface FitLimits {
  maxDepthIn: number | null;
  maxWidthIn: number | null;
  maxPieceWeightLb: number | null;
  maxPieceLengthFt: number | null;
}

/**
 * Whether a size fits: depth (joists for a flush member, headroom for a dropped one), width in the wall, and
 * the heaviest and longest piece carried in. Built-up members go in one ply at a time.
 *
 * @param size member size (in, plf); lengthToBuyFt the piece length, ft; limits the fit limits
 * @returns null when it fits, else the reason
 * @example sizeFitReason(size, 12, { maxDepthIn: 9.25, maxWidthIn: null, maxPieceWeightLb: null, maxPieceLengthFt: null });
 * Reference: DESIGN.md §5 "Shortlist" (fits: depth, width, piece weight and length; common practice).
 */
export function sizeFitReason(size: MemberSize, lengthToBuyFt: number, limits: FitLimits): string | null {
  const slack = 1e-9;
  if (limits.maxDepthIn !== null && size.dIn > limits.maxDepthIn + slack) return 'too deep';
  if (limits.maxWidthIn !== null && size.bIn > limits.maxWidthIn + slack) return 'too wide for the wall';
  if (limits.maxPieceLengthFt !== null && lengthToBuyFt > limits.maxPieceLengthFt + slack)
    return 'too long to carry in';
  if (
    limits.maxPieceWeightLb !== null &&
    pieceWeightLb(size, lengthToBuyFt) > limits.maxPieceWeightLb + slack
  ) {
    return 'too heavy to carry in';
  }
  return null;
}

/**
 * Weight of the heaviest piece carried in: one ply of a built-up member, or the whole member, lb.
 * @param size member size (selfWeightPlf plf, plies); lengthToBuyFt ft
 * @example pieceWeightLb(getSize('lvl-2.0e', '3-ply-1.75x11.875'), 14); // one ply's weight
 * Reference: DESIGN.md §5 (ply weight that can be carried in).
 */
export function pieceWeightLb(size: MemberSize, lengthToBuyFt: number): number {
  return (size.selfWeightPlf / size.plies) * lengthToBuyFt;
}
