import { z } from 'zod';

/** Body of every non-2xx API answer. `fields` maps a field path ("email", "address.city") to its messages. */
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.enum([
      'bad_request',
      'unauthorized',
      'forbidden',
      'not_found',
      'conflict',
      /** An Idempotency-Key sent again with another method, path or body. */
      'idempotency_key_reused',
      /** A create's client id is another record's (in this firm or any other). */
      'id_taken',
      /** An edit's `baseVersion` is not the record's version; `current` is the record now. */
      'version_conflict',
      'rate_limited',
      'internal',
    ]),
    message: z.string(),
    fields: z.record(z.string(), z.array(z.string())).optional(),
    /** With `version_conflict`: the record as its GET answers it, for the person to choose between. */
    current: z.unknown().optional(),
    /** The server's id of the request (also in the log and the X-Request-Id header): quote it to support. */
    requestId: z.string().optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
export type ApiErrorCode = ApiErrorBody['error']['code'];

/** Most field messages one error body carries; a body with thousands of bad entries gets the first ones. */
export const MAX_FIELD_MESSAGES = 30;

/**
 * Flattens a zod error (or its issues) into the `fields` map of an API error body, keeping the first
 * MAX_FIELD_MESSAGES messages.
 */
export function fieldErrors(error: z.ZodError | readonly z.core.$ZodIssue[]): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  const issues = 'issues' in error ? error.issues : error;
  for (const issue of issues.slice(0, MAX_FIELD_MESSAGES)) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}
