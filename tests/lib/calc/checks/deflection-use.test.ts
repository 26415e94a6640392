import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const rafterBeam = (roofPitchIn12: number) =>
  checkMember(
    memberCheckInputSchema.parse({
      kind: 'beam',
      edition: 'ASCE 7-16',
      clearSpanFt: 10,
      roofPitchIn12,
      sources: [{ kind: 'roof', tributaryFt: 8, deadPsf: 15, roofLivePsf: 20 }],
      materialId: 'sawn-douglas-fir-larch-no2',
      sizeId: '2-ply-2x10',
      deflectionUse: 'roof-no-ceiling',
    }),
  );

describe('roof without a ceiling: L/180 only above 3 in 12 (IRC 2021 Table R301.7)', () => {
  it('names L/180 in the result and warns when the roof is 3 in 12 or flatter', () => {
    const flat = rafterBeam(2);
    expect(flat.checks.find((c) => c.id === 'deflection-live')?.label).toContain('L/180');
    expect(flat.warnings.some((w) => w.includes('R301.7'))).toBe(true);
  });

  it('does not warn on a steeper roof', () => {
    expect(rafterBeam(6).warnings.some((w) => w.includes('R301.7'))).toBe(false);
  });
});

describe('floors under tile and under natural stone', () => {
  const floorBeam = (deflectionUse: 'floor-tile' | 'floor-stone') =>
    checkMember(
      memberCheckInputSchema.parse({
        kind: 'beam',
        edition: 'ASCE 7-16',
        clearSpanFt: 10,
        sources: [{ kind: 'floor', tributaryFt: 8, deadPsf: 15, livePsf: 40 }],
        materialId: 'lvl-2.0e',
        sizeId: '2-ply-1.75x11.875',
        deflectionUse,
      }),
    );

  it('holds a floor under natural stone to L/720 live (Natural Stone Institute guideline)', () => {
    const result = floorBeam('floor-stone');
    const live = result.checks.find((c) => c.id === 'deflection-live');
    expect(live?.label).toContain('L/720');
    expectApprox(live?.capacity ?? NaN, (result.spans.designSpanFt * 12) / 720, { rel: 1e-12 });
    expect(live?.note).toBe('Floor under natural stone');
    expect(result.sources.join(' ')).toContain('Natural Stone Institute');
  });

  it('says the tile preset is for ceramic and porcelain tile, stricter than the TCNA minimum L/360', () => {
    const result = floorBeam('floor-tile');
    expect(result.checks.find((c) => c.id === 'deflection-live')?.note).toBe(
      'Floor under ceramic or porcelain tile',
    );
    expect(result.sources.join(' ')).toContain('TCNA Handbook minimum L/360');
  });
});
