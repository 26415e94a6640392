import { describe, expect, it } from 'vitest';
import { CalcInputError } from '@/lib/calc/types';
import { chainBelow, evaluateLoadPath } from '@/lib/calc/load-path';
import { getSize } from '@/lib/calc/materials';
import type { LoadPathNode } from '@/shared/schemas/calc/load-path';
import { expectApprox } from '@/tests/helpers/approx';
import { beamInput, DFL2, foundationWall, node, pad, post, SPF } from './fixtures';

// Demo-style loads (invented): a 10 ft beam carrying 12 ft of floor (10 psf dead, 40 psf live, ASCE 7
// Table 4.3-1 dwelling live load), on jack studs at the left and a post at the right; the wall and the post
// land on a basement girder, which bears on the foundation wall and a post on a new pad.
const beam = beamInput({
  clearSpanFt: 10,
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
  sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
});
const girder = beamInput({
  clearSpanFt: 14,
  bearingLeftIn: 5.5,
  bearingRightIn: 5.5,
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
  sources: [{ kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 }],
});

function chain(overrides: Partial<Record<string, Partial<LoadPathNode>>> = {}): LoadPathNode[] {
  const nodes = [
    node(
      'beam',
      { kind: 'member', input: beam },
      [
        { end: 'left', ontoId: 'wall' },
        { end: 'right', ontoId: 'post' },
      ],
      'Kitchen beam',
    ),
    node(
      'wall',
      { kind: 'wall', studMaterialId: SPF, studSizeId: '2x4', jackStuds: 2, heightFt: 8 },
      [{ end: 'bottom', ontoId: 'girder', atFt: 3, through: 'solid-blocking' }],
      'Jacks in the wall',
    ),
    node('post', post(8), [{ end: 'bottom', ontoId: 'girder', atFt: 10, through: 'squash-blocks' }], 'Post'),
    node(
      'girder',
      { kind: 'girder', input: girder },
      [
        { end: 'left', ontoId: 'fw' },
        { end: 'right', ontoId: 'post2' },
      ],
      'Basement girder',
    ),
    node('post2', post(7), [{ end: 'bottom', ontoId: 'pad' }], 'Basement post'),
    node('fw', foundationWall(), [], 'Foundation wall'),
    node('pad', pad(), [], 'New pad'),
  ];
  return nodes.map((n) => ({ ...n, ...overrides[n.id] }));
}

describe('equilibrium: what reaches the ground is everything applied, self-weights included', () => {
  const result = evaluateLoadPath({ edition: 'ASCE 7-16', nodes: chain() });
  const el = (id: string) => result.elements.find((e) => e.id === id);

  it('dead load: floor dead over each design span, each member’s self-weight, each post’s own weight', () => {
    const beamSpan = el('beam')?.memberResult?.spans.designSpanFt ?? NaN;
    const girderSpan = el('girder')?.memberResult?.spans.designSpanFt ?? NaN;
    const expected =
      (12 * 10 + (el('beam')?.memberResult?.member.selfWeightPlf ?? NaN)) * beamSpan +
      (4 * 10 + (el('girder')?.memberResult?.member.selfWeightPlf ?? NaN)) * girderSpan +
      getSize(DFL2, '6x6').selfWeightPlf * (8 + 7);
    expectApprox(result.atGround.D, expected, { rel: 1e-9 });
    expectApprox(result.applied.D, expected, { rel: 1e-9 });
  });

  it('live load: 40 psf over both tributary areas, nothing left on an open end', () => {
    const beamSpan = el('beam')?.memberResult?.spans.designSpanFt ?? NaN;
    const girderSpan = el('girder')?.memberResult?.spans.designSpanFt ?? NaN;
    expectApprox(result.atGround.L, 12 * 40 * beamSpan + 4 * 40 * girderSpan, { rel: 1e-9 });
    expect(result.unresolved).toEqual({ D: 0, L: 0, Lr: 0, S: 0 });
  });

  it('orders the chain from the member to the ground, level by level', () => {
    expect(result.elements.map((e) => [e.id, e.level])).toEqual([
      ['beam', 0],
      ['wall', 1],
      ['post', 1],
      ['girder', 2],
      ['fw', 3],
      ['post2', 3],
      ['pad', 4],
    ]);
  });
});

