import { describe, expect, it } from 'vitest';
import { checkBeamElement, evaluateLoadPath } from '@/lib/calc/load-path';
import { getSize } from '@/lib/calc/materials';
import { expectApprox } from '@/tests/helpers/approx';
import { beamInput, DFL2, foundationWall, node, pad, post } from './fixtures';

/** Douglas Fir-Larch No.2, E = 1,600,000 psi (NDS Supplement 2018 Table 4A), dry service: E' = E. */
const EI = 1.6e6 * getSize(DFL2, '3-ply-2x12').ixIn4;
const IN3_PER_FT3 = 1728;
const P = 3000;

describe('a point load from above on a girder (AWC Design Aid No. 6, simple beam, concentrated load at any point)', () => {
  // 14 ft clear with 3 in bearings: design span l = 14.25 ft; the load lands 4 ft from the left face,
  // a = 4.125 ft from the left support's centre.
  const l = 14.25;
  const a = 4.125;
  const b = l - a;
  const girder = beamInput({ clearSpanFt: 14, selfWeight: false });
  const { result, endLoads } = checkBeamElement(
    girder,
    [{ fromId: 'p', fromLabel: 'Post', fromEnd: 'bottom', atFt: 4, load: { D: P, L: 0, Lr: 0, S: 0 } }],
    () => 'p.bearings.bottom',
  );
  const dead = result.demands?.byCombination.find((d) => d.combination === 'D');

  it('R1 = Pb/l and R2 = Pa/l, carried down as dead load at each end', () => {
    expectApprox(endLoads.left?.D ?? NaN, (P * b) / l, { rel: 1e-9 });
    expectApprox(endLoads.right?.D ?? NaN, (P * a) / l, { rel: 1e-9 });
    expectApprox(dead?.reactions[0].lb ?? NaN, (P * b) / l, { rel: 1e-9 });
  });

  it('M_max = Pab/l at the load', () => {
    expectApprox(dead?.maxMoment.lbFt ?? NaN, (P * a * b) / l, { rel: 1e-9 });
    expectApprox(dead?.maxMoment.atFt ?? NaN, a, { rel: 1e-6 });
  });

  it('Δ_max = Pab(a + 2b)√(3a(a + 2b)) / (27EIl) at √(a(a + 2b)/3), the longer segment taken as a', () => {
    // The design aid measures a on the longer side; here that is b, from the right support.
    const [long, short] = [b, a];
    const expected =
      ((P * long * short * (long + 2 * short) * Math.sqrt(3 * long * (long + 2 * short))) / (27 * EI * l)) *
      IN3_PER_FT3;
    expectApprox(dead?.deflectionTotalElastic.in ?? NaN, expected, { rel: 1e-4 });
    expectApprox(l - (dead?.deflectionTotalElastic.atFt ?? NaN), Math.sqrt((long * (long + 2 * short)) / 3), {
      rel: 2e-2,
    });
  });

  it('at midspan the deflection at the load Pa²b²/(3EIl) is Pl³/48EI', () => {
    const mid = checkBeamElement(
      girder,
      [{ fromId: 'p', fromLabel: 'Post', fromEnd: 'bottom', atFt: 7, load: { D: P, L: 0, Lr: 0, S: 0 } }],
      () => 'p.bearings.bottom',
    ).result.demands?.byCombination.find((d) => d.combination === 'D');
    const half = l / 2;
    expectApprox(
      mid?.deflectionTotalElastic.in ?? NaN,
      ((P * half ** 2 * half ** 2) / (3 * EI * l)) * IN3_PER_FT3,
      {
        rel: 1e-6,
      },
    );
  });

  it('a live load from above is checked in the girder’s own D + L combination (load types kept apart)', () => {
    const live = checkBeamElement(
      girder,
      [
        {
          fromId: 'p',
          fromLabel: 'Post',
          fromEnd: 'bottom',
          atFt: 4,
          load: { D: 1000, L: 2000, Lr: 0, S: 0 },
        },
      ],
      () => 'p.bearings.bottom',
    );
    expectApprox(live.endLoads.left?.L ?? NaN, (2000 * b) / l, { rel: 1e-9 });
    const dl = live.result.demands?.byCombination.find((d) => d.combination === 'D + L');
    expectApprox(dl?.maxMoment.lbFt ?? NaN, (3000 * a * b) / l, { rel: 1e-9 });
  });

  it('refuses a load landing past the end of the girder, at the bearing that puts it there', () => {
    expect(() =>
      checkBeamElement(
        girder,
        [{ fromId: 'p', fromLabel: 'Post', fromEnd: 'bottom', atFt: 30, load: { D: P, L: 0, Lr: 0, S: 0 } }],
        () => 'p.bearings.bottom',
      ),
    ).toThrow(expect.objectContaining({ field: 'p.bearings.bottom.atFt' }));
  });
});

