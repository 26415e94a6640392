/**
 * Reference design values, visually graded dimension lumber 2 in to 4 in thick, 2 in and wider.
 *
 * Source: American Wood Council, NDS Supplement — Design Values for Wood Construction, 2018 edition,
 * Table 4A (Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir; size factors C_F apply, see size-factors.ts) and
 * Table 4B (Southern Pine; values are size-specific by nominal width, C_F = 1.0 to 12 in wide).
 * Units: all values in psi (lb/in²); normal load duration, dry service (moisture content ≤ 19 %).
 *
 * Provenance is recorded per row: 'references' = the value set is listed in the project's REFERENCES.md
 * (seen in reproductions of the Supplement); 'from memory' = recalled from the printed table, confirm against
 * the book before relying on it. A row's `note` says which of its values come from where when they differ.
 *
 * Nominal 4x members (4x4 to 4x16) are dimension lumber and use these rows with the 4-in-thick size factors.
 */

export type SawnSpeciesId = 'douglas-fir-larch' | 'hem-fir' | 'spruce-pine-fir' | 'southern-pine';
export type SawnGradeId = 'select-structural' | 'no1' | 'no2' | 'no1-no2' | 'no3' | 'stud';
export type TableProvenance = 'references' | 'from memory';

export interface SawnSpeciesRow {
  id: SawnSpeciesId;
  label: string;
  /** NDS Supplement table the species' dimension lumber values come from. */
  table: '4A' | '4B';
}

/** The seven reference design values of a row, psi. */
export interface ReferenceDesignValuesPsi {
  FbPsi: number;
  FtPsi: number;
  FvPsi: number;
  FcPerpPsi: number;
  FcPsi: number;
  EPsi: number;
  EminPsi: number;
}

export interface SawnReferenceRow extends ReferenceDesignValuesPsi {
  species: SawnSpeciesId;
  grade: SawnGradeId;
  /** Table 4B: the nominal width (in) the row applies to; Table 4A: null (all widths, with C_F). */
  nominalWidthIn: 4 | 6 | 8 | 10 | 12 | null;
  provenance: TableProvenance;
  /** Which values of the row come from where, when the row mixes sources or awaits confirmation. */
  note?: string;
}

export const sawnSpecies = [
  { id: 'douglas-fir-larch', label: 'Douglas Fir-Larch', table: '4A' },
  { id: 'hem-fir', label: 'Hem-Fir', table: '4A' },
  { id: 'spruce-pine-fir', label: 'Spruce-Pine-Fir', table: '4A' },
  { id: 'southern-pine', label: 'Southern Pine', table: '4B' },
] as const satisfies readonly SawnSpeciesRow[];

export const sawnGradeLabels = {
  'select-structural': 'Select Structural',
  no1: 'No.1',
  no2: 'No.2',
  'no1-no2': 'No.1/No.2',
  no3: 'No.3',
  stud: 'Stud',
} as const satisfies Record<SawnGradeId, string>;

const SPIB_2013 =
  "SPIB's values of 1 June 2013, from a transcription of the Southern Pine Use Guide (REFERENCES.md): confirm in the printed 2018 Supplement";
const SOUTHERN_PINE_2013_SELECT = `F_b, F_t, F_c: ${SPIB_2013}; F_v, F_c⊥, E, E_min from memory`;
const SOUTHERN_PINE_2013_NO1 = `F_c: ${SPIB_2013}; F_b, F_t, F_v, F_c⊥, E, E_min from memory`;
const SOUTHERN_PINE_2013_NO1_12 = `F_c, F_t: ${SPIB_2013}; F_b, F_v, F_c⊥, E, E_min from memory`;

