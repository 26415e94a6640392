import { describe, expect, it } from 'vitest';
import { amountText, parseAmountText } from '@/lib/budget';

describe('price book amounts as text, without floating point', () => {
  it('writes money, percentages and quantities in their decimals', () => {
    expect(amountText(1250, 'lf')).toBe('12.50');
    expect(amountText(5, 'each')).toBe('0.05');
    expect(amountText(825, 'percent')).toBe('8.25');
    expect(amountText(350, 'hours-per-lf')).toBe('0.35');
    expect(amountText(24_000, 'ft')).toBe('24');
    expect(amountText(11_875, 'in')).toBe('11.875');
  });

  it('reads them back exactly', () => {
    expect(parseAmountText('12.5', 'lf')).toEqual({ amount: 1250 });
    expect(parseAmountText('$1,250.50', 'each')).toEqual({ amount: 125_050 });
    expect(parseAmountText('8.25%', 'percent')).toEqual({ amount: 825 });
    expect(parseAmountText('0.145', 'hours')).toEqual({ amount: 145 });
    expect(parseAmountText('19.99', 'sf')).toEqual({ amount: 1999 }); // 19.99 × 100 is 1998.9999999999998 in floating point
    for (const amount of [0, 1, 99, 1999, 123_456])
      expect(parseAmountText(amountText(amount, 'lf'), 'lf')).toEqual({ amount });
  });

  it('refuses what is not a price', () => {
    expect(parseAmountText('12.505', 'lf')).toEqual({ error: 'At most 2 decimals' });
    expect(parseAmountText('-3', 'lf')).toHaveProperty('error');
    expect(parseAmountText('twelve', 'lf')).toHaveProperty('error');
    expect(parseAmountText('', 'lf')).toHaveProperty('error');
    expect(parseAmountText('1e5', 'lf')).toHaveProperty('error');
  });
});
