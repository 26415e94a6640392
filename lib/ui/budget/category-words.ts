import type { PriceCategory } from '@/lib/budget';

/** Price book categories in words, in the order the price book shows them. */
export const categoryWords: Record<PriceCategory, string> = {
  'engineered-lumber': 'LVL by depth, per ply',
  'sawn-lumber': 'Sawn lumber by size and length',
  glulam: 'Glulam by size',
  'posts-and-hardware': 'Post caps, bases, squash blocks',
  'hangers-and-connectors': 'Hangers and connectors',
  'ply-fasteners': 'Ply fastening',
  footing: 'Footing work',
  shoring: 'Temporary walls and shores',
  'labour-rates': 'Labour rates',
  production: 'Hours by task',
  demolition: 'Demolition and disposal',
  allowances: 'Allowances: wiring, plumbing, ducts, gas',
  protection: 'Dust and floor protection',
  'lead-safe': 'Lead-safe work',
  finishes: 'Drywall, texture, paint, trim, flooring',
  'permit-and-engineer': 'Permit and engineer',
  delivery: 'Delivery and heavy pieces',
  yard: 'Yard: cuts, stock, special order',
  alternates: 'Steel and flitch alternates',
  'old-house': 'Old-house surprises',
  schedule: 'Waiting days',
  markups: 'Waste, tax, overhead, profit, contingency',
};
