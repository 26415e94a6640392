import type { Db } from '@/db/client';
import { notFound, versionConflict } from '@/server/app-error';
import { alreadyCreated, type Created } from '@/server/api/client-ids';
import { sameContent } from '@/server/services/idempotency/idempotency-store';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { recomputeJobMembers } from '@/server/api/members/job-context';
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
     * value from the job (see recomputeJobMembers).
     */
    update(actor: Actor, jobId: string, patch: JobPatch): JobUpdateResult {
      const { baseVersion, ...changes } = patch;
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
