import { describe, expect, it } from 'vitest';
import { buildSpanTable } from '@/lib/calc/span-table';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';
import { expectApprox } from '@/tests/helpers/approx';

// IRC 2018 Table R502.3.1(2), Spruce-Pine-Fir No.1/No.2 joists at 16 in on centre, 40 psf live, 10 psf dead
// (joist weight included), L/360 live. The code's spans follow the AWC span-table assumptions: repetitive
// members (C_r 1.15), normal load duration, spans printed to the nearest inch. The comparison is on the
// solved span itself, so the table prints design spans here.
const table = buildSpanTable(
  spanTableInputSchema.parse({
    edition: 'ASCE 7-16',
    deadPsf: 10,
    livePsf: 40,
    tributaryWidthsFt: [16 / 12],
    materialIds: ['sawn-spruce-pine-fir-no1-no2'],
    plies: [1],
    repetitive: true,
    selfWeight: false,
    deflectionUse: 'floor',
    spanBasis: 'design',
  }),
);
const spanIn = (sizeId: string) => (table.rows.find((r) => r.sizeId === sizeId)?.cells[0].spanFt ?? NaN) * 12;

describe('span table against IRC 2018 Table R502.3.1(2), SPF No.1/No.2, 16 in o.c., 40 L / 10 D, L/360', () => {
  it('2x6 9-4, 2x8 12-3, 2x10 15-5, 2x12 17-10 within the table rounding (nearest inch)', () => {
    expectApprox(spanIn('2x6'), 9 * 12 + 4, { abs: 0.5 }); // IRC 2018 Table R502.3.1(2): 9-4
    expectApprox(spanIn('2x8'), 12 * 12 + 3, { abs: 0.5 }); // IRC 2018 Table R502.3.1(2): 12-3
    expectApprox(spanIn('2x10'), 15 * 12 + 5, { abs: 0.5 }); // IRC 2018 Table R502.3.1(2): 15-5
    expectApprox(spanIn('2x12'), 17 * 12 + 10, { abs: 0.5 }); // IRC 2018 Table R502.3.1(2): 17-10
  });

  it('deflection governs the shallow joists and bending the deep ones, as in the AWC span tables', () => {
    const governed = (sizeId: string) => table.rows.find((r) => r.sizeId === sizeId)?.cells[0].governedBy;
    expect(governed('2x6')).toBe('deflection-live');
    expect(governed('2x8')).toBe('deflection-live');
    expect(governed('2x10')).toBe('bending');
    expect(governed('2x12')).toBe('bending');
  });

  it('prints spans in ft-in rounded down to the inch', () => {
    const row = table.rows.find((r) => r.sizeId === '2x12');
    expect(row?.cells[0].spanText).toBe('17-10');
  });
});
