import { describe, expect, it } from 'vitest';
import {
  buildMemberBudget,
  catalogueItem,
  FIXED_ITEMS,
  lineAmount,
  percentOf,
  type BudgetChoices,
  type BudgetFacts,
} from '@/lib/budget';
import { DEMO_PRICES } from '@/db/demo-prices';

// The prices are the demo firm's invented price book (db/demo-prices.ts): the tests check the arithmetic
// and the rules (even lengths, day minimums, who pays which markup), never a real price.
const prices = new Map(DEMO_PRICES);
const price = (key: string) => prices.get(key)!;

const facts: BudgetFacts = {
  memberLabel: 'Kitchen wall beam',
  kind: 'beam',
  mount: 'flush',
  clearSpanFt: 12,
  lengthToBuyFt: 12.5,
  size: {
    family: 'lvl',
    materialLabel: 'LVL 2.0E (generic)',
    sizeId: '2-ply-1.75x11.875',
    sizeLabel: '2-ply 1-3/4 x 11-7/8',
    plies: 2,
    bIn: 3.5,
    dIn: 11.875,
    nominal: '1-3/4 x 11-7/8',
    pieceWeightLb: 76,
  },
  joistsHung: 16,
  endsOnJacks: 2,
  posts: [],
  shoring: [
    { side: 'A', lengthFt: 14, spacingIn: 16, studs: 12, plateLf: 28 },
    { side: 'B', lengthFt: 14, spacingIn: 24, studs: 8, plateLf: 28 },
  ],
  yearBuilt: 1985,
};
const choices: BudgetChoices = {
  work: 'wall-removed',
  wallHeightFt: 8,
  shoring: 'built',
  delivery: 'auto',
  allowances: ['wiring'],
  oldHouse: [],
  engineerSiteVisit: false,
  material: 'wood',
  footingThroughSlab: false,
};
const byId = (budget: ReturnType<typeof buildMemberBudget>, id: string) =>
  budget.lines.find((l) => l.id === id);

describe('a member budget from the price book', () => {
  const budget = buildMemberBudget(facts, choices, prices, {});

  it('prices every item the catalogue names in the demo book', () => {
    for (const item of FIXED_ITEMS) expect(prices.has(item.key), item.key).toBe(true);
    for (const [key] of DEMO_PRICES) expect(catalogueItem(key), key).toBeDefined();
    expect(budget.missingPrices).toEqual([]);
  });

  it('buys the member by stock length, plies counted', () => {
    const member = byId(budget, 'member')!;
    // 12.5 ft to buy → 14 ft (even lengths); 2 plies → 28 ply-lf at the 11-7/8 in price.
    expect([member.quantity, member.unit, member.unitCents]).toEqual([28, 'ply-lf', price('lvl/11.875')]);
    expect(member.amountCents).toBe(lineAmount(price('lvl/11.875'), 28));
    expect(budget.supply.supply).toBe('stock');
    expect(byId(budget, 'yard-cut')?.quantity).toBe(2);
    expect(byId(budget, 'ply-fastening')?.quantity).toBe(14); // 1 ply joint × 14 ft
  });

  it('hangs every joist framing in and prices the labour per joist hung', () => {
    expect(byId(budget, 'hangers')?.quantity).toBe(16);
    const hang = byId(budget, 'labour/hang-joists')!;
    expect(hang.quantity).toBe(16 * 0.3);
    expect(hang.amountCents).toBe(lineAmount(price('rate/carpenter'), 4.8));
  });

  it('takes the temporary walls’ studs and plates from the shoring takeoff', () => {
    expect(byId(budget, 'shoring/studs')?.quantity).toBe(20);
    expect(byId(budget, 'shoring/plates')?.quantity).toBe(56);
    expect(byId(budget, 'shoring/rental')).toBeUndefined();
  });

  it('charges finish trips the day minimum and sends the finisher back per coat', () => {
    const trips = budget.lines.filter((l) => l.id.startsWith('labour/finish-'));
    expect(trips.map((t) => t.label)).toEqual([
      'Hang drywall',
      'Coat 1 of joint compound',
      'Coat 2 of joint compound',
      'Coat 3 of joint compound',
      'Texture and paint',
    ]);
    // 48 sq ft of ceiling + 32 sq ft of wall ends = 80 sq ft; a coat is 1.6 h, charged the 4 h minimum.
    expect(trips[1].quantity).toBe(4);
    expect(trips[1].basis).toMatch(/trip minimum/);
    expect(budget.schedule.returnTrips).toBe(5);
  });

  it('stacks the markups on the priced lines and totals in whole cents', () => {
    const lines = budget.lines.filter((l) => l.group !== 'markups');
    const sum = lines.reduce((s, l) => s + l.amountCents, 0);
    expect(budget.subtotalCents).toBe(sum);
    const lumber = lines.filter((l) => l.lumber).reduce((s, l) => s + l.amountCents, 0);
    expect(byId(budget, 'markup/waste')?.amountCents).toBe(percentOf(lumber, 1000));
    const markups = budget.lines.filter((l) => l.group === 'markups').reduce((s, l) => s + l.amountCents, 0);
    expect(budget.totalCents).toBe(sum + markups);
    for (const line of budget.lines) expect(Number.isInteger(line.amountCents), line.id).toBe(true);
  });

  it('moves when a price changes', () => {
    const dearer = new Map(prices).set('lvl/11.875', price('lvl/11.875') + 100);
    const moved = buildMemberBudget(facts, choices, dearer, {});
    expect(byId(moved, 'member')!.amountCents - byId(budget, 'member')!.amountCents).toBe(2800);
    expect(moved.totalCents).toBeGreaterThan(budget.totalCents);
  });

  it('lets the estimator override any line with a note, keeping what it was', () => {
    const changed = buildMemberBudget(facts, choices, prices, {
      'labour/demolition': { quantity: 10, note: 'Plaster and lath: slower' },
      'markup/profit': { quantity: 12, note: 'Small job' },
      nothing: { amountCents: 5, note: 'stale' },
    });
    const demo = byId(changed, 'labour/demolition')!;
    expect(demo.amountCents).toBe(lineAmount(price('rate/labourer'), 10));
    expect(demo.override).toEqual({
      note: 'Plaster and lath: slower',
      computedCents: byId(budget, 'labour/demolition')!.amountCents,
    });
    expect(byId(changed, 'markup/profit')?.quantity).toBe(12);
    expect(changed.unusedOverrides).toEqual(['nothing']);
  });

  it('shows a missing price as missing, counting nothing', () => {
    const without = new Map(prices);
    without.delete('hanger/joist');
    const partial = buildMemberBudget(facts, choices, without, {});
    expect(byId(partial, 'hangers')).toMatchObject({ missingPrice: true, amountCents: 0 });
    expect(partial.missingPrices).toEqual(['hanger/joist']);
  });
});