describe('a two-span girder taking a post (AISC Manual Table 3-23, continuous beam, two equal spans, concentrated load at centre of one span)', () => {
  // 10 ft + 10 ft clear, 3 in end bearings and a 3.5 in centre bearing: each design span l = 10 + 1.5/12 +
  // 1.75/12 ft. The post lands at mid first span. Published: R1 = 13P/32, R2 = 11P/16, R3 = −3P/32,
  // M at the load = 13Pl/64, M over the centre support = −3Pl/16.
  const girderInput = beamInput({
    clearSpanFt: 10,
    secondClearSpanFt: 10,
    centreBearingIn: 3.5,
    selfWeight: false,
  });
  const l = 10 + 1.5 / 12 + 1.75 / 12;
  const atFaceFt = l / 2 - 1.5 / 12;
  // A beam above puts a dead point load on its left end over the column: the column passes it on whole.
  const beam = beamInput({
    clearSpanFt: 8,
    selfWeight: false,
    sources: [{ kind: 'point', pointKind: 'post-above', atFt: 0, deadLb: 8000 }],
  });
  const loaded = evaluateLoadPath({
    edition: 'ASCE 7-16',
    nodes: [
      node('beam', { kind: 'member', input: beam }, [
        { end: 'left', ontoId: 'column' },
        { end: 'right', ontoId: 'wall' },
      ]),
      node('column', { kind: 'steel-column', heightFt: 7, ratedCapacityLb: 20_000 }, [
        { end: 'bottom', ontoId: 'girder', atFt: atFaceFt },
      ]),
      node('girder', { kind: 'girder', input: girderInput }, [
        { end: 'left', ontoId: 'wall' },
        { end: 'centre', ontoId: 'pad' },
        { end: 'right', ontoId: 'wall' },
      ]),
      node('wall', foundationWall()),
      node('pad', pad()),
    ],
  });
  const P = loaded.elements.find((e) => e.id === 'beam')?.ends.find((e) => e.end === 'left')?.load.D ?? NaN;
  const g = loaded.elements.find((e) => e.id === 'girder');
  const by = Object.fromEntries((g?.ends ?? []).map((e) => [e.end, e.load.D]));

  it('the column lands the beam’s reaction on the girder whole', () => {
    expect(g?.incoming.map((i) => i.fromId)).toEqual(['column']);
    expectApprox(g?.incoming[0].load.D ?? NaN, P, { rel: 1e-12 });
  });

  it('the girder’s supports take 13P/32, 11P/16 and −3P/32', () => {
    expectApprox(by.left, (13 * P) / 32, { rel: 1e-6 });
    expectApprox(by.centre, (11 * P) / 16, { rel: 1e-6 });
    expectApprox(by.right, (-3 * P) / 32, { rel: 1e-6 });
  });

  it('M at the load = 13Pl/64; the lifting far end is said', () => {
    const dead = g?.memberResult?.demands?.byCombination.find((d) => d.combination === 'D');
    expectApprox(dead?.maxMoment.lbFt ?? NaN, (13 * P * l) / 64, { rel: 1e-6 });
    expect(g?.memberResult?.warnings.some((w) => w.startsWith('Uplift at the right support'))).toBe(true);
  });

  it('the centre post’s pad is sized for 11P/16 and the soil sees every pound', () => {
    expectApprox(loaded.elements.find((e) => e.id === 'pad')?.pad?.loadLb ?? NaN, (11 * P) / 16, {
      rel: 1e-6,
    });
    expectApprox(loaded.atGround.D, 8000, { rel: 1e-9 });
  });
});

describe('a post on a footing pad', () => {
  it('carries its own weight down and sizes the pad at the presumptive 1,500 psf (IRC 2021 R401.4.1)', () => {
    const r = evaluateLoadPath({
      edition: 'ASCE 7-16',
      nodes: [node('post', post(8), [{ end: 'bottom', ontoId: 'pad' }]), node('pad', pad())],
    });
    // 6x6 DF-L: 5.5 × 5.5 in; at 8 ft its own weight is its plf (NDS Supplement Table 1B density) × 8.
    expectApprox(r.atGround.D, getSize(DFL2, '6x6').selfWeightPlf * 8, { rel: 1e-12 });
  });
});
