import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatFtIn, formatIn, formatSpanFtIn } from '@/lib/format';

// Tape-measure notation to 1/16 in with reduced fractions (common practice).
describe('formatFtIn', () => {
  it.each([
    [162.5, `13' 6-1/2"`],
    [162.53, `13' 6-1/2"`],
    [156, `13' 0"`],
    [156.5, `13' 1/2"`],
    [6.5, `6-1/2"`],
    [0, `0"`],
    [11.999, `1' 0"`],
    [12 + 1 / 16, `1' 1/16"`],
    [92.625, `7' 8-5/8"`],
    [104.625, `8' 8-5/8"`],
    [9.25, `9-1/4"`],
    [-18, `-1' 6"`],
    [Number.NaN, '—'],
  ])('%f in → %s', (value, text) => {
    expect(formatFtIn(value)).toBe(text);
  });

  it('reduces every fraction: the denominator is 2, 4, 8 or 16 and the numerator odd', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 16 * 12 * 100 }), (sixteenths) => {
        const match = /(\d+)\/(\d+)"$/.exec(formatFtIn(sixteenths / 16));
        if (sixteenths % 16 === 0) {
          expect(match).toBeNull();
        } else {
          expect(match).not.toBeNull();
          expect([2, 4, 8, 16]).toContain(Number(match?.[2]));
          expect(Number(match?.[1]) % 2).toBe(1);
        }
      }),
    );
  });
});

describe('formatIn', () => {
  it.each([
    [92.625, `92-5/8"`],
    [104.625, `104-5/8"`],
    [0.75, `3/4"`],
    [3.5, `3-1/2"`],
    [1.5, `1-1/2"`],
    [7.25, `7-1/4"`],
  ])('%f in → %s', (value, text) => {
    expect(formatIn(value)).toBe(text);
  });
});

describe('formatSpanFtIn', () => {
  it('prints ft-in like IRC Table R502.3.1(2) ("12-3"), never rounding up', () => {
    expect(formatSpanFtIn(147)).toBe('12-3');
    expect(formatSpanFtIn(147.99)).toBe('12-3');
    expect(formatSpanFtIn(185)).toBe('15-5');
    expect(formatSpanFtIn(-1)).toBe('—');
  });
});
