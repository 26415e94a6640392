import { z } from 'zod';

/**
 * A firm's price book (DESIGN.md §4 price_items). Every price has a key the budget reads (the catalogue is
 * lib/budget/price-catalogue), a whole-number amount (cents for money, basis points for a percentage,
 * thousandths for a quantity), a note, and when and by whom it was set.
 */

/** Price book keys: lower-case words, digits, dots, dashes, "x" and slashes ("lvl/11.875", "markup/tax"). */
export const priceKeySchema = z
  .string()
  .min(1, { message: 'Give the item' })
  .max(60, { message: 'At most 60 characters' })
  .regex(/^[a-z0-9.\-/]+$/, { message: 'Not a price book item' });

/** Largest amount a price may hold: $10,000,000.00 in cents, or 10,000,000 of a quantity's thousandths. */
export const MAX_PRICE_AMOUNT = 1_000_000_000;

const amount = z
  .number({ message: 'Enter an amount' })
  .int({ message: 'A whole number of cents, basis points or thousandths' })
  .min(0, { message: 'Cannot be below 0' })
  .max(MAX_PRICE_AMOUNT, { message: 'Too large' });
const note = z.string().trim().max(200, { message: 'At most 200 characters' });

/** `POST /api/price-book/items`: set one item's price (a new price or a changed one). */
export const priceSetSchema = z.object({ key: priceKeySchema, amount, note: note.default('') });
export type PriceSet = z.infer<typeof priceSetSchema>;
export type PriceSetBody = z.input<typeof priceSetSchema>;

/** `PATCH /api/price-book/items/:itemId`. */
export const pricePatchSchema = z
  .object({ amount: amount.optional(), note: note.optional() })
  .refine((patch) => patch.amount !== undefined || patch.note !== undefined, {
    message: 'Change the amount or the note',
  });
export type PricePatch = z.infer<typeof pricePatchSchema>;

/** `PATCH /api/price-book/settings`. */
export const priceBookSettingsSchema = z.object({
  staleAfterDays: z
    .number({ message: 'Enter a number of days' })
    .int({ message: 'Whole days' })
    .min(1, { message: 'At least 1 day' })
    .max(3650, { message: 'At most 3,650 days' }),
});
export type PriceBookSettings = z.infer<typeof priceBookSettingsSchema>;

/** Most characters of a CSV import (about 2,000 rows). */
export const MAX_IMPORT_CSV = 200_000;

/** `POST /api/price-book/import`: the CSV text, as exported (key and value columns are read). */
export const priceImportSchema = z.object({
  csv: z
    .string({ message: 'Give the CSV text' })
    .min(1, { message: 'The file is empty' })
    .max(MAX_IMPORT_CSV, { message: `At most ${MAX_IMPORT_CSV.toLocaleString('en-US')} characters` }),
});
export type PriceImport = z.infer<typeof priceImportSchema>;

export const priceItemSchema = z.object({
  id: z.string(),
  key: z.string(),
  category: z.string(),
  /** What the item is, in words (the catalogue's). */
  description: z.string(),
  unit: z.string(),
  amount: z.number().int(),
  note: z.string(),
  setAt: z.string(),
  setBy: z.object({ id: z.string(), name: z.string() }),
  /** Older than the firm's stale age. */
  stale: z.boolean(),
});
export type PriceItem = z.infer<typeof priceItemSchema>;

export const catalogueEntrySchema = z.object({
  key: z.string(),
  category: z.string(),
  description: z.string(),
  unit: z.string(),
});

export const priceBookSchema = z.object({
  items: z.array(priceItemSchema),
  staleAfterDays: z.number().int(),
  /** Fixed items the firm has not priced yet. */
  unpriced: z.array(catalogueEntrySchema),
});
export type PriceBook = z.infer<typeof priceBookSchema>;

export const priceImportResultSchema = z.object({ imported: z.number().int(), changed: z.number().int() });
