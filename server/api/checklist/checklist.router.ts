import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import {
  checklistItemKeySchema,
  checklistItemPatchSchema,
  engineerItemPatchSchema,
} from '@/shared/schemas/job-checklist';
import type { ChecklistService } from './checklist.service';

const jobParams = z.object({ jobId: z.string().min(1).max(100) });
const itemParams = jobParams.extend({ itemKey: checklistItemKeySchema });
const engineerItemParams = jobParams.extend({ engineerItemId: z.string().min(1).max(100) });

const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

interface ChecklistDeps {
  db: Db;
  checklist: ChecklistService;
}

const firmOnly = (db: Db) => [requireMember(db), requireRole('owner', 'contractor', 'estimator')];

/**
 * `/api/jobs/:jobId/checklist`: the job's checklist (read), one fixed item's state and note (update), and
 * one of the engineer's items: its state, note and photos (update).
 */
export function jobChecklistRouter(deps: ChecklistDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(...firmOnly(deps.db));

  router.get('/', validate({ params: jobParams }), (req, res) => {
    res.json(deps.checklist.get(res.locals.member.orgId, req.params.jobId));
  });

  router.patch(
    '/engineer/:engineerItemId',
    validate({ params: engineerItemParams, body: engineerItemPatchSchema }),
    (req, res) => {
      res.json(
        deps.checklist.updateEngineerItem(
          actorOf(res),
          req.params.jobId,
          req.params.engineerItemId,
          req.body,
        ),
      );
    },
  );

  router.patch('/:itemKey', validate({ params: itemParams, body: checklistItemPatchSchema }), (req, res) => {
    res.json(deps.checklist.update(actorOf(res), req.params.jobId, req.params.itemKey, req.body));
  });

  return router;
}

/** `/api/job-progress`: every open job's checklist progress, for the jobs list. */
export function jobProgressRouter(deps: ChecklistDeps): Router {
  const router = Router();
  router.use(...firmOnly(deps.db));
  router.get('/', (_req, res) => {
    res.json(deps.checklist.progress(res.locals.member.orgId));
  });
  return router;
}
