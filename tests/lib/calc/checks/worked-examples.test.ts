import { describe, it } from 'vitest';
import {
  checkMember,
  evaluateSize,
  prepareMember,
  sectionFactors,
  serviceConditions,
  supportSpec,
} from '@/lib/calc/checks';
import { getSize } from '@/lib/calc/materials';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const IN3_PER_FT3 = 1728;

function run(body: MemberCheckInputBody) {
  const input = memberCheckInputSchema.parse(body);
  const prepared = prepareMember(input);
  const size = getSize(input.materialId, input.sizeId);
  const section = sectionFactors(
    input.materialId,
    size,
    prepared.spans.designSpanFt,
    serviceConditions(input),
  );
  const evaluation = evaluateSize(prepared, section, size.selfWeightPlf, supportSpec(input).spec);
  const result = checkMember(input);
  const byId = Object.fromEntries(result.checks.map((c) => [c.id, c]));
  return { input, size, section, evaluation, result, byId };
}

describe('AWC Structural Wood Design Examples E1.2a: 4x16 DF-L Select Structural, 20 ft, centre point load, no bracing', () => {
  // Inputs as in E1.2a: 20 ft span, one concentrated load at midspan, no intermediate lateral support. The
  // published values below do not depend on the load's size; P = 2,000 lb live is this test's input.
  const P = 2000;
  const bearingIn = 3;
  const { size, section, evaluation, byId } = run({
    kind: 'beam',
    edition: 'ASCE 7-16',
    clearSpanFt: 20 - bearingIn / 12,
    sources: [{ kind: 'point', pointKind: 'post-above', atFt: 10 - bearingIn / 24, liveLb: P }],
    selfWeight: false,
    materialId: 'sawn-douglas-fir-larch-select-structural',
    sizeId: '4x16',
    unbracedLengthFt: 20,
    supportKind: 'post',
    supportWidthIn: 3.5,
  });

  it("beam stability: l_e 375 in, R_B 21.6, F_bE 1776 psi, C_L 0.876, F'_b 1313 psi", () => {
    const s = evaluation.bending.stability;
    expectApprox(s.leIn, 375, { abs: 0.5 }); // E1.2a: l_e = 1.37 l_u + 3d = 375 in
    expectApprox(s.RB, 21.6, { abs: 0.05 }); // E1.2a: R_B = 21.6
    expectApprox(s.FbEPsi ?? 0, 1776, { abs: 1 }); // E1.2a: F_bE = 1,776 psi
    expectApprox(s.CL, 0.876, { abs: 0.0005 }); // E1.2a: C_L = 0.876
    expectApprox(byId.bending.capacity, 1313, { abs: 1 }); // E1.2a: F'_b = 1,313 psi
  });

  it('demands follow AWC Design Aid No. 6 case 7 (centre point): M = Pl/4, V = P/2, Δ = Pl³/48EI, R = P/2', () => {
    const l = 20;
    expectApprox(byId.bending.demand, (((P * l) / 4) * 12) / size.sxIn3, { rel: 1e-9 }); // f_b = (Pl/4)/S
    expectApprox(byId.shear.demand, (1.5 * (P / 2)) / size.areaIn2, { rel: 1e-9 }); // f_v = 3V/2A, V = P/2
    const ei = 1_900_000 * size.ixIn4; // E = 1,900,000 psi (NDS Supplement Table 4A, DF-L SS)
    expectApprox(byId['deflection-live'].demand, ((P * l ** 3) / (48 * ei)) * IN3_PER_FT3, { rel: 1e-9 }); // Pl³/48EI
    expectApprox(byId.bearing.demand, P / 2 / (3.5 * 625), { rel: 1e-9 }); // R / (b·F_c⊥), F_c⊥ 625 psi (Table 4A)
    expectApprox(section.sizeFactor.value, 1, { abs: 0 }); // C_F = 1.0 for 4 in thick, 14 in and wider (NDS Supplement Table 4A)
  });
});

describe('AWC TR10 (2018) Example 1: glulam 6-3/4 x 13-1/2, 18 ft', () => {
  // Inputs as in the example's bending part: 24F-V4 Douglas Fir, 6-3/4 in × 13-1/2 in, 18 ft simple span,
  // braced top edge. Loads wD = 150 plf, wL = 600 plf are this test's inputs (C_V and F'_b do not depend on them).
  const wD = 150;
  const wL = 600;
  const bearingIn = 4;
  const { size, byId } = run({
    kind: 'beam',
    edition: 'ASCE 7-16',
    clearSpanFt: 18 - bearingIn / 12,
    bearingLeftIn: bearingIn,
    bearingRightIn: bearingIn,
    sources: [{ kind: 'floor', tributaryFt: 10, deadPsf: wD / 10, livePsf: wL / 10 }],
    selfWeight: false,
    materialId: 'glulam-24f-v4-df',
    sizeId: '6.75x13.5',
    supportKind: 'post',
    supportWidthIn: 6.75,
  });
  const l = 18;

  it("C_V 0.98 and F'_b 2343 psi", () => {
    const cv = byId.bending.factors.find((f) => f.symbol === 'C_V');
    expectApprox(cv?.value ?? 0, 0.98, { abs: 0.005 }); // TR10 Example 1: C_V = 0.98
    expectApprox(byId.bending.capacity, 2343, { abs: 1 }); // TR10 Example 1: F'_b = 2,343 psi
  });

  it('demands follow AWC Design Aid No. 6 case 1: M = wl²/8, V at d = w(l/2 − d), Δ = 5wl⁴/384EI, R = wl/2', () => {
    const w = wD + wL;
    const dFt = size.dIn / 12;
    expectApprox(byId.bending.demand, (((w * l * l) / 8) * 12) / size.sxIn3, { rel: 1e-9 });
    expectApprox(byId.shear.demand, (1.5 * w * (l / 2 - dFt)) / size.areaIn2, { rel: 1e-9 }); // NDS 3.4.3.1
    const ei = 1_800_000 * size.ixIn4; // E_x = 1,800,000 psi (NDS Supplement Table 5A, 24F-V4)
    expectApprox(byId['deflection-live'].demand, ((5 * wL * l ** 4) / (384 * ei)) * IN3_PER_FT3, {
      rel: 1e-9,
    });
    // Total with creep, K_cr = 1.5 on the dead load (NDS 2018 §3.5.2, glulam in dry service).
    expectApprox(
      byId['deflection-total'].demand,
      ((5 * (wL + 1.5 * wD) * l ** 4) / (384 * ei)) * IN3_PER_FT3,
      { rel: 1e-9 },
    );
    expectApprox(byId.bearing.demand, (w * l) / 2 / (6.75 * 650), { rel: 1e-9 }); // F_c⊥x 650 psi (Table 5A, from memory)
  });
});
