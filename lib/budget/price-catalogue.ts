import { lvlDepthsIn } from '@/tables/lvl/generic-grades';
import { glulamSizeSets } from '@/tables/glulam/standard-sizes';

/**
 * What a firm's price book can hold: every item the budget reads, by key. Sized items follow patterns
 * (`lvl/<depth in>`, `glulam/<b>x<d>`, `sawn/<nominal>/<length ft>`); the rest are fixed keys. An item's
 * unit says how its whole-number amount reads: money in cents, a percentage in basis points (1 % = 100), a
 * quantity (hours, days, feet, inches, pounds, a count) in thousandths.
 */

export const priceCategories = [
  'engineered-lumber',
  'sawn-lumber',
  'glulam',
  'posts-and-hardware',
  'hangers-and-connectors',
  'ply-fasteners',
  'footing',
  'shoring',
  'labour-rates',
  'production',
  'demolition',
  'allowances',
  'protection',
  'lead-safe',
  'finishes',
  'permit-and-engineer',
  'delivery',
  'yard',
  'alternates',
  'old-house',
  'schedule',
  'markups',
] as const;
export type PriceCategory = (typeof priceCategories)[number];

export const priceUnits = [
  'each',
  'lf',
  'ply-lf',
  'sf',
  'cf',
  'hour',
  'day',
  'lump',
  'percent',
  'hours-per-lf',
  'hours-per-sf',
  'hours-each',
  'hours',
  'days',
  'ft',
  'in',
  'lb',
  'count',
] as const;
export type PriceUnit = (typeof priceUnits)[number];

export type UnitKind = 'money' | 'percent' | 'quantity';

const KIND: Record<PriceUnit, UnitKind> = {
  each: 'money',
  lf: 'money',
  'ply-lf': 'money',
  sf: 'money',
  cf: 'money',
  hour: 'money',
  day: 'money',
  lump: 'money',
  percent: 'percent',
  'hours-per-lf': 'quantity',
  'hours-per-sf': 'quantity',
  'hours-each': 'quantity',
  hours: 'quantity',
  days: 'quantity',
  ft: 'quantity',
  in: 'quantity',
  lb: 'quantity',
  count: 'quantity',
};

/** Money and percentages carry two decimals (cents, basis points); quantities three. */
const SCALE: Record<UnitKind, number> = { money: 100, percent: 100, quantity: 1000 };

/**
 * How an item's stored whole-number amount reads.
 * @param unit the item's unit
 * @returns money (cents), percent (basis points) or quantity (thousandths)
 * @example unitKind('ply-lf') // 'money'
 * Reference: Tributary price book convention (integer amounts).
 */
export function unitKind(unit: PriceUnit): UnitKind {
  return KIND[unit];
}

/**
 * Stored amounts per displayed unit: 100 for money (cents per dollar) and percentages (basis points per
 * percent), 1000 for quantities.
 * @example amountScale('hours') // 1000
 * Reference: Tributary price book convention (integer amounts).
 */
export function amountScale(unit: PriceUnit): number {
  return SCALE[KIND[unit]];
}

export interface CatalogueItem {
  key: string;
  category: PriceCategory;
  label: string;
  unit: PriceUnit;
}

const fixed = (category: PriceCategory, unit: PriceUnit, items: [key: string, label: string][]) =>
  items.map(([key, label]): CatalogueItem => ({ key, category, label, unit }));

