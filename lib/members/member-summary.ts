import { envelopeReasons } from '@/lib/calc';
import type { MemberCheckInput, MemberCheckResult, PrescriptiveResult } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import type { MemberCheckState, MemberSummary } from '@/shared/schemas/members';

/** A failing check comes first: "needs an engineer" is only said of a member that passes. */
export function memberState(pass: boolean, engineerNeeded: boolean): MemberCheckState {
  if (!pass) return 'fails';
  return engineerNeeded ? 'engineer-needed' : 'passes';
}

/** The checked member and the two job values a header's verdict takes. */
export interface SummaryFacts {
  member: MemberCheckInput;
  buildingWidthFt: Job['buildingWidthFt'];
  groundSnowPsf: Job['groundSnowPsf'];
}

/**
 * The stored summary of a member's own check, made by one rule on the device and on the server. A beam
 * (no prescriptive verdict) always needs an engineer; its reasons come from the envelope test. The state is
 * the member's own until the job's load path is checked with it (the server's load-path service).
 */
export function memberSummary(
  facts: SummaryFacts,
  result: MemberCheckResult,
  prescriptive: PrescriptiveResult | null,
): MemberSummary {
  const engineerNeeded = prescriptive ? prescriptive.verdict === 'engineer-needed' : true;
  const state = memberState(result.pass, engineerNeeded);
  return {
    state,
    checkState: state,
    pass: result.pass,
    governingCheck: result.governing.check,
    governingRatio: result.governing.ratio,
    warningsCount: result.warnings.length,
    sizeLabel: result.member.sizeLabel,
    materialLabel: result.member.materialLabel,
    engineerReasons: state !== 'engineer-needed' ? [] : (prescriptive?.reasons ?? envelopeReasons(facts)),
  };
}
