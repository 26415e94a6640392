import type { MaterialFamily } from '@/lib/calc/materials';

export interface ColumnStability {
  CP: number;
  /** l_e / d (dimensionless). */
  slenderness: number;
  /** F_cE = 0.822 E'_min / (l_e/d)² (psi). */
  FcEPsi: number;
  /** NDS 3.7.1.4: l_e/d shall not exceed 50 (75 during construction). A column with false here does not pass. */
  withinSlendernessLimit: boolean;
}

const MAX_SLENDERNESS = 50;
const MAX_SLENDERNESS_DURING_CONSTRUCTION = 75;

/**
 * The column buckling coefficient c: 0.8 sawn lumber, 0.9 glulam and structural composite lumber.
 * @example columnBucklingCoefficient('sawn') // 0.8
 * Reference: NDS 2018 §3.7.1.5.
 */
export function columnBucklingCoefficient(family: MaterialFamily): number {
  return family === 'sawn' ? 0.8 : 0.9;
}

/**
 * Column stability factor C_P = (1 + F_cE/F_c*)/(2c) − √(((1 + F_cE/F_c*)/(2c))² − (F_cE/F_c*)/c), about one
 * axis of a rectangular column. For nailed built-up columns the caller multiplies by K_f (NDS 15.3.2).
 * @param input.leIn effective length l_e = K_e l (in)
 * @param input.dIn the cross-section dimension perpendicular to the buckling axis (in)
 * @param input.FcStarPsi F_c* (psi): F_c × all applicable factors except C_P
 * @param input.EminAdjPsi E'_min (psi)
 * @param input.c 0.8 sawn, 0.9 glulam / SCL (columnBucklingCoefficient)
 * @param input.duringConstruction temporary use during construction (shoring): l_e/d limit 75 instead of 50
 * @example columnStabilityFactor({ leIn: 87.6, dIn: 3.5, FcStarPsi: 1322.5, EminAdjPsi: 510000, c: 0.8 }).CP // 0.4378
 * Reference: NDS 2018 §3.7.1, equation 3.7-1.
 */
export function columnStabilityFactor(input: {
  leIn: number;
  dIn: number;
  FcStarPsi: number;
  EminAdjPsi: number;
  c: number;
  duringConstruction?: boolean;
}): ColumnStability {
  const slenderness = input.leIn / input.dIn;
  const FcEPsi = (0.822 * input.EminAdjPsi) / (slenderness * slenderness);
  const ratio = FcEPsi / input.FcStarPsi;
  const half = (1 + ratio) / (2 * input.c);
  const CP = half - Math.sqrt(half * half - ratio / input.c);
  const limit = input.duringConstruction ? MAX_SLENDERNESS_DURING_CONSTRUCTION : MAX_SLENDERNESS;
  return { CP, slenderness, FcEPsi, withinSlendernessLimit: slenderness <= limit };
}
