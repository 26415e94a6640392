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
  EngineerItemPatch,
  JobProgressList,
} from '@/shared/schemas/job-checklist';
import { checklistOf, progressOf } from './checklist-items';
import { listChecklistRows, upsertChecklistRow } from './checklist.repository';
import { engineerItemsOf } from './engineer-items';
import { listEngineerItems, listItemPhotos, updateEngineerItem } from './engineer-items.repository';

const PHOTO_TYPES = new Set(['image/jpeg', 'image/png', 'image/heic']);
const photoError = (message: string) => new AppError('bad_request', message, { photoIds: [message] });

/**
 * The job checklist of the actor's firm's jobs. Items start where the job puts them (lead-safe by the year
 * built, the engineer's design by the screens); each change records who and when. A raised lead-safe item
 * set "not needed" must say why in its note. Beside the fixed items stand the engineer's "verify in the
 * field" items from the structured replies; one whose photo is asked for is done only with a photo.
 */
export function createChecklistService(db: Db) {
  const build = (orgId: string, jobId: string): Checklist => {
    const job = findJob(db, orgId, jobId);
    if (!job) throw notFound('Job');
    const engineer = engineerNeededOf(listScreens(db, orgId, jobId));
    const items = checklistOf(job.yearBuilt, engineer, listChecklistRows(db, orgId, jobId));
    const engineerItems = engineerItemsOf(db, listEngineerItems(db, orgId, jobId));
    return { jobId, items, engineerItems, progress: progressOf([...items, ...engineerItems]) };
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

    updateEngineerItem(actor: Actor, jobId: string, itemId: string, patch: EngineerItemPatch): Checklist {
      db.transaction((tx) => {
        openJob(tx, actor.orgId, jobId);
        const current = listEngineerItems(tx, actor.orgId, jobId).find((i) => i.row.id === itemId)?.row;
        if (!current) throw notFound('Checklist item');
        const photoIds = patch.photoIds ?? current.photoIds;
        const photos = listItemPhotos(tx, photoIds);
        for (const id of photoIds) {
          const photo = photos.find((p) => p.id === id);
          if (!photo || photo.requestId !== current.requestId || photo.side !== 'firm')
            throw photoError('Attach photos uploaded to this design request by your firm');
          if (!PHOTO_TYPES.has(photo.mimeType)) throw photoError('Attach a photo (JPEG, PNG or HEIC)');
        }
        const state = patch.state ?? current.state;
        if (current.photoAsked && state === 'done' && photoIds.length === 0)
          throw photoError('The engineer asked for a photo of this: add it before marking it done');
        const note = patch.note ?? current.note;
        updateEngineerItem(tx, itemId, { state, note, photoIds, updatedBy: actor.userId });
        recordAudit(tx, actor, {
          action: 'checklist.engineer-item',
          subject: jobId,
          detail: { itemId, requestId: current.requestId, state, photos: photoIds.length },
        });
      });
      return build(actor.orgId, jobId);
    },

    /** Every open job's progress and "engineer needed" mark, for the jobs list. */
    progress(orgId: string): JobProgressList {
      const rows = listChecklistRows(db, orgId);
      const engineerItems = listEngineerItems(db, orgId);
      const engineerJobs = new Set(listEngineerScreens(db, orgId).map((s) => s.jobId));
      return {
        jobs: listJobs(db, orgId, false).map((job) => {
          const engineer = { needed: engineerJobs.has(job.id), reasons: [] };
          const items = checklistOf(
            job.yearBuilt,
            engineer,
            rows.filter((r) => r.jobId === job.id),
          );
          const fromEngineer = engineerItems.filter((i) => i.row.jobId === job.id).map((i) => i.row);
          return {
            jobId: job.id,
            progress: progressOf([...items, ...fromEngineer]),
            engineerNeeded: engineer.needed,
          };
        }),
      };
    },
  };
}

export type ChecklistService = ReturnType<typeof createChecklistService>;
