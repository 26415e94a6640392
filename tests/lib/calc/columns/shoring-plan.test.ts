import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { CAUTION_TEXT, CalcInputError, planShoring } from '@/lib/calc';
import {
  shoringPlanInputSchema,
  shoringSurfaces,
  type ShoringPlanInputBody,
  type ShoringSurface,
} from '@/shared/schemas/calc';

const SPF = 'sawn-spruce-pine-fir-no1-no2';

// Demo member (invented layout; the psf values are published defaults): a first-floor bearing wall under
// floor joists spanning 12 ft on side A and 10 ft on side B, a wall above and a strip of roof.
//   floor 11 ft (12/2 + 10/2) × 12 psf dead (HUD RSDG Table 3.2, floor with wood flooring) = 132 plf D
//   floor 11 ft × 40 psf live (ASCE 7 Table 4.3-1, dwellings)                              = 440 plf L
//   wall above 8 ft × 6 psf (HUD RSDG Table 3.2, 2x4 wall)                                 =  48 plf D
//   roof 4 ft × 15 psf dead (HUD RSDG Table 3.2, asphalt shingles)                         =  60 plf D
//   roof 4 ft × 20 psf roof live (ASCE 7 Table 4.3-1, ordinary roofs)                      =  80 plf Lr
// D 240, L 440, Lr 80 plf. ASCE 7-22 §2.4.1 ASD: D + L = 680; D + Lr = 320; D + 0.75L + 0.75Lr = 630.
// D + L governs: 680 plf.
const member = {
  kind: 'beam' as const,
  edition: 'ASCE 7-22' as const,
  clearSpanFt: 10,
  sources: [
    { kind: 'floor' as const, tributaryFt: 11, deadPsf: 12, livePsf: 40 },
    { kind: 'wall-above' as const, heightFt: 8, deadPsf: 6 },
    { kind: 'roof' as const, tributaryFt: 4, deadPsf: 15, roofLivePsf: 20 },
  ],
};
// The studs of the hand calculation in shoring-wall.test.ts (NDS 2018 eq. 3.7-1, C_D 1.25 per Table 2.3.2):
// 2x4 SPF No.1/No.2, 8 ft, mid-height blocking: 2026 lb per stud.
const studs = {
  materialId: SPF,
  studSizeId: '2x4',
  studSpacingIn: 16,
  heightFt: 8,
  weakAxisBracing: 'mid-height-blocking' as const,
};
const STUD_CAPACITY_LB = 2026;

function plan(overrides: Partial<ShoringPlanInputBody> = {}) {
  return planShoring(
    shoringPlanInputSchema.parse({
      member,
      layout: 'both-sides',
      studs,
      standsOn: 'slab-on-grade',
      ...overrides,
    }),
  );
}

