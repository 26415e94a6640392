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
      'rate_limited',
      'internal',
    ]),
    message: z.string(),
    fields: z.record(z.string(), z.array(z.string())).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
export type ApiErrorCode = ApiErrorBody['error']['code'];

/** Flattens a zod error into the `fields` map of an API error body. */
export function fieldErrors(error: z.ZodError): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}
