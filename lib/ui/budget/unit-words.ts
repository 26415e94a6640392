import type { PriceUnit } from '@/lib/budget';

/** Each price book unit in words, for the value field's label. */
export const unitWords: Record<PriceUnit, string> = {
  each: '$ each',
  lf: '$ per lf',
  'ply-lf': '$ per ply per lf',
  sf: '$ per sq ft',
  cf: '$ per cu ft',
  hour: '$ per hour',
  day: '$ per day',
  lump: '$ lump sum',
  percent: '%',
  'hours-per-lf': 'hours per lf',
  'hours-per-sf': 'hours per sq ft',
  'hours-each': 'hours each',
  hours: 'hours',
  days: 'days',
  ft: 'ft',
  in: 'in',
  lb: 'lb',
  count: 'count',
};
