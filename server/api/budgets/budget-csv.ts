import { toCsv } from '@/lib/format/csv';
import type { BudgetLineView } from '@/shared/schemas/budgets';

const HEADER = [
  'member',
  'group',
  'line',
  'quantity',
  'unit',
  'unit_price',
  'amount',
  'basis',
  'price_item',
  'override_note',
];

const dollars = (cents: number) =>
  `${cents < 0 ? '-' : ''}${Math.floor(Math.abs(cents) / 100)}.${String(Math.abs(cents) % 100).padStart(2, '0')}`;

/** Every line of one or more member budgets as CSV (the office's detail; never the client's). */
export function budgetLinesCsv(
  members: readonly { label: string; lines: readonly BudgetLineView[] }[],
): string {
  return toCsv([
    HEADER,
    ...members.flatMap((member) =>
      member.lines.map((line) => [
        member.label,
        line.group,
        line.label,
        String(Math.round(line.quantity * 1000) / 1000),
        line.unit,
        line.unitCents === null ? '' : dollars(line.unitCents),
        dollars(line.amountCents),
        line.basis,
        line.priceKey ?? '',
        line.override?.note ?? '',
      ]),
    ),
  ]);
}
