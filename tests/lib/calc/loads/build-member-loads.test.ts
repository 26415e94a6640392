import { describe, expect, it } from 'vitest';
import { buildMemberLoads, CONTINUOUS_JOIST_FACTOR, slopeToHorizontalFactor } from '@/lib/calc/loads';
import { CalcInputError } from '@/lib/calc/types';
import { memberLoadsInputSchema, type LoadSourceInput } from '@/shared/schemas/calc/loads';
import { expectApprox } from '@/tests/helpers/approx';

const build = (sources: LoadSourceInput[], extra: Record<string, number> = {}) =>
  buildMemberLoads(memberLoadsInputSchema.parse({ spanFt: 10, sources, ...extra }));

const line = (result: ReturnType<typeof buildMemberLoads>, type: string) => {
  const found = result.lines.find((l) => l.type === type);
  if (!found) throw new Error(`no ${type} line`);
  return found;
};

describe('slope to horizontal projection', () => {
  it('is ×1.41 at 12/12 (REFERENCES.md: divide by cos θ; cos 45° = 1/√2)', () => {
    expectApprox(slopeToHorizontalFactor(12), Math.SQRT2, { rel: 1e-12 });
    expectApprox(slopeToHorizontalFactor(12), 1.41, { abs: 0.005 });
  });

  it('is 1 for a flat roof', () => {
    expectApprox(slopeToHorizontalFactor(0), 1, { abs: 0 });
  });
});

describe('continuous joists', () => {
  it('1.25 equals the AWC Design Aid No. 6 two-equal-span centre reaction 10wL/8 over the half-span sum wL', () => {
    // AWC DA6, two equal spans, uniform load: R_B = 10wL/8. Half-span tributary: wL/2 + wL/2 = wL.
    const wPlf = 40;
    const spanFt = 12;
    const centreReaction = (10 * wPlf * spanFt) / 8;
    const halfSpanSum = wPlf * spanFt;
    expectApprox(CONTINUOUS_JOIST_FACTOR, centreReaction / halfSpanSum, { abs: 1e-12 });
  });

  it('multiplies the floor load by 1.25 and warns about the equal-span assumption', () => {
    const result = build([{ kind: 'floor', tributaryFt: 6, deadPsf: 10, livePsf: 40, continuousOver: true }]);
    expectApprox(line(result, 'L').wPlf ?? 0, 6 * 40 * 1.25, { rel: 1e-12 });
    expectApprox(line(result, 'D').wPlf ?? 0, 6 * 10 * 1.25, { rel: 1e-12 });
    expect(line(result, 'L').expression).toBe('6 ft × 40 psf × 1.25 (joists continuous over the member)');
    expect(result.warnings.some((w) => w.includes('two equal spans'))).toBe(true);
  });

  it('applies to ceiling joists continuous over the member too (AWC Design Aid No. 6, two equal spans)', () => {
    const result = build([
      { kind: 'ceiling', tributaryFt: 7, deadPsf: 10, livePsf: 20, continuousOver: true },
    ]);
    expectApprox(line(result, 'D').wPlf ?? 0, 7 * 10 * 1.25, { rel: 1e-12 });
    expectApprox(line(result, 'L').wPlf ?? 0, 7 * 20 * 1.25, { rel: 1e-12 });
  });

  it('uses 1.0 when the joists are lapped or spliced over the member', () => {
    const result = build([{ kind: 'floor', tributaryFt: 6, deadPsf: 10, livePsf: 40 }]);
    expectApprox(line(result, 'L').wPlf ?? 0, 240, { rel: 1e-12 });
    expect(result.warnings).toEqual([]);
  });
});

