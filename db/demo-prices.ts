import { lvlDepthsIn } from '@/tables/lvl/generic-grades';

/**
 * The demo firm's price book. EVERY PRICE HERE IS INVENTED for the demo: it is no yard's, trade's or
 * region's real price and must never be quoted to anyone. Amounts are whole numbers as the price book keeps
 * them (lib/budget/price-catalogue): money in cents, percentages in basis points (1 % = 100), quantities
 * (hours, days, ft, in, lb, counts) in thousandths.
 */
const dollars = (value: number) => Math.round(value * 100);
const percent = (value: number) => Math.round(value * 100);
const qty = (value: number) => Math.round(value * 1000);

/** Invented: LVL per 1-3/4 in ply per lf, rising with depth. */
const lvl = lvlDepthsIn.map((dIn): [string, number] => [`lvl/${dIn}`, dollars(1.1 * dIn + 0.5)]);

/** Invented: sawn lumber per piece, by nominal size and even length. */
const SAWN_PER_FT: Record<string, number> = {
  '2x4': 0.6,
  '2x6': 0.9,
  '2x8': 1.2,
  '2x10': 1.6,
  '2x12': 2.1,
  '4x4': 1.8,
  '4x6': 2.6,
  '6x6': 4.4,
};
const sawn = Object.entries(SAWN_PER_FT).flatMap(([nominal, perFt]) =>
  [8, 10, 12, 14, 16, 18, 20].map((lengthFt): [string, number] => [
    `sawn/${nominal}/${lengthFt}`,
    dollars(perFt * lengthFt),
  ]),
);

/** Invented: a few common glulam sizes per lf. */
const glulam: [string, number][] = [
  ['glulam/3.5x9', dollars(16)],
  ['glulam/3.5x12', dollars(21)],
  ['glulam/5.125x12', dollars(30)],
  ['glulam/5.125x13.5', dollars(34)],
  ['glulam/5.5x12', dollars(32)],
  ['glulam/5.5x13.75', dollars(37)],
];

export const DEMO_PRICES: readonly [key: string, amount: number][] = [
  ...lvl,
  ...sawn,
  ...glulam,
  ['post/cap', dollars(38)],
  ['post/base', dollars(32)],
  ['post/squash-block', dollars(18)],
  ['hanger/joist', dollars(4.5)],
  ['hanger/strap', dollars(5.25)],
  ['fastener/ply', dollars(1.4)],
  ['footing/saw-cut', dollars(240)],
  ['footing/rebar', dollars(35)],
  ['footing/inspection', dollars(90)],
  ['footing/dig', dollars(14)],
  ['footing/concrete', dollars(11)],
  ['footing/slab-patch', dollars(22)],
  ['shoring/stud', dollars(4.75)],
  ['shoring/plate', dollars(0.65)],
  ['shoring/shore-rental', dollars(9)],
  ['shoring/shores-per-wall', qty(4)],
  ['rate/carpenter', dollars(72)],
  ['rate/labourer', dollars(48)],
  ['rate/drywall', dollars(66)],
  ['rate/painter', dollars(58)],
  ['rate/day-minimum', qty(4)],
  ['rate/crew-day', qty(8)],
  ['hours/shoring', qty(0.35)],
  ['hours/demolition', qty(0.6)],
  ['hours/set-member', qty(0.4)],
  ['hours/floor-patch', qty(0.5)],
  ['hours/trim', qty(0.15)],
  ['hours/joist-hung', qty(0.3)],
  ['hours/post', qty(1.5)],
  ['hours/footing', qty(3)],
  ['hours/jacks-and-kings', qty(1.25)],
  ['hours/drywall-hang', qty(0.04)],
  ['hours/drywall-coat', qty(0.02)],
  ['hours/drywall-coats', qty(3)],
  ['hours/paint', qty(0.02)],
  ['demolition/disposal', dollars(185)],
  ['allowance/wiring', dollars(450)],
  ['allowance/plumbing', dollars(900)],
  ['allowance/duct', dollars(600)],
  ['allowance/gas', dollars(750)],
  ['protection/dust', dollars(160)],
  ['protection/floor', dollars(0.45)],
  ['lead-safe/work', dollars(380)],
  ['finish/floor-patch', dollars(14)],
  ['finish/trim', dollars(3.2)],
  ['finish/drywall', dollars(1.1)],
  ['finish/texture', dollars(0.6)],
  ['finish/paint', dollars(0.55)],
  ['permit/building', dollars(320)],
  ['engineer/fee', dollars(850)],
  ['engineer/site-visit', dollars(300)],
  ['delivery/standard', dollars(75)],
  ['delivery/boom', dollars(240)],
  ['delivery/crane', dollars(900)],
  ['delivery/heavy-crew', dollars(48)],
  ['delivery/carry-limit', qty(200)],
  ['yard/cut', dollars(12)],
  ['yard/restocking', percent(15)],
  ['yard/special-order', percent(10)],
  ['yard/stocked-length', qty(24)],
  ['yard/longest-length', qty(48)],
  ['yard/stocked-depth', qty(14)],
  ['yard/lead-time', qty(10)],
  ['alternate/steel', dollars(95)],
  ['alternate/flitch', dollars(70)],
  ['old-house/knob-and-tube', dollars(1200)],
  ['old-house/vent-stack', dollars(1500)],
  ['old-house/asbestos-test', dollars(275)],
  ['schedule/engineer-wait', qty(10)],
  ['schedule/inspection-wait', qty(2)],
  ['schedule/concrete-cure', qty(3)],
  ['markup/waste', percent(10)],
  ['markup/tax', percent(8.25)],
  ['markup/overhead', percent(15)],
  ['markup/profit', percent(10)],
  ['markup/contingency', percent(10)],
];

/** How old a demo price may be before it shows as stale, days (invented). */
export const DEMO_STALE_AFTER_DAYS = 90;
