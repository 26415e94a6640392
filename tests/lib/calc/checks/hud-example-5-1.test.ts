import { describe, it } from 'vitest';
import { checkMember, sectionFactors } from '@/lib/calc/checks';
import { DEFLECTION_PRESETS } from '@/lib/calc/checks/deflection-presets';
import { asdCombinations } from '@/lib/calc/loads';
import { getSize } from '@/lib/calc/materials';
import { uniformSpanLimits } from '@/lib/calc/span-table/uniform-span-limits';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

// HUD Residential Structural Design Guide (2000), Example 5.1: 2x8 Hem-Fir No.1 floor joists at 16 in on
// centre, 30 psf live + 10 psf dead (joists included), repetitive (C_r 1.15), 2 in bearing, L/360 live.
const MATERIAL = 'sawn-hem-fir-no1';
const SIZE = getSize(MATERIAL, '2x8');
const TRIB_FT = 16 / 12;
const dry = { wetService: false, temperatureF: 70, incised: false, flatUse: false, repetitive: true };

describe('HUD RSDG Example 5.1 (2x8 Hem-Fir No.1 joists)', () => {
  const section = sectionFactors(MATERIAL, SIZE, 14, dry);
  const limits = uniformSpanLimits(MATERIAL, SIZE, section, {
    wPlfByType: { D: 10 * TRIB_FT, L: 30 * TRIB_FT, Lr: 0, S: 0 },
    combinations: asdCombinations('ASCE 7-16'),
    selfWeightPlf: 0,
    preset: DEFLECTION_PRESETS.floor,
    deflectionCapIn: null,
    creepKcr: 1.5,
    sustainedLiveFraction: 0,
    shearAtD: false,
    bearingIn: 2,
    support: { kind: 'post', widthIn: 3.5, plateFcPerpPsi: null },
  });

  it("F'_b = 975 × C_F 1.2 × C_r 1.15 = 1345 psi", () => {
    expectApprox(section.FbBasePsi, 1345, { abs: 1 }); // HUD RSDG Example 5.1: F'_b = 1,345 psi
  });

  it('span limited by bending 14.865 ft, shear 40.8 ft, bearing 45.6 ft, deflection 13.8 ft', () => {
    expectApprox(limits.byCheck.bending, 14.865, { abs: 0.005 }); // HUD RSDG Example 5.1: 14.865 ft
    expectApprox(limits.byCheck.shear, 40.8, { abs: 0.05 }); // HUD RSDG Example 5.1: 40.8 ft
    expectApprox(limits.byCheck.bearing, 45.6, { abs: 0.05 }); // HUD RSDG Example 5.1: 45.6 ft (2 in bearing)
    expectApprox(limits.byCheck['deflection-live'], 13.8, { abs: 0.05 }); // HUD RSDG Example 5.1: 13.8 ft (L/360)
  });

  it('the member check at the bending-limited span reports a bending ratio of 1.0 and the same four limits', () => {
    const bearingIn = 2;
    const designSpanFt = limits.byCheck.bending;
    const input = memberCheckInputSchema.parse({
      kind: 'beam',
      edition: 'ASCE 7-16',
      clearSpanFt: designSpanFt - bearingIn / 12,
      bearingLeftIn: bearingIn,
      bearingRightIn: bearingIn,
      sources: [{ kind: 'floor', tributaryFt: TRIB_FT, deadPsf: 10, livePsf: 30 }],
      selfWeight: false,
      materialId: MATERIAL,
      sizeId: '2x8',
      repetitive: true,
      shearAtD: false,
      supportKind: 'post',
      deflectionUse: 'floor',
    });
    const result = checkMember(input);
    const byId = Object.fromEntries(result.checks.map((c) => [c.id, c]));
    expectApprox(result.spans.designSpanFt, designSpanFt, { rel: 1e-12 });
    expectApprox(byId.bending.ratio, 1, { rel: 1e-9 }); // bending governs at 14.865 ft (HUD RSDG Example 5.1)
    expectApprox(byId.bending.capacity, 1345, { abs: 1 }); // F'_b 1,345 psi (HUD RSDG Example 5.1)
    // At 14.865 ft each other limit scales as (its span / 14.865) to the power of its formula (V ∝ L, R ∝ L, Δ/L ∝ L³).
    expectApprox(byId.shear.ratio, designSpanFt / 40.8, { rel: 2e-3 }); // shear limit 40.8 ft (HUD)
    expectApprox(byId.bearing.ratio, designSpanFt / 45.6, { rel: 2e-3 }); // bearing limit 45.6 ft (HUD)
    expectApprox(byId['deflection-live'].ratio, (designSpanFt / 13.8) ** 3, { rel: 1e-2 }); // L/360 limit 13.8 ft (HUD)
  });
});
