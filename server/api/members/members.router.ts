import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { memberCreateSchema, memberPatchSchema } from '@/shared/schemas/members';
import { sendCreated } from '@/server/api/client-ids';
import type { AnswerCache } from '@/server/services/answer-cache';
import { sendJsonText } from '@/server/middleware/json-answer';
import type { MembersService } from './members.service';

const jobParams = z.object({ jobId: z.string().min(1).max(100) });
const memberParams = z.object({ memberId: z.string().min(1).max(100) });

const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

interface MembersDeps {
  db: Db;
  members: MembersService;
  answers: AnswerCache;
}

/**
 * Contracting-firm roles only; engineers see members through design requests, not here. The member routes
 * live in two routers because they hang off two paths.
 */
function firmRouter(db: Db, options: { mergeParams: boolean }): Router {
  const router = Router(options);
  router.use(requireMember(db), requireRole('owner', 'contractor', 'estimator'));
  return router;
}

/** `/api/jobs/:jobId/members`: the job's members (list, create). */
export function jobMembersRouter(deps: MembersDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: true });

  router.get('/', validate({ params: jobParams }), (req, res) => {
    const orgId = res.locals.member.orgId;
    const { jobId } = req.params;
    sendJsonText(
      res,
      deps.answers.text(`members-of:${orgId}:${jobId}`, () => ({ members: deps.members.list(orgId, jobId) })),
    );
  });

  router.post('/', validate({ params: jobParams, body: memberCreateSchema }), async (req, res) => {
    sendCreated(res, await deps.members.create(actorOf(res), req.params.jobId, req.body));
  });

  return router;
}

/** `/api/members/:memberId`: one member (read, update, delete). */
export function membersRouter(deps: MembersDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: false });

  router.get('/:memberId', validate({ params: memberParams }), (req, res) => {
    res.json(deps.members.get(res.locals.member.orgId, req.params.memberId));
  });

  router.patch(
    '/:memberId',
    validate({ params: memberParams, body: memberPatchSchema }),
    async (req, res) => {
      res.json(await deps.members.update(actorOf(res), req.params.memberId, req.body));
    },
  );

  router.delete('/:memberId', validate({ params: memberParams }), (req, res) => {
    deps.members.remove(actorOf(res), req.params.memberId);
    res.status(204).end();
  });

  return router;
}
