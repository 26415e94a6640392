import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import {
  glulamSizeSetSchema,
  glulamStressClassRowSchema,
  lvlGradeRowSchema,
} from '@/shared/schemas/calc/materials';
import { glulamSizeSets } from '@/tables/glulam/standard-sizes';
import { glulamStressClasses } from '@/tables/glulam/stress-classes';
import { lvlDepthsIn, lvlGenericGrades } from '@/tables/lvl/generic-grades';

describe('glulam stress classes (NDS Supplement 2018 Table 5A) and sizes', () => {
  it('every stress class and size set passes its schema', () => {
    for (const r of glulamStressClasses)
      expect(glulamStressClassRowSchema.safeParse(r).success, r.id).toBe(true);
    for (const s of glulamSizeSets)
      expect(glulamSizeSetSchema.safeParse(s).success, s.speciesGroup).toBe(true);
  });

  // REFERENCES.md (from memory there, confirm): 24F-V4 DF F_bx+ 2400, F_bx− 1850, F_c⊥x 650, F_vx 265,
  // E_x 1.8e6, E_x,min 0.95e6.
  it('24F-V4 Douglas Fir matches REFERENCES.md', () => {
    const v4 = glulamStressClasses.find((c) => c.id === '24f-v4-df');
    expect(v4 && [v4.FbxPosPsi, v4.FbxNegPsi, v4.FcPerpxPsi, v4.FvxPsi, v4.ExPsi, v4.ExMinPsi]).toEqual([
      2400, 1850, 650, 265, 1_800_000, 950_000,
    ]);
  });

  it('E_x,min follows NDS Appendix D for glulam: E (1 − 1.645 × 0.10) × 1.05 / 1.66', () => {
    for (const c of glulamStressClasses)
      expectApprox(c.ExMinPsi, (c.ExPsi * (1 - 1.645 * 0.1) * 1.05) / 1.66, { rel: 0.01 });
  });

  it('western depths step by 1-1/2 in from 6 to 24 in; Southern Pine by 1-3/8 in', () => {
    const western = glulamSizeSets.find((s) => s.speciesGroup === 'western');
    const sp = glulamSizeSets.find((s) => s.speciesGroup === 'southern-pine');
    expect(western?.depthsIn[0]).toBe(6);
    expect(western?.depthsIn[western.depthsIn.length - 1]).toBe(24);
    expect(western?.widthsIn).toEqual([3.125, 3.5, 5.125, 5.5, 6.75]);
    expect(sp?.laminationIn).toBe(1.375);
  });
});

describe('generic LVL grades', () => {
  it('every row passes the schema and says to confirm with the manufacturer', () => {
    for (const r of lvlGenericGrades) {
      expect(lvlGradeRowSchema.safeParse(r).success, r.id).toBe(true);
      expect(r.note).toContain('confirm with the manufacturer');
    }
  });

  it('2.0E sits inside the REFERENCES.md typical ranges (F_b 2600–3100, n 0.11–0.18, F_v 285–290, F_c⊥ 750)', () => {
    const lvl = lvlGenericGrades.find((g) => g.id === '2.0e');
    expect(lvl).toBeDefined();
    if (!lvl) return;
    expect(lvl.FbPsi).toBeGreaterThanOrEqual(2600);
    expect(lvl.FbPsi).toBeLessThanOrEqual(3100);
    expect(lvl.depthExponent).toBeGreaterThanOrEqual(0.11);
    expect(lvl.depthExponent).toBeLessThanOrEqual(0.18);
    expect([lvl.FvPsi, lvl.FcPerpPsi, lvl.EPsi]).toEqual([285, 750, 2_000_000]);
  });

  it('offers the depths the brief names, 5-1/2 to 18 in', () => {
    expect([...lvlDepthsIn]).toEqual([5.5, 7.25, 9.25, 9.5, 11.25, 11.875, 14, 16, 18]);
  });
});