describe('shoring plan: load per foot during the swap', () => {
  it('sums the takedown line by line and takes the largest ASD combination (hand calculation above)', () => {
    const { load } = plan();
    expect(load.lines.map((l) => [l.type, l.wPlf])).toEqual([
      ['D', 132],
      ['L', 440],
      ['D', 48],
      ['D', 60],
      ['Lr', 80],
    ]);
    expectApprox(load.totalsPlf.D, 240, { abs: 1e-9 });
    expectApprox(load.totalsPlf.L, 440, { abs: 1e-9 });
    expectApprox(load.totalsPlf.Lr, 80, { abs: 1e-9 });
    expect(load.combination).toBe('D + L');
    expectApprox(load.wPlf, 680, { abs: 1e-9 });
    expect(load.expression).toBe('1 × 240 plf D + 1 × 440 plf L = 680 plf');
  });

  it('picks D + 0.75L + 0.75Lr when the live load is small (ASCE 7-22 §2.4.1 eq. 4a)', () => {
    // Demo: roof 10 ft × 15 psf D = 150, × 20 psf Lr = 200; ceiling 10 ft × 5 psf D (invented) = 50,
    // × 10 psf L (ASCE 7 Table 4.3-1, attic without storage) = 100. D 200, L 100, Lr 200:
    // D + L = 300, D + Lr = 400, D + 0.75L + 0.75Lr = 200 + 75 + 150 = 425 plf governs.
    const { load } = plan({
      member: {
        ...member,
        sources: [
          { kind: 'roof', tributaryFt: 10, deadPsf: 15, roofLivePsf: 20 },
          { kind: 'ceiling', tributaryFt: 10, deadPsf: 5, livePsf: 10 },
        ],
      },
    });
    expect(load.combination).toBe('D + 0.75L + 0.75Lr');
    expectApprox(load.wPlf, 425, { abs: 1e-9 });
  });

  it('shares the load by the joist spans each side with the setback lever (AWC Design Aid No. 6)', () => {
    // Beam overhanging one support (AWC Design Aid No. 6): joists of span L bearing c short of their end
    // load the new support with w L² / (2 (L − c)) = (w L / 2) × L / (L − c).
    // Wall A: 680 × 12/22 × 12/(12 − 2) = 445.0909 plf; wall B: 680 × 10/22 × 10/(10 − 2) = 386.3636 plf.
    const result = plan({ joistSpanAFt: 12, joistSpanBFt: 10 });
    expect(result.shareBasis).toBe('joist-spans');
    expect(result.walls.map((w) => w.side)).toEqual(['A', 'B']);
    const [a, b] = result.walls;
    expectApprox(a.loadPlf, (680 * 12 * 12) / (22 * 10), { rel: 1e-12 });
    expectApprox(a.loadPlf, 445.0909, { abs: 1e-4 });
    expectApprox(b.loadPlf, 386.3636, { abs: 1e-4 });
    expect(a.lines.map((l) => l.label)).toEqual([
      'Member line load (D + L)',
      'Share of side A',
      'Setback lever, side A',
      'Wall A',
    ]);
    expectApprox(a.lines[1].value, 12 / 22, { rel: 1e-12 });
    expectApprox(a.lines[2].value, 1.2, { rel: 1e-12 });
    // Per stud: 445.0909 × 16/12 = 593.45 lb against 2026 lb (hand calculation in shoring-wall.test.ts).
    expectApprox(a.check.loadPerStudLb, 593.4545, { abs: 1e-3 });
    expectApprox(a.check.ratio, 593.4545 / STUD_CAPACITY_LB, { abs: 0.001 });
    expect(result.pass).toBe(true);
    expect(result.sources).toContain('AWC Design Aid No. 6: beam overhanging one support (setback lever)');
  });

  it('without joist spans, each of two walls (or the one wall) takes the whole load', () => {
    // Conservative assumption: one wall may carry all of it while the other is set. 680 × 16/12 = 906.67 lb.
    const two = plan();
    expect(two.shareBasis).toBe('whole-load-each');
    expect(two.walls).toHaveLength(2);
    for (const wall of two.walls) expectApprox(wall.loadPlf, 680, { abs: 1e-9 });
    expectApprox(two.walls[0].check.loadPerStudLb, 906.667, { abs: 1e-3 });
    expect(two.notes.some((n) => n.includes('one wall may carry all of it'))).toBe(true);
    expect(two.warnings.some((w) => w.includes('setback’s lever is not counted'))).toBe(true);

    const one = plan({ layout: 'one-side' });
    expect(one.walls).toHaveLength(1);
    expectApprox(one.walls[0].loadPlf, 680, { abs: 1e-9 });
    expect(one.warnings.some((w) => w.includes('set a wall on each side'))).toBe(true);
  });

  it('one wall with its joist span carries the whole load times the lever', () => {
    // 680 × 12/(12 − 3) = 906.67 plf (AWC Design Aid No. 6, beam overhanging one support).
    const one = plan({ layout: 'one-side', joistSpanAFt: 12, setbackFt: 3 });
    expectApprox(one.walls[0].loadPlf, 906.667, { abs: 1e-3 });
    expect(one.setbackFt).toBe(3);
    expect(one.notes.some((n) => n.includes('this plan uses 3 ft'))).toBe(true);
  });

  it('lists a point load apart with a warning; it does not enter the plf', () => {
    const withPost = plan({
      member: {
        ...member,
        sources: [
          ...member.sources,
          { kind: 'point', pointKind: 'post-above', atFt: 4, deadLb: 400, liveLb: 800 },
        ],
      },
    });
    expectApprox(withPost.load.wPlf, 680, { abs: 1e-9 });
    expect(withPost.load.pointLoads).toHaveLength(1);
    expectApprox(withPost.load.pointLoads[0].atFt, 4, { abs: 1e-9 });
    expectApprox(withPost.load.pointLoads[0].totalLb, 1200, { abs: 1e-9 });
    const warning = withPost.warnings.find((w) => w.startsWith('Post above at 4 ft'));
    expect(warning).toContain('400 lb D + 800 lb L = 1,200 lb');
    expect(warning).toContain('needs its own shore or post');
  });
});

