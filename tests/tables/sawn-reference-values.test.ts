import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { sawnReferenceRowSchema } from '@/shared/schemas/calc/materials';
import {
  sawnReferenceValues,
  sawnSpecies,
  type SawnReferenceRow,
} from '@/tables/lumber/sawn-reference-values';

function row(species: string, grade: string, nominalWidthIn: number | null = null): SawnReferenceRow {
  const rows: readonly SawnReferenceRow[] = sawnReferenceValues;
  const found = rows.find(
    (r) => r.species === species && r.grade === grade && r.nominalWidthIn === nominalWidthIn,
  );
  if (!found) throw new Error(`missing ${species} ${grade} ${nominalWidthIn}`);
  return found;
}

describe('NDS Supplement 2018 Table 4A / 4B rows', () => {
  it('every row passes the row schema', () => {
    for (const r of sawnReferenceValues)
      expect(sawnReferenceRowSchema.safeParse(r).success, JSON.stringify(r)).toBe(true);
  });

  it('has one row per species, grade and width', () => {
    const keys = sawnReferenceValues.map((r) => `${r.species}|${r.grade}|${r.nominalWidthIn}`);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('Table 4A species carry width-free rows, Southern Pine (Table 4B) width-specific rows', () => {
    for (const species of sawnSpecies) {
      const rows = sawnReferenceValues.filter((r) => r.species === species.id);
      expect(rows.length).toBeGreaterThan(0);
      for (const r of rows) expect(r.nominalWidthIn === null).toBe(species.table === '4A');
    }
  });

  // Values: NDS Supplement 2018 Table 4A as listed in REFERENCES.md (F_b, F_t, F_v, F_c⊥, F_c, E, E_min, psi).
  it.each([
    ['douglas-fir-larch', 'select-structural', [1500, 1000, 180, 625, 1700, 1_900_000, 690_000]],
    ['douglas-fir-larch', 'no1', [1000, 675, 180, 625, 1500, 1_700_000, 620_000]],
    ['douglas-fir-larch', 'no2', [900, 575, 180, 625, 1350, 1_600_000, 580_000]],
    ['hem-fir', 'no1', [975, 625, 150, 405, 1350, 1_500_000, 550_000]],
    ['hem-fir', 'no2', [850, 525, 150, 405, 1300, 1_300_000, 470_000]],
    ['spruce-pine-fir', 'no1-no2', [875, 450, 135, 425, 1150, 1_400_000, 510_000]],
  ] as const)('Table 4A %s %s matches REFERENCES.md', (species, grade, expected) => {
    const r = row(species, grade);
    expect([r.FbPsi, r.FtPsi, r.FvPsi, r.FcPerpPsi, r.FcPsi, r.EPsi, r.EminPsi]).toEqual(expected);
    expect(r.provenance).toBe('references');
  });

  // NDS Supplement 2018 Table 4B, Southern Pine No.2, as listed in REFERENCES.md: F_b 925 / 800 / 750 psi
  // for 2x8 / 2x10 / 2x12; F_v 175, F_c⊥ 565, E 1,400,000, E_min 510,000.
  it.each([
    [8, 925],
    [10, 800],
    [12, 750],
  ] as const)('Table 4B Southern Pine No.2 %i in wide: F_b %i psi', (width, fb) => {
    const r = row('southern-pine', 'no2', width);
    expect(r.FbPsi).toBe(fb);
    expect([r.FvPsi, r.FcPerpPsi, r.EPsi, r.EminPsi]).toEqual([175, 565, 1_400_000, 510_000]);
  });

  // NDS Supplement 2018 Table 4B, Southern Pine, SPIB's values in force since 1 June 2013 as listed in
  // REFERENCES.md (seen in a transcription of the Southern Pine Use Guide; confirm in the printed Supplement).
  // Widths 2x4 / 2x6 / 2x8 / 2x10 / 2x12.
  const WIDTHS = [4, 6, 8, 10, 12] as const;
  it.each([
    ['F_b', 'FbPsi', [2350, 2100, 1950, 1700, 1600]],
    ['F_t', 'FtPsi', [1650, 1450, 1350, 1150, 1100]],
    ['F_c', 'FcPsi', [1900, 1800, 1700, 1650, 1650]],
  ] as const)('Table 4B Southern Pine Select Structural %s (SPIB 2013 values)', (_name, key, values) => {
    expect(WIDTHS.map((w) => row('southern-pine', 'select-structural', w)[key])).toEqual(values);
    for (const w of WIDTHS) {
      expect(row('southern-pine', 'select-structural', w).note).toContain('Southern Pine Use Guide');
    }
  });

  it('Table 4B Southern Pine No.1 F_c and the 2x12 F_t (SPIB 2013 values)', () => {
    expect(WIDTHS.map((w) => row('southern-pine', 'no1', w).FcPsi)).toEqual([1650, 1550, 1500, 1450, 1400]);
    expect(row('southern-pine', 'no1', 12).FtPsi).toBe(650);
    for (const w of WIDTHS) expect(row('southern-pine', 'no1', w).note).toContain('confirm');
  });

  it('E_min is close to the NDS Appendix D relation for visually graded lumber (COV_E 0.25)', () => {
    // NDS 2018 Appendix D: E_min = E (1 − 1.645 × 0.25) × 1.03 / 1.66; tables round to 10,000 psi.
    for (const r of sawnReferenceValues) {
      expectApprox(r.EminPsi, (r.EPsi * (1 - 1.645 * 0.25) * 1.03) / 1.66, { abs: 10_000 });
    }
  });

  it('Southern Pine values fall (or stay) as the width grows, as size-specific values do', () => {
    for (const grade of ['select-structural', 'no1', 'no2'] as const) {
      const widths = [4, 6, 8, 10, 12] as const;
      for (let i = 1; i < widths.length; i++) {
        expect(row('southern-pine', grade, widths[i]).FbPsi).toBeLessThanOrEqual(
          row('southern-pine', grade, widths[i - 1]).FbPsi,
        );
      }
    }
  });
});
