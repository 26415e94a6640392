import { describe, expect, it } from 'vitest';
import { buildSpanTable, DEFLECTION_PRESETS } from '@/lib/calc';
import { GOVERNING_KEYS, legendLines } from '@/lib/ui/span-table/governing-key';
import { printSheetModel } from '@/lib/ui/span-table/print-sheet-model';
import { spanBasisHeading, spanBasisName, spanBasisOf } from '@/lib/ui/span-table/span-basis';
import { markedSpan, spanTableCsv, widthTitle } from '@/lib/ui/span-table/span-table-csv';
import { assumptionsOf } from '@/lib/ui/span-table/span-table-summary';
import { checkIds } from '@/shared/schemas/calc/member';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';
import { readCsv } from '@/tests/helpers/csv';

const input = spanTableInputSchema.parse({
  edition: 'ASCE 7-16',
  deadPsf: 12.5,
  livePsf: 40,
  roofSnowPsf: 25,
  tributaryWidthsFt: [4, 6.5],
  materialIds: ['sawn-douglas-fir-larch-no2'],
  plies: [1, 2],
  bearingIn: 4.5,
  deflectionUse: 'plaster-ceiling',
});
const result = buildSpanTable(input);

describe('governing keys and legend', () => {
  it('gives every check of the engine its own key', () => {
    const keys = checkIds.map((id) => GOVERNING_KEYS[id].key);
    expect(new Set(keys).size).toBe(checkIds.length);
  });

  it('prints one legend line per key with the deflection limits of the chosen use (IRC 2021 Table R301.7)', () => {
    const lines = legendLines(DEFLECTION_PRESETS['plaster-ceiling']);
    expect(lines).toHaveLength(checkIds.length);
    expect(lines[0]).toBe('b = Bending');
    expect(lines).toContain('Δ = Deflection under live, roof live or snow load (L/360)');
    expect(lines).toContain('Δt = Total deflection, creep included (L/240)');
  });
});

describe('span basis heading', () => {
  // design span = clear span + half the bearing at each end (shared/schemas/calc/member.ts; DESIGN.md §5)
  it('says a design span is centre to centre and the clear span one bearing length shorter', () => {
    const text = spanBasisHeading('design', 3);
    expect(text).toMatch(/largest design span, support centre to support centre/);
    expect(text).toMatch(/clear span between the supports \(what you measure on site\) is 3" shorter/);
    expect(text).toMatch(/rounded down to the inch/);
  });

  it('says a clear span is between the faces of the supports for the stated bearing', () => {
    const text = spanBasisHeading('clear', 4.5);
    expect(text).toMatch(/largest clear span, between the faces of the supports/);
    expect(text).toMatch(/with 4-1\/2" of bearing at each end/);
    expect(text).toMatch(/design span, support centre to centre, is 4-1\/2" longer/);
    expect(spanBasisName('clear')).toBe('Clear span');
  });

  it('takes the basis the result states, and the engine default (clear spans) from one that states none', () => {
    const stated = (spanBasis: 'clear' | 'design' | undefined) => ({ ...result, spanBasis });
    expect(spanBasisOf(stated('clear'))).toBe('clear');
    expect(spanBasisOf(stated('design'))).toBe('design');
    expect(spanBasisOf(stated(undefined))).toBe('clear');
  });
});

describe('span table CSV', () => {
  it('writes spans with their marks so a spreadsheet does not read 3-7 as a date', () => {
    expect(markedSpan('3-7')).toBe(`3' 7"`);
    expect(markedSpan('12-11')).toBe(`12' 11"`);
    expect(markedSpan('—')).toBe('—');
  });

  const lines = spanTableCsv(result, 'design').split('\r\n');

  it('has a header naming the span, the width and the unit of each column, quoted where it holds a "', () => {
    expect(lines[0]).toBe(
      [
        'Material',
        'Size',
        `"Design span, tributary 4' 0"" (ft-in)"`,
        `"Design span, tributary 4' 0"" (ft)"`,
        `"Governs, tributary 4' 0"""`,
        `"Design span, tributary 6' 6"" (ft-in)"`,
        `"Design span, tributary 6' 6"" (ft)"`,
        `"Governs, tributary 6' 6"""`,
      ].join(','),
    );
  });

  it('names the printed spans by the table’s basis and the decimal feet always as design spans', () => {
    const [header] = readCsv(spanTableCsv(result, 'clear'));
    expect(header.slice(2, 5)).toEqual([
      `Clear span, tributary 4' 0" (ft-in)`,
      `Design span, tributary 4' 0" (ft)`,
      `Governs, tributary 4' 0"`,
    ]);
  });

  it('has one record per size with each cell’s printed span, its decimal feet and what governs', () => {
    const records = readCsv(spanTableCsv(result, 'design'));
    expect(records).toHaveLength(result.rows.length + 1);
    result.rows.forEach((row, i) => {
      const fields = records[i + 1];
      expect(fields).toHaveLength(2 + 3 * row.cells.length);
      expect(fields.slice(0, 2)).toEqual([row.materialLabel, row.sizeLabel]);
      row.cells.forEach((cell, j) => {
        expect(fields[2 + 3 * j]).toBe(markedSpan(cell.spanText));
        expect(Number(fields[3 + 3 * j])).toBe(Number(cell.spanFt.toFixed(3)));
        expect(fields[4 + 3 * j]).toBe(`${GOVERNING_KEYS[cell.governedBy].word} (${cell.combination})`);
      });
    });
  });
});

describe('assumptions and print sheet', () => {
  it('states the loads, standard, deflection use, bearing and plies the table was built under', () => {
    expect(assumptionsOf(input)).toEqual([
      { label: 'Material', value: 'Douglas Fir-Larch No.2' },
      { label: 'Dead load', value: '12.5 psf, plus the member’s own weight' },
      { label: 'Live load', value: '40 psf' },
      { label: 'Roof live load', value: 'none' },
      { label: 'Roof snow load', value: '25 psf' },
      { label: 'Load standard', value: 'ASCE 7-16, ASD load combinations (§2.4)' },
      {
        label: 'Deflection use',
        value: 'Under a plaster ceiling: L/360 under live, roof live or snow load; L/240 total',
      },
      { label: 'Bearing', value: '4-1/2" at each end' },
      { label: 'Plies', value: '1 or 2 plies' },
    ]);
  });

  it('prints the table with a key per cell, the legend, the engine’s notes and the caution given', () => {
    const sheet = printSheetModel(input, result, 'design', 'Caution text');
    expect(sheet.title).toBe('Span table — Douglas Fir-Larch No.2');
    expect(sheet.heading).toMatch(/^Design span \(ft-in\) by size and tributary width\. Each number is/);
    expect(sheet.columns).toEqual(['Size', widthTitle(4), widthTitle(6.5)]);
    expect(widthTitle(6.5)).toBe(`6' 6"`);
    expect(sheet.rows).toHaveLength(result.rows.length);
    const [first] = result.rows;
    expect(sheet.rows[0]).toEqual([
      first.sizeLabel,
      ...first.cells.map((c) => `${c.spanText} ${GOVERNING_KEYS[c.governedBy].key}`),
    ]);
    expect(sheet.notes).toEqual(result.notes);
    expect(sheet.sources).toEqual(result.sources);
    expect(sheet.caution).toBe('Caution text');
  });
});
