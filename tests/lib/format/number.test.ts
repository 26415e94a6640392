import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatNumber, formatNumberTrimmed } from '@/lib/format/number';

// Display convention only (US thousands separator, common practice): no published source involved.
describe('formatNumber', () => {
  it('groups thousands and keeps the decimals asked for', () => {
    expect(formatNumber(1345.46, 1)).toBe('1,345.5');
    expect(formatNumber(1250000)).toBe('1,250,000');
    expect(formatNumber(999.4)).toBe('999');
    expect(formatNumber(-12345.678, 2)).toBe('-12,345.68');
    expect(formatNumber(-0.0001, 2)).toBe('0.00');
    expect(formatNumber(Number.NaN)).toBe('—');
  });
});

describe('formatNumberTrimmed', () => {
  it('drops trailing zeros and a bare decimal point', () => {
    expect(formatNumberTrimmed(1250.04, 1)).toBe('1,250');
    expect(formatNumberTrimmed(12.5, 2)).toBe('12.5');
    expect(formatNumberTrimmed(26.565, 1)).toBe('26.6');
    expect(formatNumberTrimmed(100, 2)).toBe('100');
    expect(formatNumberTrimmed(0.04, 1)).toBe('0');
    expect(formatNumberTrimmed(-1500.25, 2)).toBe('-1,500.25');
    expect(formatNumberTrimmed(1000, 0)).toBe('1,000');
  });

  it('reads back to the rounded value for any finite number', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.integer({ min: 0, max: 4 }), (v, d) => {
        const text = formatNumberTrimmed(v, d);
        expect(Number(text.replace(/,/g, ''))).toBe(
          Number(Math.abs(v).toFixed(d)) * (text.startsWith('-') ? -1 : 1),
        );
      }),
    );
  });
});
