import { z } from 'zod';

/**
 * Fields of the device queue's writes (docs/sync-protocol.md): a create may carry the id the device chose,
 * an edit the version of the record it was made on.
 */

/** A record id chosen by the device: a UUID, as the server's own ids are. */
export const clientIdSchema = z
  .uuid({ message: 'Send the id as a UUID' })
  .transform((id) => id.toLowerCase());

/** The record's version the edit was made on; another version answers 409 version_conflict. */
export const baseVersionSchema = z
  .number({ message: 'Send baseVersion as a whole number' })
  .int({ message: 'Send baseVersion as a whole number' })
  .min(0, { message: 'baseVersion cannot be negative' })
  .max(2 ** 31, { message: 'baseVersion is too large' });

/** A record's version in an answer: 1 on create, +1 on every change. */
export const versionSchema = z.number().int();

/** True when a patch changes a field besides the sync fields (`baseVersion`). */
export function changesAField(patch: Record<string, unknown>): boolean {
  return Object.entries(patch).some(([key, value]) => key !== 'baseVersion' && value !== undefined);
}
