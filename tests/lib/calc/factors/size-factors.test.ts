import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { bendingSizeFactor, glulamVolumeFactor, lvlDepthFactor, sawnSizeFactors } from '@/lib/calc/factors';
import { getSize } from '@/lib/calc/materials';

const SPF = 'sawn-spruce-pine-fir-no1-no2';
const DFL = 'sawn-douglas-fir-larch-no2';
const SP = 'sawn-southern-pine-no2';

describe('sawn size factor C_F (NDS Supplement 2018 Table 4A / 4B / 4D)', () => {
  // REFERENCES.md (Table 4A, 2 in and 3 in thick): F_b 2x4 1.5, 2x6 1.3, 2x8 1.2, 2x10 1.1, 2x12 1.0.
  it.each([
    ['2x4', 1.5],
    ['2x6', 1.3],
    ['2x8', 1.2],
    ['2x10', 1.1],
    ['2x12', 1.0],
    ['3-ply-2x10', 1.1],
  ])('Table 4A F_b %s: %f', (sizeId, fb) => {
    expect(sawnSizeFactors(DFL, getSize(DFL, sizeId)).fb).toBe(fb);
  });

  it('4 in thick members take the 4 in column (Table 4A, from memory): 4x8 1.3, 4x12 1.1, 4x16 1.0', () => {
    expect(['4x8', '4x12', '4x16'].map((id) => sawnSizeFactors(DFL, getSize(DFL, id)).fb)).toEqual([
      1.3, 1.1, 1.0,
    ]);
  });

  it('F_c of a 4x4 is × 1.15 (Table 4A; HUD RSDG Example 5.6 uses 1.15)', () => {
    expect(sawnSizeFactors(SPF, getSize(SPF, '4x4')).fc).toBe(1.15);
  });

  it('Southern Pine is 1.0 to 12 in, × 1.1 on F_b for 4 in thick 8 in and wider, × 0.9 beyond 12 in (Table 4B)', () => {
    expect(sawnSizeFactors(SP, getSize(SP, '2x10'))).toEqual({ fb: 1, ft: 1, fc: 1 });
    expect(sawnSizeFactors(SP, getSize(SP, '4x10')).fb).toBe(1.1);
    expect(sawnSizeFactors(SP, getSize(SP, '4x16'))).toEqual({ fb: 0.9, ft: 0.9, fc: 0.9 });
  });

  it('timbers 12 in deep or less take 1.0; deeper ones (12/d)^(1/9) (NDS 4.3.6.2)', () => {
    expect(sawnSizeFactors(DFL, getSize(DFL, '6x12')).fb).toBe(1);
    const deep = { ...getSize(DFL, '6x12'), id: 'measured-6x16', dIn: 15.5 };
    expectApprox(sawnSizeFactors(DFL, deep).fb, (12 / 15.5) ** (1 / 9), { rel: 1e-12 });
  });

  it('refuses glulam and LVL', () => {
    expect(() => sawnSizeFactors('lvl-2.0e', getSize('lvl-2.0e', '1.75x11.875'))).toThrow(
      expect.objectContaining({ field: 'materialId' }),
    );
  });
});

describe('glulam volume factor C_V (NDS 2018 §5.3.6)', () => {
  // AWC TR10 (2018) Example 1: 6-3/4 × 13-1/2 glulam, 18 ft → C_V 0.98 (printed to two places), F'_b 2343 psi
  // (F_bx+ 2400 psi, C_D 1.0). C_V = (21/18)^(1/10) (12/13.5)^(1/10) (5.125/6.75)^(1/10).
  it('reproduces AWC TR10 Example 1', () => {
    const CV = glulamVolumeFactor({ spanFt: 18, dIn: 13.5, bIn: 6.75, speciesGroup: 'western' });
    expectApprox(CV, 0.98, { abs: 0.005 }); // TR10 Example 1
    expectApprox(2400 * CV, 2343, { abs: 1 }); // TR10 Example 1 F'_b
  });

  it('uses exponent 1/20 for Southern Pine, caps at 1.0 and at b = 10.75 in', () => {
    const sp = glulamVolumeFactor({ spanFt: 30, dIn: 24, bIn: 6.75, speciesGroup: 'southern-pine' });
    expectApprox(sp, ((21 / 30) * (12 / 24) * (5.125 / 6.75)) ** (1 / 20), { rel: 1e-12 });
    expect(glulamVolumeFactor({ spanFt: 10, dIn: 9, bIn: 3.125, speciesGroup: 'western' })).toBe(1);
    expect(glulamVolumeFactor({ spanFt: 30, dIn: 24, bIn: 14, speciesGroup: 'western' })).toBe(
      glulamVolumeFactor({ spanFt: 30, dIn: 24, bIn: 10.75, speciesGroup: 'western' }),
    );
  });
});

describe('LVL depth factor and the bending size factor dispatcher', () => {
  it('is (12/d)^n with the grade exponent (NDS 2018 §8.3.6; generic n 0.136)', () => {
    expectApprox(lvlDepthFactor(16, 0.136), (12 / 16) ** 0.136, { rel: 1e-12 });
    expect(lvlDepthFactor(12, 0.136)).toBe(1);
  });

  it('names C_F for sawn, C_V for glulam and LVL', () => {
    expect(bendingSizeFactor(DFL, getSize(DFL, '2x10'), 10)).toMatchObject({ symbol: 'C_F', value: 1.1 });
    const glulam = bendingSizeFactor('glulam-24f-v4-df', getSize('glulam-24f-v4-df', '6.75x13.5'), 18);
    expect(glulam.symbol).toBe('C_V');
    expectApprox(glulam.value, 0.9764, { abs: 0.0005 }); // AWC TR10 Example 1 inputs
    const lvl = bendingSizeFactor('lvl-2.0e', getSize('lvl-2.0e', '1.75x16'), 16);
    expectApprox(lvl.value, (12 / 16) ** 0.136, { rel: 1e-12 });
  });
});
