import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const input = memberCheckInputSchema.parse({
  kind: 'beam',
  edition: 'ASCE 7-22',
  clearSpanFt: 11,
  sources: [
    { kind: 'floor', tributaryFt: 10, deadPsf: 12, livePsf: 40 },
    { kind: 'point', pointKind: 'post-above', atFt: 3.5, deadLb: 700, liveLb: 1100 },
  ],
  materialId: 'lvl-2.0e',
  sizeId: '2-ply-1.75x11.875',
});

describe('member check diagrams', () => {
  it('are sampled only when asked', () => {
    expect(checkMember(input).diagram).toBeUndefined();
    expect(checkMember(input, { diagrams: true }).diagram?.samples.length).toBeGreaterThan(41);
  });

  it("show the governing combination's largest moment and the end reactions", () => {
    const result = checkMember(input, { diagrams: true, diagramPoints: 21 });
    const samples = result.diagram?.samples ?? [];
    const bending = result.checks.find((c) => c.id === 'bending');
    expect(result.diagram?.combination).toBe(result.governing.combination);
    // every check of this beam governs under D + L (ASD: only D and L are present), so the diagram's peak is
    // the bending check's moment: M = f_b · S / 12 lb·ft (sampleDiagram adds the maximum's station)
    expect(bending?.combination).toBe('D + L');
    const peakLbFt = Math.max(...samples.map((s) => Math.abs(s.momentLbFt)));
    const sIn3 = (3.5 * 11.875 ** 2) / 6; // 2-ply 1-3/4 x 11-7/8: b·d²/6
    expectApprox(peakLbFt, ((bending?.demand ?? 0) * sIn3) / 12, { rel: 1e-9 });
    expectApprox(samples[0].shearLb, result.reactions.leftLb, { rel: 1e-9 });
    expectApprox(samples[samples.length - 1].shearLb, -result.reactions.rightLb, { rel: 1e-9 });
  });
});
