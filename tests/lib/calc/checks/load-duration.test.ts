import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const snowHeader = memberCheckInputSchema.parse({
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 7,
  roofPitchIn12: 6,
  snow: { groundSnowPsf: 50 },
  sources: [
    { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
  ],
  materialId: 'sawn-douglas-fir-larch-no2',
  sizeId: '2-ply-2x10',
});

describe('load duration factor C_D (NDS 2018 Table 2.3.2: never on F_c⊥ or E)', () => {
  const result = checkMember(snowHeader);
  const byId = Object.fromEntries(result.checks.map((c) => [c.id, c]));

  it('bending and shear list C_D; deflection and bearing never do', () => {
    expect(byId.bending.factors.map((f) => f.symbol)).toContain('C_D');
    expect(byId.shear.factors.map((f) => f.symbol)).toContain('C_D');
    for (const id of ['deflection-live', 'deflection-total', 'bearing']) {
      expect(byId[id].factors.map((f) => f.symbol)).not.toContain('C_D');
    }
  });

  it('C_D in the bending list is the governing combination’s: snow 1.15, roof live 1.25, live 1.0, dead 0.9', () => {
    const expected: Record<string, number> = {
      D: 0.9, // NDS 2018 Table 2.3.2: permanent
      'D + L': 1.0, // ten years (occupancy live)
      'D + Lr': 1.25, // seven days (roof live)
      'D + 0.7S': 1.15, // two months (snow)
      'D + 0.75L + 0.75Lr': 1.25,
      'D + 0.75L + 0.75(0.7S)': 1.15,
    };
    const cd = byId.bending.factors.find((f) => f.symbol === 'C_D')?.value ?? NaN;
    expectApprox(cd, expected[byId.bending.combination], { abs: 0 });
  });

  it("bearing capacity is the same whatever the combination: F'_c⊥ carries no C_D", () => {
    const longTerm = checkMember({ ...snowHeader, snow: undefined, sources: [snowHeader.sources[1]] });
    const bearingA = result.checks.find((c) => c.id === 'bearing');
    const bearingB = longTerm.checks.find((c) => c.id === 'bearing');
    // required length / reaction = 1 / (width · F'_c⊥): equal when F'_c⊥ does not depend on the combination
    const perLbA = (bearingA?.demand ?? 0) / Math.max(result.reactions.leftLb, result.reactions.rightLb);
    const perLbB = (bearingB?.demand ?? 0) / Math.max(longTerm.reactions.leftLb, longTerm.reactions.rightLb);
    expectApprox(perLbA, perLbB, { rel: 1e-12 });
  });
});
