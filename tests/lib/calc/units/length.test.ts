import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/calc/units';
import { CalcInputError } from '@/lib/calc/types';
import { formatFtIn, formatIn } from '@/lib/format';
import { expectApprox } from '@/tests/helpers/approx';

const inches = (text: string, defaultUnit: 'ft' | 'in' = 'in') =>
  parseLength(text, 'spanFt', { defaultUnit });

const errorOf = (run: () => unknown): CalcInputError => {
  try {
    run();
  } catch (error) {
    if (error instanceof CalcInputError) return error;
    throw error;
  }
  throw new Error('expected a CalcInputError');
};

describe('parseLength', () => {
  // 1 ft = 12 in (US customary definition); 1 in = 25.4 mm exactly (1959 international yard and pound).
  it.each([
    [`13' 6"`, 162],
    [`13'6"`, 162],
    [`13'-6 1/2"`, 162.5],
    [`13' 6-1/2"`, 162.5],
    ['13-6', 162],
    ['13-6 1/2', 162.5],
    ['13 ft 6 in', 162],
    ['13 ft', 156],
    ["13'", 156],
    ['13 feet 6 inches', 162],
    ['162 in', 162],
    ['162"', 162],
    ['6 1/2"', 6.5],
    ['6-1/2"', 6.5],
    ['3/4"', 0.75],
    ['13.5 ft', 162],
    ['13’ 6″', 162],
  ])('reads %s as %f in', (text, expected) => {
    expectApprox(inches(text), expected, { abs: 1e-9 });
  });

  it('reads metric through mathjs units (1 in = 25.4 mm exactly)', () => {
    expectApprox(inches('410 mm'), 410 / 25.4, { rel: 1e-12 });
    expectApprox(inches('4.1 m'), 4100 / 25.4, { rel: 1e-12 });
    expectApprox(inches('41 cm'), 410 / 25.4, { rel: 1e-12 });
    expectApprox(inches('254 mm'), 10, { rel: 1e-12 });
  });

  it("takes a bare number in the field's default unit", () => {
    expectApprox(inches('13.5', 'ft'), 162, { abs: 1e-9 });
    expectApprox(inches('13.5', 'in'), 13.5, { abs: 1e-9 });
    expectApprox(inches('6 1/2', 'in'), 6.5, { abs: 1e-9 });
    expectApprox(inches('6-1/2', 'in'), 6.5, { abs: 1e-9 });
    expectApprox(parseLength('162', 'x'), 162, { abs: 1e-9 });
  });

  // A tape reading as written three ways (common practice): 13 ft 6-3/8 in = 162.375 in, never 13 ft 6 in.
  it.each([`13' 6-3/8"`, '13-6-3/8', '13 6 3/8', '13 6-3/8'])(
    'reads the tape reading %s as 162-3/8 in',
    (text) => {
      expectApprox(inches(text, 'ft'), 162.375, { abs: 1e-9 });
    },
  );

  it('reads "13 6" as feet and inches only where bare numbers are feet', () => {
    expectApprox(inches('13 6', 'ft'), 162, { abs: 1e-9 });
    expectApprox(inches('6 1/2', 'ft'), 78, { abs: 1e-9 });
    expect(() => inches('13 6', 'in')).toThrow(CalcInputError);
    expect(() => inches('13 13', 'ft')).toThrow(/under 12/);
  });

  it('names the field and suggests a form when the text cannot be read', () => {
    const error = errorOf(() => parseLength(`13'6x`, 'clearSpanIn', { label: 'Clear span' }));
    expect(error.field).toBe('clearSpanIn');
    expect(error.message).toBe(`Clear span: can't read "13'6x"; try 13' 6" or 162 in`);
  });

  it.each([
    ['-3 ft', "can't be negative"],
    ['', 'enter a length'],
    ['6 1/0"', '0 below the line'],
    ['6 3/2"', 'under 1'],
    [`13' 14"`, 'under 12'],
    ['twelve feet', "can't read"],
    ['1' + '0'.repeat(400), 'too large'],
  ])('refuses %j (%s)', (text, why) => {
    const error = errorOf(() => parseLength(text, 'widthIn'));
    expect(error.field).toBe('widthIn');
    expect(error.message).toContain(why);
  });

  it('round-trips every 1/16 in through formatFtIn and formatIn', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 16 * 12 * 200 }), (sixteenths) => {
        const value = sixteenths / 16;
        expect(inches(formatFtIn(value))).toBe(value);
        expect(inches(formatIn(value))).toBe(value);
      }),
    );
  });

  it('reads metric round values back within float precision', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100000 }), (mm) => {
        expectApprox(inches(`${mm} mm`), mm / 25.4, { rel: 1e-12, abs: 1e-12 });
      }),
    );
  });

  it('never returns NaN or Infinity; anything it refuses is a CalcInputError naming the field', () => {
    const lengthish = fc.stringMatching(/^[-0-9 ./'"ftinchesmc]{0,16}$/);
    fc.assert(
      fc.property(fc.oneof(fc.string(), lengthish), (text) => {
        try {
          const value = parseLength(text, 'opening.widthIn');
          expect(Number.isFinite(value)).toBe(true);
          expect(value).toBeGreaterThanOrEqual(0);
        } catch (error) {
          expect(error).toBeInstanceOf(CalcInputError);
          expect((error as CalcInputError).field).toBe('opening.widthIn');
          expect((error as CalcInputError).message.startsWith('opening.widthIn: ')).toBe(true);
        }
      }),
      { numRuns: 2000 },
    );
  });
});
