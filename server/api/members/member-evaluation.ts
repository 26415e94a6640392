import { CalcInputError, ENGINE_VERSION, checkMember, prescriptiveVerdict } from '@/lib/calc';
import { memberSummary } from '@/lib/members/member-summary';
import { AppError } from '@/server/app-error';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import type { MemberFields } from './members.repository';

/** Engine input errors name a field of the check input; in a member body that input sits under `input`. */
export function asFieldError(error: unknown): unknown {
  if (!(error instanceof CalcInputError)) return error;
  return new AppError('bad_request', error.message, { [`input.${error.field}`]: [error.message] });
}

/** What a member's check reads: the member as it is saved and the two job values a header's verdict takes. */
export interface MemberToEvaluate {
  label: string;
  wall: string;
  input: MemberCheckInput;
  buildingWidthFt: Job['buildingWidthFt'];
  groundSnowPsf: Job['groundSnowPsf'];
}

/** Whether two members to check are the same check (what a pooled result may stand in for). */
export const sameCheck = (a: MemberToEvaluate, b: MemberToEvaluate) =>
  a.label === b.label &&
  a.wall === b.wall &&
  a.buildingWidthFt === b.buildingWidthFt &&
  a.groundSnowPsf === b.groundSnowPsf &&
  JSON.stringify(a.input) === JSON.stringify(b.input);

/** The member to check from the job it belongs to and what is being saved. */
export const memberToEvaluate = (
  job: Job,
  label: string,
  wall: string,
  input: MemberCheckInput,
): MemberToEvaluate => ({
  label,
  wall,
  input,
  buildingWidthFt: job.buildingWidthFt,
  groundSnowPsf: job.groundSnowPsf,
});

/**
 * Runs the engine on what is being saved: the check with its diagram samples, and for a header the
 * prescriptive-path verdict on the job's building width and ground snow, summarised by the rule the device
 * also uses ({@link memberSummary}). The engine's input
 * error is thrown as it is (CalcInputError): this also runs in a worker thread of the calculation pool.
 */
export function evaluateMember(given: MemberToEvaluate): MemberFields {
  const { label, wall, buildingWidthFt, groundSnowPsf } = given;
  const input: MemberCheckInput = { ...given.input, label };
  const result = checkMember(input, { diagrams: true });
  const facts = { member: input, buildingWidthFt, groundSnowPsf };
  const prescriptive = input.kind === 'header' ? prescriptiveVerdict(facts) : null;
  return {
    kind: input.kind,
    label,
    wall,
    input,
    materialId: input.materialId,
    sizeId: input.sizeId,
    summary: memberSummary(facts, result, prescriptive),
    result,
    prescriptive,
    engineVersion: ENGINE_VERSION,
  };
}

/** {@link evaluateMember} on the event loop, the engine's input error as a 400 naming the member's field. */
export function evaluateHere(given: MemberToEvaluate): MemberFields {
  try {
    return evaluateMember(given);
  } catch (error) {
    throw asFieldError(error);
  }
}

/** {@link evaluateHere} for a member of `job`. */
export const evaluate = (job: Job, label: string, wall: string, given: MemberCheckInput): MemberFields =>
  evaluateHere(memberToEvaluate(job, label, wall, given));
