import type { ShoringPlanInput } from '@/shared/schemas/calc/shoring';
import type { ShoringPlanBody, ShoringResult } from '@/shared/schemas/shoring-plans';
import { planShoring } from './shoring-plan';
import { SHORING_END_RUN_FT, SHORING_SEQUENCE, rentedShores, studWallTakeoff } from './shoring-takeoff';

/**
 * A member's whole shoring plan, as saved and as computed on the device while it is typed: the engine's
 * plan of each temporary wall (load per foot during the swap, stud check, what it stands on), then the studs
 * and plates of each wall (at the spacing chosen, or the widest common one that works when it fails) or
 * the rented shores at the rated capacity read off them.
 *
 * @param input the plan's parsed input (the member's loads with the layout), lengths in ft.
 * @param body the planner's choices: method, rated capacity of one shore (lb), wall length (ft).
 * @param clearSpanFt the member's clear span, ft: each wall runs SHORING_END_RUN_FT past each end by default.
 * @returns whether the plan holds, the wall length (ft), the plan, the takeoff or the shores, the sequence.
 * @throws CalcInputError naming the field when the engine cannot plan it.
 * @example evaluateShoringPlan(input, { ...body, method: 'stud-walls' }, 12).takeoff?.[0].studCount
 * Reference: common practice (takeoff, sequence); NDS 2018 §3.7 (stud check, through planShoring).
 */
export function evaluateShoringPlan(
  input: ShoringPlanInput,
  body: ShoringPlanBody,
  clearSpanFt: number,
): ShoringResult {
  const plan = planShoring(input);
  const wallLengthFt = body.wallLengthFt ?? clearSpanFt + 2 * SHORING_END_RUN_FT;
  const standsOk = plan.walls.every((w) => w.standing.verdict !== 'not-acceptable');
  const takeoff =
    body.method === 'stud-walls'
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
  const capacityLb = body.shoreRatedCapacityLb;
  const shores =
    body.method === 'rented-shores' && capacityLb !== undefined
      ? plan.walls.map((w) => ({ side: w.side, ...rentedShores(w.loadPlf, capacityLb, wallLengthFt) }))
      : null;
  const carried = shores
    ? shores.every((s) => s.pass)
    : plan.walls.every((w) => w.check.pass || w.check.layoutSpacingIn !== null);
  return { pass: standsOk && carried, wallLengthFt, plan, takeoff, shores, sequence: [...SHORING_SEQUENCE] };
}