describe('states: "load path open" until every chain ends on a confirmed footing or foundation wall', () => {
  const stateOf = (nodes: LoadPathNode[], id = 'beam') =>
    evaluateLoadPath({ edition: 'ASCE 7-16', nodes }).elements.find((e) => e.id === id);

  it('the whole chain passes and closes when the footing and foundation wall are confirmed', () => {
    const result = evaluateLoadPath({ edition: 'ASCE 7-16', nodes: chain() });
    expect(result.elements.map((e) => e.state)).toEqual(Array(7).fill('passes'));
  });

  it('an end that says nothing leaves the member open, with the reason, and its load unresolved', () => {
    const beamOnly = stateOf(chain({ beam: { bearings: [{ end: 'left', ontoId: 'wall' }] } }));
    expect(beamOnly?.checkState).toBe('passes');
    expect(beamOnly?.state).toBe('load-path-open');
    expect(beamOnly?.openReasons).toEqual(['Right end: say what it bears on.']);
  });

  it('a footing not yet confirmed keeps every element above it open', () => {
    const result = evaluateLoadPath({ edition: 'ASCE 7-16', nodes: chain({ pad: { element: pad(false) } }) });
    const states = Object.fromEntries(result.elements.map((e) => [e.id, e.state]));
    expect(states).toMatchObject({
      beam: 'load-path-open',
      girder: 'load-path-open',
      fw: 'passes',
      pad: 'load-path-open',
    });
    expect(result.elements.find((e) => e.id === 'pad')?.openReasons[0]).toMatch(/^Confirm the new pad/);
  });

  it('a girder failing under the new point load shows "fails"; the beam above it "load path open"', () => {
    const weak = beamInput({
      clearSpanFt: 14,
      sizeId: '2x8',
      gradeUnknown: true,
      measuredPly: { bIn: 1.75, dIn: 7.5 },
    });
    const result = evaluateLoadPath({
      edition: 'ASCE 7-16',
      nodes: chain({ girder: { element: { kind: 'girder', input: weak } } }),
    });
    const girderResult = result.elements.find((e) => e.id === 'girder');
    expect(girderResult?.state).toBe('fails');
    expect(girderResult?.assumptions.some((a) => a.includes('weakest grade'))).toBe(true);
    expect(result.elements.find((e) => e.id === 'post')?.openReasons).toEqual([
      'Bottom → Basement girder: fails under the load.',
    ]);
    expect(result.elements.find((e) => e.id === 'beam')?.state).toBe('load-path-open');
  });

  it('a brick pier, a footing of unknown size and a column on a slab each need an engineer, with the reason', () => {
    const pier = stateOf(chain({ post2: { element: { kind: 'pier', material: 'brick' } } }), 'post2');
    expect(pier?.state).toBe('engineer-required');
    expect(pier?.engineerReasons[0]).toMatch(/brick pier/);
    const unknown = stateOf(
      chain({ pad: { element: { kind: 'footing', data: { footing: 'existing', confirmed: true } } } }),
      'pad',
    );
    expect(unknown?.engineerReasons[0]).toMatch(/unknown size/);
    const slab = stateOf(chain({ pad: { element: { kind: 'slab' } } }), 'pad');
    expect(slab?.engineerReasons[0]).toMatch(/^A slab is not a footing/);
    expect(stateOf(chain({ pad: { element: { kind: 'slab' } } }))?.state).toBe('load-path-open');
  });

  it('a post through floor framing with nothing under it leaves the chain open (common practice: squash blocks)', () => {
    const open = stateOf(
      chain({ post: { bearings: [{ end: 'bottom', ontoId: 'girder', atFt: 10, through: 'nothing' }] } }),
      'post',
    );
    expect(open?.openReasons[0]).toMatch(/squash blocks or solid blocking/);
  });

  it('an existing footing of measured size is checked against the soil bearing (IRC 2021 R401.4.1, 1,500 psf)', () => {
    const small = evaluateLoadPath({
      edition: 'ASCE 7-16',
      nodes: chain({
        pad: {
          element: {
            kind: 'footing',
            data: { footing: 'existing', widthIn: 12, lengthIn: 12, confirmed: true },
          },
        },
      }),
    }).elements.find((e) => e.id === 'pad');
    const check = small?.checks[0];
    expectApprox(check?.demand ?? NaN, small?.incoming.reduce((s, i) => s + i.load.D + i.load.L, 0) ?? NaN, {
      rel: 1e-9,
    });
    expect(check?.capacity).toBe(1500);
    expect(small?.state).toBe(check && check.ratio > 1 ? 'fails' : 'passes');
  });
});

