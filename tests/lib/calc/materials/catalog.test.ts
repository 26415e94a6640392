import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import {
  getMaterial,
  getSize,
  inchFraction,
  listMaterials,
  listSizes,
  referenceValues,
  weakestGrade,
} from '@/lib/calc/materials';
import { CalcInputError } from '@/lib/calc/types';
import { unknownGradeMaterial } from '@/lib/calc/checks';

const DFL2 = 'sawn-douglas-fir-larch-no2';
const SP2 = 'sawn-southern-pine-no2';

describe('materials catalogue', () => {
  it('lists every family and filters by family', () => {
    const all = listMaterials();
    expect(new Set(all.map((m) => m.id)).size).toBe(all.length);
    for (const family of ['sawn', 'glulam', 'lvl'] as const) {
      const some = listMaterials(family);
      expect(some.length).toBeGreaterThan(0);
      expect(some.every((m) => m.family === family)).toBe(true);
    }
    expect(listMaterials('lvl').every((m) => m.generic === true)).toBe(true);
  });

  it('names each material with its source table', () => {
    expect(getMaterial(DFL2)).toMatchObject({
      label: 'Douglas Fir-Larch No.2',
      source: 'NDS Supplement 2018 Table 4A',
    });
    expect(getMaterial(SP2).source).toBe('NDS Supplement 2018 Table 4B');
    expect(getMaterial('glulam-24f-v4-df').source).toBe('NDS Supplement 2018 Table 5A');
  });

  it('throws a field error for an unknown material or size', () => {
    expect(() => getMaterial('oak')).toThrowError(CalcInputError);
    expect(() => listSizes('oak')).toThrow(expect.objectContaining({ field: 'materialId' }));
    expect(() => getSize(DFL2, '2x11')).toThrow(expect.objectContaining({ field: 'sizeId' }));
  });
});

describe('member sizes', () => {
  it('built-up sawn sizes sum the plies of the Table 1B section (NDS Supplement 2018 Table 1B 2x10)', () => {
    const single = getSize(DFL2, '2x10');
    const triple = getSize(DFL2, '3-ply-2x10');
    expect(triple.label).toBe('3-ply 2x10');
    expect([triple.plies, triple.bIn, triple.dIn]).toEqual([3, 4.5, 9.25]);
    expectApprox(single.areaIn2, 13.88, { abs: 0.005 });
    expectApprox(triple.areaIn2, 3 * 13.88, { abs: 0.01 });
    expectApprox(triple.sxIn3, 3 * 21.39, { abs: 0.01 });
    expectApprox(triple.ixIn4, 3 * 98.93, { abs: 0.01 });
    expectApprox(triple.selfWeightPlf, 3 * 3.372, { abs: 0.001 });
  });

  it('offers 1 to 4 plies of 2x, single 4x and 6x, and filters by plies', () => {
    const plies = new Set(listSizes(DFL2).map((s) => s.plies));
    expect([...plies].sort()).toEqual([1, 2, 3, 4]);
    expect(listSizes(DFL2, { plies: [2] }).every((s) => s.plies === 2 && s.nominal.startsWith('2x'))).toBe(
      true,
    );
    expect(listSizes(DFL2, { plies: [1, 4] }).every((s) => s.plies === 1 || s.plies === 4)).toBe(true);
    expect(listSizes(DFL2).some((s) => s.id === '6x10')).toBe(true);
    // No Table 4D values are held for Southern Pine, so no 6x sizes are offered.
    expect(listSizes(SP2).some((s) => s.nominal.startsWith('6x'))).toBe(false);
    // Stud grade is graded to 6 in wide (NDS Supplement 2018 Table 4A).
    expect(listSizes('sawn-spruce-pine-fir-stud').map((s) => s.nominal)).not.toContain('2x8');
  });

  it('glulam and LVL sizes are rectangles b·d, b·d²/6, b·d³/12 with labelled fractions', () => {
    const glulam = getSize('glulam-24f-1.8e-western', '5.125x12');
    expect(glulam.label).toBe('5-1/8 x 12');
    expectApprox(glulam.sxIn3, (5.125 * 144) / 6, { rel: 1e-12 });
    const lvl = getSize('lvl-2.0e', '2-ply-1.75x11.875');
    expect(lvl.label).toBe('2-ply 1-3/4 x 11-7/8');
    expectApprox(lvl.ixIn4, (3.5 * 11.875 ** 3) / 12, { rel: 1e-12 });
    expect(inchFraction(9.625)).toBe('9-5/8');
  });

  it('size lists are shared, frozen and not rebuilt between calls', () => {
    const a = listSizes(DFL2);
    expect(listSizes(DFL2)).toBe(a);
    expect(Object.isFrozen(a)).toBe(true);
    expect(Object.isFrozen(a[0])).toBe(true);
  });
});

