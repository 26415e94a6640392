import type { Db } from '@/db/client';
import { notFound, versionConflict } from '@/server/app-error';
import { alreadyCreated, type Created } from '@/server/api/client-ids';
import { sameContent } from '@/server/services/idempotency/idempotency-store';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import {
  planJobRecompute,
  recomputeJobMembers,
  type PooledJobRecompute,
} from '@/server/api/members/job-context';
import { runTask } from '@/server/services/calc-pool';
import type { JobUpdateResult } from '@/shared/schemas/job-update';
import type { Job, JobCreate, JobListItem, JobPatch } from '@/shared/schemas/jobs';
import {
  archiveJob,
  findJob,
  findJobInAnyFirm,
  insertJob,
  listJobs,
  memberStatesByJob,
  noMembers,
  updateJob,
  type JobFields,
} from './jobs.repository';

/** The fields a person enters, out of a stored job (to compare a create sent again with it). */
function fieldsOf(job: Job): JobFields {
  const {
    id: _id,
    orgId: _orgId,
    createdAt: _c,
    updatedAt: _u,
    archivedAt: _a,
    version: _v,
    ...fields
  } = job;
  return fields;
}

/** Jobs of the actor's firm. A job id of another firm is "not found", never "forbidden". */
export function createJobsService(db: Db) {
  /** A job change's member checks and load path, made in the pool from the job and members as read now. */
  async function pooledRecompute(
    orgId: string,
    jobId: string,
    changes: Omit<JobPatch, 'baseVersion'>,
  ): Promise<PooledJobRecompute | undefined> {
    const before = findJob(db, orgId, jobId);
    if (!before || before.archivedAt) return undefined;
    const plan = planJobRecompute(db, orgId, before, { ...before, ...changes });
    const answer = await runTask('jobRecompute', plan);
    const from = new Map(plan.members.map(({ id, ...member }) => [id, member]));
    const members = new Map(
      answer.members.flatMap(({ id, fields }) => {
        const member = from.get(id);
        return member ? [[id, { from: member, fields }] as const] : [];
      }),
    );
    return { members, path: { inputJson: plan.pathJson, answer: answer.path } };
  }

  return {
    /** The firm's jobs, each with its members counted by state (one grouped query for all of them). */
    list(orgId: string, archived: boolean): JobListItem[] {
      const states = memberStatesByJob(db, orgId);
      return listJobs(db, orgId, archived).map((job) => ({
        ...job,
        memberStates: states.get(job.id) ?? noMembers(),
      }));
    },

    get(orgId: string, jobId: string): Job {
      const job = findJob(db, orgId, jobId);
      if (!job) throw notFound('Job');
      return job;
    },

    /** A create sent again with the same device-chosen id answers the job it made (see alreadyCreated). */
    create(actor: Actor, body: JobCreate): Created<Job> {
      const { id, ...fields } = body;
      return db.transaction((tx) => {
        if (id) {
          const found = findJobInAnyFirm(tx, id);
          if (found) {
            const { createdBy: _createdBy, ...job } = found;
            if (alreadyCreated(found, actor, () => sameContent(fieldsOf(job), fields))) {
              return { record: job, replayed: true };
            }
          }
        }
        const job = insertJob(tx, actor.orgId, actor.userId, fields, id);
        recordAudit(tx, actor, { action: 'job.create', subject: job.id, detail: { name: job.name } });
        return { record: job, replayed: false };
      });
    },

    /**
     * Saves the patch and, in the same transaction, checks again every member that takes a changed load
     * value from the job (see recomputeJobMembers). The checks and the job's load path run in the
     * calculation pool first, from the job and members as read before the transaction; the transaction uses
     * them where they were made from what it reads.
     */
    async update(actor: Actor, jobId: string, patch: JobPatch): Promise<JobUpdateResult> {
      const { baseVersion, ...changes } = patch;
      const pooled = await pooledRecompute(actor.orgId, jobId, changes);
      return db.transaction((tx) => {
        const before = findJob(tx, actor.orgId, jobId);
        if (!before) throw notFound('Job');
        if (baseVersion !== undefined && baseVersion !== before.version) {
          throw versionConflict('This job', before);
        }
        const job = updateJob(tx, actor.orgId, jobId, changes);
        if (!job) throw notFound('Job');
        recordAudit(tx, actor, {
          action: 'job.update',
          subject: jobId,
          detail: { fields: Object.keys(changes) },
        });
        return { ...job, recomputed: recomputeJobMembers(tx, actor, before, job, pooled) };
      });
    },

    archive(actor: Actor, jobId: string): void {
      db.transaction((tx) => {
        if (!archiveJob(tx, actor.orgId, jobId)) throw notFound('Job');
        recordAudit(tx, actor, { action: 'job.archive', subject: jobId });
      });
    },
  };
}

export type JobsService = ReturnType<typeof createJobsService>;
