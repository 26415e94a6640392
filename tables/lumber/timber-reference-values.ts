/**
 * Reference design values, visually graded timbers 5 in × 5 in and larger.
 *
 * Source: American Wood Council, NDS Supplement — Design Values for Wood Construction, 2018 edition,
 * Table 4D. Beams and Stringers: width more than 2 in greater than thickness (6x10 to 6x16, 8x12 to 8x16);
 * Posts and Timbers: width not more than 2 in greater than thickness (6x6, 6x8, 8x8, 8x10).
 * Units: psi; normal load duration. Size factor for timbers: C_F = (12/d)^(1/9) only where d > 12 in
 * (Table 4D footnote): 1.0 to 6x12 and 8x12, below 1.0 for 6x14, 6x16, 8x14 and 8x16.
 *
 * Provenance: every row from memory — confirm against the printed Table 4D before relying on it. Only
 * Douglas Fir-Larch and Hem-Fir are tabulated here; other species' timbers are not offered.
 */
import type { ReferenceDesignValuesPsi, SawnSpeciesId, TableProvenance } from './sawn-reference-values';

export type TimberUse = 'beams-and-stringers' | 'posts-and-timbers';
export type TimberGradeId = 'select-structural' | 'no1' | 'no2';

export interface TimberReferenceRow extends ReferenceDesignValuesPsi {
  species: SawnSpeciesId;
  grade: TimberGradeId;
  use: TimberUse;
  provenance: TableProvenance;
}

export const timberReferenceValues = [
  // Douglas Fir-Larch: from memory.
  {
    species: 'douglas-fir-larch',
    grade: 'select-structural',
    use: 'beams-and-stringers',
    FbPsi: 1600,
    FtPsi: 950,
    FvPsi: 170,
    FcPerpPsi: 625,
    FcPsi: 1100,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'from memory',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'no1',
    use: 'beams-and-stringers',
    FbPsi: 1350,
    FtPsi: 675,
    FvPsi: 170,
    FcPerpPsi: 625,
    FcPsi: 925,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'from memory',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'no2',
    use: 'beams-and-stringers',
    FbPsi: 875,
    FtPsi: 425,
    FvPsi: 170,
    FcPerpPsi: 625,
    FcPsi: 600,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'from memory',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'select-structural',
    use: 'posts-and-timbers',
    FbPsi: 1500,
    FtPsi: 1000,
    FvPsi: 170,
    FcPerpPsi: 625,
    FcPsi: 1150,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'from memory',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'no1',
    use: 'posts-and-timbers',
    FbPsi: 1200,
    FtPsi: 825,
    FvPsi: 170,
    FcPerpPsi: 625,
    FcPsi: 1000,
    EPsi: 1_600_000,
    EminPsi: 580_000,
    provenance: 'from memory',
  },
  {
    species: 'douglas-fir-larch',
    grade: 'no2',
    use: 'posts-and-timbers',
    FbPsi: 750,
    FtPsi: 475,
    FvPsi: 170,
    FcPerpPsi: 625,
    FcPsi: 700,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'from memory',
  },
  // Hem-Fir: from memory.
  {
    species: 'hem-fir',
    grade: 'select-structural',
    use: 'beams-and-stringers',
    FbPsi: 1300,
    FtPsi: 750,
    FvPsi: 140,
    FcPerpPsi: 405,
    FcPsi: 925,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'no1',
    use: 'beams-and-stringers',
    FbPsi: 1050,
    FtPsi: 525,
    FvPsi: 140,
    FcPerpPsi: 405,
    FcPsi: 750,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'no2',
    use: 'beams-and-stringers',
    FbPsi: 675,
    FtPsi: 350,
    FvPsi: 140,
    FcPerpPsi: 405,
    FcPsi: 500,
    EPsi: 1_100_000,
    EminPsi: 400_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'select-structural',
    use: 'posts-and-timbers',
    FbPsi: 1200,
    FtPsi: 800,
    FvPsi: 140,
    FcPerpPsi: 405,
    FcPsi: 975,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'no1',
    use: 'posts-and-timbers',
    FbPsi: 975,
    FtPsi: 650,
    FvPsi: 140,
    FcPerpPsi: 405,
    FcPsi: 850,
    EPsi: 1_300_000,
    EminPsi: 470_000,
    provenance: 'from memory',
  },
  {
    species: 'hem-fir',
    grade: 'no2',
    use: 'posts-and-timbers',
    FbPsi: 575,
    FtPsi: 375,
    FvPsi: 140,
    FcPerpPsi: 405,
    FcPsi: 575,
    EPsi: 1_100_000,
    EminPsi: 400_000,
    provenance: 'from memory',
  },
] as const satisfies readonly TimberReferenceRow[];
