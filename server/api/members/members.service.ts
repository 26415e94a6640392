import type { Db, DbOrTx } from '@/db/client';
import {
  CalcInputError,
  ENGINE_VERSION,
  checkMember,
  envelopeReasons,
  prescriptiveVerdict,
} from '@/lib/calc';
import { AppError, notFound } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import type {
  Member,
  MemberCreate,
  MemberListItem,
  MemberPatch,
  MemberState,
  MemberSummary,
} from '@/shared/schemas/members';
import {
  deleteMember,
  findMember,
  insertMember,
  listMembers,
  updateMember,
  type MemberFields,
} from './members.repository';

/** Engine input errors name a field of the check input; in a member body that input sits under `input`. */
function asFieldError(error: unknown): unknown {
  if (!(error instanceof CalcInputError)) return error;
  return new AppError('bad_request', error.message, { [`input.${error.field}`]: [error.message] });
}

/** A failing check comes first: "needs an engineer" is only said of a member that passes. */
function memberState(pass: boolean, engineerNeeded: boolean): MemberState {
  if (!pass) return 'fails';
  return engineerNeeded ? 'engineer-needed' : 'passes';
}

/**
 * Runs the engine on what is being saved: the check with its diagram samples, and for a header the
 * prescriptive-path verdict on the job's building width and ground snow. A beam always needs an engineer;
 * its reasons come from the same envelope test, so `engineerReasons` lists every one.
 */
function evaluate(job: Job, label: string, wall: string, given: MemberCheckInput): MemberFields {
  const input: MemberCheckInput = { ...given, label };
  try {
    const result = checkMember(input, { diagrams: true });
    const facts = { member: input, buildingWidthFt: job.buildingWidthFt, groundSnowPsf: job.groundSnowPsf };
    const prescriptive = input.kind === 'header' ? prescriptiveVerdict(facts) : null;
    const engineerNeeded = prescriptive ? prescriptive.verdict === 'engineer-needed' : true;
    const state = memberState(result.pass, engineerNeeded);
    const summary: MemberSummary = {
      state,
      pass: result.pass,
      governingCheck: result.governing.check,
      governingRatio: result.governing.ratio,
      warningsCount: result.warnings.length,
      sizeLabel: result.member.sizeLabel,
      materialLabel: result.member.materialLabel,
      engineerReasons: state !== 'engineer-needed' ? [] : (prescriptive?.reasons ?? envelopeReasons(facts)),
    };
    return {
      kind: input.kind,
      label,
      wall,
      input,
      materialId: input.materialId,
      sizeId: input.sizeId,
      summary,
      result,
      prescriptive,
      engineVersion: ENGINE_VERSION,
    };
  } catch (error) {
    throw asFieldError(error);
  }
}

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
        return member;
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
