import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { jobCreateSchema, jobPatchSchema } from '@/shared/schemas/jobs';
import { sendCreated } from '@/server/api/client-ids';
import type { AnswerCache } from '@/server/services/answer-cache';
import { sendJsonText } from '@/server/middleware/json-answer';
import type { JobsService } from './jobs.service';

const jobParams = z.object({ jobId: z.string().min(1).max(100) });
const listQuery = z.object({
  archived: z.enum(['0', '1'], { message: 'Use archived=1 or archived=0' }).optional(),
});

const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

/** Contracting-firm roles only; engineers see jobs through design requests, not here. */
export function jobsRouter(deps: { db: Db; jobs: JobsService; answers: AnswerCache }): Router {
  const router = Router();
  router.use(requireMember(deps.db), requireRole('owner', 'contractor', 'estimator'));

  router.get('/', validate({ query: listQuery }), (req, res) => {
    const orgId = res.locals.member.orgId;
    const archived = req.query.archived === '1';
    sendJsonText(
      res,
      deps.answers.text(`jobs:${orgId}:${archived}`, () => ({ jobs: deps.jobs.list(orgId, archived) })),
    );
  });

  router.post('/', validate({ body: jobCreateSchema }), (req, res) => {
    sendCreated(res, deps.jobs.create(actorOf(res), req.body));
  });

  router.get('/:jobId', validate({ params: jobParams }), (req, res) => {
    const orgId = res.locals.member.orgId;
    const { jobId } = req.params;
    sendJsonText(
      res,
      deps.answers.text(`job:${orgId}:${jobId}`, () => deps.jobs.get(orgId, jobId)),
    );
  });

  router.patch('/:jobId', validate({ params: jobParams, body: jobPatchSchema }), async (req, res) => {
    res.json(await deps.jobs.update(actorOf(res), req.params.jobId, req.body));
  });

  router.delete('/:jobId', validate({ params: jobParams }), (req, res) => {
    deps.jobs.archive(actorOf(res), req.params.jobId);
    res.status(204).end();
  });

  return router;
}
