import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { checkShoringWall } from '@/lib/calc/columns';

const SPF = 'sawn-spruce-pine-fir-no1-no2';

describe('temporary shoring wall', () => {
  // Hand calculation (NDS 2018 eq. 3.7-1, C_D 1.25 construction per Table 2.3.2, C_F 1.15 on F_c per
  // Table 4A): 2x4 SPF No.1/No.2 studs, 8 ft, blocking at mid-height. Across b: l_e/d = 48/1.5 = 32,
  // F_cE = 0.822 × 510,000 / 32² = 409.4 psi, F_c* = 1150 × 1.25 × 1.15 = 1653.1 psi, C_P 0.2334,
  // F'_c 385.9 psi, 2026 lb per stud; plate F_c⊥ 425 × 5.25 = 2231 lb. 600 plf × 16/12 = 800 lb per stud.
  it('matches the hand calculation for 2x4 studs with mid-height blocking', () => {
    const result = checkShoringWall({
      loadPlf: 600,
      studSpacingIn: 16,
      heightFt: 8,
      materialId: SPF,
      studSizeId: '2x4',
      weakAxisBracing: 'mid-height-blocking',
    });
    expectApprox(result.loadPerStudLb, 800, { rel: 1e-12 });
    expectApprox(result.columnCapacityLb, 2026, { abs: 1 });
    expectApprox(result.plateBearingCapacityLb, 2231.25, { abs: 0.01 });
    expect(result.governing).toBe('stud buckling');
    expectApprox(result.ratio, 800 / 2026, { abs: 0.001 });
    expectApprox(result.maxSpacingIn, (2026 * 12) / 600, { abs: 0.05 });
    expect(result.layoutSpacingIn).toBe(24);
    expect(result.pass).toBe(true);
    expect(result.factors.find((f) => f.symbol === 'C_D')?.value).toBe(1.25);
    expect(result.cautions.some((c) => c.includes('engineer'))).toBe(true);
  });

  it('without blocking the same studs carry less; sheathing removes the weak-axis check', () => {
    const base = { loadPlf: 600, studSpacingIn: 16, heightFt: 8, materialId: SPF, studSizeId: '2x4' };
    const none = checkShoringWall(base);
    const blocked = checkShoringWall({ ...base, weakAxisBracing: 'mid-height-blocking' });
    const sheathed = checkShoringWall({ ...base, weakAxisBracing: 'sheathing' });
    expect(none.columnCapacityLb).toBeLessThan(blocked.columnCapacityLb);
    expect(sheathed.axes.map((a) => a.axis)).toEqual(['across-d']);
  });

  it('gives no layout and fails when even 8 in spacing is too wide', () => {
    const result = checkShoringWall({
      loadPlf: 8000,
      studSpacingIn: 16,
      heightFt: 8,
      materialId: SPF,
      studSizeId: '2x4',
    });
    expect(result.pass).toBe(false);
    expect(result.layoutSpacingIn).toBeNull();
  });

  it('C_P and capacity never rise as the wall gets taller, and are never NaN (NDS 3.7.1)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 16, noNaN: true }),
        fc.double({ min: 0.01, max: 8, noNaN: true }),
        fc.constantFrom('none', 'mid-height-blocking', 'sheathing'),
        fc.constantFrom('2x4', '2x6'),
        (heightFt, extraFt, weakAxisBracing, studSizeId) => {
          const input = { loadPlf: 500, studSpacingIn: 16, materialId: SPF, studSizeId, weakAxisBracing };
          const short = checkShoringWall({ ...input, heightFt });
          const tall = checkShoringWall({ ...input, heightFt: heightFt + extraFt });
          const cpShort = short.factors.find((f) => f.symbol === 'C_P')?.value ?? NaN;
          const cpTall = tall.factors.find((f) => f.symbol === 'C_P')?.value ?? NaN;
          expect(Number.isNaN(cpShort) || Number.isNaN(cpTall)).toBe(false);
          expect(cpTall).toBeLessThanOrEqual(cpShort);
          expect(tall.capacityPerStudLb).toBeLessThanOrEqual(short.capacityPerStudLb);
        },
      ),
    );
  });

  it('rejects a zero spacing with a field name', () => {
    expect(() =>
      checkShoringWall({ loadPlf: 600, studSpacingIn: 0, heightFt: 8, materialId: SPF, studSizeId: '2x4' }),
    ).toThrow(expect.objectContaining({ field: 'studSpacingIn' }));
  });
});
