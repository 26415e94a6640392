import { describe, expect, it } from 'vitest';
import { ENGINEERED_PLY_IN, plyCount, plyJoints, stockLength } from '@/lib/budget';

// The firm's yard rules (a test input, like a firm's own price book): stock to 24 ft and 14 in deep, made to
// order to 48 ft, 10 days' lead time.
const YARD = { stockedLengthFt: 24, stockedDepthIn: 14, longestLengthFt: 48, leadTimeDays: 10 };

describe('stock length: even lengths, stocked or special order (common practice)', () => {
  it('rounds the length to buy up to the next even foot', () => {
    expect(stockLength(13.17, 11.875, YARD).buyFt).toBe(14);
    expect(stockLength(12.5, 11.875, YARD).buyFt).toBe(14);
    expect(stockLength(12, 11.875, YARD).buyFt).toBe(12);
    // A length summed from inches may carry binary noise above a whole foot.
    expect(stockLength(12 + 1e-12, 11.875, YARD).buyFt).toBe(12);
    expect(stockLength(0.5, 9.25, YARD).buyFt).toBe(2);
  });

  it('buys from stock within the stocked length and depth', () => {
    expect(stockLength(23.5, 14, YARD)).toEqual({
      buyFt: 24,
      supply: 'stock',
      leadTimeDays: 0,
      note: null,
      available: true,
    });
  });

  it('makes a longer or deeper member a special order with the lead time', () => {
    const long = stockLength(24.3, 11.875, YARD);
    expect([long.buyFt, long.supply, long.leadTimeDays]).toEqual([26, 'special-order', 10]);
    expect(long.note).toContain('longer than the 24 ft stocked');
    const deep = stockLength(10, 16, YARD);
    expect([deep.supply, deep.note]).toEqual([
      'special-order',
      'Special order (deeper than the 14 in stocked): 10 days lead time',
    ]);
  });

  it('says when even a special order is too long', () => {
    const tooLong = stockLength(49, 11.875, YARD);
    expect([tooLong.buyFt, tooLong.available]).toEqual([50, false]);
    expect(tooLong.note).toMatch(/splice over a support or ask the engineer/);
  });
});

describe('plies of 1-3/4 in engineered lumber (common practice)', () => {
  it('counts plies for a width', () => {
    expect(ENGINEERED_PLY_IN).toBe(1.75);
    expect(plyCount(3.5, 'at-least')).toBe(2); // fills a 2x4 wall
    expect(plyCount(5.25, 'at-least')).toBe(3);
    expect(plyCount(5.5, 'fits')).toBe(3); // 5-1/4 in in a 2x6 wall
    expect(plyCount(5.5, 'at-least')).toBe(4);
    expect(plyCount(1, 'fits')).toBe(1);
  });

  it('counts ply joints to fasten', () => {
    expect([1, 2, 3, 4].map(plyJoints)).toEqual([0, 1, 2, 3]);
  });
});
