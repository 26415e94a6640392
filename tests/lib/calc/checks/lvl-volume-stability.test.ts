import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

// NDS 2018 §8.3.6 (structural composite lumber): when C_V ≤ 1.0 it is not applied together with C_L and the
// lesser of the two governs; when C_V > 1.0 both apply. Generic LVL 2.0E, F_b = 2,600 psi
// (tables/lvl/generic-grades.ts, generic values), top edge unbraced over 10 ft.
function bendingOf(sizeId: string) {
  const result = checkMember(
    memberCheckInputSchema.parse({
      kind: 'beam',
      edition: 'ASCE 7-16',
      clearSpanFt: 12,
      sources: [{ kind: 'floor', tributaryFt: 2, deadPsf: 10, livePsf: 40 }],
      materialId: 'lvl-2.0e',
      sizeId,
      unbracedLengthFt: 10,
    }),
  );
  const bending = result.checks.find((c) => c.id === 'bending');
  if (!bending) throw new Error('no bending check');
  const factor = (symbol: string) => bending.factors.find((f) => f.symbol === symbol)?.value ?? NaN;
  return { bending, CD: factor('C_D'), CL: factor('C_L'), CV: factor('C_V') };
}

describe("LVL F'_b with C_V and C_L (NDS 2018 §8.3.6)", () => {
  it('16 in deep (C_V = (12/16)^0.136 < 1): the lesser of C_L and C_V, not their product', () => {
    const { bending, CD, CL, CV } = bendingOf('1.75x16');
    expectApprox(CV, (12 / 16) ** 0.136, { rel: 1e-12 }); // generic depth factor (12/d)^n
    expect(CL).toBeLessThan(CV);
    expectApprox(bending.capacity, 2600 * CD * Math.min(CL, CV), { rel: 1e-12 });
  });

  it('9-1/4 in deep (C_V = (12/9.25)^0.136 > 1): C_L and C_V both apply', () => {
    const { bending, CD, CL, CV } = bendingOf('1.75x9.25');
    expect(CV).toBeGreaterThan(1);
    expectApprox(bending.capacity, 2600 * CD * CL * CV, { rel: 1e-12 });
  });
});
