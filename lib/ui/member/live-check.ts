import { CalcInputError, checkMember, prescriptiveVerdict } from '@/lib/calc';
import { fieldErrors } from '@/shared/errors';
import {
  memberCheckInputSchema,
  type MemberCheckInput,
  type MemberCheckResult,
  type PrescriptiveResult,
} from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import type { MemberDraft } from './member-draft';
import { draftPathOf, readMemberDraft, type FieldErrors } from './member-input';

export type LiveCheck =
  | { ok: true; input: MemberCheckInput; result: MemberCheckResult; prescriptive: PrescriptiveResult | null }
  | { ok: false; errors: FieldErrors };

function mapped(errors: FieldErrors): FieldErrors {
  const out: FieldErrors = {};
  for (const [path, messages] of Object.entries(errors)) (out[draftPathOf(path)] ??= []).push(...messages);
  return out;
}

/**
 * The check as the person types: the draft is read, validated by the same shared schema the server uses,
 * and checked by the same engine, in the browser. Any message is keyed by the draft field it belongs to.
 *
 * @example const live = liveCheck(draft, job); if (live.ok) live.result.pass;
 */
export function liveCheck(draft: MemberDraft, job: Job): LiveCheck {
  const reading = readMemberDraft(draft, job);
  if (Object.keys(reading.errors).length > 0) return { ok: false, errors: reading.errors };
  const parsed = memberCheckInputSchema.safeParse(reading.input);
  if (!parsed.success) return { ok: false, errors: mapped(fieldErrors(parsed.error)) };
  try {
    const result = checkMember(parsed.data, { diagrams: true });
    const prescriptive =
      parsed.data.kind === 'header'
        ? prescriptiveVerdict({
            member: parsed.data,
            buildingWidthFt: job.buildingWidthFt,
            groundSnowPsf: job.groundSnowPsf,
          })
        : null;
    return { ok: true, input: parsed.data, result, prescriptive };
  } catch (error) {
    if (error instanceof CalcInputError)
      return { ok: false, errors: mapped({ [error.field]: [error.message] }) };
    throw error;
  }
}
