import { describe, expect, it } from 'vitest';
import { createSimpleSpan, loadsAwayFromSupports, sampleDiagram } from '@/lib/calc/analysis';
import { expectApprox } from '@/tests/helpers/approx';

const EI = 1.6e6 * 47.63;

describe('sampleDiagram', () => {
  it('puts both sides of a point-load jump at the same station and includes the peaks', () => {
    const beam = createSimpleSpan({
      spanFt: 10,
      eiLbIn2: EI,
      loads: [{ kind: 'point', pLb: 1000, atFt: 3.3 }],
    });
    const samples = sampleDiagram(beam, 11);
    const atLoad = samples.filter((s) => s.xFt === 3.3);
    expect(atLoad).toHaveLength(2);
    expectApprox(atLoad[0].shearLb, 670, { rel: 1e-12 }); // R1 = Pb/l = 1000·6.7/10 (AWC DA6 case 8)
    expectApprox(atLoad[1].shearLb, -330, { rel: 1e-12 }); // R1 − P
    expect(samples.some((s) => s.xFt === beam.maxDeflection().atFt)).toBe(true);
    expect(samples[0].xFt).toBe(0);
    expect(samples[samples.length - 1].xFt).toBe(10);
    for (let i = 1; i < samples.length; i++)
      expect(samples[i].xFt).toBeGreaterThanOrEqual(samples[i - 1].xFt);
  });
});

describe('loadsAwayFromSupports', () => {
  it('cuts uniform loads back to d from each support: V = w(l/2 − d) (NDS 2018 §3.4.3.1(a))', () => {
    const l = 12;
    const w = 300;
    const dFt = 9.25 / 12;
    const loads = loadsAwayFromSupports(l, [{ kind: 'uniform', wPlf: w }], dFt);
    const beam = createSimpleSpan({ spanFt: l, eiLbIn2: EI, loads });
    expectApprox(beam.maxShear().value, w * (l / 2 - dFt), { rel: 1e-12 }); // AWC DA6 case 1: V_x = w(l/2 − x) at x = d
  });

  it('scales a point load inside d by x/d and keeps one beyond d whole', () => {
    const loads = loadsAwayFromSupports(
      10,
      [
        { kind: 'point', pLb: 1000, atFt: 0.5 },
        { kind: 'point', pLb: 1000, atFt: 5 },
      ],
      1,
    );
    expect(loads).toEqual([
      { kind: 'point', pLb: 500, atFt: 0.5 },
      { kind: 'point', pLb: 1000, atFt: 5 },
    ]);
  });
});