describe('scenarios and old houses', () => {
  it('a deep member is a special order: premium and the lead time in the wait', () => {
    const deep = buildMemberBudget(
      { ...facts, size: { ...facts.size, dIn: 16, sizeId: '2-ply-1.75x16' } },
      choices,
      prices,
      {},
    );
    expect(deep.supply.supply).toBe('special-order');
    expect(byId(deep, 'special-order')?.amountCents).toBe(percentOf(byId(deep, 'member')!.amountCents, 1000));
    expect(byId(deep, 'yard-cut')).toBeUndefined();
    expect(deep.schedule.waiting[0].days).toBe(10);
  });

  it('rents shores for the days the house stays shored', () => {
    const rented = buildMemberBudget(facts, { ...choices, shoring: 'rented' }, prices, {});
    const rental = byId(rented, 'shoring/rental')!;
    expect(rental.quantity).toBe(2 * 4 * rented.schedule.shoredDays);
    expect(byId(rented, 'shoring/studs')).toBeUndefined();
  });

  it('a post on a new footing dug through the slab: saw-cut, pad, rebar, inspection, cure', () => {
    const onPost = buildMemberBudget(
      {
        ...facts,
        posts: [
          {
            label: 'Left post',
            heightFt: 7.5,
            nominal: '4x4',
            pieces: 1,
            footingSideIn: 24,
            padThicknessIn: 12,
            floorsCrossed: 0,
          },
        ],
      },
      { ...choices, footingThroughSlab: true },
      prices,
      {},
    );
    expect(byId(onPost, 'post/1')?.priceKey).toBe('sawn/4x4/8');
    expect(byId(onPost, 'footing/1/concrete')?.quantity).toBe(4); // 24 × 24 × 12 in = 4 cu ft
    expect(byId(onPost, 'footing/1/saw-cut')?.quantity).toBe(1);
    expect(byId(onPost, 'footing/inspection')?.quantity).toBe(1);
    expect(onPost.schedule.waiting.map((w) => w.label)).toContain('Concrete cure before loading the post');
  });

  it('a steel alternate is an allowance per lf for the engineer to size', () => {
    const steel = buildMemberBudget(facts, { ...choices, material: 'steel' }, prices, {});
    expect(byId(steel, 'member')).toMatchObject({
      priceKey: 'alternate/steel',
      quantity: 14,
      client: 'allowance',
    });
    expect(byId(steel, 'ply-fastening')).toBeUndefined();
  });

  it('adds lead-safe work for a house built before 1978 (EPA Renovation, Repair and Painting Rule, 40 CFR 745)', () => {
    const old = buildMemberBudget(
      { ...facts, yearBuilt: 1962 },
      { ...choices, oldHouse: ['knob-and-tube', 'vent-stack'] },
      prices,
      {},
    );
    expect(byId(old, 'lead-safe')?.amountCents).toBe(price('lead-safe/work'));
    expect(byId(old, 'old-house/vent-stack')?.client).toBe('allowance');
    expect(byId(buildMemberBudget(facts, choices, prices, {}), 'lead-safe')).toBeUndefined();
  });

  it('a heavy ply brings a boom truck and extra hands', () => {
    const heavy = buildMemberBudget(
      { ...facts, size: { ...facts.size, pieceWeightLb: 260 } },
      choices,
      prices,
      {},
    );
    expect(byId(heavy, 'delivery')?.priceKey).toBe('delivery/boom');
    // 260 lb ÷ (200 lb per two people ÷ 2) → 3 people: one extra for the 14 ft × 0.4 h set.
    expect(byId(heavy, 'delivery/heavy-crew')?.quantity).toBe(5.6);
  });
});
