import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { getSize } from '@/lib/calc/materials';
import { buildShortlist } from '@/lib/calc/shortlist';
import { CalcInputError } from '@/lib/calc/types';
import { listMaterials } from '@/lib/calc/materials';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import {
  memberCheckInputSchema,
  memberCheckResultSchema,
  type MemberCheckInputBody,
} from '@/shared/schemas/calc/member';
import { shortlistInputSchema } from '@/shared/schemas/calc/shortlist';
import { expectApprox } from '@/tests/helpers/approx';

const LVL = 'lvl-2.0e';
const SIZE = '3-ply-1.75x11.875';
/** Generic LVL 2.0E: E = 2.0e6 psi (tables/lvl/generic-grades.ts; confirm with the manufacturer). */
const EI = 2.0e6 * getSize(LVL, SIZE).ixIn4;

const check = (body: Partial<MemberCheckInputBody>, diagrams = false) =>
  checkMember(
    memberCheckInputSchema.parse({
      kind: 'beam',
      edition: 'ASCE 7-16',
      materialId: LVL,
      sizeId: SIZE,
      selfWeight: false,
      ...body,
    }),
    { diagrams },
  );

describe('a beam continuous over a centre post, two equal spans (AWC Design Aid No. 6)', () => {
  // Clear spans 9 ft 9 in each, 3 in end bearings and a 3 in centre bearing: design spans 10 ft each.
  const l = 10;
  const wD = 10 * 12;
  const wL = 10 * 40;
  const body = {
    clearSpanFt: 9.75,
    secondClearSpanFt: 9.75,
    centreBearingIn: 3,
    sources: [{ kind: 'floor' as const, tributaryFt: 10, deadPsf: 12, livePsf: 40 }],
  };
  const result = check(body, true);

  it('puts 1.25wl on the centre post and 3wl/8 on each end under full load', () => {
    const full = result.demands?.byCombination.find((d) => d.combination === 'D + L');
    expect(full?.reactions.map((r) => r.support)).toEqual(['left', 'centre', 'right']);
    expectApprox(full?.reactions[1].lb ?? NaN, 1.25 * (wD + wL) * l, { rel: 1e-9 });
    expectApprox(full?.reactions[0].lb ?? NaN, (3 * (wD + wL) * l) / 8, { rel: 1e-9 });
    const centre = result.reactions.bySupport?.find((r) => r.support === 'centre');
    expectApprox(centre?.largestLb ?? NaN, 1.25 * (wD + wL) * l, { rel: 1e-9 });
    expectApprox(result.reactions.byType.L.centreLb ?? NaN, 1.25 * wL * l, { rel: 1e-9 });
  });

  it('places the live load span by span (ASCE 7 §4.3.3): one span loaded gives the larger end reaction and live deflection', () => {
    const names = result.combinations.map((c) => c.name);
    expect(names).toContain('D + L (variable load on the left span)');
    expect(names).toContain('D + L (variable load on the right span)');
    // AWC Design Aid No. 6, one span loaded: R1 = 7wl/16 (vs 3wl/8 with both spans loaded); with the dead
    // load on both spans: R1 = 3wDl/8 + 7wLl/16.
    const left = result.reactions.bySupport?.[0];
    expectApprox(left?.largestLb ?? NaN, (3 * wD * l) / 8 + (7 * wL * l) / 16, { rel: 1e-9 });
    expect(left?.largestCombination).toBe('D + L (variable load on the left span)');
    // Live deflection: one span loaded, wl⁴/109EI (denominator rounded as published, 0.5 %).
    const live = result.checks.find((c) => c.id === 'deflection-live');
    expect(live?.combination).toMatch(/variable load on the (left|right) span/);
    expectApprox(live?.demand ?? NaN, ((wL * l ** 4) / 109) * (1728 / EI), { rel: 0.005 });
  });

  it('checks bending at the negative moment over the post: M = wl²/8', () => {
    const bending = result.checks.find((c) => c.id === 'bending');
    const s = getSize(LVL, SIZE).sxIn3;
    expectApprox(bending?.demand ?? NaN, ((((wD + wL) * l * l) / 8) * 12) / s, { rel: 1e-9 });
  });

  it('bears the centre reaction on the centre bearing and reports the member length', () => {
    expect(result.spans).toMatchObject({ secondClearSpanFt: 9.75, centreBearingIn: 3 });
    expectApprox(result.spans.memberLengthFt ?? NaN, 2 * l, { rel: 1e-12 });
    expectApprox(result.spans.lengthToBuyFt, 9.75 * 2 + 9 / 12, { rel: 1e-12 });
    const bearing = result.checks.find((c) => c.id === 'bearing');
    expectApprox(bearing?.capacity ?? NaN, 3, { abs: 1e-12 });
  });

  it('draws the whole member, both spans, with the post moment', () => {
    const samples = result.diagram?.samples ?? [];
    expectApprox(samples[samples.length - 1].xFt, 2 * l, { rel: 1e-12 });
    const atPost = samples.find((p) => Math.abs(p.xFt - l) < 1e-9);
    expect(atPost?.momentLbFt).toBeLessThan(0);
    expect(memberCheckResultSchema.safeParse(result).success).toBe(true);
  });
});