/** The fixed items, in the order the price book lists them. */
export const FIXED_ITEMS: readonly CatalogueItem[] = Object.freeze([
  ...fixed('posts-and-hardware', 'each', [
    ['post/cap', 'Post cap'],
    ['post/base', 'Post base'],
    ['post/squash-block', 'Squash block set, per floor crossed'],
  ]),
  ...fixed('hangers-and-connectors', 'each', [
    ['hanger/joist', 'Joist hanger'],
    ['hanger/strap', 'Strap or hanger for a ceiling joist hung from a raised member'],
  ]),
  ...fixed('ply-fasteners', 'lf', [['fastener/ply', 'Ply-to-ply fastening, per lf of member per ply joint']]),
  ...fixed('footing', 'each', [
    ['footing/saw-cut', 'Saw-cut the slab, per pad'],
    ['footing/rebar', 'Rebar, per pad'],
    ['footing/inspection', 'Footing inspection'],
  ]),
  ...fixed('footing', 'cf', [
    ['footing/dig', 'Dig and haul, per cubic foot'],
    ['footing/concrete', 'Concrete placed, per cubic foot'],
  ]),
  ...fixed('footing', 'sf', [['footing/slab-patch', 'Slab patch over the pad, per sq ft']]),
  ...fixed('shoring', 'each', [['shoring/stud', 'Temporary wall stud (precut)']]),
  ...fixed('shoring', 'lf', [['shoring/plate', 'Temporary wall plate, per lf']]),
  ...fixed('shoring', 'day', [['shoring/shore-rental', 'Rented adjustable shore, per shore per day']]),
  ...fixed('shoring', 'count', [['shoring/shores-per-wall', 'Rented shores per temporary wall line']]),
  ...fixed('labour-rates', 'hour', [
    ['rate/carpenter', 'Carpenter, per hour'],
    ['rate/labourer', 'Labourer, per hour'],
    ['rate/drywall', 'Drywall finisher, per hour'],
    ['rate/painter', 'Painter, per hour'],
  ]),
  ...fixed('labour-rates', 'hours', [
    ['rate/day-minimum', 'Least hours charged per trip'],
    ['rate/crew-day', 'Working hours in a crew day'],
  ]),
  ...fixed('production', 'hours-per-lf', [
    ['hours/shoring', 'Build and strike a temporary wall, per lf'],
    ['hours/demolition', 'Take out the old wall or open it, per lf'],
    ['hours/set-member', 'Set the member, per lf'],
    ['hours/floor-patch', 'Patch flooring along the old wall line, per lf'],
    ['hours/trim', 'Trim, per lf'],
  ]),
  ...fixed('production', 'hours-each', [
    ['hours/joist-hung', 'Hang one joist'],
    ['hours/post', 'Set one post with cap and base'],
    ['hours/footing', 'Dig, form and pour one pad'],
    ['hours/jacks-and-kings', 'Frame one end (jack and king studs)'],
  ]),
  ...fixed('production', 'hours-per-sf', [
    ['hours/drywall-hang', 'Hang drywall, per sq ft'],
    ['hours/drywall-coat', 'One coat of joint compound, per sq ft'],
    ['hours/paint', 'Texture and paint, per sq ft'],
  ]),
  ...fixed('production', 'count', [['hours/drywall-coats', 'Coats of joint compound (one trip each)']]),
  ...fixed('demolition', 'each', [['demolition/disposal', 'Debris disposal, per load']]),
  ...fixed('allowances', 'lump', [
    ['allowance/wiring', 'Move wiring in the wall'],
    ['allowance/plumbing', 'Move plumbing in the wall'],
    ['allowance/duct', 'Move a duct in the wall'],
    ['allowance/gas', 'Move a gas line in the wall'],
  ]),
  ...fixed('protection', 'lump', [['protection/dust', 'Dust walls and cleanup']]),
  ...fixed('protection', 'sf', [['protection/floor', 'Floor protection, per sq ft']]),
  ...fixed('lead-safe', 'lump', [['lead-safe/work', 'Lead-safe work practices (house built before 1978)']]),
  ...fixed('finishes', 'lf', [
    ['finish/floor-patch', 'Flooring patch material, per lf of old wall line'],
    ['finish/trim', 'Trim material, per lf'],
  ]),
  ...fixed('finishes', 'sf', [
    ['finish/drywall', 'Drywall and compound, per sq ft'],
    ['finish/texture', 'Texture, per sq ft'],
    ['finish/paint', 'Paint, per sq ft'],
  ]),
  ...fixed('permit-and-engineer', 'each', [
    ['permit/building', 'Building permit'],
    ['engineer/fee', "Engineer's design fee"],
    ['engineer/site-visit', "Engineer's site visit"],
  ]),
  ...fixed('delivery', 'each', [
    ['delivery/standard', 'Delivery'],
    ['delivery/boom', 'Boom truck delivery'],
    ['delivery/crane', 'Crane delivery'],
  ]),
  ...fixed('delivery', 'hour', [['delivery/heavy-crew', 'Extra crew for a heavy piece, per person-hour']]),
  ...fixed('delivery', 'lb', [['delivery/carry-limit', 'Heaviest piece two people carry in']]),
  ...fixed('yard', 'each', [['yard/cut', 'Cut charge, per cut']]),
  ...fixed('yard', 'percent', [
    ['yard/restocking', 'Restocking fee on returned stock'],
    ['yard/special-order', 'Special-order premium'],
  ]),
  ...fixed('yard', 'ft', [
    ['yard/stocked-length', 'Longest engineered lumber kept in stock'],
    ['yard/longest-length', 'Longest engineered lumber made to order'],
  ]),
  ...fixed('yard', 'in', [['yard/stocked-depth', 'Deepest engineered lumber kept in stock']]),
  ...fixed('yard', 'days', [['yard/lead-time', 'Lead time on a special order']]),
  ...fixed('alternates', 'lf', [
    ['alternate/steel', 'Steel beam allowance, fabricated, per lf'],
    ['alternate/flitch', 'Flitch plate allowance, per lf'],
  ]),
  ...fixed('old-house', 'lump', [
    ['old-house/knob-and-tube', 'Knob-and-tube wiring found'],
    ['old-house/vent-stack', 'Vent stack in the wall'],
    ['old-house/asbestos-test', 'Asbestos test'],
  ]),
  ...fixed('schedule', 'days', [
    ['schedule/engineer-wait', "Waiting for the engineer's design"],
    ['schedule/inspection-wait', 'Waiting for an inspection'],
    ['schedule/concrete-cure', 'Concrete cure before the post is loaded'],
  ]),
  ...fixed('markups', 'percent', [
    ['markup/waste', 'Waste on lumber'],
    ['markup/tax', 'Sales tax on materials'],
    ['markup/overhead', 'Overhead'],
    ['markup/profit', 'Profit'],
    ['markup/contingency', 'Contingency'],
  ]),
]);

