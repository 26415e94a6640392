import type { Db, DbOrTx } from '@/db/client';
import { AppError, notFound, versionConflict } from '@/server/app-error';
import { alreadyCreated, type Created } from '@/server/api/client-ids';
import { sameContent } from '@/server/services/idempotency/idempotency-store';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import type { Job } from '@/shared/schemas/jobs';
import type { Member, MemberCreate, MemberListItem, MemberPatch } from '@/shared/schemas/members';
import { CalcInputError } from '@/lib/calc';
import { runTask } from '@/server/services/calc-pool';
import {
  asFieldError,
  evaluateHere,
  memberToEvaluate,
  sameCheck,
  type MemberToEvaluate,
} from './member-evaluation';
import type { MemberFields } from './members.repository';
import {
  deleteMember,
  findMember,
  findMemberInAnyFirm,
  findMemberToSave,
  insertMember,
  listMembers,
  updateMember,
} from './members.repository';
import { deleteBearingsOf } from '@/server/api/load-path/load-path.repository';
import {
  pathInputWith,
  refreshLoadPath,
  type PooledLoadPath,
} from '@/server/api/load-path/load-path.service';
import { newId } from '@/db/new-id';

/** The member's job, which must still be open for its members to change. */
function openJob(db: DbOrTx, orgId: string, jobId: string): Job {
  const job = findJob(db, orgId, jobId);
  if (!job) throw notFound('Job');
  if (job.archivedAt)
    throw new AppError('conflict', 'This job is archived: its members can be read, not changed');
  return job;
}

/** True when two checks read the same values, so the result of one is the result of the other. */
/**
 * The stored fields for `now` (read in the write's transaction): the pool's result when it was computed from
 * the same values, else (the job or the member changed while the pool worked) computed again here.
 */
const fieldsFor = (now: MemberToEvaluate, from: MemberToEvaluate, computed: MemberFields) =>
  sameCheck(now, from) ? computed : evaluateHere(now);

/** A member's input as the load path names it: a refusal there is about the member's input. */
const inputField = () => 'input';

/**
 * A save's calculation in the pool, in one trip, while the event loop answers others: the member's check,
 * and the job's load path as it will be with the member `id` saved (in its place, or last when it is new).
 * The write's transaction uses both when what it reads is what they were computed from.
 */
async function saveInPool(db: DbOrTx, orgId: string, job: Job, id: string, from: MemberToEvaluate) {
  const onPath = {
    id,
    label: from.label,
    kind: from.input.kind,
    input: { ...from.input, label: from.label },
  };
  const inputJson = JSON.stringify(pathInputWith(db, orgId, job, onPath));
  const { fields, path } = await runTask('memberSave', { member: from, pathJson: inputJson });
  if (!fields.ok) throw asFieldError(new CalcInputError(fields.field, fields.message));
  const pooled: PooledLoadPath | undefined = path && { inputJson, answer: path };
  return { computed: fields.value, pooled };
}

/** The member with its state on the job's load path, checked again with this change. */
function onLoadPath(tx: DbOrTx, orgId: string, job: Job, member: Member, pooled?: PooledLoadPath): Member {
  const summary = refreshLoadPath(tx, orgId, job, inputField, pooled).summaries.get(member.id);
  return summary ? { ...member, summary } : member;
}

/**
 * Members of the actor's firm's jobs. Every save recomputes with lib/calc and stores the server's own result;
 * a member or job id of another firm is "not found", never "forbidden". Members of an archived job stay
 * readable and cannot be changed.
 */
