import type { Db } from '@/db/client';
import { notFound } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { recomputeJobMembers } from '@/server/api/members/job-context';
import type { JobUpdateResult } from '@/shared/schemas/job-update';
import type { Job, JobPatch } from '@/shared/schemas/jobs';
import { archiveJob, findJob, insertJob, listJobs, updateJob, type JobFields } from './jobs.repository';

/** Jobs of the actor's firm. A job id of another firm is "not found", never "forbidden". */
export function createJobsService(db: Db) {
  return {
    list(orgId: string, archived: boolean): Job[] {
      return listJobs(db, orgId, archived);
    },

    get(orgId: string, jobId: string): Job {
      const job = findJob(db, orgId, jobId);
      if (!job) throw notFound('Job');
      return job;
    },

    create(actor: Actor, fields: JobFields): Job {
      return db.transaction((tx) => {
        const job = insertJob(tx, actor.orgId, actor.userId, fields);
        recordAudit(tx, actor, { action: 'job.create', subject: job.id, detail: { name: job.name } });
        return job;
      });
    },

    /**
     * Saves the patch and, in the same transaction, checks again every member that takes a changed load
     * value from the job (see recomputeJobMembers).
     */
    update(actor: Actor, jobId: string, patch: JobPatch): JobUpdateResult {
      return db.transaction((tx) => {
        const before = findJob(tx, actor.orgId, jobId);
        if (!before) throw notFound('Job');
        const job = updateJob(tx, actor.orgId, jobId, patch);
        if (!job) throw notFound('Job');
        recordAudit(tx, actor, {
          action: 'job.update',
          subject: jobId,
          detail: { fields: Object.keys(patch) },
        });
        return { ...job, recomputed: recomputeJobMembers(tx, actor, before, job) };
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
