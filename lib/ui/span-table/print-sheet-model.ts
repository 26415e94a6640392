import { DEFAULT_BEARING_IN, DEFLECTION_PRESETS } from '@/lib/calc';
import type { SpanTableInput, SpanTableResult } from '@/shared/schemas/calc/span-table';
import { GOVERNING_KEYS, legendLines } from './governing-key';
import { spanBasisHeading, spanBasisName, type SpanBasis } from './span-basis';
import { widthTitle } from './span-table-csv';
import { assumptionsOf, type Assumption } from './span-table-summary';

/** Everything a printed span table carries, as text, in print order. */
export type PrintSheetModel = {
  title: string;
  heading: string;
  /** Column titles: the size column, then one per tributary width. */
  columns: string[];
  /** Per size: its label, then each width's span with its governing key ("12-3 b"). */
  rows: string[][];
  legend: string[];
  assumptions: Assumption[];
  notes: string[];
  warnings: string[];
  sources: string[];
  caution: string;
};

/**
 * The print layout's content for a built table: title, which span the numbers are, the table with a key
 * per cell, the legend, the assumptions, the engine's notes and warnings, the sources and the caution.
 *
 * @param caution the caution the screen shows (lib/ui/caution-note.tsx), printed under the table
 * @example printSheetModel(input, result, 'design', cautionText).columns // ['Size', `4' 0"`, `8' 0"`]
 */
export function printSheetModel(
  input: SpanTableInput,
  result: SpanTableResult,
  basis: SpanBasis,
  caution: string,
): PrintSheetModel {
  const materials = [...new Set(result.rows.map((r) => r.materialLabel))];
  return {
    title: `Span table${materials.length ? ` — ${materials.join(', ')}` : ''}`,
    heading: `${spanBasisName(basis)} (ft-in) by size and tributary width. ${spanBasisHeading(
      basis,
      input.bearingIn ?? DEFAULT_BEARING_IN,
    )}`,
    columns: ['Size', ...result.tributaryWidthsFt.map(widthTitle)],
    rows: result.rows.map((row) => [
      row.sizeLabel,
      ...row.cells.map((cell) => `${cell.spanText} ${GOVERNING_KEYS[cell.governedBy].key}`),
    ]),
    legend: legendLines(DEFLECTION_PRESETS[input.deflectionUse ?? 'floor']),
    assumptions: assumptionsOf(input),
    notes: result.notes,
    warnings: result.warnings,
    sources: result.sources,
    caution,
  };
}
