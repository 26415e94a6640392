/**
 * Loading and bracing cases of NDS Table 3.3.3 (effective length of bending members).
 * - 'uniform': single span, uniformly distributed load
 * - 'point-center': single span, concentrated load at centre, no intermediate lateral support
 * - 'point-center-braced': single span, concentrated load at centre, lateral support at centre
 * - 'third-points-braced': single span, two equal loads at 1/3 points, lateral support at 1/3 points
 * - 'quarter-points-braced': single span, three equal loads at 1/4 points, lateral support at 1/4 points
 * - 'cantilever-uniform': cantilever, uniformly distributed load
 * - 'cantilever-point-end': cantilever, concentrated load at the free end
 * - 'any': single span or cantilever with any other load (the table's general row)
 */
export type BeamStabilityCase =
  | 'uniform'
  | 'point-center'
  | 'point-center-braced'
  | 'third-points-braced'
  | 'quarter-points-braced'
  | 'cantilever-uniform'
  | 'cantilever-point-end'
  | 'any';

export interface BeamStability {
  CL: number;
  /** Effective length l_e (in); 0 when continuously braced. */
  leIn: number;
  /** Slenderness ratio R_B; 0 when continuously braced or d ≤ b. */
  RB: number;
  /** Critical buckling design value F_bE (psi); null when stability does not govern (braced, d ≤ b). */
  FbEPsi: number | null;
  /** NDS 3.3.3.7: R_B shall not exceed 50. A member with false here does not pass. */
  withinSlendernessLimit: boolean;
}

const MAX_RB = 50;
const SHORT_LU_OVER_D = 7;
const GENERAL_LONG_LU_OVER_D = 14.3;

/**
 * Effective length l_e (in) from the unbraced length and the load case.
 * @param luIn unbraced length l_u (in); dIn depth (in)
 * @example effectiveLengthIn(240, 15.25, 'point-center') // 374.55
 * Reference: NDS 2018 Table 3.3.3.
 */
export function effectiveLengthIn(luIn: number, dIn: number, loadCase: BeamStabilityCase): number {
  const short = luIn / dIn < SHORT_LU_OVER_D;
  switch (loadCase) {
    case 'uniform':
      return short ? 2.06 * luIn : 1.63 * luIn + 3 * dIn;
    case 'point-center':
      return short ? 1.8 * luIn : 1.37 * luIn + 3 * dIn;
    case 'point-center-braced':
      return 1.11 * luIn;
    case 'third-points-braced':
      return 1.68 * luIn;
    case 'quarter-points-braced':
      return 1.54 * luIn;
    case 'cantilever-uniform':
      return short ? 1.33 * luIn : 0.9 * luIn + 3 * dIn;
    case 'cantilever-point-end':
      return short ? 1.87 * luIn : 1.44 * luIn + 3 * dIn;
    case 'any':
      if (short) return 2.06 * luIn;
      return luIn / dIn <= GENERAL_LONG_LU_OVER_D ? 1.63 * luIn + 3 * dIn : 1.84 * luIn;
  }
}

const BRACED: BeamStability = Object.freeze({
  CL: 1,
  leIn: 0,
  RB: 0,
  FbEPsi: null,
  withinSlendernessLimit: true,
});

/**
 * Beam stability factor C_L. R_B = √(l_e d / b²), F_bE = 1.20 E'_min / R_B²,
 * C_L = (1 + F_bE/F_b*)/1.9 − √(((1 + F_bE/F_b*)/1.9)² − (F_bE/F_b*)/0.95).
 * C_L = 1.0 when the compression edge is continuously braced or when d ≤ b.
 * @param input.bIn width (in); input.dIn depth (in)
 * @param input.unbracedLengthIn l_u (in): distance between points of lateral support of the compression
 *   edge; null = continuously braced (sheathing or joists nailed to the top edge)
 * @param input.loadCase Table 3.3.3 case
 * @param input.EminAdjPsi E'_min (psi): E_min × C_M × C_t × C_i (× C_T)
 * @param input.FbStarPsi F_b* (psi): F_b × all applicable factors except C_fu, C_V and C_L
 * @example beamStabilityFactor({ bIn: 3.5, dIn: 15.25, unbracedLengthIn: 240, loadCase: 'point-center', EminAdjPsi: 690000, FbStarPsi: 1500 }).CL // 0.876
 * Reference: NDS 2018 §3.3.3, Table 3.3.3, equation 3.3-6.
 */
export function beamStabilityFactor(input: {
  bIn: number;
  dIn: number;
  unbracedLengthIn: number | null;
  loadCase: BeamStabilityCase;
  EminAdjPsi: number;
  FbStarPsi: number;
}): BeamStability {
  const { bIn, dIn, unbracedLengthIn } = input;
  if (unbracedLengthIn === null || unbracedLengthIn <= 0 || dIn <= bIn) return BRACED;
  const leIn = effectiveLengthIn(unbracedLengthIn, dIn, input.loadCase);
  const RB = Math.sqrt((leIn * dIn) / (bIn * bIn));
  const FbEPsi = (1.2 * input.EminAdjPsi) / (RB * RB);
  const ratio = FbEPsi / input.FbStarPsi;
  const half = (1 + ratio) / 1.9;
  const CL = half - Math.sqrt(half * half - ratio / 0.95);
  return { CL, leIn, RB, FbEPsi, withinSlendernessLimit: RB <= MAX_RB };
}