export const sawnReferenceValues = [
  // Douglas Fir-Larch, Table 4A. SS, No.1, No.2: REFERENCES.md.
  {
    species: 'douglas-fir-larch',
    grade: 'select-structural',
    nominalWidthIn: null,
    FbPsi: 1500,
    FtPsi: 1000,
    FvPsi: 180,
    FcPerpPsi: 625,
    FcPsi: 1700,
    EPsi: 1_900_000,
    EminPsi: 690_000,
    provenance: 'references',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'no1',
    nominalWidthIn: null,
    FbPsi: 1000,
    FtPsi: 675,
    FvPsi: 180,
    FcPerpPsi: 625,
    FcPsi: 1500,
    EPsi: 1_700_000,
    EminPsi: 620_000,
    provenance: 'references',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'no2',
    nominalWidthIn: null,
    FbPsi: 900,
    FtPsi: 575,
    FvPsi: 180,
    FcPerpPsi: 625,
    FcPsi: 1350,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'references',
  },
  // Douglas Fir-Larch No.3 and Stud: from memory.
  {
    species: 'douglas-fir-larch',
    grade: 'no3',
    nominalWidthIn: null,
    FbPsi: 525,
    FtPsi: 325,
    FvPsi: 180,
    FcPerpPsi: 625,
    FcPsi: 775,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'from memory',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'stud',
    nominalWidthIn: null,
    FbPsi: 700,
    FtPsi: 450,
    FvPsi: 180,
    FcPerpPsi: 625,
    FcPsi: 850,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'from memory',
  },

  // Hem-Fir, Table 4A. No.1, No.2: REFERENCES.md; SS, No.3, Stud: from memory.
  {
    species: 'hem-fir',
    grade: 'select-structural',
    nominalWidthIn: null,
    FbPsi: 1400,
    FtPsi: 925,
    FvPsi: 150,
    FcPerpPsi: 405,
    FcPsi: 1500,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'no1',
    nominalWidthIn: null,
    FbPsi: 975,
    FtPsi: 625,
    FvPsi: 150,
    FcPerpPsi: 405,
    FcPsi: 1350,
    EPsi: 1_500_000,
    EminPsi: 550_000,
    provenance: 'references',
  },
  {
    species: 'hem-fir',
    grade: 'no2',
    nominalWidthIn: null,
    FbPsi: 850,
    FtPsi: 525,
    FvPsi: 150,
    FcPerpPsi: 405,
    FcPsi: 1300,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'references',
  },
  {
    species: 'hem-fir',
    grade: 'no3',
    nominalWidthIn: null,
    FbPsi: 500,
    FtPsi: 300,
    FvPsi: 150,
    FcPerpPsi: 405,
    FcPsi: 725,
    EPsi: 1_200_000,
    EminPsi: 440_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'stud',
    nominalWidthIn: null,
    FbPsi: 675,
    FtPsi: 400,
    FvPsi: 150,
    FcPerpPsi: 405,
    FcPsi: 800,
    EPsi: 1_200_000,
    EminPsi: 440_000,
    provenance: 'from memory',
  },

  // Spruce-Pine-Fir, Table 4A (No.1 and No.2 are published as one row). No.1/No.2: REFERENCES.md;
  // SS, No.3, Stud: from memory.
  {
    species: 'spruce-pine-fir',
    grade: 'select-structural',
    nominalWidthIn: null,
    FbPsi: 1250,
    FtPsi: 700,
    FvPsi: 135,
    FcPerpPsi: 425,
    FcPsi: 1400,
    EPsi: 1_500_000,
    EminPsi: 550_000,
    provenance: 'from memory',
  },
  {
    species: 'spruce-pine-fir',
    grade: 'no1-no2',
    nominalWidthIn: null,
    FbPsi: 875,
    FtPsi: 450,
    FvPsi: 135,
    FcPerpPsi: 425,
    FcPsi: 1150,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'references',
  },
  {
    species: 'spruce-pine-fir',
    grade: 'no3',
    nominalWidthIn: null,
    FbPsi: 500,
    FtPsi: 250,
    FvPsi: 135,
    FcPerpPsi: 425,
    FcPsi: 650,
    EPsi: 1_200_000,
    EminPsi: 440_000,
    provenance: 'from memory',
  },
  {
    species: 'spruce-pine-fir',
    grade: 'stud',
    nominalWidthIn: null,
    FbPsi: 675,
    FtPsi: 350,
    FvPsi: 135,
    FcPerpPsi: 425,
    FcPsi: 725,
    EPsi: 1_200_000,
    EminPsi: 440_000,
    provenance: 'from memory',
  },

  // Southern Pine, Table 4B (size-specific). Select Structural and No.1 carry SPIB's values of 1 June 2013
  // (the rows held before replaced values higher than those in force); each row's note says which values.
  {
    species: 'southern-pine',
    grade: 'select-structural',
    nominalWidthIn: 4,
    FbPsi: 2350,
    FtPsi: 1650,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1900,
    EPsi: 1_800_000,
    EminPsi: 660_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_SELECT,
  },
  {
    species: 'southern-pine',
    grade: 'select-structural',
    nominalWidthIn: 6,
    FbPsi: 2100,
    FtPsi: 1450,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1800,
    EPsi: 1_800_000,
    EminPsi: 660_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_SELECT,
  },
  {
    species: 'southern-pine',
    grade: 'select-structural',
    nominalWidthIn: 8,
    FbPsi: 1950,
    FtPsi: 1350,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1700,
    EPsi: 1_800_000,
    EminPsi: 660_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_SELECT,
  },
  {
    species: 'southern-pine',
    grade: 'select-structural',
    nominalWidthIn: 10,
    FbPsi: 1700,
    FtPsi: 1150,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1650,
    EPsi: 1_800_000,
    EminPsi: 660_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_SELECT,
  },
  {
    species: 'southern-pine',
    grade: 'select-structural',
    nominalWidthIn: 12,
    FbPsi: 1600,
    FtPsi: 1100,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1650,
    EPsi: 1_800_000,
    EminPsi: 660_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_SELECT,
  },
  // No.1: F_c and the 2x12 F_t from the 2013 values (REFERENCES.md); the rest from memory.
  {
    species: 'southern-pine',
    grade: 'no1',
    nominalWidthIn: 4,
    FbPsi: 1500,
    FtPsi: 1000,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1650,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_NO1,
  },
  {
    species: 'southern-pine',
    grade: 'no1',
    nominalWidthIn: 6,
    FbPsi: 1350,
    FtPsi: 875,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1550,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_NO1,
  },
  {
    species: 'southern-pine',
    grade: 'no1',
    nominalWidthIn: 8,
    FbPsi: 1250,
    FtPsi: 800,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1500,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_NO1,
  },
  {
    species: 'southern-pine',
    grade: 'no1',
    nominalWidthIn: 10,
    FbPsi: 1050,
    FtPsi: 700,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1450,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_NO1,
  },
  {
    species: 'southern-pine',
    grade: 'no1',
    nominalWidthIn: 12,
    FbPsi: 1000,
    FtPsi: 650,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1400,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'references',
    note: SOUTHERN_PINE_2013_NO1_12,
  },
  // No.2: F_b for 2x8/2x10/2x12, F_v, F_c⊥, E, E_min: REFERENCES.md; F_b 2x4/2x6, F_t and F_c: from memory.
  {
    species: 'southern-pine',
    grade: 'no2',
    nominalWidthIn: 4,
    FbPsi: 1100,
    FtPsi: 675,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1450,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'from memory',
  },
  {
    species: 'southern-pine',
    grade: 'no2',
    nominalWidthIn: 6,
    FbPsi: 1000,
    FtPsi: 600,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1400,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'from memory',
  },
  {
    species: 'southern-pine',
    grade: 'no2',
    nominalWidthIn: 8,
    FbPsi: 925,
    FtPsi: 550,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1350,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'references',
  },
  {
    species: 'southern-pine',
    grade: 'no2',
    nominalWidthIn: 10,
    FbPsi: 800,
    FtPsi: 475,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1300,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'references',
  },
  {
    species: 'southern-pine',
    grade: 'no2',
    nominalWidthIn: 12,
    FbPsi: 750,
    FtPsi: 450,
    FvPsi: 175,
    FcPerpPsi: 565,
    FcPsi: 1250,
    EPsi: 1_400_000,
    EminPsi: 510_000,
    provenance: 'references',
  },
] as const satisfies readonly SawnReferenceRow[];
