/**
 * Structural glued laminated timber, bending members (loads perpendicular to the wide faces of the
 * laminations, x-x axis).
 *
 * Source: American Wood Council, NDS Supplement — Design Values for Wood Construction, 2018 edition,
 * Table 5A (stress class 24F-1.8E) and Table 5A Expanded (combinations 24F-V4 and 24F-V8, Douglas Fir).
 * Units: psi; normal load duration, dry service.
 * F_bx+ applies where the tension zone is stressed in tension (simple-span positive moment); F_bx− where the
 * compression zone is stressed in tension (cantilevers, continuous spans over supports). F_c⊥x is the
 * compression-face value. F_c is the axially loaded compression value, used for posts.
 *
 * Provenance: 24F-V4 bending values are listed in REFERENCES.md (from memory there too); every other value
 * from memory — confirm against the printed Table 5A before relying on it. The 24F-1.8E F_vx of 265 psi is
 * used for Southern Pine too, although Table 5A footnotes permit a higher value for it (conservative).
 */
import type { TableProvenance } from '../lumber/sawn-reference-values';

/** Species group for the volume factor exponent (NDS 5.3.6: 1/10 western species, 1/20 Southern Pine). */
export type GlulamSpeciesGroup = 'western' | 'southern-pine';

export interface GlulamStressClassRow {
  id: string;
  label: string;
  speciesGroup: GlulamSpeciesGroup;
  FbxPosPsi: number;
  FbxNegPsi: number;
  FcPerpxPsi: number;
  FvxPsi: number;
  FcPsi: number;
  ExPsi: number;
  ExMinPsi: number;
  provenance: TableProvenance;
}

export const glulamStressClasses = [
  {
    id: '24f-1.8e-western',
    label: '24F-1.8E (western species)',
    speciesGroup: 'western',
    FbxPosPsi: 2400,
    FbxNegPsi: 1450,
    FcPerpxPsi: 650,
    FvxPsi: 265,
    FcPsi: 1600,
    ExPsi: 1_800_000,
    ExMinPsi: 950_000,
    provenance: 'from memory',
  },
  {
    id: '24f-1.8e-southern-pine',
    label: '24F-1.8E (Southern Pine)',
    speciesGroup: 'southern-pine',
    FbxPosPsi: 2400,
    FbxNegPsi: 1450,
    FcPerpxPsi: 650,
    FvxPsi: 265,
    FcPsi: 1600,
    ExPsi: 1_800_000,
    ExMinPsi: 950_000,
    provenance: 'from memory',
  },
  {
    id: '24f-v4-df',
    label: '24F-V4 Douglas Fir (unbalanced)',
    speciesGroup: 'western',
    FbxPosPsi: 2400,
    FbxNegPsi: 1850,
    FcPerpxPsi: 650,
    FvxPsi: 265,
    FcPsi: 1650,
    ExPsi: 1_800_000,
    ExMinPsi: 950_000,
    provenance: 'references',
  },
  {
    id: '24f-v8-df',
    label: '24F-V8 Douglas Fir (balanced)',
    speciesGroup: 'western',
    FbxPosPsi: 2400,
    FbxNegPsi: 2400,
    FcPerpxPsi: 650,
    FvxPsi: 265,
    FcPsi: 1650,
    ExPsi: 1_800_000,
    ExMinPsi: 950_000,
    provenance: 'from memory',
  },
] as const satisfies readonly GlulamStressClassRow[];

/**
 * Table 5A wet service factors C_M for glulam (moisture content in service 16 % or more). From memory.
 */
export const glulamWetServiceFactors = {
  fb: 0.8,
  ft: 0.8,
  fv: 0.875,
  fcPerp: 0.53,
  fc: 0.73,
  e: 0.833,
} as const satisfies Record<string, number>;