describe('shoring plan: what the walls stand on', () => {
  it('ground: mud sill width = plf / 1,500 psf (IRC R401.4.1 presumptive value)', () => {
    // 680 plf ÷ 1,500 psf = 0.4533 ft = 5.44 in → a 2x6 laid flat, 5.5 in (NDS Supplement Table 1B).
    const wall = plan({ standsOn: 'ground' }).walls[0];
    expect(wall.standing.verdict).toBe('spread-load');
    expect(wall.standing.soilBearingPsf).toBe(1500);
    expectApprox(wall.standing.requiredSillWidthIn ?? NaN, 5.44, { abs: 1e-9 });
    expect(wall.standing.sillPlank).toBe('2x6');
    // Given soil 1,000 psf: 680 × 12 / 1000 = 8.16 in → 2x10 (9.25 in); 500 psf: 16.32 in → no plank.
    const softer = plan({ standsOn: 'ground', soilBearingPsf: 1000 }).walls[0].standing;
    expectApprox(softer.requiredSillWidthIn ?? NaN, 8.16, { abs: 1e-9 });
    expect(softer.sillPlank).toBe('2x10');
    const soft = plan({ standsOn: 'ground', soilBearingPsf: 500 }).walls[0].standing;
    expect(soft.sillPlank).toBeNull();
    expect(soft.actions[0]).toContain('cribbing');
  });

  it('floor framing across the joists: plf × spacing / 12 on each joist, not checked here', () => {
    // 680 plf × 16 in / 12 = 906.67 lb per joist; at 24 in: 1,360 lb.
    const at16 = plan({ standsOn: 'floor-framing-perpendicular' });
    expect(at16.walls[0].standing.verdict).toBe('check-floor-below');
    expectApprox(at16.walls[0].standing.joistPointLoadLb ?? NaN, 906.667, { abs: 1e-3 });
    expect(at16.walls[0].standing.summary).toContain('not checked here');
    expect(at16.walls[0].standing.actions.join(' ')).toContain('down to the foundation');
    expect(at16.pass).toBe(true);
    const at24 = plan({ standsOn: 'floor-framing-perpendicular', floorJoistSpacingIn: 24 });
    expectApprox(at24.walls[0].standing.joistPointLoadLb ?? NaN, 1360, { abs: 1e-9 });
  });

  it('floor framing along the joists is not acceptable and fails the plan', () => {
    const result = plan({ standsOn: 'floor-framing-parallel' });
    expect(result.walls.every((w) => w.standing.verdict === 'not-acceptable')).toBe(true);
    expect(result.pass).toBe(false);
    expect(result.walls[0].check.pass).toBe(true);
    expect(result.warnings.some((w) => w.startsWith('Wall A: Floor framing, plate along the joists'))).toBe(
      true,
    );
  });

  it.each(['slab-on-grade', 'basement-slab'] as const)(
    '%s: spread the load on a sill, slab not checked',
    (s) => {
      const standing = plan({ standsOn: s }).walls[0].standing;
      expect(standing.verdict).toBe('spread-load');
      expect(standing.summary).toContain('not checked here');
      expect(standing.actions[0]).toContain('sill');
      expect(standing.requiredSillWidthIn).toBeNull();
      expect(standing.joistPointLoadLb).toBeNull();
    },
  );
});

describe('shoring plan: cautions, notes and sources', () => {
  it('carries the caution, the shoring caution, the clearance note and the C_D 1.25 source', () => {
    const result = plan({ standsOn: 'ground' });
    expect(result.caution).toBe(CAUTION_TEXT);
    expect(result.cautions).toContain('The shoring itself may need an engineer’s design.');
    expect(result.notes.some((n) => n.includes('stand clear of the work area on both sides'))).toBe(true);
    expect(result.notes.some((n) => n.startsWith('Live load: the full occupancy live load'))).toBe(true);
    expect(result.walls[0].check.factors.find((f) => f.symbol === 'C_D')?.value).toBe(1.25);
    expect(result.sources).toEqual(
      expect.arrayContaining([
        'ASCE 7-22 §2.4.1 ASD load combinations',
        'NDS 2018 Table 2.3.2 load duration (construction 1.25)',
        'IRC 2021 R401.4.1 presumptive load-bearing values of soils',
      ]),
    );
  });
});

