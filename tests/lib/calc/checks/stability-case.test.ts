import { describe, expect, it } from 'vitest';
import { checkMember, prepareMember } from '@/lib/calc/checks';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const base: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-16',
  clearSpanFt: 16,
  sources: [],
  materialId: 'sawn-douglas-fir-larch-no2',
  sizeId: '2-ply-2x12',
  unbracedLengthFt: 16,
};

const input = (sources: MemberCheckInputBody['sources']) =>
  memberCheckInputSchema.parse({ ...base, sources });

describe('Table 3.3.3 row chosen for C_L (NDS 2018 §3.3.3)', () => {
  it('a uniform load over the whole span takes the "uniformly distributed load" row', () => {
    const prepared = prepareMember(input([{ kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 }]));
    expect(prepared.stabilityCase).toBe('uniform');
  });

  it('a partial uniform load takes the "any other load" row: l_e = 1.84 l_u when l_u/d > 14.3', () => {
    const member = input([
      { kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 },
      { kind: 'floor', tributaryFt: 6, deadPsf: 10, livePsf: 40, startFt: 2, endFt: 9 },
    ]);
    expect(prepareMember(member).stabilityCase).toBe('any');
    const bending = checkMember(member).checks.find((c) => c.id === 'bending');
    const note = bending?.factors.find((f) => f.symbol === 'C_L')?.note ?? '';
    const leIn = Number(/l_e ([\d.,]+) in/.exec(note)?.[1]?.replace(',', '') ?? NaN);
    // NDS 2018 Table 3.3.3, single span with any load, l_u/d = 192/11.25 = 17.1 > 14.3: l_e = 1.84 l_u.
    expectApprox(leIn, 1.84 * 16 * 12, { abs: 0.05 });
  });

  it('point loads with a uniform load take the "any other load" row', () => {
    const prepared = prepareMember(
      input([
        { kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 },
        { kind: 'point', pointKind: 'post-above', atFt: 8, deadLb: 500 },
      ]),
    );
    expect(prepared.stabilityCase).toBe('any');
  });
});
