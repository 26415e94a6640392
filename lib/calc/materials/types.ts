/**
 * Contracts of the materials catalogue: what a material is, what one member size is, and the reference
 * design values the checks adjust. Units: section dimensions in in, area in in², section modulus in in³,
 * moment of inertia in in⁴, self-weight in plf, stresses and moduli in psi.
 */

export type MaterialFamily = 'sawn' | 'glulam' | 'lvl';

/** One species-and-grade (sawn), stress class (glulam) or generic grade (LVL). */
export interface Material {
  id: string;
  family: MaterialFamily;
  /** e.g. "Douglas Fir-Larch No.2", "24F-V4 Douglas Fir (unbalanced)", "LVL 2.0E (generic)". */
  label: string;
  /** Species id for sawn lumber ("douglas-fir-larch"), species group for glulam, "lvl" for LVL. */
  species: string;
  /** Grade label as printed: "No.2", "24F-1.8E", "2.0E". */
  grade: string;
  /** Source table with edition, e.g. "NDS Supplement 2018 Table 4A". */
  source: string;
  /** True for values that are not standard and must be confirmed with the manufacturer. */
  generic?: boolean;
}

/**
 * One member size. Built-up members (sawn and LVL plies) carry the totals: b = plies × ply width, and
 * A, S_x, I_x and self-weight are the sums over the plies.
 */
export interface MemberSize {
  id: string;
  materialId: string;
  /** e.g. "2-ply 2x10", "5-1/8 x 12", "3-ply 1-3/4 x 11-7/8". */
  label: string;
  plies: number;
  /** Total width (in). */
  bIn: number;
  /** Depth (in). */
  dIn: number;
  areaIn2: number;
  /** Section modulus about the strong axis (in³). */
  sxIn3: number;
  /** Moment of inertia about the strong axis (in⁴). */
  ixIn4: number;
  /** Self-weight (lb/ft) at the density the source table names. */
  selfWeightPlf: number;
  /** One ply's nominal size, e.g. "2x10", "1-3/4 x 11-7/8". */
  nominal: string;
}

/** Reference (unadjusted) design values in psi: normal load duration, dry service. */
export interface DesignValues {
  FbPsi: number;
  FvPsi: number;
  FcPerpPsi: number;
  FcPsi: number;
  EPsi: number;
  EminPsi: number;
}
