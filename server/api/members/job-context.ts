import type { DbOrTx } from '@/db/client';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { AppError } from '@/server/app-error';
import {
  memberCheckInputSchema,
  type MemberCheckInput,
  type MemberCheckInputBody,
} from '@/shared/schemas/calc/member';
import type { JobLoadContextField, MemberRecompute } from '@/shared/schemas/job-update';
import type { Job } from '@/shared/schemas/jobs';
import type { Member } from '@/shared/schemas/members';
import {
  jobPathInputOf,
  refreshLoadPath,
  type PooledLoadPath,
} from '@/server/api/load-path/load-path.service';
import type { CalcTaskAnswer } from '@/server/services/calc-tasks';
import { evaluateHere, memberToEvaluate, sameCheck, type MemberToEvaluate } from './member-evaluation';
import { listMembersOfJob, listMembersOnPath, updateMember, type MemberFields } from './members.repository';

/**
 * A member's input with the job's new load context where the member takes it from the job, and which of the
 * job's changed values it takes. A member takes a value when its own equals the job's value before the
 * change (the editor prefills every member from the job, and a member set apart from the job keeps its own):
 * the edition, the ground snow (no snow on the member is a job's 0 psf), the roof type of its snow and the
 * roof slope. A header's prescriptive-path verdict reads the job's building width and ground snow straight
 * from the job, so every header takes those two.
 *
 * @param member the saved member (kind and parsed input)
 * @param before the job before the change; after the job after it
 * @returns the input to check (parsed again, so its defaults are filled) and the fields it takes
 * @example takeJobContext(member, { ...job, groundSnowPsf: 30 }, { ...job, groundSnowPsf: 50 }).fields // ['groundSnowPsf']
 */
export function takeJobContext(
  member: Pick<Member, 'kind' | 'input'>,
  before: Job,
  after: Job,
): { input: MemberCheckInput; fields: JobLoadContextField[] } {
  const { input } = member;
  const fields = new Set<JobLoadContextField>();
  const next: MemberCheckInputBody = { ...input };
  if (before.loadStandard !== after.loadStandard && input.edition === before.loadStandard) {
    next.edition = after.loadStandard;
    fields.add('loadStandard');
  }
  if (before.roofPitchIn12 !== after.roofPitchIn12 && (input.roofPitchIn12 ?? 0) === before.roofPitchIn12) {
    next.roofPitchIn12 = after.roofPitchIn12;
    fields.add('roofPitchIn12');
  }
  const ownSnowPsf = input.snow?.groundSnowPsf ?? 0;
  const takesSnow = before.groundSnowPsf !== after.groundSnowPsf && ownSnowPsf === before.groundSnowPsf;
  const takesRoofType =
    before.roofType !== after.roofType &&
    (input.snow === undefined || input.snow.roofType === before.roofType);
  if (takesSnow) fields.add('groundSnowPsf');
  if (takesRoofType && (input.snow !== undefined || takesSnow)) fields.add('roofType');
  if (takesSnow || fields.has('roofType')) {
    const groundSnowPsf = takesSnow ? after.groundSnowPsf : ownSnowPsf;
    const roofType = takesRoofType ? after.roofType : (input.snow?.roofType ?? after.roofType);
    next.snow = groundSnowPsf > 0 ? { ...input.snow, groundSnowPsf, roofType } : undefined;
  }
  if (member.kind === 'header') {
    if (before.buildingWidthFt !== after.buildingWidthFt) fields.add('buildingWidthFt');
    if (before.groundSnowPsf !== after.groundSnowPsf) fields.add('groundSnowPsf');
  }
  if (fields.size === 0) return { input, fields: [] };
  return { input: memberCheckInputSchema.parse(next), fields: [...fields] };
}

/** A member of a job change, as the pool checks it beforehand. */
export type PlannedMember = MemberToEvaluate & { id: string };

