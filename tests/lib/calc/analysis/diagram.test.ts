import { describe, expect, it } from 'vitest';
import { createSimpleSpan, sampleDiagram } from '@/lib/calc/analysis';
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
