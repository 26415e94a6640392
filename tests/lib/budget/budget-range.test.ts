import { describe, expect, it } from 'vitest';
import { budgetRange, cheapestPassing, nextSizeUp } from '@/lib/budget';

describe('range from the preliminary size to the next size up (common practice)', () => {
  it('runs from the preliminary total to the next size up', () => {
    const range = budgetRange(
      { label: '2-ply 1-3/4 x 11-7/8', totalCents: 500_000 },
      { label: '2-ply 1-3/4 x 14', totalCents: 540_000 },
    );
    expect([range.lowCents, range.highCents, range.lowLabel, range.highLabel]).toEqual([
      500_000,
      540_000,
      '2-ply 1-3/4 x 11-7/8',
      '2-ply 1-3/4 x 14',
    ]);
  });

  it('orders the ends when the larger size is cheaper (from stock, the smaller special order)', () => {
    const range = budgetRange({ label: 'A', totalCents: 600_000 }, { label: 'B', totalCents: 550_000 });
    expect([range.lowCents, range.highCents, range.lowLabel]).toEqual([550_000, 600_000, 'B']);
  });

  it('says so when nothing larger passes', () => {
    const range = budgetRange({ label: 'A', totalCents: 600_000 }, null);
    expect([range.lowCents, range.highCents]).toEqual([600_000, 600_000]);
    expect(range.basis).toMatch(/no larger size/);
  });

  it('finds the next size up: deeper first, then one more ply', () => {
    const passing = [
      { id: '3-ply-11.875', dIn: 11.875, bIn: 5.25 },
      { id: '2-ply-14', dIn: 14, bIn: 3.5 },
      { id: '2-ply-11.875', dIn: 11.875, bIn: 3.5 },
      { id: '2-ply-9.25', dIn: 9.25, bIn: 3.5 },
    ];
    expect(nextSizeUp({ id: '2-ply-11.875', dIn: 11.875, bIn: 3.5 }, passing)?.id).toBe('3-ply-11.875');
    expect(nextSizeUp({ id: '3-ply-11.875', dIn: 11.875, bIn: 5.25 }, passing)?.id).toBe('2-ply-14');
    expect(nextSizeUp({ id: '2-ply-14', dIn: 14, bIn: 3.5 }, passing)).toBeNull();
  });

  it('marks the cheapest option that passes and is completely priced', () => {
    const options = [
      { id: 'fails', label: 'F', passes: false, totalCents: 100, complete: true },
      { id: 'unpriced', label: 'U', passes: true, totalCents: 150, complete: false },
      { id: 'a', label: 'A', passes: true, totalCents: 300, complete: true },
      { id: 'b', label: 'B', passes: true, totalCents: 200, complete: true },
      { id: 'c', label: 'C', passes: true, totalCents: 200, complete: true },
    ];
    expect(cheapestPassing(options)).toBe('b');
    expect(cheapestPassing(options.slice(0, 2))).toBeNull();
  });
});
