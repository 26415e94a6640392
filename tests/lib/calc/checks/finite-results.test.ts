import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildShortlist, buildSpanTable, checkMember, listMaterials, listSizes } from '@/lib/calc';
import { CalcInputError } from '@/lib/calc/types';
import {
  memberCheckInputSchema,
  memberCheckResultSchema,
  type MemberCheckInputBody,
} from '@/shared/schemas/calc/member';
import { shortlistInputSchema, shortlistResultSchema } from '@/shared/schemas/calc/shortlist';
import { spanTableInputSchema, spanTableResultSchema } from '@/shared/schemas/calc/span-table';

/** Every number anywhere in a value, with its path. */
function numbers(value: unknown, path = 'result'): [string, number][] {
  if (typeof value === 'number') return [[path, value]];
  if (Array.isArray(value)) return value.flatMap((v, i) => numbers(v, `${path}[${i}]`));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => numbers(v, `${path}.${k}`));
  return [];
}

function expectAllFinite(value: unknown): void {
  for (const [path, n] of numbers(value)) expect(Number.isFinite(n), path).toBe(true);
}

const materials = listMaterials().filter((m) => m.family !== 'sawn' || !/stud/.test(m.id));

/** Inputs pushed to the edges the schemas allow: the heaviest loads, the smallest sections and lengths. */
const extremeMember = fc
  .record({
    materialIndex: fc.nat({ max: materials.length - 1 }),
    sizeSeed: fc.nat(),
    clearSpanFt: fc.constantFrom(1e-6, 0.5, 40),
    tributaryFt: fc.constantFrom(1e-9, 60),
    psf: fc.constantFrom(0, 500),
    pointLb: fc.constantFrom(0, 200_000),
    bearingIn: fc.constantFrom(0.5, 24),
    measured: fc.boolean(),
    capIn: fc.constantFrom(undefined, 0.05),
    unbracedLengthFt: fc.constantFrom(undefined, 1e-9, 40),
  })
  .map((r): MemberCheckInputBody => {
    const material = materials[r.materialIndex];
    const sizes = listSizes(material.id);
    const size = sizes[r.sizeSeed % sizes.length];
    return {
      kind: 'beam',
      edition: 'ASCE 7-22',
      clearSpanFt: r.clearSpanFt,
      bearingLeftIn: r.bearingIn,
      bearingRightIn: r.bearingIn,
      roofPitchIn12: 6,
      snow: { groundSnowPsf: 300 },
      sources: [
        { kind: 'floor', tributaryFt: r.tributaryFt, deadPsf: r.psf, livePsf: r.psf },
        { kind: 'roof', tributaryFt: r.tributaryFt, deadPsf: r.psf, roofLivePsf: r.psf },
        { kind: 'point', pointKind: 'post-above', atFt: 0, deadLb: r.pointLb, liveLb: r.pointLb },
      ],
      materialId: material.id,
      sizeId: size.id,
      ...(r.measured && material.family === 'sawn' && { measuredPly: { bIn: 0.5, dIn: 1 } }),
      deflectionCapIn: r.capIn,
      unbracedLengthFt: r.unbracedLengthFt,
      supportWidthIn: 1.5,
      joistSpacingIn: 4,
      mount: 'flush',
    };
  });

describe('no result carries a non-finite number (output schemas reject Infinity and NaN)', () => {
  it('member checks at the edges of the input schema either refuse with a field or give finite numbers', () => {
    let checked = 0;
    fc.assert(
      fc.property(extremeMember, (body) => {
        const input = memberCheckInputSchema.parse(body);
        let result;
        try {
          result = checkMember(input, { diagrams: true });
        } catch (error) {
          expect(error).toBeInstanceOf(CalcInputError);
          return;
        }
        expect(memberCheckResultSchema.safeParse(result).success).toBe(true);
        expectAllFinite(result);
        checked++;
      }),
      { numRuns: 150 },
    );
    // Refusals (zero load, a size with no values here) are allowed, but most cases must be checked.
    expect(checked).toBeGreaterThan(100);
  });

  it('a shortlist and a span table at the heaviest loads give finite numbers', () => {
    const shortlist = buildShortlist(
      shortlistInputSchema.parse({
        kind: 'beam',
        edition: 'ASCE 7-16',
        clearSpanFt: 40,
        sources: [{ kind: 'floor', tributaryFt: 60, deadPsf: 500, livePsf: 500 }],
        materialIds: listMaterials().map((m) => m.id),
        pricePerFt: { '2x10': 1_000_000 },
        sortBy: 'cheapest',
      }),
    );
    expect(shortlistResultSchema.safeParse(shortlist).success).toBe(true);
    expectAllFinite(shortlist);
    const table = buildSpanTable(
      spanTableInputSchema.parse({
        edition: 'ASCE 7-22',
        deadPsf: 500,
        livePsf: 500,
        tributaryWidthsFt: [1e-9, 60],
        materialIds: ['sawn-douglas-fir-larch-no2', 'glulam-24f-v4-df', 'lvl-2.0e'],
        deflectionCapIn: 0.05,
      }),
    );
    expect(spanTableResultSchema.safeParse(table).success).toBe(true);
    expectAllFinite(table);
  });

  it('refuses a span table with no load at all instead of printing an endless span', () => {
    const input = spanTableInputSchema.parse({
      edition: 'ASCE 7-16',
      deadPsf: 0,
      tributaryWidthsFt: [4],
      materialIds: ['sawn-douglas-fir-larch-no2'],
      selfWeight: false,
    });
    expect(() => buildSpanTable(input)).toThrow(CalcInputError);
  });
});
