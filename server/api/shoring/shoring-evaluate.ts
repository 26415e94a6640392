import { CalcInputError, evaluateShoringPlan } from '@/lib/calc';
import { AppError } from '@/server/app-error';
import { fieldErrors } from '@/shared/errors';
import { shoringPlanInputSchema } from '@/shared/schemas/calc/shoring';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { ShoringPlanBody, ShoringResult } from '@/shared/schemas/shoring-plans';

/**
 * Runs the engine's shoring plan (lib/calc evaluateShoringPlan, the same the planner runs on the device) on
 * the member's saved loads and the body's layout. Engine field errors come back as 400s at the field.
 */
export function evaluateShoring(member: MemberCheckInput, body: ShoringPlanBody): ShoringResult {
  // The schema keeps the member's loads and the body's layout and drops the rest (size, method, shores).
  const parsed = shoringPlanInputSchema.safeParse({ ...body, member });
  if (!parsed.success) {
    throw new AppError('bad_request', 'Some fields need attention', fieldErrors(parsed.error.issues));
  }
  try {
    return evaluateShoringPlan(parsed.data, body, member.clearSpanFt);
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    throw new AppError('bad_request', error.message, { [error.field]: [error.message] });
  }
}