describe('buildMemberLoads', () => {
  it('converts a roof dead load given along the slope by ÷ cos θ and shows the arithmetic', () => {
    // 6 in 12: θ = atan(0.5) = 26.565°, 1/cos θ = √(1 + 0.25) = 1.1180 (geometry).
    const result = build(
      [{ kind: 'roof', tributaryFt: 12, deadPsf: 15, deadAlongSlope: true, roofLivePsf: 20 }],
      { roofPitchIn12: 6, roofSnowPsf: 25 },
    );
    const dead = line(result, 'D');
    expectApprox(dead.wPlf ?? 0, 12 * 15 * Math.sqrt(1.25), { rel: 1e-12 });
    expect(dead.expression).toBe('12 ft × 15 psf ÷ cos 26.6°');
    expectApprox(line(result, 'Lr').wPlf ?? 0, 240, { rel: 1e-12 });
    expectApprox(line(result, 'S').wPlf ?? 0, 300, { rel: 1e-12 });
    expectApprox(result.totalsPlf.S, 300, { rel: 1e-12 });
  });

  it('keeps a roof dead load already on horizontal projection as given', () => {
    const result = build([{ kind: 'roof', tributaryFt: 12, deadPsf: 15, roofLivePsf: 20 }], {
      roofPitchIn12: 6,
    });
    expectApprox(line(result, 'D').wPlf ?? 0, 180, { rel: 1e-12 });
    expect(line(result, 'D').expression).toBe('12 ft × 15 psf');
  });

  it('lets a roof source override the member snow load', () => {
    const result = build([{ kind: 'roof', tributaryFt: 4, deadPsf: 15, roofLivePsf: 20, snowPsf: 50 }], {
      roofSnowPsf: 25,
    });
    expectApprox(line(result, 'S').wPlf ?? 0, 200, { rel: 1e-12 });
  });

  it('takes ceiling attic live load as L (ASCE 7 Table 4.3-1: attics without storage 10 psf)', () => {
    const result = build([{ kind: 'ceiling', tributaryFt: 7, deadPsf: 5, livePsf: 10 }]);
    expectApprox(line(result, 'L').wPlf ?? 0, 70, { rel: 1e-12 });
    expectApprox(line(result, 'D').wPlf ?? 0, 35, { rel: 1e-12 });
  });

  it('takes a wall above as plf or as height × psf (HUD RSDG Table 3.2: 2x4 wall 6 psf)', () => {
    const given = build([{ kind: 'wall-above', wPlf: 120 }]);
    expectApprox(given.totalsPlf.D, 120, { rel: 1e-12 });
    expect(given.lines[0].expression).toBe('120 plf (given)');
    const area = build([{ kind: 'wall-above', heightFt: 8, deadPsf: 6 }]);
    expectApprox(area.totalsPlf.D, 48, { rel: 1e-12 });
    expect(area.lines[0].expression).toBe('8 ft × 6 psf');
  });

  it('keeps partial uniform loads with their extent', () => {
    const result = build([{ kind: 'wall-above', wPlf: 100, startFt: 2, endFt: 6 }]);
    expect(result.loads[0]).toEqual({
      kind: 'uniform',
      wPlf: 100,
      startFt: 2,
      endFt: 6,
      type: 'D',
      label: 'Wall above',
    });
    expect(result.lines[0].expression).toBe('100 plf (given) from 2 to 6 ft');
  });

  it('splits a point load by type and skips zero parts', () => {
    const result = build([
      { kind: 'point', pointKind: 'girder-truss', atFt: 4.5, deadLb: 1200, snowLb: 1800 },
    ]);
    expect(result.loads).toEqual([
      { kind: 'point', pLb: 1200, atFt: 4.5, type: 'D', label: 'Girder truss' },
      { kind: 'point', pLb: 1800, atFt: 4.5, type: 'S', label: 'Girder truss' },
    ]);
    expect(result.lines[1].expression).toBe('1,800 lb at 4.5 ft');
    expectApprox(result.totalsPlf.D, 0, { abs: 0 });
  });

  it('adds self-weight as dead load over the whole span', () => {
    const result = build([], { selfWeightPlf: 12.5 });
    expect(result.loads).toEqual([{ kind: 'uniform', wPlf: 12.5, type: 'D', label: 'Self-weight' }]);
  });

  it('names the field when a position is off the span', () => {
    const attempt = () =>
      build([
        { kind: 'wall-above', wPlf: 10 },
        { kind: 'point', pointKind: 'post-above', atFt: 12, deadLb: 10 },
      ]);
    expect(attempt).toThrow(CalcInputError);
    try {
      attempt();
    } catch (error) {
      expect((error as CalcInputError).field).toBe('sources.1.atFt');
      expect((error as Error).message).toContain('past the 10 ft span');
    }
  });

  it('rejects an extent that ends before it starts', () => {
    expect(() => build([{ kind: 'wall-above', wPlf: 10, startFt: 6, endFt: 2 }])).toThrow(
      /before the load end/,
    );
  });

  describe('positions entered from the face of the left support (positionOffsetFt)', () => {
    // 4-1/2 in bearings: the analysis starts at the bearing centre, 2-1/4 in before the face (DESIGN.md §5)
    const offset = 2.25 / 12;
    const sources: LoadSourceInput[] = [
      { kind: 'wall-above', wPlf: 48, startFt: 0, endFt: 6 },
      { kind: 'point', pointKind: 'post-above', atFt: 9, deadLb: 600 },
    ];

    it('puts the loads on the member and writes the positions the user entered', () => {
      const result = build(sources, { spanFt: 14.375, positionOffsetFt: offset });
      const wall = result.lines.find((l) => l.label === 'Wall above');
      const post = result.lines.find((l) => l.label === 'Post above');
      expect(wall?.expression).toBe('48 plf (given) from 0 to 6 ft');
      expect(post?.expression).toBe('600 lb at 9 ft');
      expectApprox(wall?.startFt ?? NaN, offset, { abs: 1e-12 });
      expectApprox(wall?.endFt ?? NaN, 6 + offset, { abs: 1e-12 });
      expectApprox(post?.atFt ?? NaN, 9 + offset, { abs: 1e-12 });
      expect(result.loads.find((l) => l.kind === 'point')).toMatchObject({ atFt: 9 + offset });
    });

    it('names an entered position past the member in entered feet', () => {
      try {
        build([{ kind: 'point', pointKind: 'post-above', atFt: 14.5, deadLb: 10 }], {
          spanFt: 14.375,
          positionOffsetFt: offset,
        });
        expect.unreachable('a position past the member');
      } catch (error) {
        expect((error as CalcInputError).field).toBe('sources.0.atFt');
        // 14.375 ft analysed less the 0.1875 ft offset: 14.19 ft from the face
        expect((error as Error).message).toBe('Post above position: 14.5 ft is past the 14.19 ft span');
      }
    });
  });
});
