import { describe, expect, it } from 'vitest';
import { buildSpanTable, getMaterial, listSizes } from '@/lib/calc';
import {
  DEFAULT_MATERIAL_ID,
  emptySpanTableDraft,
  plyCounts,
  withMaterial,
  type SpanTableDraft,
} from '@/lib/ui/span-table/span-table-draft';
import { spanBasisOf } from '@/lib/ui/span-table/span-basis';
import { readSpanTableDraft, runSpanTable } from '@/lib/ui/span-table/span-table-input';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';
import { expectApprox } from '@/tests/helpers/approx';
import { formatSpanFtIn } from '@/lib/format';

const draft = (patch: Partial<SpanTableDraft> = {}): SpanTableDraft => ({
  ...emptySpanTableDraft(),
  ...patch,
});

function errorsOf(patch: Partial<SpanTableDraft>) {
  const run = runSpanTable(draft(patch));
  if (run.ok) throw new Error('expected the run to fail');
  return run.errors;
}

describe('span table draft', () => {
  it('starts on a catalogue material at the member editor’s floor defaults (HUD RSDG Table 3.2, ASCE 7-16 Table 4.3-1)', () => {
    const d = emptySpanTableDraft();
    expect(getMaterial(DEFAULT_MATERIAL_ID).family).toBe('sawn');
    expect(d.deadPsf).toBe('12');
    expect(d.livePsf).toBe('40');
    expect(d.plies).toEqual([1, 2, 3]);
  });

  it('keeps only the ply counts the chosen material comes in', () => {
    const glulam = withMaterial(draft({ plies: [2, 3] }), 'glulam-24f-v4-df');
    expect(glulam.plies).toEqual(plyCounts('glulam-24f-v4-df'));
    expect(new Set(listSizes('glulam-24f-v4-df').map((s) => s.plies))).toEqual(new Set(glulam.plies));
    expect(withMaterial(draft({ plies: [2, 3] }), 'lvl-2.0e').plies).toEqual([2, 3]);
  });
});

describe('readSpanTableDraft', () => {
  it('reads psf, the bearing as a length in inches and the widths in feet', () => {
    const { input, errors } = readSpanTableDraft(
      draft({ roofSnowPsf: '25', bearing: '4 1/2', widths: `6' 6", 10` }),
    );
    expect(errors).toEqual({});
    expect(input).toMatchObject({
      edition: 'ASCE 7-22',
      deadPsf: 12,
      livePsf: 40,
      roofLivePsf: undefined,
      roofSnowPsf: 25,
      tributaryWidthsFt: [6.5, 10],
      materialIds: [DEFAULT_MATERIAL_ID],
      bearingIn: 4.5,
    });
  });

  it('leaves an empty bearing to the engine default', () => {
    expect(readSpanTableDraft(draft({ bearing: ' ' })).input.bearingIn).toBeUndefined();
  });
});

describe('runSpanTable', () => {
  it('prints clear spans by default and design spans when asked, a bearing length apart', () => {
    const clear = runSpanTable(draft());
    const design = runSpanTable(draft({ designSpans: true }));
    expect(clear.ok && spanBasisOf(clear.result)).toBe('clear');
    expect(design.ok && spanBasisOf(design.result)).toBe('design');
    if (!clear.ok || !design.ok) return;
    const [c, d] = [clear.result.rows[0].cells[0], design.result.rows[0].cells[0]];
    // The same largest span either way; design span = clear span + half the 3 in bearing at each end.
    expectApprox(d.spanFt, c.spanFt, { abs: 1e-9 });
    expectApprox((c.designSpanFt ?? NaN) - (c.clearSpanFt ?? NaN), 3 / 12, { abs: 1e-9 });
    expect(c.spanText).toBe(formatSpanFtIn((c.clearSpanFt ?? NaN) * 12));
    expect(d.spanText).toBe(formatSpanFtIn(d.spanFt * 12));
  });

  it('builds the same table as the engine on the schema-parsed input (the server’s path)', () => {
    const run = runSpanTable(draft());
    expect(run.ok).toBe(true);
    if (!run.ok) return;
    const direct = buildSpanTable(spanTableInputSchema.parse(readSpanTableDraft(draft()).input));
    expect(run.result).toEqual(direct);
    expect(run.result.tributaryWidthsFt).toEqual([4, 8, 12, 16]);
    expect(run.result.rows.every((r) => r.cells.length === 4)).toBe(true);
  });

  it('puts letters in a load at that load and computes nothing', () => {
    expect(errorsOf({ deadPsf: 'twelve' })).toEqual({
      deadPsf: ['Dead load: enter a number of psf, like 15 or 12.5'],
    });
  });

  it('asks for the dead load when it is empty; other loads may be empty', () => {
    expect(errorsOf({ deadPsf: '', livePsf: '' })).toEqual({ deadPsf: ['Enter the dead load in psf'] });
  });

  it('gives a negative load the schema’s message at the field', () => {
    expect(errorsOf({ livePsf: '-40' }).livePsf).toEqual(['The live load cannot be negative']);
  });

  it('names a negative, a zero and a too-wide tributary width by its place in the list', () => {
    expect(errorsOf({ widths: '4, -8' }).widths?.[0]).toMatch(/^Width 2: a length can't be negative/);
    expect(errorsOf({ widths: '4, 0' }).widths).toEqual(['Width 2: must be more than 0 ft']);
    expect(errorsOf({ widths: '70' }).widths).toEqual(['Width 1: at most 60 ft']);
  });

  it('asks for at least one width, and at most twelve', () => {
    expect(errorsOf({ widths: '' }).widths).toEqual(['Give at least one tributary width']);
    expect(errorsOf({ widths: Array.from({ length: 13 }, (_, i) => i + 1).join(', ') }).widths).toEqual([
      'At most 12 tributary widths',
    ]);
  });

  it('asks for a ply count when none is chosen', () => {
    expect(errorsOf({ plies: [] }).plies).toEqual(['Choose at least one ply count']);
  });

  it('reads the bearing as a length and checks it is above 0', () => {
    expect(errorsOf({ bearing: 'wide' }).bearing?.[0]).toMatch(/^Bearing length: can't read "wide"/);
    expect(errorsOf({ bearing: '0' }).bearing).toEqual(['Bearing length: must be more than 0 in']);
  });

  it('shows every field’s message at once, each at its own field', () => {
    const errors = errorsOf({ deadPsf: 'x', widths: '-1', bearing: '0' });
    expect(Object.keys(errors).sort()).toEqual(['bearing', 'deadPsf', 'widths']);
  });

  it('puts an unknown material at the material field', () => {
    expect(Object.keys(errorsOf({ materialId: 'no-such-material' }))).toEqual(['materialId']);
  });
});
