import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';

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
