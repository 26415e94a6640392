import type { Db, DbOrTx } from '@/db/client';
import { AppError, notFound, versionConflict } from '@/server/app-error';
import { alreadyCreated, type Created } from '@/server/api/client-ids';
import { sameContent } from '@/server/services/idempotency/idempotency-store';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import type { Job } from '@/shared/schemas/jobs';
import type { Member, MemberCreate, MemberListItem, MemberPatch } from '@/shared/schemas/members';
import { evaluate } from './member-evaluation';
import {
  deleteMember,
  findMember,
  findMemberInAnyFirm,
  insertMember,
  listMembers,
  updateMember,
} from './members.repository';

/** The member's job, which must still be open for its members to change. */
function openJob(db: DbOrTx, orgId: string, jobId: string): Job {
  const job = findJob(db, orgId, jobId);
  if (!job) throw notFound('Job');
  if (job.archivedAt)
    throw new AppError('conflict', 'This job is archived: its members can be read, not changed');
  return job;
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

    /** A create sent again with the same device-chosen id answers the member it made (see alreadyCreated). */
    create(actor: Actor, jobId: string, body: MemberCreate): Created<Member> {
      return db.transaction((tx) => {
        const job = openJob(tx, actor.orgId, jobId);
        const fields = evaluate(job, body.label, body.wall, body.input);
        if (body.id) {
          const found = findMemberInAnyFirm(tx, body.id);
          const asSent = { jobId, label: fields.label, wall: fields.wall, input: fields.input };
          const same = (m: Member) =>
            sameContent({ jobId: m.jobId, label: m.label, wall: m.wall, input: m.input }, asSent);
          if (found && alreadyCreated(found, actor, () => same(found))) {
            const { orgId: _orgId, ...member } = found;
            return { record: member, replayed: true };
          }
        }
        const owner = { orgId: actor.orgId, jobId, userId: actor.userId };
        const member = insertMember(tx, owner, fields, body.id);
        recordAudit(tx, actor, {
          action: 'member.create',
          subject: member.id,
          detail: { jobId, kind: member.kind, label: member.label },
        });
        return { record: member, replayed: false };
      });
    },

    update(actor: Actor, memberId: string, patch: MemberPatch): Member {
      const { baseVersion, ...changes } = patch;
      return db.transaction((tx) => {
        const saved = findMember(tx, actor.orgId, memberId);
        if (!saved) throw notFound('Member');
        if (baseVersion !== undefined && baseVersion !== saved.version) {
          throw versionConflict('This member', saved);
        }
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
          detail: { jobId: saved.jobId, fields: Object.keys(changes) },
        });
        return member;
      });
    },

    remove(actor: Actor, memberId: string): void {
      db.transaction((tx) => {
        const saved = findMember(tx, actor.orgId, memberId);
        if (!saved) throw notFound('Member');
        openJob(tx, actor.orgId, saved.jobId);
        deleteMember(tx, actor.orgId, memberId);
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
