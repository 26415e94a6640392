import { ENGINE_VERSION, envelopeReasons } from '@/lib/calc';
import type { Job } from '@/shared/schemas/jobs';
import type { Member, MemberState } from '@/shared/schemas/members';
import type { LiveCheck } from './live-check';

/** What the device computed for a member it saves without the server: the same engine the server runs. */
export type DeviceMemberFields = Pick<
  Member,
  'kind' | 'materialId' | 'sizeId' | 'input' | 'summary' | 'result' | 'prescriptive' | 'engineVersion'
>;

/** A failing check comes first: "needs an engineer" is only said of a member that passes. */
const stateOf = (pass: boolean, engineerNeeded: boolean): MemberState =>
  !pass ? 'fails' : engineerNeeded ? 'engineer-needed' : 'passes';

/**
 * The member's result fields as the server would store them, from the device's own check (its summary is
 * made by the same rules as the server's save): shown until the server's answer replaces them.
 */
export function deviceMemberFields(
  job: Job,
  label: string,
  checked: Extract<LiveCheck, { ok: true }>,
): DeviceMemberFields {
  const input = { ...checked.input, label };
  const { result, prescriptive } = checked;
  const engineerNeeded = prescriptive ? prescriptive.verdict === 'engineer-needed' : true;
  const state = stateOf(result.pass, engineerNeeded);
  const facts = { member: input, buildingWidthFt: job.buildingWidthFt, groundSnowPsf: job.groundSnowPsf };
  return {
    kind: input.kind,
    materialId: input.materialId,
    sizeId: input.sizeId,
    input,
    result,
    prescriptive,
    engineVersion: ENGINE_VERSION,
    summary: {
      state,
      pass: result.pass,
      governingCheck: result.governing.check,
      governingRatio: result.governing.ratio,
      warningsCount: result.warnings.length,
      sizeLabel: result.member.sizeLabel,
      materialLabel: result.member.materialLabel,
      engineerReasons: state !== 'engineer-needed' ? [] : (prescriptive?.reasons ?? envelopeReasons(facts)),
    },
  };
}
