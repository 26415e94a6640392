import { CalcInputError, evaluateShoringPlan } from '@/lib/calc';
import { fieldErrors } from '@/shared/errors';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import { shoringPlanInputSchema } from '@/shared/schemas/calc/shoring';
import {
  shoringPlanBodySchema,
  type ShoringPlanBody,
  type ShoringPlanBodyInput,
  type ShoringResult,
} from '@/shared/schemas/shoring-plans';

export type LiveShoring =
  | { ok: true; body: ShoringPlanBody; result: ShoringResult }
  | { ok: false; errors: Record<string, string[]> };

/**
 * The shoring plan computed on the device as the planner is typed: the same body schema, input schema and
 * engine function the server runs on save, so what shows before a save is what the save will store.
 */
export function liveShoring(member: MemberCheckInput, body: ShoringPlanBodyInput): LiveShoring {
  const parsedBody = shoringPlanBodySchema.safeParse(body);
  if (!parsedBody.success) return { ok: false, errors: fieldErrors(parsedBody.error) };
  const input = shoringPlanInputSchema.safeParse({ ...parsedBody.data, member });
  if (!input.success) return { ok: false, errors: fieldErrors(input.error) };
  try {
    return {
      ok: true,
      body: parsedBody.data,
      result: evaluateShoringPlan(input.data, parsedBody.data, member.clearSpanFt),
    };
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    return { ok: false, errors: { [error.field]: [error.message] } };
  }
}
