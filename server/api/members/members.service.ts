import type { Db, DbOrTx } from '@/db/client';
import { AppError, notFound } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import type { Job } from '@/shared/schemas/jobs';
import type { Member, MemberCreate, MemberListItem, MemberPatch } from '@/shared/schemas/members';
import { deleteBearingsOf } from '@/server/api/load-path/load-path.repository';
import { refreshLoadPath } from '@/server/api/load-path/load-path.service';
import { evaluate } from './member-evaluation';
import { deleteMember, findMember, insertMember, listMembers, updateMember } from './members.repository';

/** The member's job, which must still be open for its members to change. */
function openJob(db: DbOrTx, orgId: string, jobId: string): Job {
  const job = findJob(db, orgId, jobId);
  if (!job) throw notFound('Job');
  if (job.archivedAt)
    throw new AppError('conflict', 'This job is archived: its members can be read, not changed');
  return job;
}

/** A member's input as the load path names it: a refusal there is about the member's input. */
const inputField = () => 'input';

/** The member with its state on the job's load path, checked again with this change. */
function onLoadPath(tx: DbOrTx, orgId: string, job: Job, member: Member): Member {
  const summary = refreshLoadPath(tx, orgId, job, inputField).summaries.get(member.id);
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

    create(actor: Actor, jobId: string, body: MemberCreate): Member {
      return db.transaction((tx) => {
        const job = openJob(tx, actor.orgId, jobId);
        const fields = evaluate(job, body.label, body.wall, body.input);
        const member = insertMember(tx, { orgId: actor.orgId, jobId, userId: actor.userId }, fields);
        recordAudit(tx, actor, {
          action: 'member.create',
          subject: member.id,
          detail: { jobId, kind: member.kind, label: member.label },
        });
        return onLoadPath(tx, actor.orgId, job, member);
      });
    },

    update(actor: Actor, memberId: string, patch: MemberPatch): Member {
      return db.transaction((tx) => {
        const saved = findMember(tx, actor.orgId, memberId);
        if (!saved) throw notFound('Member');
        const job = openJob(tx, actor.orgId, saved.jobId);
        const fields = evaluate(
          job,
          patch.label ?? saved.label,
          patch.wall ?? saved.wall,
          patch.input ?? saved.input,
        );
        const member = updateMember(tx, actor.orgId, saved, actor.userId, fields);
        if (!member) throw notFound('Member');
        recordAudit(tx, actor, {
          action: 'member.update',
          subject: memberId,
          detail: { jobId: saved.jobId, fields: Object.keys(patch) },
        });
        return onLoadPath(tx, actor.orgId, job, member);
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
