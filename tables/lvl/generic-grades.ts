/**
 * Laminated veneer lumber (LVL), generic grades for preliminary checks, beam orientation (load on the
 * narrow face of the veneers).
 *
 * Source: there are no standard LVL design values; each manufacturer publishes its own under its code
 * evaluation report (NDS 2018 chapter 8: structural composite lumber). The values below are typical of the
 * published ranges listed in REFERENCES.md (F_b 2600–3100 psi at 12 in depth with (12/d)^n, n ≈ 0.11–0.18,
 * F_v 285–290, F_c⊥ 750, E 2.0e6), taking the low end of F_b and a mid-range n; F_c (parallel) and E_min
 * are typical values from memory. Every row: generic — confirm with the manufacturer's published values.
 * Units: psi; depths and widths in in. Weight at an assumed 42 lb/ft³ (typical LVL, common practice).
 */

export const ASSUMED_LVL_DENSITY_PCF = 42;

export interface LvlGradeRow {
  id: string;
  label: string;
  /** F_b at the reference depth of 12 in. */
  FbPsi: number;
  /** Depth factor (12/d)^depthExponent on F_b. */
  depthExponent: number;
  FvPsi: number;
  FcPerpPsi: number;
  FcPsi: number;
  EPsi: number;
  EminPsi: number;
  generic: true;
  note: "generic: confirm with the manufacturer's published values";
}

export const lvlGenericGrades = [
  {
    id: '2.0e',
    label: 'LVL 2.0E (generic)',
    FbPsi: 2600,
    depthExponent: 0.136,
    FvPsi: 285,
    FcPerpPsi: 750,
    FcPsi: 2500,
    EPsi: 2_000_000,
    EminPsi: 1_016_000,
    generic: true,
    note: "generic: confirm with the manufacturer's published values",
  },
  {
    id: '1.9e',
    label: 'LVL 1.9E (generic)',
    FbPsi: 2600,
    depthExponent: 0.136,
    FvPsi: 285,
    FcPerpPsi: 750,
    FcPsi: 2500,
    EPsi: 1_900_000,
    EminPsi: 965_000,
    generic: true,
    note: "generic: confirm with the manufacturer's published values",
  },
] as const satisfies readonly LvlGradeRow[];

/** Common practice: LVL beams come 1-3/4 in thick per ply, in these depths. */
export const lvlPlyWidthIn = 1.75;
export const lvlDepthsIn = [
  5.5, 7.25, 9.25, 9.5, 11.25, 11.875, 14, 16, 18,
] as const satisfies readonly number[];
