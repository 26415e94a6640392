import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { listMaterials, listSizes } from '@/lib/calc/materials';
import { buildSpanTable } from '@/lib/calc/span-table';
import { CalcInputError } from '@/lib/calc/types';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';
import { expectApprox } from '@/tests/helpers/approx';

describe('span table', () => {
  it('at the solved span the member check governs at a ratio of 1 (same rules, solved not interpolated)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(
          'sawn-douglas-fir-larch-no2',
          'glulam-24f-v4-df',
          'lvl-2.0e',
          'sawn-southern-pine-no2',
        ),
        fc.double({ min: 2, max: 16, noNaN: true }),
        fc.constantFrom('ASCE 7-16' as const, 'ASCE 7-22' as const),
        (materialId, tributaryFt, edition) => {
          const bearingIn = 3;
          const table = buildSpanTable(
            spanTableInputSchema.parse({
              edition,
              deadPsf: 15,
              livePsf: 40,
              roofSnowPsf: 25,
              tributaryWidthsFt: [tributaryFt],
              materialIds: [materialId],
              plies: [1, 2],
              bearingIn,
            }),
          );
          const row = table.rows[Math.floor(table.rows.length / 2)];
          const cell = row.cells[0];
          const result = checkMember(
            memberCheckInputSchema.parse({
              kind: 'beam',
              edition,
              clearSpanFt: cell.spanFt - bearingIn / 12,
              bearingLeftIn: bearingIn,
              bearingRightIn: bearingIn,
              sources: [
                { kind: 'floor', tributaryFt, deadPsf: 15, livePsf: 40 },
                { kind: 'roof', tributaryFt, deadPsf: 0, roofLivePsf: 0, snowPsf: 25 },
              ],
              materialId,
              sizeId: row.sizeId,
            }),
          );
          // every limit is a closed form (glulam's C_V is a power of the span), so the check lands on 1
          expectApprox(result.governing.ratio, 1, { rel: 1e-9 });
          expect(result.governing.ratio).toBeLessThanOrEqual(1 + 1e-9);
          expect(result.governing.check).toBe(cell.governedBy);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('spans fall as the tributary width grows', () => {
    const table = buildSpanTable(
      spanTableInputSchema.parse({
        edition: 'ASCE 7-22',
        deadPsf: 12,
        livePsf: 40,
        tributaryWidthsFt: [2, 4, 6, 8, 10, 12, 14, 16],
        materialIds: ['sawn-hem-fir-no2'],
      }),
    );
    for (const row of table.rows) {
      for (let i = 1; i < row.cells.length; i++)
        expect(row.cells[i].spanFt).toBeLessThan(row.cells[i - 1].spanFt);
    }
    expect(table.caution).toMatch(/^Preliminary check only/);
  });
});

describe('bounded work (CALC_BOUNDS.spanTableWork)', () => {
  const body = {
    edition: 'ASCE 7-22' as const,
    deadPsf: 12,
    livePsf: 40,
    roofLivePsf: 20,
    roofSnowPsf: 30,
    tributaryWidthsFt: [2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24],
  };

  it('tabulates a material named many times once', () => {
    const table = buildSpanTable(
      spanTableInputSchema.parse({ ...body, materialIds: Array(40).fill('sawn-hem-fir-no2') }),
    );
    expect(table.rows.length).toBe(listSizes('sawn-hem-fir-no2').length);
  });

  it('refuses sizes × widths × combinations past the ceiling, naming the count and the ceiling', () => {
    const input = spanTableInputSchema.parse({ ...body, materialIds: listMaterials().map((m) => m.id) });
    const refusal = (() => {
      try {
        buildSpanTable(input);
      } catch (error) {
        return error;
      }
      return null;
    })();
    expect(refusal).toBeInstanceOf(CalcInputError);
    expect((refusal as CalcInputError).field).toBe('materialIds');
    expect((refusal as CalcInputError).message).toContain(
      `at most ${CALC_BOUNDS.spanTableWork.toLocaleString('en-US')} per request`,
    );
  });
});

describe('printed spans: clear by default, design on request', () => {
  const body = {
    edition: 'ASCE 7-16' as const,
    deadPsf: 10,
    livePsf: 40,
    tributaryWidthsFt: [16 / 12],
    materialIds: ['sawn-spruce-pine-fir-no1-no2'],
    plies: [1],
    repetitive: true,
    selfWeight: false,
    bearingIn: 4.5,
  };

  it('prints the clear span (design span less the bearing) and says so at the head', () => {
    const table = buildSpanTable(spanTableInputSchema.parse(body));
    expect(table.spanBasis).toBe('clear');
    expect(table.spanHeading).toContain('Clear spans');
    const cell = table.rows.find((r) => r.sizeId === '2x10')?.cells[0];
    // clear span = design span − two halves of the 4.5 in bearing (DESIGN.md §5 span names).
    expectApprox(cell?.clearSpanFt ?? NaN, (cell?.designSpanFt ?? NaN) - 4.5 / 12, { rel: 1e-12 });
    expectApprox(cell?.designSpanFt ?? NaN, cell?.spanFt ?? NaN, { rel: 0 });
    const clearIn = Math.floor((cell?.clearSpanFt ?? NaN) * 12 + 1e-9);
    expect(cell?.spanText).toBe(`${Math.floor(clearIn / 12)}-${clearIn % 12}`);
  });

  it('prints the design span when asked and says so', () => {
    const table = buildSpanTable(spanTableInputSchema.parse({ ...body, spanBasis: 'design' }));
    expect(table.spanBasis).toBe('design');
    expect(table.spanHeading).toContain('Design spans');
    const cell = table.rows.find((r) => r.sizeId === '2x10')?.cells[0];
    const designIn = Math.floor((cell?.designSpanFt ?? NaN) * 12 + 1e-9);
    expect(cell?.spanText).toBe(`${Math.floor(designIn / 12)}-${designIn % 12}`);
  });
});

describe('span tables for two continuous spans and for a span with an overhang', () => {
  const materials = ['sawn-douglas-fir-larch-no2', 'glulam-24f-v4-df', 'lvl-2.0e'];
  const bearingIn = 3;

  it.each(['two-span', 'overhang'] as const)(
    '%s: at the solved span the member check of that geometry governs at 1 (same rules, solved)',
    (layout) => {
      fc.assert(
        fc.property(
          fc.constantFrom(...materials),
          fc.nat(),
          fc.double({ min: 1, max: 16, noNaN: true }),
          fc.constantFrom('ASCE 7-16' as const, 'ASCE 7-22' as const),
          (materialId, seed, tributaryFt, edition) => {
            const table = buildSpanTable(
              spanTableInputSchema.parse({
                edition,
                deadPsf: 15,
                livePsf: 40,
                roofSnowPsf: 25,
                tributaryWidthsFt: [tributaryFt],
                materialIds: [materialId],
                plies: materialId.startsWith('glulam') ? [1] : [2],
                bearingIn,
                shearAtD: false,
                layout,
                overhangFraction: 0.3,
              }),
            );
            const row = table.rows[seed % table.rows.length];
            const cell = row.cells[0];
            const spanFt = cell.designSpanFt ?? NaN;
            // The member check takes clear spans to 40 ft.
            fc.pre(spanFt < 39);
            const geometry =
              layout === 'two-span'
                ? { secondClearSpanFt: spanFt - bearingIn / 12, centreBearingIn: bearingIn }
                : { overhangRightFt: 0.3 * spanFt - bearingIn / 24 };
            const result = checkMember(
              memberCheckInputSchema.parse({
                kind: 'beam',
                edition,
                clearSpanFt: spanFt - bearingIn / 12,
                bearingLeftIn: bearingIn,
                bearingRightIn: bearingIn,
                ...geometry,
                shearAtD: false,
                sources: [
                  { kind: 'floor', tributaryFt, deadPsf: 15, livePsf: 40 },
                  { kind: 'roof', tributaryFt, deadPsf: 0, roofLivePsf: 0, snowPsf: 25 },
                ],
                materialId,
                sizeId: row.sizeId,
              }),
            );
            expectApprox(result.governing.ratio, 1, { rel: 1e-9 });
            expect(result.governing.check).toBe(cell.governedBy);
          },
        ),
        { numRuns: 40 },
      );
    },
  );

  it('says which layout it is and prints the span of each span', () => {
    const table = buildSpanTable(
      spanTableInputSchema.parse({
        edition: 'ASCE 7-16',
        deadPsf: 10,
        livePsf: 40,
        tributaryWidthsFt: [16 / 12],
        materialIds: ['sawn-spruce-pine-fir-no1-no2'],
        plies: [1],
        layout: 'two-span',
      }),
    );
    expect(table.layout).toBe('two-span');
    expect(table.notes.join(' ')).toContain('Two equal spans continuous');
  });
});
