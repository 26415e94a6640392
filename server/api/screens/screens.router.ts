import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { screenCreateSchema, screenPatchSchema } from '@/shared/schemas/bearing-screens';
import { sendCreated } from '@/server/api/client-ids';
import type { ScreensService } from './screens.service';

const jobParams = z.object({ jobId: z.string().min(1).max(100) });
const screenParams = z.object({ screenId: z.string().min(1).max(100) });

const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

interface ScreensDeps {
  db: Db;
  screens: ScreensService;
}

/** Contracting-firm roles only, like members: engineers see a job through design requests. */
function firmRouter(db: Db, options: { mergeParams: boolean }): Router {
  const router = Router(options);
  router.use(requireMember(db), requireRole('owner', 'contractor', 'estimator'));
  return router;
}

/** `/api/jobs/:jobId/screens`: the job's bearing screens (list with "engineer needed", create). */
export function jobScreensRouter(deps: ScreensDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: true });

  router.get('/', validate({ params: jobParams }), (req, res) => {
    res.json(deps.screens.list(res.locals.member.orgId, req.params.jobId));
  });

  router.post('/', validate({ params: jobParams, body: screenCreateSchema }), (req, res) => {
    sendCreated(res, deps.screens.create(actorOf(res), req.params.jobId, req.body));
  });

  return router;
}

/** `/api/screens/:screenId`: one screen with its history (read), and a new version (update). */
export function screensRouter(deps: ScreensDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: false });

  router.get('/:screenId', validate({ params: screenParams }), (req, res) => {
    res.json(deps.screens.get(res.locals.member.orgId, req.params.screenId));
  });

  router.patch('/:screenId', validate({ params: screenParams, body: screenPatchSchema }), (req, res) => {
    res.json(deps.screens.update(actorOf(res), req.params.screenId, req.body));
  });

  return router;
}