export function createMembersService(db: Db) {
  return {
    list(orgId: string, jobId: string): MemberListItem[] {
      if (!findJob(db, orgId, jobId)) throw notFound('Job');
      return listMembers(db, orgId, jobId);
    },

    get(orgId: string, memberId: string): Member {
      const member = findMember(db, orgId, memberId);
      if (!member) throw notFound('Member');
      return member;
    },

    /**
     * The check runs in the calculation pool; the write then happens in one transaction. A create sent again
     * with the same device-chosen id answers the member it made (see alreadyCreated): that is looked up
     * before the pool, so a replay costs no check, and again in the transaction, where a create that made
     * the id meanwhile is found.
     */
    async create(actor: Actor, jobId: string, body: MemberCreate): Promise<Created<Member>> {
      const toCheck = (job: Job) => memberToEvaluate(job, body.label, body.wall, body.input);
      // What a save stores of the body (evaluateMember puts the label into the input).
      const asSent = {
        jobId,
        label: body.label,
        wall: body.wall,
        input: { ...body.input, label: body.label },
      };
      const same = (m: Member) =>
        sameContent({ jobId: m.jobId, label: m.label, wall: m.wall, input: m.input }, asSent);
      const replay = (tx: DbOrTx): Created<Member> | undefined => {
        if (!body.id) return undefined;
        const found = findMemberInAnyFirm(tx, body.id);
        if (!found || !alreadyCreated(found, actor, () => same(found))) return undefined;
        const { orgId: _orgId, ...member } = found;
        return { record: member, replayed: true };
      };
      const before = openJob(db, actor.orgId, jobId);
      const from = toCheck(before);
      const early = replay(db);
      if (early) return early;
      const id = body.id ?? newId();
      const { computed, pooled } = await saveInPool(db, actor.orgId, before, id, from);
      return db.transaction((tx) => {
        const job = openJob(tx, actor.orgId, jobId);
        const replayed = replay(tx);
        if (replayed) return replayed;
        const fields = fieldsFor(toCheck(job), from, computed);
        const owner = { orgId: actor.orgId, jobId, userId: actor.userId };
        const member = insertMember(tx, owner, fields, id);
        recordAudit(tx, actor, {
          action: 'member.create',
          subject: member.id,
          detail: { jobId, kind: member.kind, label: member.label },
        });
        return { record: onLoadPath(tx, actor.orgId, job, member, pooled), replayed: false };
      });
    },

    /** As create: the check in the pool, then the write in one transaction (refused on a stale baseVersion). */
    async update(actor: Actor, memberId: string, patch: MemberPatch): Promise<Member> {
      const { baseVersion, ...changes } = patch;
      const read = (tx: DbOrTx) => {
        const saved = findMemberToSave(tx, actor.orgId, memberId);
        if (!saved) throw notFound('Member');
        if (baseVersion !== undefined && baseVersion !== saved.version) {
          // The conflict answers the member as stored, its result too.
          throw versionConflict('This member', findMember(tx, actor.orgId, memberId));
        }
        const job = openJob(tx, actor.orgId, saved.jobId);
        const label = patch.label ?? saved.label;
        const wall = patch.wall ?? saved.wall;
        return { saved, job, toCheck: memberToEvaluate(job, label, wall, patch.input ?? saved.input) };
      };
      const { toCheck: from, job: before } = read(db);
      const { computed, pooled } = await saveInPool(db, actor.orgId, before, memberId, from);
      return db.transaction((tx) => {
        const { saved, job, toCheck } = read(tx);
        const fields = fieldsFor(toCheck, from, computed);
        const member = updateMember(tx, actor.orgId, saved, actor.userId, fields);
        if (!member) throw notFound('Member');
        recordAudit(tx, actor, {
          action: 'member.update',
          subject: memberId,
          detail: { jobId: saved.jobId, fields: Object.keys(changes) },
        });
        return onLoadPath(tx, actor.orgId, job, member, pooled);
      });
    },

    remove(actor: Actor, memberId: string): void {
      db.transaction((tx) => {
        const saved = findMember(tx, actor.orgId, memberId);
        if (!saved) throw notFound('Member');
        const job = openJob(tx, actor.orgId, saved.jobId);
        deleteBearingsOf(tx, actor.orgId, memberId);
        deleteMember(tx, actor.orgId, memberId);
        refreshLoadPath(tx, actor.orgId, job, inputField);
        recordAudit(tx, actor, {
          action: 'member.delete',
          subject: memberId,
          detail: { jobId: saved.jobId, label: saved.label },
        });
      });
    },
  };
}

export type MembersService = ReturnType<typeof createMembersService>;
