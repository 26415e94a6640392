import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { csvField, toCsv } from '@/lib/format';
import { readCsv } from '@/tests/helpers/csv';

describe('csvField (RFC 4180 §2 rules 5–7)', () => {
  it.each([
    ['2x10', '2x10'],
    ['', ''],
    [12.5, '12.5'],
    // rule 6: a field with a comma, a double quote or a line break is enclosed in double quotes
    ['Dead, live', '"Dead, live"'],
    ['line\nbreak', '"line\nbreak"'],
    ['cr\rhere', '"cr\rhere"'],
    // rule 7: a double quote inside is escaped by another double quote
    [`Design span at 6' 6" (ft-in)`, `"Design span at 6' 6"" (ft-in)"`],
    ['"', '""""'],
  ])('%j → %j', (value, text) => {
    expect(csvField(value)).toBe(text);
  });

  it('leaves spaces and apostrophes alone: they are part of the field (rule 4)', () => {
    expect(csvField(" 13' ")).toBe(" 13' ");
  });
});

describe('toCsv (RFC 4180 §2 rules 1–3)', () => {
  it('ends every record with CRLF, the last one too, and separates fields by commas', () => {
    expect(
      toCsv([
        ['Size', 'Span'],
        ['2x10', '12-3'],
      ]),
    ).toBe('Size,Span\r\n2x10,12-3\r\n');
    expect(toCsv([])).toBe('');
  });

  it('reads back field for field through an RFC 4180 reader, whatever the fields hold', () => {
    const field = fc.string({ unit: fc.constantFrom('a', ' ', ',', '"', '\r', '\n', "'", 'Δ', '-') });
    fc.assert(
      fc.property(fc.array(fc.array(field, { minLength: 1, maxLength: 5 }), { maxLength: 6 }), (records) => {
        expect(readCsv(toCsv(records))).toEqual(records);
      }),
      { numRuns: 300 },
    );
  });
});
