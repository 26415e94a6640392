import { describe, expect, it } from 'vitest';
import { checkMember, jackStuds } from '@/lib/calc/checks';
import { getSize } from '@/lib/calc/materials';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const LVL = 'lvl-2.0e';
const SIZE = '2-ply-1.75x11.875';
/** Generic LVL 2.0E: E = 2.0e6 psi (tables/lvl/generic-grades.ts, confirm with the manufacturer). */
const EI = 2.0e6 * getSize(LVL, SIZE).ixIn4;

const check = (body: Omit<MemberCheckInputBody, 'kind' | 'materialId' | 'sizeId'>) =>
  checkMember(
    memberCheckInputSchema.parse({ kind: 'beam', materialId: LVL, sizeId: SIZE, selfWeight: false, ...body }),
  );

describe('demands of each combination: simple span, uniform load (AWC Design Aid No. 6 case 1)', () => {
  // Floor 10 ft tributary, 12 psf dead and 40 psf live: w_D 120 plf, w_L 400 plf; 3 in bearings give a design
  // span of 12.25 ft for 12 ft clear.
  const result = check({
    edition: 'ASCE 7-16',
    clearSpanFt: 12,
    sources: [{ kind: 'floor', tributaryFt: 10, deadPsf: 12, livePsf: 40 }],
  });
  const l = 12.25;
  const wD = 120;
  const wL = 400;
  const dPlusL = result.demands?.byCombination.find((d) => d.combination === 'D + L');

  it('reactions wl/2 at each support, one combination together', () => {
    expect(dPlusL?.reactions.map((r) => r.support)).toEqual(['left', 'right']);
    for (const r of dPlusL?.reactions ?? []) expectApprox(r.lb, ((wD + wL) * l) / 2, { rel: 1e-12 });
    expectApprox(dPlusL?.reactions[1].atFt ?? NaN, l, { rel: 1e-12 });
  });

  it('M_max = wl²/8 at midspan; V_max = wl/2 at the support; V at d = w(l/2 − d) (NDS 3.4.3.1)', () => {
    expectApprox(dPlusL?.maxMoment.lbFt ?? NaN, ((wD + wL) * l * l) / 8, { rel: 1e-12 });
    expectApprox(dPlusL?.maxMoment.atFt ?? NaN, l / 2, { rel: 1e-9 });
    expectApprox(Math.abs(dPlusL?.maxShear.lb ?? NaN), ((wD + wL) * l) / 2, { rel: 1e-12 });
    const dFt = 11.875 / 12;
    expectApprox(dPlusL?.designShear.lb ?? NaN, (wD + wL) * (l / 2 - dFt), { rel: 1e-12 });
    expect(dPlusL?.designShear.atD).toBe(true);
  });

  it('Δ = 5wl⁴/384EI at midspan: live, plain elastic total, and total with creep K_cr 1.5 (NDS 3.5.2)', () => {
    const delta = (w: number) => (5 * w * l ** 4 * 1728) / (384 * EI);
    expectApprox(dPlusL?.deflectionLive.in ?? NaN, delta(wL), { rel: 1e-9 });
    expectApprox(dPlusL?.deflectionTotalElastic.in ?? NaN, delta(wD + wL), { rel: 1e-9 });
    expectApprox(dPlusL?.deflectionTotal.in ?? NaN, delta(1.5 * wD + wL), { rel: 1e-9 });
    for (const d of [dPlusL?.deflectionLive, dPlusL?.deflectionTotalElastic, dPlusL?.deflectionTotal])
      expectApprox(d?.atFt ?? NaN, l / 2, { rel: 1e-6 });
  });

  it('the governing demands are those of the governing check’s combination', () => {
    expect(result.demands?.governing.combination).toBe(result.governing.combination);
    expect(result.demands?.byCombination.map((d) => d.combination)).toEqual(
      result.combinations.filter((c) => !c.skipped).map((c) => c.name),
    );
  });

  it('gives the largest reaction at each end with the combination that gives it', () => {
    const [left, right] = result.reactions.bySupport ?? [];
    expect(left.largestCombination).toBe('D + L');
    expectApprox(left.largestLb, ((wD + wL) * l) / 2, { rel: 1e-12 });
    expectApprox(right.largestLb, ((wD + wL) * l) / 2, { rel: 1e-12 });
    expect(left.leastCombination).toBe('D');
    expectApprox(left.leastLb, (wD * l) / 2, { rel: 1e-12 });
  });
});

