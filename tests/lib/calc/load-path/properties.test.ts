import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateLoadPath } from '@/lib/calc/load-path';
import type { LoadPathNode } from '@/shared/schemas/calc/load-path';
import { expectApprox } from '@/tests/helpers/approx';
import { beamInput, foundationWall, node, pad } from './fixtures';

/**
 * Random chains (invented loads): beams one under the next, each with a floor load; each beam's right end
 * lands on the next beam at a random point, its left end on a foundation wall; the last beam bears on a
 * foundation wall and a new pad, either of which may not be confirmed. Statics (superposition and
 * equilibrium of a simple beam, AWC Design Aid No. 6) say the ground takes everything applied.
 */
const beamArb = fc.record({
  clearSpanFt: fc.double({ min: 4, max: 16, noNaN: true }),
  tributaryFt: fc.double({ min: 1, max: 10, noNaN: true }),
  deadPsf: fc.double({ min: 5, max: 20, noNaN: true }),
  livePsf: fc.double({ min: 0, max: 40, noNaN: true }),
  at: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
});
const chainArb = fc.record({
  beams: fc.array(beamArb, { minLength: 1, maxLength: 4 }),
  wallConfirmed: fc.boolean(),
  padConfirmed: fc.boolean(),
});

type Chain = typeof chainArb extends fc.Arbitrary<infer T> ? T : never;

function build(c: Chain): LoadPathNode[] {
  const nodes: LoadPathNode[] = c.beams.map((b, i) => {
    const next = c.beams[i + 1];
    return node(
      `b${i}`,
      {
        kind: i === 0 ? 'member' : 'girder',
        input: beamInput({
          clearSpanFt: b.clearSpanFt,
          materialId: 'lvl-2.0e',
          sizeId: '4-ply-1.75x11.875',
          sources: [{ kind: 'floor', tributaryFt: b.tributaryFt, deadPsf: b.deadPsf, livePsf: b.livePsf }],
        }),
      },
      [
        { end: 'left', ontoId: 'fw' },
        next
          ? { end: 'right', ontoId: `b${i + 1}`, atFt: next.at * next.clearSpanFt, hanger: true }
          : { end: 'right', ontoId: 'pad' },
      ],
    );
  });
  return [...nodes, node('fw', foundationWall(c.wallConfirmed)), node('pad', pad(c.padConfirmed))];
}

describe('load path properties (fast-check)', () => {
  it('the ground takes everything applied: floor loads and self-weights over each design span', () => {
    fc.assert(
      fc.property(chainArb, (c) => {
        const result = evaluateLoadPath({ edition: 'ASCE 7-22', nodes: build(c) });
        let dead = 0;
        let live = 0;
        c.beams.forEach((b, i) => {
          const member = result.elements.find((e) => e.id === `b${i}`)?.memberResult;
          const span = member?.spans.designSpanFt ?? NaN;
          dead += (b.tributaryFt * b.deadPsf + (member?.member.selfWeightPlf ?? NaN)) * span;
          live += b.tributaryFt * b.livePsf * span;
        });
        expectApprox(result.atGround.D, dead, { rel: 1e-9 });
        expectApprox(result.atGround.L, live, { rel: 1e-9, abs: 1e-9 });
      }),
      { numRuns: 60, seed: 12 },
    );
  });

  it('nothing "passes" unless its chain is closed; closed needs every element below confirmed and passing', () => {
    fc.assert(
      fc.property(chainArb, (c) => {
        const result = evaluateLoadPath({ edition: 'ASCE 7-22', nodes: build(c) });
        const groundOk = c.wallConfirmed && c.padConfirmed;
        const byId = new Map(result.elements.map((e) => [e.id, e]));
        for (const e of result.elements) {
          if (e.state === 'passes') expect(e.closed).toBe(true);
          if (e.closed) {
            for (const end of e.ends) expect(end.ontoId && byId.get(end.ontoId)?.state).toBe('passes');
          }
        }
        const top = byId.get('b0');
        const everyBeamPasses = c.beams.every((_, i) => byId.get(`b${i}`)?.checkState === 'passes');
        expect(top?.closed).toBe(groundOk && everyBeamPasses && byId.get('pad')?.checkState === 'passes');
      }),
      { numRuns: 60, seed: 34 },
    );
  });
});
