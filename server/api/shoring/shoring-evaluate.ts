import {
  CalcInputError,
  SHORING_END_RUN_FT,
  SHORING_SEQUENCE,
  planShoring,
  rentedShores,
  studWallTakeoff,
} from '@/lib/calc';
import { AppError } from '@/server/app-error';
import { fieldErrors } from '@/shared/errors';
import { shoringPlanInputSchema } from '@/shared/schemas/calc/shoring';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { ShoringPlanBody, ShoringResult } from '@/shared/schemas/shoring-plans';

/**
 * Runs the engine's shoring plan on the member's saved loads and the body's layout, then the studs and
 * plates of each wall (at the spacing chosen, or the widest common one that works when it fails) or the
 * rented shores at the rated capacity read off them. Engine field errors come back as 400s at the field.
 */
export function evaluateShoring(member: MemberCheckInput, body: ShoringPlanBody): ShoringResult {
  const {
    materialId: _m,
    sizeId: _s,
    plies: _p,
    gradeUnknown: _g,
    measuredPly: _mp,
    posts: _posts,
    ...loading
  } = member;
  const { method, shoreRatedCapacityLb, wallLengthFt: givenLength, ...layout } = body;
  const parsed = shoringPlanInputSchema.safeParse({ ...layout, member: loading });
  if (!parsed.success) {
    throw new AppError('bad_request', 'Some fields need attention', fieldErrors(parsed.error.issues));
  }
  try {
    const plan = planShoring(parsed.data);
    const wallLengthFt = givenLength ?? member.clearSpanFt + 2 * SHORING_END_RUN_FT;
    const standsOk = plan.walls.every((w) => w.standing.verdict !== 'not-acceptable');
    const takeoff =
      method === 'stud-walls'
        ? plan.walls.map((w) => {
            const spacingIn = w.check.pass
              ? body.studs.studSpacingIn
              : (w.check.layoutSpacingIn ?? body.studs.studSpacingIn);
            return {
              side: w.side,
              spacingIn,
              ...studWallTakeoff(wallLengthFt, spacingIn, body.studs.heightFt),
            };
          })
        : null;
    const shores =
      method === 'rented-shores' && shoreRatedCapacityLb !== undefined
        ? plan.walls.map((w) => ({
            side: w.side,
            ...rentedShores(w.loadPlf, shoreRatedCapacityLb, wallLengthFt),
          }))
        : null;
    const carried = shores
      ? shores.every((s) => s.pass)
      : plan.walls.every((w) => w.check.pass || w.check.layoutSpacingIn !== null);
    return {
      pass: standsOk && carried,
      wallLengthFt,
      plan,
      takeoff,
      shores,
      sequence: [...SHORING_SEQUENCE],
    };
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    throw new AppError('bad_request', error.message, { [error.field]: [error.message] });
  }
}