describe('reference values', () => {
  // NDS Supplement 2018 Table 4B, Southern Pine No.2 (REFERENCES.md): F_b 925 / 800 / 750 psi for 2x8 / 2x10 / 2x12.
  it.each([
    ['2x8', 925],
    ['2x10', 800],
    ['2x12', 750],
    ['3-ply-2x12', 750],
  ])('Southern Pine No.2 %s: F_b %i psi (size-specific)', (sizeId, fb) => {
    expect(referenceValues(SP2, getSize(SP2, sizeId)).FbPsi).toBe(fb);
  });

  it('a measured depth between dressed sizes takes the wider (lower) Southern Pine row', () => {
    const measured = { ...getSize(SP2, '2x10'), id: 'measured', dIn: 10 };
    expect(referenceValues(SP2, measured).FbPsi).toBe(750);
  });

  it('Table 4A values are the same for every width (C_F applied separately): DF-L No.2 F_b 900, E 1.6e6', () => {
    for (const size of listSizes(DFL2).filter((s) => s.bIn / s.plies < 5)) {
      expect(referenceValues(DFL2, size)).toMatchObject({ FbPsi: 900, EPsi: 1_600_000, EminPsi: 580_000 });
    }
  });

  it('6x sizes use Table 4D: 6x10 Beams and Stringers, 6x6 Posts and Timbers (from memory)', () => {
    expect(referenceValues(DFL2, getSize(DFL2, '6x10')).FbPsi).toBe(875);
    expect(referenceValues(DFL2, getSize(DFL2, '6x6')).FcPsi).toBe(700);
  });

  it('glulam returns F_bx+ and LVL its generic values', () => {
    const glulam = referenceValues('glulam-24f-v4-df', getSize('glulam-24f-v4-df', '5.125x12'));
    expect(glulam).toMatchObject({ FbPsi: 2400, FvPsi: 265, FcPerpPsi: 650, EPsi: 1_800_000 });
    expect(referenceValues('lvl-2.0e', getSize('lvl-2.0e', '1.75x11.875')).EPsi).toBe(2_000_000);
  });
});

describe('weakest grade', () => {
  it('is No.3 where Table 4A lists it, and takes ids or labels', () => {
    expect(weakestGrade('douglas-fir-larch').id).toBe('sawn-douglas-fir-larch-no3');
    expect(weakestGrade('Hem-Fir').grade).toBe('No.3');
    expect(weakestGrade('spruce-pine-fir').grade).toBe('No.3');
  });

  it('is No.3 for Southern Pine too, now that Table 4B No.3 is held (from memory)', () => {
    expect(weakestGrade('southern-pine').grade).toBe('No.3');
  });

  it('throws a field error for an unknown species', () => {
    expect(() => weakestGrade('balsa')).toThrow(expect.objectContaining({ field: 'species' }));
  });
});

describe('catalogue reach', () => {
  it('offers Spruce-Pine-Fir Select Structural, No.3 and Stud; Southern Pine No.3 and Stud; DF-L and Hem-Fir No.3', () => {
    const ids = listMaterials('sawn').map((m) => m.id);
    expect(ids).toEqual(
      expect.arrayContaining([
        'sawn-spruce-pine-fir-select-structural',
        'sawn-spruce-pine-fir-no3',
        'sawn-spruce-pine-fir-stud',
        'sawn-southern-pine-no3',
        'sawn-southern-pine-stud',
        'sawn-douglas-fir-larch-no3',
        'sawn-hem-fir-no3',
      ]),
    );
  });

  it('offers 4x14 and 4x16 (NDS Supplement 2018 Table 1B: 3-1/2 × 13-1/4 and 3-1/2 × 15-1/4 in)', () => {
    expect(getSize(DFL2, '4x14')).toMatchObject({ bIn: 3.5, dIn: 13.25 });
    expect(getSize(SP2, '4x16')).toMatchObject({ bIn: 3.5, dIn: 15.25 });
  });

  it('offers timbers to 6x16 and 8x16, Beams and Stringers or Posts and Timbers by Table 4D (from memory)', () => {
    for (const id of ['6x14', '6x16', '8x8', '8x10', '8x12', '8x14', '8x16'])
      expect(getSize(DFL2, id).plies).toBe(1);
    // Beams and Stringers: width more than 2 in (nominal) over the thickness (8x12, 6x16); Posts and Timbers
    // otherwise (8x8, 8x10). DF-L No.2: B&S F_b 875, P&T F_b 750 (Table 4D, from memory).
    expect(referenceValues(DFL2, getSize(DFL2, '8x12')).FbPsi).toBe(875);
    expect(referenceValues(DFL2, getSize(DFL2, '6x16')).FbPsi).toBe(875);
    expect(referenceValues(DFL2, getSize(DFL2, '8x10')).FbPsi).toBe(750);
    expect(referenceValues(DFL2, getSize(DFL2, '8x8')).FbPsi).toBe(750);
  });
});

describe('unknown grade falls to the true weakest grade for the size', () => {
  it('is Southern Pine No.3 now that No.3 is held (Table 4B, from memory)', () => {
    expect(unknownGradeMaterial(SP2, '2x10').grade).toBe('No.3');
  });

  it('is Stud for a DF-L 2x4 and No.3 for a 2x6 (F_b·C_F: Stud 700 × 1.1 < No.3 525 × 1.5; No.3 525 × 1.3 < Stud 700 × 1.0)', () => {
    // NDS Supplement 2018 Table 4A values and size factors (No.3 and Stud from memory).
    expect(unknownGradeMaterial(DFL2, '2x4').grade).toBe('Stud');
    expect(unknownGradeMaterial(DFL2, '2x6').grade).toBe('No.3');
    expect(unknownGradeMaterial(DFL2, '2-ply-2x10').grade).toBe('No.3');
  });

  it('is No.2 for a timber (Table 4D holds Select Structural to No.2 only)', () => {
    expect(unknownGradeMaterial(DFL2, '6x12').grade).toBe('No.2');
  });
});
