import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLoad } from '@/lib/calc/units';
import { CalcInputError } from '@/lib/calc/types';
import { expectApprox } from '@/tests/helpers/approx';

// Exact definitions: 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N; 1 ft = 0.3048 m; 1 kip = 1000 lbf.
const LBF_N = 0.45359237 * 9.80665;
const FT_M = 0.3048;

describe('parseLoad', () => {
  it.each([
    ['15 psf', 'psf', 15],
    ['15', 'psf', 15],
    ['15 lb/ft²', 'psf', 15],
    ['15 lbs per sq ft', 'psf', 15],
    ['180 plf', 'plf', 180],
    ['180 lb/ft', 'plf', 180],
    ['180 lbs/ft', 'plf', 180],
    ['1.2 klf', 'plf', 1200],
    ['1,500 lb', 'lb', 1500],
    ['1500 lbs', 'lb', 1500],
    ['2.5 kip', 'lb', 2500],
    ['2.5 kips', 'lb', 2500],
  ] as const)('reads %s as %s %f', (text, kind, expected) => {
    expectApprox(parseLoad(text, 'f', kind), expected, { abs: 1e-9 });
  });

  it('converts metric loads by the exact pound-force and foot definitions', () => {
    expectApprox(parseLoad('1 kN', 'f', 'lb'), 1000 / LBF_N, { rel: 1e-12 });
    expectApprox(parseLoad('1 kN/m', 'f', 'plf'), (1000 * FT_M) / LBF_N, { rel: 1e-12 });
    expectApprox(parseLoad('1 kPa', 'f', 'psf'), (1000 * FT_M * FT_M) / LBF_N, { rel: 1e-12 });
    // 1 psf = 4.788026e-2 kPa (NIST SP 811 Appendix B.8 conversion table; from memory).
    expectApprox(parseLoad('1 kPa', 'f', 'psf'), 1 / 4.788026e-2, { rel: 1e-6 });
  });

  it('refuses a load of the wrong kind, naming the field and both kinds', () => {
    try {
      parseLoad('15 psf', 'wallAbove.wPlf', 'plf', { label: 'Wall above' });
      expect.fail('expected a CalcInputError');
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect((error as CalcInputError).field).toBe('wallAbove.wPlf');
      expect((error as Error).message).toBe(
        'Wall above: "15 psf" is an area load in psf; this field takes a line load in plf (lb per ft)',
      );
    }
  });

  it.each([
    ['-15 psf', "can't be negative"],
    ['', 'enter an area load'],
    ['15 bananas', "can't read the unit"],
    ['heavy', "can't read"],
    ['15 constructor', "can't read the unit"],
  ])('refuses %j (%s)', (text, why) => {
    expect(() => parseLoad(text, 'deadPsf', 'psf')).toThrow(why);
  });

  it('never returns NaN or Infinity; anything it refuses is a CalcInputError naming the field', () => {
    const loadish = fc.stringMatching(/^[-0-9 .,/²^a-z#]{0,14}$/);
    fc.assert(
      fc.property(
        fc.oneof(fc.string(), loadish),
        fc.constantFrom('psf', 'plf', 'lb' as const),
        (text, kind) => {
          try {
            const value = parseLoad(text, 'load', kind);
            expect(Number.isFinite(value)).toBe(true);
            expect(value).toBeGreaterThanOrEqual(0);
          } catch (error) {
            expect(error).toBeInstanceOf(CalcInputError);
            expect((error as CalcInputError).field).toBe('load');
          }
        },
      ),
      { numRuns: 2000 },
    );
  });
});
