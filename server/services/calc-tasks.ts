import { CalcInputError, buildShortlist, buildSpanTable } from '@/lib/calc';
import type { ShortlistInput } from '@/shared/schemas/calc/shortlist';
import type { SpanTableInput } from '@/shared/schemas/calc/span-table';

/**
 * What a worker thread of the calculation pool sends back: the result already as JSON text (serializing a
 * large result is part of the heavy work), or the engine's input error by field, which does not survive
 * the trip between threads as a class.
 */
export type CalcTaskAnswer = { ok: true; json: string } | { ok: false; field: string; message: string };

function answer(work: () => unknown): CalcTaskAnswer {
  try {
    return { ok: true, json: JSON.stringify(work()) };
  } catch (error) {
    if (error instanceof CalcInputError) return { ok: false, field: error.field, message: error.message };
    throw error;
  }
}

/** Runs in a worker thread (calc-worker.cjs): every size of the chosen materials, checked and sorted. */
export function shortlist(input: ShortlistInput): CalcTaskAnswer {
  return answer(() => buildShortlist(input));
}

/** Runs in a worker thread (calc-worker.cjs): the largest span of each size at each tributary width. */
export function spanTable(input: SpanTableInput): CalcTaskAnswer {
  return answer(() => buildSpanTable(input));
}
