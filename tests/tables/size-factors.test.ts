import { describe, expect, it } from 'vitest';
import { flatUseRowSchema, sizeFactorRowSchema, wetServiceRowSchema } from '@/shared/schemas/calc/materials';
import {
  flatUseFactors,
  structuralGradeSizeFactors,
  studGradeSizeFactors,
} from '@/tables/lumber/size-factors';
import { sawnWetServiceFactors } from '@/tables/lumber/wet-service-factors';

describe('NDS Supplement 2018 Table 4A adjustment factors', () => {
  it('every size factor, flat use and wet service row passes its schema', () => {
    for (const r of [...structuralGradeSizeFactors, ...studGradeSizeFactors]) {
      expect(sizeFactorRowSchema.safeParse(r).success).toBe(true);
    }
    for (const r of flatUseFactors) expect(flatUseRowSchema.safeParse(r).success).toBe(true);
    for (const r of Object.values(sawnWetServiceFactors))
      expect(wetServiceRowSchema.safeParse(r).success).toBe(true);
  });

  it('C_F for F_b, 2 in and 3 in thick, matches REFERENCES.md: 1.5, 1.3, 1.2, 1.1, 1.0, 0.9', () => {
    const byWidth = (w: number) => structuralGradeSizeFactors.find((r) => w <= r.maxNominalWidthIn)?.fbThin;
    expect([4, 6, 8, 10, 12, 14].map(byWidth)).toEqual([1.5, 1.3, 1.2, 1.1, 1.0, 0.9]);
  });

  it('rows are ordered by width so the first match is the right one', () => {
    for (const rows of [structuralGradeSizeFactors, studGradeSizeFactors, flatUseFactors]) {
      for (let i = 1; i < rows.length; i++)
        expect(rows[i].maxNominalWidthIn).toBeGreaterThan(rows[i - 1].maxNominalWidthIn);
    }
  });

  it('wet service dimension lumber factors match REFERENCES.md (0.85, 0.97, 0.67, 0.8, 0.9; 1150 psi rule)', () => {
    const d = sawnWetServiceFactors.dimension;
    expect([d.fb, d.fv, d.fcPerp, d.fc, d.e, d.fbThresholdPsi]).toEqual([0.85, 0.97, 0.67, 0.8, 0.9, 1150]);
  });
});
