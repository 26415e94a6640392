import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createSimpleSpan, sampleDiagram } from '@/lib/calc/analysis';
import type { BeamLoad } from '@/lib/calc/types';
import { expectApprox } from '@/tests/helpers/approx';

const spanAndLoads = fc.double({ min: 1, max: 40, noNaN: true }).chain((spanFt) =>
  fc.record({
    spanFt: fc.constant(spanFt),
    loads: fc.array(
      fc.oneof(
        fc.record({
          kind: fc.constant('point' as const),
          pLb: fc.double({ min: 0, max: 20000, noNaN: true }),
          atFt: fc.double({ min: 0, max: spanFt, noNaN: true }),
        }),
        fc
          .tuple(
            fc.double({ min: 0, max: 2000, noNaN: true }),
            fc.double({ min: 0, max: spanFt, noNaN: true }),
            fc.double({ min: 0, max: spanFt, noNaN: true }),
          )
          .map(([wPlf, x1, x2]): BeamLoad => ({
            kind: 'uniform',
            wPlf,
            startFt: Math.min(x1, x2),
            endFt: Math.max(x1, x2),
          })),
      ),
      { maxLength: 6 },
    ),
  }),
);

const EI = 1.8e6 * 200;

describe('simple span properties (statics, no NaN)', () => {
  it('reactions balance the applied load and moments vanish at the supports', () => {
    fc.assert(
      fc.property(spanAndLoads, ({ spanFt, loads }) => {
        const beam = createSimpleSpan({ spanFt, loads, eiLbIn2: EI });
        const total = loads.reduce(
          (sum, l) => sum + (l.kind === 'point' ? l.pLb : l.wPlf * ((l.endFt ?? spanFt) - (l.startFt ?? 0))),
          0,
        );
        const [left, right] = beam.reactions();
        expectApprox(left.reactionLb + right.reactionLb, total, { abs: 1e-6, rel: 1e-9 });
        expectApprox(beam.momentLbFt(spanFt), 0, { abs: 1e-6 * Math.max(1, total * spanFt) });
        expectApprox(beam.deflectionIn(spanFt), 0, {
          abs: 1e-9 * Math.max(1, Math.abs(beam.maxDeflection().value)),
        });
      }),
    );
  });

  it('the reported maxima bound every sampled value and are finite', () => {
    fc.assert(
      fc.property(spanAndLoads, ({ spanFt, loads }) => {
        const beam = createSimpleSpan({ spanFt, loads, eiLbIn2: EI });
        const mMax = Math.abs(beam.maxMoment().value);
        const dMax = Math.abs(beam.maxDeflection().value);
        const vMax = Math.abs(beam.maxShear().value);
        for (const s of sampleDiagram(beam, 101)) {
          expect(Number.isFinite(s.shearLb + s.momentLbFt + s.deflectionIn)).toBe(true);
          expect(Math.abs(s.momentLbFt)).toBeLessThanOrEqual(mMax * (1 + 1e-9) + 1e-9);
          expect(Math.abs(s.deflectionIn)).toBeLessThanOrEqual(dMax * (1 + 1e-9) + 1e-12);
          expect(Math.abs(s.shearLb)).toBeLessThanOrEqual(vMax * (1 + 1e-9) + 1e-9);
        }
      }),
    );
  });
});
