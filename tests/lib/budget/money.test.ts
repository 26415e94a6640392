import { describe, expect, it } from 'vitest';
import { lineAmount, percentOf, sumCents, wholeCents } from '@/lib/budget';

// Integer money: every amount is whole cents; each line rounds once, half away from zero (common practice).
describe('money in whole cents', () => {
  it('extends a line and rounds once to the cent', () => {
    expect(lineAmount(1899, 2.5)).toBe(4748); // 47.475 → 47.48
    expect(lineAmount(1899, 3)).toBe(5697);
    expect(lineAmount(333, 1 / 3)).toBe(111);
    expect(lineAmount(-101, 0.5)).toBe(-51);
  });

  it('does not lose a cent to binary fractions', () => {
    // 14.5 cents: 0.145 × 100 is 14.499999999999998 in floating point.
    expect(lineAmount(100, 0.145)).toBe(15);
    expect(lineAmount(1, 0.5)).toBe(1);
  });

  it('takes a percentage in basis points with integer arithmetic', () => {
    expect(percentOf(100_000, 825)).toBe(8250); // 8.25 % of $1,000.00
    expect(percentOf(12_345, 1000)).toBe(1235); // 1,234.5 ¢ → 1,235 ¢
    expect(percentOf(9_007_199_254_740, 1500)).toBe(1_351_079_888_211);
    expect(percentOf(0, 1000)).toBe(0);
  });

  it('refuses fractions of a cent as money', () => {
    expect(() => wholeCents(10.5)).toThrow(RangeError);
    expect(() => lineAmount(10.5, 1)).toThrow(RangeError);
    expect(() => percentOf(100, 12.5)).toThrow(RangeError);
    expect(sumCents([100, 250, 1])).toBe(351);
  });
});
