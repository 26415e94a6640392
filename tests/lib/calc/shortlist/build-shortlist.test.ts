import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { listMaterials } from '@/lib/calc/materials';
import { buildShortlist, NEAR_MISS_LIMIT } from '@/lib/calc/shortlist';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { shortlistInputSchema, type ShortlistInputBody } from '@/shared/schemas/calc/shortlist';
import { expectApprox } from '@/tests/helpers/approx';

const base: ShortlistInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-16',
  clearSpanFt: 12,
  bearingLeftIn: 6,
  bearingRightIn: 6,
  sources: [
    { kind: 'floor', tributaryFt: 12, deadPsf: 12, livePsf: 40 },
    { kind: 'point', pointKind: 'post-above', atFt: 4, deadLb: 500, liveLb: 700 },
  ],
  materialIds: listMaterials().map((m) => m.id),
};
const run = (extra: Partial<ShortlistInputBody>) =>
  buildShortlist(shortlistInputSchema.parse({ ...base, ...extra }));

describe('buildShortlist', () => {
  const shallowest = run({});

  it('checks every size of every material and returns passing sizes shallowest first', () => {
    expect(shallowest.counts.checked).toBeGreaterThan(700);
    expect(shallowest.passing.length).toBeGreaterThan(0);
    for (let i = 1; i < shallowest.passing.length; i++) {
      expect(shallowest.passing[i].dIn).toBeGreaterThanOrEqual(shallowest.passing[i - 1].dIn);
    }
  });

  it('gives each passing size the same utilization as the member check of that size', () => {
    for (const e of shallowest.passing.slice(0, 8)) {
      expect(e.utilization).toBeLessThanOrEqual(1);
      const { materialIds: _ignored, ...loads } = base;
      const single = checkMember(
        memberCheckInputSchema.parse({ ...loads, materialId: e.materialId, sizeId: e.sizeId }),
      );
      expectApprox(e.utilization, single.governing.ratio, { rel: 1e-12 });
    }
  });

  it('lists near misses between 1.0 and 1.15 with what fails', () => {
    expect(shallowest.nearMisses.length).toBeGreaterThan(0);
    for (const m of shallowest.nearMisses) {
      expect(m.utilization).toBeGreaterThan(1);
      expect(m.utilization).toBeLessThanOrEqual(NEAR_MISS_LIMIT);
      expect(m.failing).toMatch(/\d\.\d\d \(/);
    }
  });

  it('keeps to the depth of the joists for a flush beam, the wall width and the piece weight', () => {
    const fit = run({
      mount: 'flush',
      joistDepthIn: 11.25,
      maxWidthIn: 5.5,
      maxPieceWeightLb: 80,
      limit: 500,
    });
    expect(fit.counts.filteredOut).toBeGreaterThan(0);
    for (const e of fit.passing) {
      expect(e.dIn).toBeLessThanOrEqual(11.25);
      expect(e.bIn).toBeLessThanOrEqual(5.5);
      expect(e.pieceWeightLb).toBeLessThanOrEqual(80);
    }
    expect(fit.filters).toEqual([
      'depth at most 11.25 in',
      'width at most 5.5 in',
      'piece weight at most 80 lb',
    ]);
  });

  it('sorts lightest and cheapest (price per ft × length to buy) first', () => {
    const lightest = run({ sortBy: 'lightest', limit: 500 });
    for (let i = 1; i < lightest.passing.length; i++) {
      expect(lightest.passing[i].weightPlf).toBeGreaterThanOrEqual(lightest.passing[i - 1].weightPlf);
    }
    const [a, b] = lightest.passing;
    const cheapest = run({
      sortBy: 'cheapest',
      pricePerFt: { [`${a.materialId}/${a.sizeId}`]: 30, [`${b.materialId}/${b.sizeId}`]: 10 },
    });
    expect(cheapest.passing[0].sizeId).toBe(b.sizeId);
    expectApprox(cheapest.passing[0].cost ?? NaN, 10 * cheapest.spans.lengthToBuyFt, { rel: 1e-12 }); // price × length to buy
    expectApprox(cheapest.spans.lengthToBuyFt, 13, { rel: 1e-12 }); // 12 ft clear + 6 in + 6 in bearing
  });

  it('sorts fewest plies first, then shallowest', () => {
    const fewest = run({ sortBy: 'fewest-plies', limit: 500 });
    for (let i = 1; i < fewest.passing.length; i++) {
      const [prev, next] = [fewest.passing[i - 1], fewest.passing[i]];
      expect(next.plies).toBeGreaterThanOrEqual(prev.plies);
      if (next.plies === prev.plies) expect(next.dIn).toBeGreaterThanOrEqual(prev.dIn);
    }
  });

  it('says when sizes fail on bearing alone', () => {
    const short = run({ bearingLeftIn: 1.5, bearingRightIn: 1.5 });
    expect(short.warnings.some((w) => w.includes('fail on bearing alone'))).toBe(true);
  });
});

describe('bounded work', () => {
  it('checks a material named twice, and a ply count named twice, once', () => {
    const once = run({ materialIds: ['lvl-2.0e'], plies: [2] });
    const twice = run({ materialIds: ['lvl-2.0e', 'lvl-2.0e'], plies: [2, 2] });
    expect(twice.counts).toEqual(once.counts);
    expect(twice.passing.map((e) => e.sizeId)).toEqual(once.passing.map((e) => e.sizeId));
  });
});
