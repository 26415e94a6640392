import type { z } from 'zod';
import { buildSpanTable, CalcInputError, parseLength } from '@/lib/calc';
import { parseNumberText } from '@/lib/ui/number-text';
import {
  spanTableInputSchema,
  type SpanTableInput,
  type SpanTableInputBody,
  type SpanTableResult,
} from '@/shared/schemas/calc/span-table';
import type { SpanTableDraft } from './span-table-draft';
import { parseWidthList } from './width-list';

/** Messages keyed by the draft field that shows them ('_' for the form as a whole). */
export type FieldErrors = Partial<Record<keyof SpanTableDraft | '_', string[]>>;
type Field = keyof FieldErrors;

export type SpanTableRun =
  { ok: true; input: SpanTableInput; result: SpanTableResult } | { ok: false; errors: FieldErrors };

/** How each field is named in a message, and its unit. */
const FIELDS: Partial<Record<Field, { label: string; unit: string }>> = {
  deadPsf: { label: 'Dead load', unit: 'psf' },
  livePsf: { label: 'Live load', unit: 'psf' },
  roofLivePsf: { label: 'Roof live load', unit: 'psf' },
  roofSnowPsf: { label: 'Roof snow load', unit: 'psf' },
  bearing: { label: 'Bearing length', unit: 'in' },
  widths: { label: 'Tributary width', unit: 'ft' },
};

/** Input paths of spanTableInputSchema and the draft field each belongs to. */
const INPUT_TO_DRAFT: Record<string, Field> = {
  edition: 'edition',
  deadPsf: 'deadPsf',
  livePsf: 'livePsf',
  roofLivePsf: 'roofLivePsf',
  roofSnowPsf: 'roofSnowPsf',
  tributaryWidthsFt: 'widths',
  materialIds: 'materialId',
  materialId: 'materialId',
  plies: 'plies',
  deflectionUse: 'deflectionUse',
  bearingIn: 'bearing',
  spanBasis: 'designSpans',
};

const capitalize = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
const add = (errors: FieldErrors, field: Field, message: string) => (errors[field] ??= []).push(message);

function psf(errors: FieldErrors, field: Field, text: string, required: boolean): number | undefined {
  const read = parseNumberText(text);
  if (read.kind === 'number') return read.value;
  const label = FIELDS[field]?.label ?? field;
  if (read.kind === 'invalid') add(errors, field, `${label}: enter a number of psf, like 15 or 12.5`);
  else if (required) add(errors, field, `Enter the ${label.toLowerCase()} in psf`);
  return undefined;
}

function inches(errors: FieldErrors, field: Field, text: string): number | undefined {
  if (text.trim() === '') return undefined;
  try {
    return parseLength(text, field, { label: FIELDS[field]?.label });
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    add(errors, field, error.message);
    return undefined;
  }
}

/**
 * The span table input a draft describes, and a message for each field that can't be read (psf as plain
 * numbers, bearing as a length in inches, widths as a list of lengths in feet). Empty optional loads are
 * left out (no such load); an empty bearing takes the engine's default.
 *
 * @example readSpanTableDraft(emptySpanTableDraft()).input.tributaryWidthsFt // [4, 8, 12, 16]
 */
export function readSpanTableDraft(draft: SpanTableDraft): {
  input: SpanTableInputBody;
  errors: FieldErrors;
} {
  const errors: FieldErrors = {};
  const widths = parseWidthList(draft.widths);
  for (const message of widths.errors) add(errors, 'widths', message);
  const input: SpanTableInputBody = {
    edition: draft.edition,
    deadPsf: psf(errors, 'deadPsf', draft.deadPsf, true) as number,
    livePsf: psf(errors, 'livePsf', draft.livePsf, false),
    roofLivePsf: psf(errors, 'roofLivePsf', draft.roofLivePsf, false),
    roofSnowPsf: psf(errors, 'roofSnowPsf', draft.roofSnowPsf, false),
    tributaryWidthsFt: widths.widthsFt,
    materialIds: [draft.materialId],
    plies: draft.plies,
    selfWeight: draft.selfWeight,
    deflectionUse: draft.deflectionUse,
    bearingIn: inches(errors, 'bearing', draft.bearing),
    spanBasis: draft.designSpans ? 'design' : undefined,
  };
  return { input, errors };
}

/** A schema message in the form's words: zod's own range messages are rewritten with the field's name and unit. */
function schemaMessage(issue: z.core.$ZodIssue, field: Field): string {
  const index = issue.path[1];
  const named = FIELDS[field];
  const label = typeof index === 'number' && field === 'widths' ? `Width ${index + 1}` : named?.label;
  if (!/^(Too small|Too big|Invalid)/.test(issue.message)) return capitalize(issue.message);
  if (issue.code === 'too_small' && issue.origin === 'array' && field === 'plies')
    return 'Choose at least one ply count';
  if (issue.code === 'too_small' && issue.origin === 'number' && label && named)
    return `${label}: must be ${issue.inclusive ? 'at least' : 'more than'} ${issue.minimum} ${named.unit}`;
  if (issue.code === 'too_big' && issue.origin === 'number' && label && named)
    return `${label}: at most ${issue.maximum} ${named.unit}`;
  return label ? `${label}: ${issue.message}` : issue.message;
}

/**
 * The span table for a draft, built on the device: the draft is read, checked by spanTableInputSchema (the
 * server's schema) and only then solved by buildSpanTable. On bad input nothing is computed and every
 * message is keyed by the field that shows it; a field whose text can't be read shows that message only.
 *
 * @example const run = runSpanTable(emptySpanTableDraft()); if (run.ok) run.result.rows[0].cells[0].spanText;
 */
export function runSpanTable(draft: SpanTableDraft): SpanTableRun {
  const reading = readSpanTableDraft(draft);
  const errors: FieldErrors = { ...reading.errors };
  const parsed = spanTableInputSchema.safeParse(reading.input);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = INPUT_TO_DRAFT[String(issue.path[0])] ?? '_';
      if (!reading.errors[field]) add(errors, field, schemaMessage(issue, field));
    }
  }
  if (!parsed.success || Object.keys(errors).length > 0) return { ok: false, errors };
  try {
    return { ok: true, input: parsed.data, result: buildSpanTable(parsed.data) };
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    return { ok: false, errors: { [INPUT_TO_DRAFT[error.field] ?? '_']: [error.message] } };
  }
}
