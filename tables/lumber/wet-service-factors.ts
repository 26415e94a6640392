/**
 * Wet service factors C_M for sawn lumber (moisture content in service above 19 %).
 *
 * Source: American Wood Council, NDS Supplement — Design Values for Wood Construction, 2018 edition,
 * Table 4A and Table 4B adjustment factors (dimension lumber) and Table 4D (timbers, applies where the
 * moisture content in service exceeds 19 %). Units: dimensionless.
 *
 * Provenance: the dimension lumber row is listed in REFERENCES.md; the timber row and the F_c threshold
 * are from memory.
 */

export interface WetServiceRow {
  fb: number;
  ft: number;
  fv: number;
  fcPerp: number;
  fc: number;
  e: number;
  /** C_M on F_b is 1.0 when F_b (× C_F for Table 4A) does not exceed this (psi). */
  fbThresholdPsi: number | null;
  /** C_M on F_c is 1.0 when F_c (× C_F for Table 4A) does not exceed this (psi). */
  fcThresholdPsi: number | null;
}

export const sawnWetServiceFactors = {
  dimension: {
    fb: 0.85,
    ft: 1.0,
    fv: 0.97,
    fcPerp: 0.67,
    fc: 0.8,
    e: 0.9,
    fbThresholdPsi: 1150,
    fcThresholdPsi: 750,
  },
  timber: {
    fb: 1.0,
    ft: 1.0,
    fv: 1.0,
    fcPerp: 0.67,
    fc: 0.91,
    e: 1.0,
    fbThresholdPsi: null,
    fcThresholdPsi: null,
  },
} as const satisfies Record<'dimension' | 'timber', WetServiceRow>;