/**
 * What a job change asks of the calculation pool, read before its transaction: each member that takes one
 * of the changed values, as it will be checked, and the job's load path as it will be once they are saved
 * (their inputs as a save stores them, the label inside, and the job's new edition).
 */
export function planJobRecompute(
  db: DbOrTx,
  orgId: string,
  before: Job,
  after: Job,
): { members: PlannedMember[]; pathJson: string } {
  const planned: PlannedMember[] = [];
  const onPath = listMembersOnPath(db, orgId, after.id);
  const taking = new Map<string, MemberCheckInput>();
  for (const member of listMembersOfJob(db, orgId, after.id)) {
    const taken = takeJobContext(member, before, after);
    if (taken.fields.length === 0) continue;
    planned.push({ id: member.id, ...memberToEvaluate(after, member.label, member.wall, taken.input) });
    taking.set(member.id, { ...taken.input, label: member.label });
  }
  const members = onPath.map((m) => {
    const input = taking.get(m.id);
    return input ? { ...m, input } : m;
  });
  return { members: planned, pathJson: JSON.stringify(jobPathInputOf(db, orgId, after, members)) };
}

/** The pool's answers for a job change (see planJobRecompute and the `jobRecompute` task). */
export interface PooledJobRecompute {
  members: Map<string, { from: MemberToEvaluate; fields: CalcTaskAnswer<MemberFields> }>;
  path?: PooledLoadPath;
}

/** The pool's fields for `member` when they were computed from exactly `now`, else undefined. */
function pooledFields(pooled: PooledJobRecompute | undefined, id: string, now: MemberToEvaluate) {
  const answer = pooled?.members.get(id);
  if (!answer || !answer.fields.ok || !sameCheck(answer.from, now)) return undefined;
  return answer.fields.value;
}

/**
 * Checks again, inside the caller's transaction, every member of a job that takes one of the job's changed
 * load values, stores each new result as a save would (by the person who changed the job) and records it in
 * the audit log. The checks and the load path come from `pooled` (made in the calculation pool before the
 * transaction) where they were made from what the transaction reads, else the engine runs here. A member
 * the engine cannot check with the new values refuses the whole change: a 400 naming the job's field, and
 * the transaction writes nothing. Members of an archived job are not changed.
 *
 * @returns each member checked again, with its state before and after
 */
export function recomputeJobMembers(
  tx: DbOrTx,
  actor: Actor,
  before: Job,
  after: Job,
  pooled?: PooledJobRecompute,
): MemberRecompute[] {
  if (after.archivedAt) return [];
  const out: MemberRecompute[] = [];
  for (const member of listMembersOfJob(tx, actor.orgId, after.id)) {
    const taken = takeJobContext(member, before, after);
    if (taken.fields.length === 0) continue;
    const now = memberToEvaluate(after, member.label, member.wall, taken.input);
    let fields = pooledFields(pooled, member.id, now);
    if (!fields) {
      try {
        fields = evaluateHere(now);
      } catch (error) {
        if (!(error instanceof AppError)) throw error;
        const message = `${member.label} can't be checked with this value: ${error.message}`;
        throw new AppError('bad_request', message, { [taken.fields[0]]: [message] });
      }
    }
    updateMember(tx, actor.orgId, member, actor.userId, fields);
    recordAudit(tx, actor, {
      action: 'member.recompute',
      subject: member.id,
      detail: { jobId: after.id, fields: taken.fields },
    });
    out.push({
      memberId: member.id,
      label: member.label,
      kind: member.kind,
      fields: taken.fields,
      // The member's own check, before and after: the load path's state is on the job page beside it.
      before: member.summary.checkState ?? member.summary.state,
      after: fields.summary.checkState ?? fields.summary.state,
    });
  }
  // The load path combines its loads by the job's edition: check it again whatever the members took.
  refreshLoadPath(tx, actor.orgId, after, () => 'loadStandard', pooled?.path);
  return out;
}
