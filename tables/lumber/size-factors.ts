/**
 * Size factors C_F and flat use factors C_fu for visually graded dimension lumber.
 *
 * Source: American Wood Council, NDS Supplement — Design Values for Wood Construction, 2018 edition,
 * Table 4A "Adjustment Factors" (size factor C_F for Select Structural, No.1 & Btr, No.1, No.2, No.3 and
 * for Stud; flat use factor C_fu) and Table 4B footnotes (Southern Pine). Units: dimensionless factors;
 * widths and thicknesses are nominal inches.
 *
 * Provenance: the 2 in and 3 in thick F_b column is listed in REFERENCES.md; the 4 in thick F_b column, the
 * F_t and F_c columns, the Stud rows, C_fu and the Table 4B footnotes are from memory.
 */

export interface SizeFactorRow {
  /** Largest nominal width (in) the row covers; Infinity = "14 in and wider". */
  maxNominalWidthIn: number;
  /** C_F on F_b for members 2 in and 3 in thick. */
  fbThin: number;
  /** C_F on F_b for members 4 in thick. */
  fbThick: number;
  ft: number;
  fc: number;
}

/** Table 4A size factors, Select Structural through No.3. */
export const structuralGradeSizeFactors = [
  { maxNominalWidthIn: 4, fbThin: 1.5, fbThick: 1.5, ft: 1.5, fc: 1.15 },
  { maxNominalWidthIn: 5, fbThin: 1.4, fbThick: 1.4, ft: 1.4, fc: 1.1 },
  { maxNominalWidthIn: 6, fbThin: 1.3, fbThick: 1.3, ft: 1.3, fc: 1.1 },
  { maxNominalWidthIn: 8, fbThin: 1.2, fbThick: 1.3, ft: 1.2, fc: 1.05 },
  { maxNominalWidthIn: 10, fbThin: 1.1, fbThick: 1.2, ft: 1.1, fc: 1.0 },
  { maxNominalWidthIn: 12, fbThin: 1.0, fbThick: 1.1, ft: 1.0, fc: 1.0 },
  { maxNominalWidthIn: Infinity, fbThin: 0.9, fbThick: 1.0, ft: 0.9, fc: 0.9 },
] as const satisfies readonly SizeFactorRow[];

/**
 * Table 4A size factors, Stud grade. Stud 8 in and wider takes No.3 values and size factors, so Stud is
 * offered only to 6 in wide.
 */
export const studGradeSizeFactors = [
  { maxNominalWidthIn: 4, fbThin: 1.1, fbThick: 1.1, ft: 1.1, fc: 1.05 },
  { maxNominalWidthIn: 6, fbThin: 1.0, fbThick: 1.0, ft: 1.0, fc: 1.0 },
] as const satisfies readonly SizeFactorRow[];

/**
 * Table 4B footnotes (Southern Pine): values are size-specific, so C_F = 1.0 to 12 in wide, except F_b of
 * 4 in thick members 8 in and wider × 1.1; wider than 12 in, the 12 in values × 0.9 (F_b, F_t, F_c).
 */
export const southernPineSizeFactorNotes = {
  fbFourInThickEightInAndWider: 1.1,
  widerThanTwelveIn: 0.9,
} as const satisfies Record<string, number>;

export interface FlatUseRow {
  /** Largest nominal width (in) the row covers; Infinity = "10 in and wider". */
  maxNominalWidthIn: number;
  /** Members 2 in and 3 in thick. */
  thin: number;
  /** Members 4 in thick. */
  thick: number;
}

/** Table 4A / 4B flat use factor C_fu on F_b, for dimension lumber loaded on its wide face. */
export const flatUseFactors = [
  { maxNominalWidthIn: 3, thin: 1.0, thick: 1.0 },
  { maxNominalWidthIn: 4, thin: 1.1, thick: 1.0 },
  { maxNominalWidthIn: 5, thin: 1.1, thick: 1.05 },
  { maxNominalWidthIn: 6, thin: 1.15, thick: 1.05 },
  { maxNominalWidthIn: 8, thin: 1.15, thick: 1.05 },
  { maxNominalWidthIn: Infinity, thin: 1.2, thick: 1.1 },
] as const satisfies readonly FlatUseRow[];
