import type { BudgetChoices, BudgetFacts } from './facts';
import { crewSchedule, type CrewSchedule } from './labour';
import { stackMarkups, type MarkupRates } from './markups';
import { workLines } from './member-lines';
import { lineAmount, sumCents, type Cents } from './money';
import { priceReader, type PriceAmounts } from './price-lookup';
import type { StockLength } from './stock-length';
import type { BudgetLine, LineOverride } from './types';

export interface MemberBudget {
  lines: BudgetLine[];
  /** Every line before the markups, cents. */
  subtotalCents: Cents;
  totalCents: Cents;
  schedule: CrewSchedule;
  /** How the member is bought: even length, stock or special order with its lead time. */
  supply: StockLength;
  /** Price book items the budget needed and did not find. */
  missingPrices: string[];
  /** Overrides naming no line of this budget (kept, shown, not applied). */
  unusedOverrides: string[];
}

const MARKUPS: [keyof MarkupRates, string, string][] = [
  ['waste', 'markup/waste', 'Waste on lumber'],
  ['tax', 'markup/tax', 'Sales tax on materials'],
  ['overhead', 'markup/overhead', 'Overhead'],
  ['profit', 'markup/profit', 'Profit'],
  ['contingency', 'markup/contingency', 'Contingency'],
];

/** Applies an override to a priced line: a new amount, or a new quantity or unit price re-extended. */
function applyOverride(line: BudgetLine, change: LineOverride): BudgetLine {
  const quantity = change.quantity ?? line.quantity;
  const unitCents = change.unitCents ?? line.unitCents ?? 0;
  const amountCents = change.amountCents ?? lineAmount(unitCents, quantity);
  return {
    ...line,
    quantity,
    unitCents,
    amountCents,
    missingPrice: line.missingPrice && change.unitCents === undefined && change.amountCents === undefined,
    override: { note: change.note, computedCents: line.amountCents },
  };
}

/**
 * A member's budget: every line of the work priced from the firm's price book, the crew schedule (framing
 * days, return trips, waits, days shored — rented shores are charged for those days), then waste, tax,
 * overhead, profit and contingency. An estimator's override replaces a line's quantity, unit price or
 * amount (with a note, and the computed amount kept beside it); a markup's quantity is its percentage.
 * @param facts the member and job from the engine (ft, in, lb)
 * @param choices the estimator's choices
 * @param prices the firm's price book amounts (cents, basis points, thousandths by unit)
 * @param overrides line id → change with a note
 * @returns lines, subtotal and total (cents), schedule, supply, missing prices
 * @example buildMemberBudget(facts, choices, prices, {}).totalCents
 * Reference: common practice (remodeling estimates); DESIGN.md §7 "Budget lines".
 */
export function buildMemberBudget(
  facts: BudgetFacts,
  choices: BudgetChoices,
  amounts: PriceAmounts,
  overrides: Readonly<Record<string, LineOverride>>,
): MemberBudget {
  const prices = priceReader(amounts);
  const work = workLines(facts, choices, prices);
  const { takeoff } = work;
  const pads = facts.posts.length;
  const inspectionWait = prices.quantity('schedule/inspection-wait');
  const schedule = crewSchedule({
    framingHoursBeforeLoad: takeoff.framingBeforeLoad,
    framingHoursAfterLoad: takeoff.framingAfterLoad,
    crewDayHours: prices.quantity('rate/crew-day') || 8,
    finishTrips: takeoff.finishTrips.length,
    engineerWaitDays: Math.max(prices.quantity('schedule/engineer-wait'), takeoff.supply.leadTimeDays),
    inspections: [
      ...(pads > 0 ? [{ label: 'Footing inspection before the pour', days: inspectionWait }] : []),
      { label: 'Framing inspection before the walls close', days: inspectionWait },
    ],
    cureDays: pads > 0 ? prices.quantity('schedule/concrete-cure') : 0,
  });
  if (work.rentedShores > 0) {
    work.add(
      'shoring/rental',
      'shoring',
      'Rented adjustable shores',
      work.rentedShores * schedule.shoredDays,
      'day',
      'shoring/shore-rental',
      `${work.rentedShores} shores × ${schedule.shoredDays} days shored`,
    );
  }

  const used = new Set<string>();
  const priced = work.lines.map((line) => {
    const change = overrides[line.id];
    if (!change) return line;
    used.add(line.id);
    return applyOverride(line, change);
  });

  const rates: MarkupRates = { waste: 0, tax: 0, overhead: 0, profit: 0, contingency: 0 };
  const bookRates: MarkupRates = { ...rates };
  const fixed: Partial<Record<keyof MarkupRates, Cents>> = {};
  for (const [name, key] of MARKUPS) {
    const change = overrides[key];
    bookRates[name] = prices.rate(key);
    rates[name] = change?.quantity !== undefined ? Math.round(change.quantity * 100) : prices.rate(key);
    if (change?.amountCents !== undefined) fixed[name] = change.amountCents;
    if (change) used.add(key);
  }
  const markups = stackMarkups(priced, rates, fixed);
  const computed = stackMarkups(priced, bookRates);
  const bases: Record<keyof MarkupRates, string> = {
    waste: 'of the lumber lines',
    tax: 'of the taxable lines and their waste',
    overhead: 'of the cost (every line, waste and tax)',
    profit: 'of cost and overhead',
    contingency: 'of cost, overhead and profit',
  };
  const markupLines: BudgetLine[] = MARKUPS.map(([name, key, label]) => {
    const change = overrides[key];
    return {
      id: key,
      group: 'markups',
      label,
      quantity: rates[name] / 100,
      unit: '%',
      unitCents: null,
      amountCents: markups[name],
      basis: `${rates[name] / 100} % ${bases[name]}`,
      priceKey: key,
      missingPrice: prices.missing().includes(key),
      taxable: false,
      lumber: false,
      client: 'internal',
      override: change ? { note: change.note, computedCents: computed[name] } : null,
    };
  });

  const subtotalCents = sumCents(priced.map((l) => l.amountCents));
  return {
    lines: [...priced, ...markupLines],
    subtotalCents,
    totalCents: markups.total,
    schedule,
    supply: takeoff.supply,
    missingPrices: prices.missing(),
    unusedOverrides: Object.keys(overrides).filter((id) => !used.has(id)),
  };
}
