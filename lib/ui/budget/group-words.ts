import type { LineGroup } from '@/lib/budget';

/** Budget line groups in words, in the order they are shown. */
export const groupWords: Record<LineGroup, string> = {
  member: 'The member',
  'posts-and-footing': 'Posts and footings',
  hardware: 'Hangers and fastening',
  shoring: 'Shoring',
  labour: 'Labour',
  demolition: 'Demolition and disposal',
  allowances: 'Allowances',
  protection: 'Protection',
  finishes: 'Finish patch',
  fees: 'Permit, inspection, engineer',
  delivery: 'Delivery',
  'old-house': 'Old-house allowances',
  markups: 'Waste, tax, overhead, profit, contingency',
};
