import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import {
  bearingSetSchema,
  elementCreateSchema,
  elementPatchSchema,
  endParamsSchema,
} from '@/shared/schemas/load-path-elements';
import type { LoadPathService } from './load-path.service';

const id = z.string().min(1).max(100);
const jobParams = z.object({ jobId: id });
const elementParams = z.object({ elementId: id });
const elementEndParams = endParamsSchema.extend({ elementId: id });
const memberEndParams = endParamsSchema.extend({ memberId: id });

const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

interface LoadPathDeps {
  db: Db;
  loadPath: LoadPathService;
}

/** Contracting-firm roles only, as members; engineers see the load path in a design request's package. */
function firmRouter(db: Db, options: { mergeParams: boolean }): Router {
  const router = Router(options);
  router.use(requireMember(db), requireRole('owner', 'contractor', 'estimator'));
  return router;
}

/** `/api/jobs/:jobId/load-path`: the job's elements, bearings and the engine's evaluation of them. */
export function jobLoadPathRouter(deps: LoadPathDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: true });
  router.get('/', validate({ params: jobParams }), (req, res) => {
    res.json(deps.loadPath.get(res.locals.member.orgId, req.params.jobId));
  });
  return router;
}

/** `/api/jobs/:jobId/elements`: the job's existing framing (list, add). */
export function jobElementsRouter(deps: LoadPathDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: true });
  router.get('/', validate({ params: jobParams }), (req, res) => {
    res.json({ elements: deps.loadPath.listElements(res.locals.member.orgId, req.params.jobId) });
  });
  router.post('/', validate({ params: jobParams, body: elementCreateSchema }), (req, res) => {
    res.status(201).json(deps.loadPath.createElement(actorOf(res), req.params.jobId, req.body));
  });
  return router;
}

/** `/api/elements/:elementId`: one element (read, change, delete) and what its bottom bears on. */
export function elementsRouter(deps: LoadPathDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: false });
  router.get('/:elementId', validate({ params: elementParams }), (req, res) => {
    res.json(deps.loadPath.getElement(res.locals.member.orgId, req.params.elementId));
  });
  router.patch('/:elementId', validate({ params: elementParams, body: elementPatchSchema }), (req, res) => {
    res.json(deps.loadPath.updateElement(actorOf(res), req.params.elementId, req.body));
  });
  router.delete('/:elementId', validate({ params: elementParams }), (req, res) => {
    deps.loadPath.removeElement(actorOf(res), req.params.elementId);
    res.status(204).end();
  });
  router.put(
    '/:elementId/ends/:end',
    validate({ params: elementEndParams, body: bearingSetSchema }),
    (req, res) => {
      const { elementId, end } = req.params;
      res.json(deps.loadPath.setBearing(actorOf(res), { elementId }, end, req.body));
    },
  );
  router.delete('/:elementId/ends/:end', validate({ params: elementEndParams }), (req, res) => {
    deps.loadPath.clearBearing(actorOf(res), { elementId: req.params.elementId }, req.params.end);
    res.status(204).end();
  });
  return router;
}

/** `/api/members/:memberId/ends/:end`: what an end of a member bears on (set, clear). */
export function memberEndsRouter(deps: LoadPathDeps): Router {
  const router = firmRouter(deps.db, { mergeParams: true });
  router.put('/:end', validate({ params: memberEndParams, body: bearingSetSchema }), (req, res) => {
    const { memberId, end } = req.params;
    res.json(deps.loadPath.setBearing(actorOf(res), { memberId }, end, req.body));
  });
  router.delete('/:end', validate({ params: memberEndParams }), (req, res) => {
    deps.loadPath.clearBearing(actorOf(res), { memberId: req.params.memberId }, req.params.end);
    res.status(204).end();
  });
  return router;
}
