import { ENGINE_VERSION } from '@/lib/calc';
import { memberSummary } from '@/lib/members/member-summary';
import type { Job } from '@/shared/schemas/jobs';
import type { Member } from '@/shared/schemas/members';
import type { LiveCheck } from './live-check';

/** What the device computed for a member it saves without the server: the same engine the server runs. */
export type DeviceMemberFields = Pick<
  Member,
  'kind' | 'materialId' | 'sizeId' | 'input' | 'summary' | 'result' | 'prescriptive' | 'engineVersion'
>;

/**
 * The member's result fields as the server would store them, from the device's own check (its summary is
 * made by the server's own rule, {@link memberSummary}): shown until the server's answer replaces them.
 */
export function deviceMemberFields(
  job: Job,
  label: string,
  checked: Extract<LiveCheck, { ok: true }>,
): DeviceMemberFields {
  const input = { ...checked.input, label };
  const { result, prescriptive } = checked;
  const facts = { member: input, buildingWidthFt: job.buildingWidthFt, groundSnowPsf: job.groundSnowPsf };
  return {
    kind: input.kind,
    materialId: input.materialId,
    sizeId: input.sizeId,
    input,
    result,
    prescriptive,
    engineVersion: ENGINE_VERSION,
    summary: memberSummary(facts, result, prescriptive),
  };
}
