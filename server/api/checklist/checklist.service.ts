import type { Db } from '@/db/client';
import { AppError, notFound, versionConflict } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob, listJobs } from '@/server/api/jobs/jobs.repository';
import { listEngineerScreens, listScreens } from '@/server/api/screens/screens.repository';
import { engineerNeededOf, openJob } from '@/server/api/screens/screens.service';
import type {
  Checklist,
  ChecklistItemKey,
  ChecklistItemPatch,
  JobProgressList,
} from '@/shared/schemas/job-checklist';
import { checklistOf, progressOf } from './checklist-items';
import { listChecklistRows, upsertChecklistRow } from './checklist.repository';

/**
 * The job checklist of the actor's firm's jobs. Items start where the job puts them (lead-safe by the year
 * built, the engineer's design by the screens); each change records who and when. A raised lead-safe item
 * set "not needed" must say why in its note.
 */
export function createChecklistService(db: Db) {
  const build = (orgId: string, jobId: string): Checklist => {
    const job = findJob(db, orgId, jobId);
    if (!job) throw notFound('Job');
    const engineer = engineerNeededOf(listScreens(db, orgId, jobId));
    const items = checklistOf(job.yearBuilt, engineer, listChecklistRows(db, orgId, jobId));
    return { jobId, items, progress: progressOf(items) };
  };

  return {
    get: build,

    update(actor: Actor, jobId: string, key: ChecklistItemKey, patch: ChecklistItemPatch): Checklist {
      db.transaction((tx) => {
        openJob(tx, actor.orgId, jobId);
        const current = build(actor.orgId, jobId).items.find((i) => i.key === key);
        if (!current) throw notFound('Checklist item');
        // An item nobody has set is version 0; `current` is the item as the checklist's GET lists it.
        if (patch.baseVersion !== undefined && patch.baseVersion !== current.version) {
          throw versionConflict('This checklist item', current);
        }
        const state = patch.state ?? current.state;
        const note = patch.note ?? current.note;
        if (key === 'lead-safe' && current.raised && state === 'not-needed' && note === '') {
          const message =
            'Say why lead-safe practice is not needed (for example, a certified renovator’s test found no lead-based paint)';
          throw new AppError('bad_request', message, { note: [message] });
        }
        upsertChecklistRow(tx, actor.orgId, { jobId, itemKey: key, state, note, updatedBy: actor.userId });
        recordAudit(tx, actor, {
          action: 'checklist.update',
          subject: jobId,
          detail: { item: key, state, fields: Object.keys(patch).filter((f) => f !== 'baseVersion') },
        });
      });
      return build(actor.orgId, jobId);
    },

    /** Every open job's progress and "engineer needed" mark, for the jobs list. */
    progress(orgId: string): JobProgressList {
      const rows = listChecklistRows(db, orgId);
      const engineerJobs = new Set(listEngineerScreens(db, orgId).map((s) => s.jobId));
      return {
        jobs: listJobs(db, orgId, false).map((job) => {
          const engineer = { needed: engineerJobs.has(job.id), reasons: [] };
          const items = checklistOf(
            job.yearBuilt,
            engineer,
            rows.filter((r) => r.jobId === job.id),
          );
          return { jobId: job.id, progress: progressOf(items), engineerNeeded: engineer.needed };
        }),
      };
    },
  };
}

export type ChecklistService = ReturnType<typeof createChecklistService>;
