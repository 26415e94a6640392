import type { InputFlag, LoadType, TypedBeamLoad } from '@/lib/calc/types';

/**
 * One line of the load takedown, so an engineer can follow the sum: the load's label and type, the
 * arithmetic as text ("12 ft × 15 psf ÷ cos 26.6°"), and the result as a line load (plf) or a point load
 * (lb). Partial uniform loads carry their extent (ft from the left support); point loads their position.
 */
export interface TakedownLine {
  label: string;
  type: LoadType;
  expression: string;
  wPlf?: number;
  pLb?: number;
  startFt?: number;
  endFt?: number;
  atFt?: number;
  flag?: InputFlag;
}

/** Output of buildMemberLoads. */
export interface MemberLoads {
  /** Loads for the beam analysis, one per load type and source (zero loads left out). */
  loads: TypedBeamLoad[];
  lines: TakedownLine[];
  warnings: string[];
  /**
   * Sum of the uniform load intensities by type, plf. Partial loads count at their full intensity, so this
   * is the largest line load anywhere on the span when every partial load overlaps (an upper bound).
   * Point loads are not in it.
   */
  totalsPlf: Record<LoadType, number>;
}
