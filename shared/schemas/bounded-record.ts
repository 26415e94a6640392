import { z } from 'zod';

/** Records made by `boundedRecord`, so a test can tell them from a record with no limit on its entries. */
export const boundedRecords = new WeakSet<z.ZodType>();

/**
 * A record keyed by free text with at most `maxEntries` entries and keys of at most `maxKeyLength`
 * characters (zod's record has no size check of its own). The entries are counted before any is parsed,
 * so an oversized record costs one count, not one issue per entry.
 */
export function boundedRecord<V extends z.ZodType>(
  value: V,
  limits: { maxEntries: number; maxKeyLength: number; message: string },
) {
  const parsed = z.record(z.string().max(limits.maxKeyLength), value);
  // A value that is no object passes the count and gets the record's own type message.
  const counted = z.custom<z.input<typeof parsed>>(
    (input) => typeof input !== 'object' || input === null || Object.keys(input).length <= limits.maxEntries,
    { message: limits.message },
  );
  boundedRecords.add(parsed);
  return counted.pipe(parsed);
}
