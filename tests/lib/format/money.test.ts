import { describe, expect, it } from 'vitest';
import { formatDollars } from '@/lib/format/money';

describe('dollars from whole cents', () => {
  it('groups thousands and shows cents when asked', () => {
    expect(formatDollars(1_234_567, true)).toBe('$12,345.67');
    expect(formatDollars(5, true)).toBe('$0.05');
    expect(formatDollars(-150, true)).toBe('-$1.50');
  });

  it('rounds to the dollar half up', () => {
    expect(formatDollars(1_234_550)).toBe('$12,346');
    expect(formatDollars(1_234_549)).toBe('$12,345');
    expect(formatDollars(0)).toBe('$0');
  });
});
