import Papa from 'papaparse';
import { amountText, catalogueItem, parseAmountText, type PriceUnit } from '@/lib/budget';
import { toCsv } from '@/lib/format/csv';
import type { PriceItem } from '@/shared/schemas/price-book';
import { amountProblem } from './price-rules';

export const PRICE_CSV_HEADER = [
  'key',
  'category',
  'item',
  'unit',
  'value',
  'note',
  'set_at',
  'set_by',
] as const;

/**
 * The price book as CSV: one row per price with its value in the unit's decimals (dollars, percent,
 * hours…), when it was set and by whom. Import reads `key`, `value` and `note` back (and checks `unit`).
 */
export function priceBookCsv(items: readonly PriceItem[]): string {
  return toCsv([
    [...PRICE_CSV_HEADER],
    ...items.map((item) => [
      item.key,
      item.category,
      item.description,
      item.unit,
      amountText(item.amount, item.unit as PriceUnit),
      item.note,
      item.setAt,
      item.setBy.name,
    ]),
  ]);
}

export interface ImportRow {
  key: string;
  amount: number;
  note: string;
}

/** Reads a price CSV: every row checked, every problem named by its line; rows only when there is none. */
export function readPriceCsv(csv: string): { rows: ImportRow[]; problems: Map<number, string[]> } {
  const problems = new Map<number, string[]>();
  const rows: ImportRow[] = [];
  const firstLine = new Map<string, number>();
  const problem = (line: number, message: string) =>
    problems.set(line, [...(problems.get(line) ?? []), message]);
  const lineAt = (offset: number) => 1 + (csv.slice(0, offset).match(/\r\n|\r|\n/g)?.length ?? 0);

  let header: string[] | null = null;
  let cursor = 0;
  Papa.parse<string[]>(csv, {
    skipEmptyLines: 'greedy',
    step: (result) => {
      const start = cursor;
      cursor = result.meta.cursor;
      const line = lineAt(start + (csv.slice(start).match(/^\s*/)?.[0].length ?? 0));
      for (const error of result.errors) problem(line, error.message);
      const fields = result.data.map((f) => f.trim());
      if (!header) {
        header = fields.map((f) => f.toLowerCase());
        for (const needed of ['key', 'value'])
          if (!header.includes(needed)) problem(line, `The header row has no "${needed}" column`);
        return;
      }
      const cell = (name: string) => {
        const at = header!.indexOf(name);
        return at < 0 ? '' : (fields[at] ?? '');
      };
      const key = cell('key');
      if (!key) return problem(line, 'No item key');
      const item = catalogueItem(key);
      if (!item) return problem(line, `"${key.slice(0, 60)}" is not a price book item`);
      const earlier = firstLine.get(key);
      if (earlier !== undefined) return problem(line, `${key} is already on line ${earlier}`);
      firstLine.set(key, line);
      const unit = cell('unit');
      if (unit && unit !== item.unit)
        problem(line, `The unit of ${key} is ${item.unit}, not ${unit.slice(0, 20)}`);
      const parsed = parseAmountText(cell('value'), item.unit);
      if ('error' in parsed) return problem(line, `Value "${cell('value').slice(0, 30)}": ${parsed.error}`);
      const outOfRange = amountProblem(parsed.amount, item.unit);
      if (outOfRange) return problem(line, outOfRange);
      const note = cell('note');
      if (note.length > 200) return problem(line, 'The note has more than 200 characters');
      if (!problems.has(line)) rows.push({ key, amount: parsed.amount, note });
    },
  });
  if (!header) problems.set(1, ['The file has no header row']);
  else if (rows.length === 0 && problems.size === 0) problems.set(2, ['The file has no prices']);
  return { rows, problems };
}
