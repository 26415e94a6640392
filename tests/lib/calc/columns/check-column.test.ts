import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { checkColumn } from '@/lib/calc/columns';
import { getSize } from '@/lib/calc/materials';

const SPF = 'sawn-spruce-pine-fir-no1-no2';
const DFL2 = 'sawn-douglas-fir-larch-no2';

describe('post check (NDS 2018 §3.7, §15.3)', () => {
  // HUD Residential Structural Design Guide (2000), Example 5.6: 4x4 SPF No.2, 7.3 ft, 4,800 lb, C_D 1.0 →
  // C_P 0.4378, F'_c 579.0 psi, f_c 391.8 psi, ratio 0.677.
  it('reproduces HUD RSDG Example 5.6', () => {
    const result = checkColumn({ materialId: SPF, sizeId: '4x4', heightFt: 7.3, loadLb: 4800, CD: 1 });
    const CP = result.factors.find((f) => f.symbol === 'C_P')?.value ?? NaN;
    expectApprox(CP, 0.4378, { abs: 0.0005 }); // HUD RSDG Example 5.6
    expectApprox(result.FcPrimePsi, 579.0, { abs: 0.5 }); // HUD RSDG Example 5.6
    expectApprox(result.fcPsi, 391.8, { abs: 0.05 }); // HUD RSDG Example 5.6
    expectApprox(result.ratio, 0.677, { abs: 0.001 }); // HUD RSDG Example 5.6
    expect(result.pass).toBe(true);
    expect(result.factors.find((f) => f.symbol === 'C_F')?.value).toBe(1.15);
  });

  // Hand calculation (NDS 2018 eq. 3.7-1 and §15.3.2, K_f = 0.6 nailed): 3-ply 2x6 DF-L No.2, 8 ft, C_D 1.0.
  // F_c* = 1350 × 1.1 = 1485 psi, E_min 580,000 psi. Across b (4.5 in): l_e/d 21.33, F_cE 1047.6 psi,
  // C_P 0.5616, × 0.6 = 0.3369; across d (5.5 in): l_e/d 17.45, C_P 0.7088. F'_c = 1485 × 0.3369 = 500.4 psi.
  it('checks a nailed built-up post across the plies with K_f = 0.6', () => {
    const result = checkColumn({ materialId: DFL2, sizeId: '3-ply-2x6', heightFt: 8, loadLb: 6000, CD: 1 });
    const acrossB = result.axes.find((a) => a.axis === 'across-b');
    const acrossD = result.axes.find((a) => a.axis === 'across-d');
    expectApprox(acrossB?.CP ?? NaN, 0.5616, { abs: 0.0005 });
    expectApprox(acrossB?.CPUsed ?? NaN, 0.3369, { abs: 0.0005 });
    expectApprox(acrossD?.CP ?? NaN, 0.7088, { abs: 0.0005 });
    expect(result.governingAxis.axis).toBe('across-b');
    expect(result.factors.find((f) => f.symbol === 'K_f')?.value).toBe(0.6);
    expectApprox(result.FcPrimePsi, 500.4, { abs: 0.5 });
    expectApprox(result.capacityLb, 500.4 * 3 * 8.25, { rel: 0.001 });
    expect(result.warnings.some((w) => w.includes('NDS 15.3.3'))).toBe(true);
  });

  it('bolted plies take K_f = 0.75 (NDS 15.3.2.2) and carry more', () => {
    const nailed = checkColumn({ materialId: DFL2, sizeId: '3-ply-2x6', heightFt: 8, loadLb: 6000, CD: 1 });
    const bolted = checkColumn({
      materialId: DFL2,
      sizeId: '3-ply-2x6',
      heightFt: 8,
      loadLb: 6000,
      CD: 1,
      fastening: 'bolted',
    });
    expect(bolted.capacityLb).toBeGreaterThan(nailed.capacityLb);
  });

  it('bracing across b leaves only buckling across d', () => {
    const braced = checkColumn({
      materialId: DFL2,
      sizeId: '2x6',
      heightFt: 8,
      loadLb: 2000,
      CD: 1,
      weakAxisBraced: true,
    });
    expect(braced.axes.map((a) => a.axis)).toEqual(['across-d']);
  });

  it('fails a post past l_e/d = 50 whatever the load (NDS 3.7.1.4)', () => {
    const slender = checkColumn({ materialId: DFL2, sizeId: '2x6', heightFt: 8, loadLb: 1, CD: 1 });
    expect(slender.pass).toBe(false);
    expect(slender.warnings.some((w) => w.includes('exceeds 50'))).toBe(true);
  });

  it('accepts a measured size and rejects bad input with a field name', () => {
    const measured = { ...getSize(DFL2, '4x4'), id: 'measured', bIn: 3.75, dIn: 3.75, areaIn2: 14.0625 };
    expect(checkColumn({ materialId: DFL2, size: measured, heightFt: 8, loadLb: 3000, CD: 1 }).areaIn2).toBe(
      14.0625,
    );
    expect(() => checkColumn({ materialId: DFL2, sizeId: '4x4', heightFt: 0, loadLb: 1, CD: 1 })).toThrow(
      expect.objectContaining({ field: 'heightFt' }),
    );
    expect(() => checkColumn({ materialId: DFL2, heightFt: 8, loadLb: 1, CD: 1 })).toThrow(
      expect.objectContaining({ field: 'sizeId' }),
    );
  });
});
