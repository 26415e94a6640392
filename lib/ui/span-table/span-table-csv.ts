import { formatFtIn, toCsv } from '@/lib/format';
import type { SpanTableResult } from '@/shared/schemas/calc/span-table';
import { GOVERNING_KEYS } from './governing-key';
import { spanBasisName, type SpanBasis } from './span-basis';

/** A width as a column title: `4' 0"`, `6' 6"`. */
export const widthTitle = (tributaryFt: number) => formatFtIn(tributaryFt * 12);

/**
 * A printed span with its marks, "12-3" → `12' 3"`: spreadsheets read a bare "3-7" as a date (7 March), so
 * the CSV carries the marks.
 */
export const markedSpan = (spanText: string) => spanText.replace(/^(\d+)-(\d+)$/, `$1' $2"`);

/**
 * The span table as CSV (RFC 4180): one record per size with, for each tributary width, the span as printed
 * (ft-in with its marks, rounded down to the inch, on the table's basis), the design span in decimal feet
 * (the engine's spanFt, support centre to centre whatever the basis) and the check that governs it in words.
 * The header names which span each column is.
 *
 * @param result the engine's span table
 * @param basis which span its numbers are
 * @example spanTableCsv(result, 'design').split('\r\n')[0] // 'Material,Size,"Design span, tributary 4\' 0"" (ft-in)",…'
 */
export function spanTableCsv(result: SpanTableResult, basis: SpanBasis): string {
  const name = spanBasisName(basis);
  const header = ['Material', 'Size'];
  for (const ft of result.tributaryWidthsFt) {
    const width = widthTitle(ft);
    header.push(
      `${name}, tributary ${width} (ft-in)`,
      `Design span, tributary ${width} (ft)`,
      `Governs, tributary ${width}`,
    );
  }
  const rows = result.rows.map((row) => [
    row.materialLabel,
    row.sizeLabel,
    ...row.cells.flatMap((cell) => [
      markedSpan(cell.spanText),
      cell.spanFt.toFixed(3),
      `${GOVERNING_KEYS[cell.governedBy].word} (${cell.combination})`,
    ]),
  ]);
  return toCsv([header, ...rows]);
}