describe('refused chains', () => {
  it('a cycle (A on B on A) is refused with a message naming the loop', () => {
    const a = node(
      'a',
      { kind: 'member', input: beam },
      [
        { end: 'left', ontoId: 'b', atFt: 2 },
        { end: 'right', ontoId: 'fw' },
      ],
      'Beam A',
    );
    const b = node(
      'b',
      { kind: 'member', input: beam },
      [
        { end: 'left', ontoId: 'a', atFt: 2 },
        { end: 'right', ontoId: 'fw' },
      ],
      'Beam B',
    );
    const run = () => evaluateLoadPath({ edition: 'ASCE 7-16', nodes: [a, b, node('fw', foundationWall())] });
    expect(run).toThrow(CalcInputError);
    expect(run).toThrow(
      /bear on each other in a loop, so no load reaches the ground: (Beam A → Beam B → Beam A|Beam B → Beam A → Beam B)\./,
    );
  });

  it('a loop below the member is named without the member above it', () => {
    const top = node('top', post(), [{ end: 'bottom', ontoId: 'a', atFt: 1 }], 'Top post');
    const a = node(
      'a',
      { kind: 'girder', input: beam },
      [
        { end: 'left', ontoId: 'p' },
        { end: 'right', ontoId: 'fw' },
      ],
      'Girder',
    );
    const p = node('p', post(), [{ end: 'bottom', ontoId: 'a', atFt: 4 }], 'Post');
    expect(() =>
      evaluateLoadPath({ edition: 'ASCE 7-16', nodes: [top, a, p, node('fw', foundationWall())] }),
    ).toThrow(/: (Girder → Post → Girder|Post → Girder → Post)\./);
  });

  it('an end the element does not have, an unknown element, and a beam landing without a position', () => {
    const bad = (bearings: LoadPathNode['bearings']) => () =>
      evaluateLoadPath({
        edition: 'ASCE 7-16',
        nodes: [node('p', post(), bearings), node('g', { kind: 'girder', input: beam })],
      });
    expect(bad([{ end: 'left', ontoId: 'g', atFt: 1 }])).toThrow(
      expect.objectContaining({ field: 'p.bearings.left' }),
    );
    expect(bad([{ end: 'bottom', ontoId: 'nope' }])).toThrow(
      expect.objectContaining({ field: 'p.bearings.bottom.ontoId' }),
    );
    expect(bad([{ end: 'bottom', ontoId: 'g' }])).toThrow(
      expect.objectContaining({ field: 'p.bearings.bottom.atFt' }),
    );
  });
});

describe('chainBelow: the chain under one member, from the top down', () => {
  it('follows every end to the ground and gives each step its depth below the member', () => {
    const result = evaluateLoadPath({ edition: 'ASCE 7-16', nodes: chain() });
    expect(chainBelow(result, 'post').map((s) => [s.element.id, s.depth])).toEqual([
      ['post', 0],
      ['girder', 1],
      ['fw', 2],
      ['post2', 2],
      ['pad', 3],
    ]);
    expect(chainBelow(result, 'beam')).toHaveLength(7);
    expect(chainBelow(result, 'nobody')).toEqual([]);
  });
});