const FIXED_BY_KEY = new Map(FIXED_ITEMS.map((item) => [item.key, item]));

/** Even stock lengths of sawn lumber, ft (common practice). */
export const SAWN_LENGTHS_FT = [8, 10, 12, 14, 16, 18, 20] as const;

const GLULAM_SIZES = new Set(
  glulamSizeSets.flatMap((set) => set.widthsIn.flatMap((b) => set.depthsIn.map((d) => `${b}x${d}`))),
);

const inchText = (value: number) => String(value);

/**
 * The catalogue entry a key names, sized ones included; undefined for a key the budget never reads.
 * @param key e.g. "lvl/11.875", "glulam/5.125x12", "sawn/2x10/12", "markup/tax"
 * @returns the item's category, label and unit
 * @example catalogueItem('lvl/11.875')?.unit // 'ply-lf'
 * Reference: Tributary price book; engineered lumber priced by depth per 1-3/4 in ply (common practice).
 */
export function catalogueItem(key: string): CatalogueItem | undefined {
  const known = FIXED_BY_KEY.get(key);
  if (known) return known;
  const lvl = key.match(/^lvl\/(\d+(?:\.\d+)?)$/);
  if (
    lvl &&
    (lvlDepthsIn as readonly number[]).includes(Number(lvl[1])) &&
    lvl[1] === inchText(Number(lvl[1]))
  )
    return {
      key,
      category: 'engineered-lumber',
      label: `LVL 1-3/4 in ply, ${lvl[1]} in deep, per lf`,
      unit: 'ply-lf',
    };
  if (key.startsWith('glulam/') && GLULAM_SIZES.has(key.slice('glulam/'.length)))
    return {
      key,
      category: 'glulam',
      label: `Glulam ${key.slice(7).replace('x', ' x ')} in, per lf`,
      unit: 'lf',
    };
  const sawn = key.match(/^sawn\/([2-8]x(?:[2-9]|1[0-6]))\/(\d+)$/);
  if (sawn && (SAWN_LENGTHS_FT as readonly number[]).includes(Number(sawn[2])))
    return { key, category: 'sawn-lumber', label: `${sawn[1]} × ${sawn[2]} ft, per piece`, unit: 'each' };
  return undefined;
}