describe('a beam that overhangs a support (AWC Design Aid No. 6, beam overhanging one support)', () => {
  // A 12 ft span (design) with a 4 ft overhang (design) past the right support; heavy live load, light dead.
  const body = {
    clearSpanFt: 11.75,
    overhangRightFt: 4 - 1.5 / 12,
    sources: [{ kind: 'floor' as const, tributaryFt: 6, deadPsf: 5, livePsf: 60 }],
  };
  const result = check(body);
  const l = 12;
  const a = 4;
  const wD = 30;
  const wL = 360;

  it('gives the reactions of the overhanging beam, and uplift at the back support with live on the overhang only', () => {
    const full = result.demands?.byCombination.find((d) => d.combination === 'D + L');
    expectApprox(full?.reactions[0].lb ?? NaN, ((wD + wL) * (l * l - a * a)) / (2 * l), { rel: 1e-9 });
    expectApprox(full?.reactions[1].lb ?? NaN, ((wD + wL) * (l + a) ** 2) / (2 * l), { rel: 1e-9 });
    // Live on the overhang only: R1 = wD(l² − a²)/2l − wL·a²/2l.
    const left = result.reactions.bySupport?.[0];
    const uplift = (wD * (l * l - a * a)) / (2 * l) - (wL * a * a) / (2 * l);
    expectApprox(left?.leastLb ?? NaN, uplift, { rel: 1e-9 });
    expect(uplift).toBeLessThan(0);
    expect(left?.leastCombination).toBe('D + L (variable load on the right overhang)');
    expect(result.warnings.join(' ')).toContain('Uplift at the left support');
  });

  it('holds the overhang to twice its length in the deflection limits (IBC Table 1604.3 footnote, from memory)', () => {
    const live = result.checks.find((c) => c.id === 'deflection-live');
    const limits = [(l * 12) / 360, (2 * a * 12) / 360];
    expect(limits.some((limit) => Math.abs((live?.capacity ?? NaN) - limit) < 1e-9)).toBe(true);
  });

  it('measures positions from the tip of a left overhang', () => {
    const mirrored = check({
      clearSpanFt: 11.75,
      overhangLeftFt: 4 - 1.5 / 12,
      sources: [{ kind: 'point', pointKind: 'post-above', atFt: 0, liveLb: 1000 }],
    });
    const dl = mirrored.demands?.byCombination.find((d) => d.combination === 'D + L');
    // A point load at the tip of a 4 ft overhang on a 12 ft span: R far = −Pa/l, R near = P(l + a)/l.
    expectApprox(dl?.reactions[0].lb ?? NaN, (1000 * (l + a)) / l, { rel: 1e-9 });
    expectApprox(dl?.reactions[1].lb ?? NaN, (-1000 * a) / l, { rel: 1e-9 });
    expectApprox(dl?.maxMoment.lbFt ?? NaN, -1000 * a, { rel: 1e-9 });
  });
});

describe('shortlist for overhanging and continuous members', () => {
  const loads = {
    kind: 'beam' as const,
    edition: 'ASCE 7-16' as const,
    clearSpanFt: 10,
    secondClearSpanFt: 12,
    overhangRightFt: 2,
    centreBearingIn: 7,
    supportWidthIn: 5.5,
    sources: [{ kind: 'floor' as const, tributaryFt: 8, deadPsf: 12, livePsf: 40 }],
  };

  it('gives each passing size the utilization of its member check', () => {
    const shortlist = buildShortlist(shortlistInputSchema.parse({ ...loads, materialIds: [LVL] }));
    expect(shortlist.passing.length).toBeGreaterThan(0);
    for (const entry of shortlist.passing.slice(0, 5)) {
      const single = checkMember(
        memberCheckInputSchema.parse({ ...loads, materialId: LVL, sizeId: entry.sizeId }),
      );
      expectApprox(entry.utilization, single.governing.ratio, { rel: 1e-12 });
    }
  });

  it('refuses more than the stated work: every material on two spans and two overhangs with roof and floor loads', () => {
    const input = shortlistInputSchema.parse({
      ...loads,
      overhangLeftFt: 2,
      roofPitchIn12: 6,
      snow: { groundSnowPsf: 30 },
      sources: [...loads.sources, { kind: 'roof', tributaryFt: 8, deadPsf: 15, roofLivePsf: 20 }],
      materialIds: listMaterials().map((m) => m.id),
    });
    expect(() => buildShortlist(input)).toThrow(CalcInputError);
    expect(() => buildShortlist(input)).toThrow(CALC_BOUNDS.shortlistWork.toLocaleString('en-US'));
  });
});
