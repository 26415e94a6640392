import type { z } from 'zod';
import { memberCheckInputSchema, memberCheckOptionsSchema } from '@/shared/schemas/calc/member';

/**
 * Bodies of the stateless calculation routes (POST /api/calc/*) that are not one engine schema already.
 * The shortlist and span table routes take shortlistInputSchema and spanTableInputSchema as they are.
 */

/** POST /api/calc/check: a member check input plus `diagrams` (sample V, M and deflection for drawing). */
export const memberCheckRequestSchema = memberCheckInputSchema.extend(
  memberCheckOptionsSchema.pick({ diagrams: true }).shape,
);
export type MemberCheckRequest = z.infer<typeof memberCheckRequestSchema>;
export type MemberCheckRequestBody = z.input<typeof memberCheckRequestSchema>;
