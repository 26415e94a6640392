import { describe, expect, it } from 'vitest';
import { stackMarkups, type BudgetLine } from '@/lib/budget';

const line = (amountCents: number, lumber: boolean, taxable: boolean): BudgetLine => ({
  id: `l${amountCents}`,
  group: 'member',
  label: 'line',
  quantity: 1,
  unit: 'each',
  unitCents: amountCents,
  amountCents,
  basis: '',
  priceKey: null,
  missingPrice: false,
  taxable,
  lumber,
  client: 'scope',
  override: null,
});

// Arithmetic check with round inputs, worked by hand; the stacking order is common practice.
describe('waste, tax, overhead, profit and contingency', () => {
  const lines = [line(100_000, true, true), line(20_000, false, true), line(50_000, false, false)];
  const rates = { waste: 1000, tax: 800, overhead: 1500, profit: 1000, contingency: 1000 };

  it('stacks each on the right base, to the cent', () => {
    const m = stackMarkups(lines, rates);
    expect(m.waste).toBe(10_000); // 10 % of $1,000 lumber
    expect(m.tax).toBe(10_400); // 8 % of ($1,200 taxable + $100 waste)
    expect(m.cost).toBe(190_400); // $1,700 + $100 + $104
    expect(m.overhead).toBe(28_560); // 15 % of $1,904
    expect(m.profit).toBe(21_896); // 10 % of $2,189.60
    expect(m.contingency).toBe(24_086); // 10 % of $2,408.56 = 240.856 → $240.86
    expect(m.total).toBe(190_400 + 28_560 + 21_896 + 24_086);
  });

  it('builds on an amount set by hand', () => {
    const m = stackMarkups(lines, rates, { overhead: 30_000 });
    expect(m.overhead).toBe(30_000);
    expect(m.profit).toBe(22_040); // 10 % of $2,204.00
  });

  it('adds nothing at zero rates', () => {
    const zero = { waste: 0, tax: 0, overhead: 0, profit: 0, contingency: 0 };
    expect(stackMarkups(lines, zero).total).toBe(170_000);
  });
});
