import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT, prescriptiveVerdict } from '@/lib/calc/prescriptive';
import { prescriptiveInputSchema } from '@/shared/schemas/calc/member';
import type { MemberCheckInputBody } from '@/shared/schemas/calc/member';

const header: MemberCheckInputBody = {
  kind: 'header',
  edition: 'ASCE 7-16',
  clearSpanFt: 6,
  roofPitchIn12: 6,
  snow: { groundSnowPsf: 30 },
  sources: [
    { kind: 'roof', tributaryFt: 14, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'ceiling', tributaryFt: 7, deadPsf: 10, livePsf: 10 },
  ],
  materialId: 'sawn-spruce-pine-fir-no1-no2',
  sizeId: '2-ply-2x8',
};
const verdict = (member: MemberCheckInputBody, buildingWidthFt: number | null = 28, groundSnowPsf = 30) =>
  prescriptiveVerdict(prescriptiveInputSchema.parse({ member, buildingWidthFt, groundSnowPsf }));

describe('prescriptive verdict (IRC R602.7 header tables: scope only, never the table)', () => {
  it('a roof and ceiling header in a 28 ft wide house with 30 psf ground snow is likely covered, with our own size', () => {
    const result = verdict(header);
    expect(result.verdict).toBe('likely-covered');
    expect(result.message).toMatch(/^Likely covered by your adopted code's header table — check it there/);
    expect(result.reasons).toEqual([]);
    expect(result.computed?.sizeId).toMatch(/2x/);
    expect(result.computed?.utilization ?? 2).toBeLessThanOrEqual(1);
    expect(result.caution).toBe(CAUTION_TEXT);
  });

  it('lists every reason a case sits outside the tables', () => {
    const result = verdict(
      {
        ...header,
        kind: 'beam',
        clearSpanFt: 18,
        materialId: 'lvl-2.0e',
        sizeId: '2-ply-1.75x11.875',
        sources: [
          ...(header.sources ?? []),
          { kind: 'point', pointKind: 'girder-truss', atFt: 4, deadLb: 800, snowLb: 900 },
          { kind: 'floor', tributaryFt: 6, deadPsf: 10, livePsf: 40 },
          { kind: 'floor', tributaryFt: 6, deadPsf: 10, livePsf: 40 },
        ],
      },
      null,
      90,
    );
    expect(result.verdict).toBe('engineer-needed');
    expect(result.message).toMatch(/^Engineer needed because /);
    expect(result.reasons).toHaveLength(7);
    expect(result.computed).toBeNull();
  });

  it('sends a header no 2x size can carry to an engineer', () => {
    const heavy = verdict({
      ...header,
      clearSpanFt: 15,
      sources: [{ kind: 'roof', tributaryFt: 30, deadPsf: 20, roofLivePsf: 20 }],
    });
    expect(heavy.verdict).toBe('engineer-needed');
    expect(heavy.reasons[0]).toMatch(/no sawn 2x header/);
  });

  it('uses the IRC R602.7(1) envelope edges: 36 ft building width and 70 psf ground snow', () => {
    expect(verdict(header, 36, 70).verdict).toBe('likely-covered');
    expect(verdict(header, 36.5, 70).reasons).toHaveLength(1);
    expect(verdict(header, 36, 71).reasons).toHaveLength(1);
  });
});
