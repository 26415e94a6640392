import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { columnBucklingCoefficient, columnStabilityFactor } from '@/lib/calc/factors';

describe('column stability factor C_P (NDS 2018 §3.7.1)', () => {
  // HUD Residential Structural Design Guide (2000), Example 5.6: 4x4 SPF No.2, 7.3 ft, C_D 1.0 →
  // C_P 0.4378. Inputs: F_c 1150 psi × C_F 1.15 (NDS Supplement Table 4A), E_min 510,000 psi, d 3.5 in.
  it('reproduces HUD RSDG Example 5.6', () => {
    const result = columnStabilityFactor({
      leIn: 7.3 * 12,
      dIn: 3.5,
      FcStarPsi: 1150 * 1.15,
      EminAdjPsi: 510_000,
      c: columnBucklingCoefficient('sawn'),
    });
    expectApprox(result.CP, 0.4378, { abs: 0.0005 }); // HUD RSDG Example 5.6
    expectApprox(result.slenderness, 25.03, { abs: 0.01 });
    expect(result.withinSlendernessLimit).toBe(true);
  });

  it('uses c = 0.8 for sawn lumber and 0.9 for glulam and SCL (NDS 3.7.1.5)', () => {
    expect([
      columnBucklingCoefficient('sawn'),
      columnBucklingCoefficient('glulam'),
      columnBucklingCoefficient('lvl'),
    ]).toEqual([0.8, 0.9, 0.9]);
  });

  it('limits l_e/d to 50, or 75 during construction (NDS 3.7.1.4)', () => {
    const base = { leIn: 96, dIn: 1.5, FcStarPsi: 1500, EminAdjPsi: 510_000, c: 0.8 };
    expect(columnStabilityFactor(base).withinSlendernessLimit).toBe(false);
    expect(columnStabilityFactor({ ...base, duringConstruction: true }).withinSlendernessLimit).toBe(true);
  });

  it('approaches 1.0 for a stocky column and stays in (0, 1]', () => {
    const stocky = columnStabilityFactor({ leIn: 6, dIn: 5.5, FcStarPsi: 700, EminAdjPsi: 470_000, c: 0.8 });
    expect(stocky.CP).toBeGreaterThan(0.99);
    expect(stocky.CP).toBeLessThanOrEqual(1);
  });
});