describe('demands under a point load off centre (AWC Design Aid No. 6 case 8)', () => {
  // P = 3,000 lb live at a = 4 ft of a 12 ft design span (bearings 0 + 0 would be refused, so the 3 in
  // bearings are taken out: clear 11.75 ft, load at 3.875 ft from the face = 4 ft from the support centre).
  const P = 3000;
  const l = 12;
  const a = 4;
  const b = l - a;
  const result = check({
    edition: 'ASCE 7-16',
    clearSpanFt: 11.75,
    sources: [{ kind: 'point', pointKind: 'post-above', atFt: a - 0.125, liveLb: P }],
  });
  const dPlusL = result.demands?.byCombination.find((d) => d.combination === 'D + L');

  it('R1 = Pb/l and R2 = Pa/l in one combination, summing to P', () => {
    expectApprox(dPlusL?.reactions[0].lb ?? NaN, (P * b) / l, { rel: 1e-12 });
    expectApprox(dPlusL?.reactions[1].lb ?? NaN, (P * a) / l, { rel: 1e-12 });
  });

  it('M_max = Pab/l at the load; Δ_max = Pab(a + 2b)√(3a(a + 2b))/27EIl at x = √(a(a + 2b)/3) from the far end', () => {
    expectApprox(dPlusL?.maxMoment.lbFt ?? NaN, (P * a * b) / l, { rel: 1e-12 });
    expectApprox(dPlusL?.maxMoment.atFt ?? NaN, a, { rel: 1e-12 });
    // Case 8 with a < b: the largest deflection lies in the longer segment, √(b(b + 2a)/3) from the right end.
    const xFromRight = Math.sqrt((b * (b + 2 * a)) / 3);
    const deltaMax = ((P * a * b * (b + 2 * a) * Math.sqrt(3 * b * (b + 2 * a))) / (27 * EI * l)) * 1728;
    expectApprox(dPlusL?.deflectionLive.atFt ?? NaN, l - xFromRight, { rel: 1e-6 });
    expectApprox(dPlusL?.deflectionLive.in ?? NaN, deltaMax, { rel: 1e-9 });
  });
});

describe('jack studs: what bearing needs and what common practice adds', () => {
  it('adds a second stud over a 6 ft clear span when bearing needs one, and says why', () => {
    const jacks = jackStuds(1.2, 8);
    expect(jacks).toMatchObject({ count: 2, forBearing: 1, addedByPractice: 1 });
    expect(jacks.note).toContain('Bearing needs 1 jack stud');
    expect(jacks.note).toContain('common practice adds 1');
  });

  it('adds nothing when bearing needs more than practice asks', () => {
    const jacks = jackStuds(3.9, 8);
    expect(jacks).toMatchObject({ count: 3, forBearing: 3, addedByPractice: 0 });
    expect(jacks.note).not.toContain('common practice');
  });

  it('is in the member result', () => {
    const result = check({
      edition: 'ASCE 7-16',
      clearSpanFt: 8,
      sources: [{ kind: 'floor', tributaryFt: 2, deadPsf: 10, livePsf: 40 }],
    });
    expect(result.bearing.jackStudsForBearing).toBe(1);
    expect(result.bearing.jackStudsAddedByPractice).toBe(1);
    expect(result.bearing.jackStuds).toBe(2);
  });
});
