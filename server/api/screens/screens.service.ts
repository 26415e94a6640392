import type { Db, DbOrTx } from '@/db/client';
import { ENGINE_VERSION, screenWall } from '@/lib/calc';
import { AppError, notFound, versionConflict } from '@/server/app-error';
import { alreadyCreated, type Created } from '@/server/api/client-ids';
import { sameContent } from '@/server/services/idempotency/idempotency-store';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import type { ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';
import type {
  EngineerNeeded,
  Screen,
  ScreenCreate,
  ScreenList,
  ScreenPatch,
  ScreenWithHistory,
} from '@/shared/schemas/bearing-screens';
import type { Job } from '@/shared/schemas/jobs';
import {
  findScreen,
  findScreenInAnyFirm,
  insertScreen,
  listScreenVersions,
  listScreens,
  updateScreen,
  type ScreenFields,
} from './screens.repository';

/** The server screens the wall itself: whatever a client computed, the stored outcome is lib/calc's. */
function evaluate(wallLabel: string, answers: ScreenAnswers): ScreenFields {
  const result = screenWall(answers);
  return { wallLabel, answers, outcome: result.outcome, result, engineVersion: ENGINE_VERSION };
}

/** The job, which must still be open for its screens to change. */
export function openJob(db: DbOrTx, orgId: string, jobId: string): Job {
  const job = findJob(db, orgId, jobId);
  if (!job) throw notFound('Job');
  if (job.archivedAt) throw new AppError('conflict', 'This job is archived: it can be read, not changed');
  return job;
}

/** "Engineer needed" on the job: every engineer-required screen's reasons, by wall. */
export function engineerNeededOf(screens: Screen[]): EngineerNeeded {
  const reasons = screens
    .filter((s) => s.outcome === 'engineer-required')
    .flatMap((s) =>
      s.result.engineerReasons.map((reason) => ({ screenId: s.id, wallLabel: s.wallLabel, reason })),
    );
  return { needed: reasons.length > 0, reasons };
}

/** The screen as its GET answers it: with its earlier versions, newest first. */
function withHistory(db: DbOrTx, screen: Screen, orgId: string): ScreenWithHistory {
  return { ...screen, history: listScreenVersions(db, orgId, screen.id, screen.version) };
}

/**
 * Bearing screens of the actor's firm's jobs, one wall each. Every save recomputes the outcome with
 * lib/calc and keeps the earlier answers in the screen's history. A screen or job id of another firm is "not
 * found"; screens of an archived job can be read, not changed.
 */
export function createScreensService(db: Db) {
  const read = (tx: DbOrTx, orgId: string, screenId: string): Screen => {
    const screen = findScreen(tx, orgId, screenId);
    if (!screen) throw notFound('Bearing screen');
    return screen;
  };

  return {
    list(orgId: string, jobId: string): ScreenList {
      if (!findJob(db, orgId, jobId)) throw notFound('Job');
      const screens = listScreens(db, orgId, jobId);
      return { screens, engineerNeeded: engineerNeededOf(screens) };
    },

    get(orgId: string, screenId: string): ScreenWithHistory {
      return withHistory(db, read(db, orgId, screenId), orgId);
    },

    /** A create sent again with the same device-chosen id answers the screen it made (see alreadyCreated). */
    create(actor: Actor, jobId: string, body: ScreenCreate): Created<Screen> {
      return db.transaction((tx) => {
        openJob(tx, actor.orgId, jobId);
        const fields = evaluate(body.wallLabel, body.answers);
        if (body.id) {
          const found = findScreenInAnyFirm(tx, body.id);
          const asSent = { jobId, wallLabel: fields.wallLabel, answers: fields.answers };
          const same = () =>
            !!found &&
            sameContent({ jobId: found.jobId, wallLabel: found.wallLabel, answers: found.answers }, asSent);
          if (alreadyCreated(found, actor, same)) {
            return { record: read(tx, actor.orgId, body.id), replayed: true };
          }
        }
        const owner = { orgId: actor.orgId, jobId, userId: actor.userId };
        const id = insertScreen(tx, owner, fields, body.id);
        recordAudit(tx, actor, {
          action: 'screen.create',
          subject: id,
          detail: { jobId, wallLabel: fields.wallLabel, outcome: fields.outcome },
        });
        return { record: read(tx, actor.orgId, id), replayed: false };
      });
    },

    update(actor: Actor, screenId: string, patch: ScreenPatch): Screen {
      const { baseVersion, ...changes } = patch;
      return db.transaction((tx) => {
        const saved = read(tx, actor.orgId, screenId);
        if (baseVersion !== undefined && baseVersion !== saved.version) {
          throw versionConflict('This bearing screen', withHistory(tx, saved, actor.orgId));
        }
        openJob(tx, actor.orgId, saved.jobId);
        const fields = evaluate(patch.wallLabel ?? saved.wallLabel, patch.answers ?? saved.answers);
        updateScreen(tx, actor.orgId, saved, actor.userId, fields);
        recordAudit(tx, actor, {
          action: 'screen.update',
          subject: screenId,
          detail: { jobId: saved.jobId, fields: Object.keys(changes), outcome: fields.outcome },
        });
        return read(tx, actor.orgId, screenId);
      });
    },
  };
}

export type ScreensService = ReturnType<typeof createScreensService>;