describe('shoring plan: input', () => {
  function fieldOf(run: () => unknown): string | undefined {
    try {
      run();
    } catch (error) {
      if (error instanceof CalcInputError) return error.field;
      throw error;
    }
    return undefined;
  }
  const parsed = () =>
    shoringPlanInputSchema.parse({ member, layout: 'both-sides', studs, standsOn: 'slab-on-grade' });

  it('engine errors name the plan field', () => {
    const base = parsed();
    expect(fieldOf(() => planShoring({ ...base, studs: { ...base.studs, studSpacingIn: 0 } }))).toBe(
      'studs.studSpacingIn',
    );
    expect(fieldOf(() => planShoring({ ...base, studs: { ...base.studs, studSizeId: '2x5' } }))).toBe(
      'studs.studSizeId',
    );
    expect(fieldOf(() => planShoring({ ...base, studs: { ...base.studs, plateMaterialId: 'nope' } }))).toBe(
      'studs.plateMaterialId',
    );
    expect(fieldOf(() => planShoring({ ...base, joistSpanAFt: 2, joistSpanBFt: 10 }))).toBe('setbackFt');
    expect(fieldOf(() => planShoring({ ...base, joistSpanBFt: 10 }))).toBe('joistSpanAFt');
    expect(fieldOf(() => planShoring({ ...base, standsOn: 'ground', soilBearingPsf: -1 }))).toBe(
      'soilBearingPsf',
    );
    const offSpan = { ...base.member.sources[0], endFt: 12 };
    expect(fieldOf(() => planShoring({ ...base, member: { ...base.member, sources: [offSpan] } }))).toBe(
      'member.sources.0.endFt',
    );
    const postOnly = shoringPlanInputSchema.parse({
      member: { ...member, sources: [{ kind: 'point', pointKind: 'post-above', atFt: 4, deadLb: 400 }] },
      layout: 'one-side',
      studs,
      standsOn: 'ground',
    });
    expect(fieldOf(() => planShoring(postOnly))).toBe('member.sources');
  });

  it('the schema reports field paths', () => {
    const body = { member, layout: 'both-sides', studs, standsOn: 'ground' };
    const oneSpan = shoringPlanInputSchema.safeParse({ ...body, joistSpanAFt: 12 });
    expect(oneSpan.error?.issues.map((i) => i.path.join('.'))).toEqual(['joistSpanBFt']);
    const setback = shoringPlanInputSchema.safeParse({ ...body, joistSpanAFt: 12, joistSpanBFt: 2 });
    expect(setback.error?.issues.map((i) => i.path.join('.'))).toEqual(['setbackFt']);
    const bad = shoringPlanInputSchema.safeParse({
      ...body,
      standsOn: 'roof',
      studs: { ...studs, heightFt: 0 },
    });
    expect(bad.error?.issues.map((i) => i.path.join('.'))).toEqual(
      expect.arrayContaining(['standsOn', 'studs.heightFt']),
    );
  });

  it('valid input never gives NaN (property)', () => {
    fc.assert(
      fc.property(
        fc.record({
          deadPsf: fc.double({ min: 0, max: 40, noNaN: true }),
          livePsf: fc.double({ min: 0.1, max: 100, noNaN: true }),
          tributaryFt: fc.double({ min: 0.5, max: 30, noNaN: true }),
          spanAFt: fc.double({ min: 3, max: 30, noNaN: true }),
          spanBFt: fc.double({ min: 3, max: 30, noNaN: true }),
          setbackFt: fc.double({ min: 0.5, max: 2.9, noNaN: true }),
          withSpans: fc.boolean(),
          layout: fc.constantFrom('one-side' as const, 'both-sides' as const),
          standsOn: fc.constantFrom<ShoringSurface>(...shoringSurfaces),
          heightFt: fc.double({ min: 4, max: 12, noNaN: true }),
          studSpacingIn: fc.constantFrom(8, 12, 16, 24),
          soilBearingPsf: fc.double({ min: 500, max: 4000, noNaN: true }),
        }),
        (v) => {
          const result = planShoring(
            shoringPlanInputSchema.parse({
              member: {
                ...member,
                sources: [
                  { kind: 'floor', tributaryFt: v.tributaryFt, deadPsf: v.deadPsf, livePsf: v.livePsf },
                ],
              },
              layout: v.layout,
              joistSpanAFt: v.withSpans ? v.spanAFt : undefined,
              joistSpanBFt: v.withSpans && v.layout === 'both-sides' ? v.spanBFt : undefined,
              setbackFt: v.setbackFt,
              studs: { ...studs, heightFt: v.heightFt, studSpacingIn: v.studSpacingIn },
              standsOn: v.standsOn,
              soilBearingPsf: v.soilBearingPsf,
            }),
          );
          for (const wall of result.walls) {
            const numbers = [
              wall.loadPlf,
              wall.check.loadPerStudLb,
              wall.check.ratio,
              wall.check.maxSpacingIn,
              ...wall.lines.map((l) => l.value),
              wall.standing.joistPointLoadLb ?? 0,
              wall.standing.requiredSillWidthIn ?? 0,
            ];
            expect(numbers.every(Number.isFinite)).toBe(true);
            expect(wall.loadPlf).toBeGreaterThan(0);
          }
        },
      ),
    );
  });
});
