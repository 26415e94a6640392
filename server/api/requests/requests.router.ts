import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, requireVerifiedEmail, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { requestComposeSchema, requestPatchSchema } from '@/shared/schemas/requests/compose';
import { engineerReplySchema } from '@/shared/schemas/requests/reply';
import {
  feeQuoteSchema,
  messageCreateSchema,
  requestListQuerySchema,
  revisionSchema,
  statusChangeSchema,
} from '@/shared/schemas/requests/workflow';
import { findJob } from '@/server/api/jobs/jobs.repository';
import { notFound } from '@/server/app-error';
import type { JobDesigns } from '@/shared/schemas/requests/member-design';
import { designsOfJob } from './member-designs';
import type { RequestViewer } from './request-access';
import type { RequestsService } from './requests.service';

const jobParams = z.object({ jobId: z.string().min(1).max(100) });
const requestParams = z.object({ requestId: z.string().min(1).max(100) });
const versionParams = requestParams.extend({ version: z.coerce.number().int().min(1).max(10_000) });

export const viewerOf = (res: Response): RequestViewer => ({
  userId: signedInUser(res).id,
  orgId: res.locals.member.orgId,
  role: res.locals.member.role,
});

interface RequestsDeps {
  db: Db;
  requests: RequestsService;
}

/** `/api/jobs/:jobId/designs`: the engineer's members that supersede the job's preliminary sizes. */
export function jobDesignsRouter(db: Db): Router {
  const router = Router({ mergeParams: true });
  router.use(requireMember(db), requireRole('owner', 'contractor', 'estimator'));
  router.get('/', validate({ params: jobParams }), (req, res) => {
    const orgId = res.locals.member.orgId;
    if (!findJob(db, orgId, req.params.jobId)) throw notFound('Job');
    const body: JobDesigns = { designs: designsOfJob(db, orgId, req.params.jobId) };
    res.json(body);
  });
  return router;
}

/** `/api/jobs/:jobId/requests`: the job's requests and a new Draft (the sending firm's roles). */
export function jobRequestsRouter(deps: RequestsDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireMember(deps.db), requireRole('owner', 'contractor', 'estimator'));

  router.get('/', validate({ params: jobParams }), (req, res) => {
    res.json({ requests: deps.requests.listForJob(viewerOf(res), req.params.jobId) });
  });

  router.post('/', validate({ params: jobParams, body: requestComposeSchema }), (req, res) => {
    res.status(201).json(deps.requests.create(viewerOf(res), req.params.jobId, req.body));
  });

  return router;
}

/**
 * `/api/requests`: open to every role at the door; the service finds the viewer's side of the request
 * (the sending firm or the addressed engineer), reads anything else as missing, and refuses what that side
 * may not do (403) or may not do in this state (409).
 */
export function requestsRouter(deps: RequestsDeps): Router {
  const router = Router();
  const { requests } = deps;
  router.use(requireMember(deps.db));

  router.get('/', validate({ query: requestListQuerySchema }), (req, res) => {
    res.json({ requests: requests.list(viewerOf(res), req.query.state) });
  });

  router.get('/:requestId', validate({ params: requestParams }), (req, res) => {
    res.json(requests.get(viewerOf(res), req.params.requestId));
  });

  router.patch('/:requestId', validate({ params: requestParams, body: requestPatchSchema }), (req, res) => {
    res.json(requests.update(viewerOf(res), req.params.requestId, req.body));
  });

  router.post('/:requestId/send', requireVerifiedEmail, validate({ params: requestParams }), (req, res) => {
    res.json(requests.send(viewerOf(res), req.params.requestId));
  });

  router.post(
    '/:requestId/revisions',
    requireVerifiedEmail,
    validate({ params: requestParams, body: revisionSchema }),
    (req, res) => {
      res.status(201).json(requests.revise(viewerOf(res), req.params.requestId, req.body));
    },
  );

  router.post(
    '/:requestId/status',
    validate({ params: requestParams, body: statusChangeSchema }),
    (req, res) => {
      res.json(requests.setStatus(viewerOf(res), req.params.requestId, req.body));
    },
  );

  router.post('/:requestId/fee', validate({ params: requestParams, body: feeQuoteSchema }), (req, res) => {
    res.json(requests.quoteFee(viewerOf(res), req.params.requestId, req.body));
  });

  router.post('/:requestId/fee/accept', validate({ params: requestParams }), (req, res) => {
    res.json(requests.acceptFee(viewerOf(res), req.params.requestId));
  });

  router.post(
    '/:requestId/reply',
    validate({ params: requestParams, body: engineerReplySchema }),
    (req, res) => {
      res.status(201).json(requests.reply(viewerOf(res), req.params.requestId, req.body));
    },
  );

  router.get('/:requestId/versions/:version', validate({ params: versionParams }), (req, res) => {
    res.json(requests.version(viewerOf(res), req.params.requestId, req.params.version));
  });

  router.get('/:requestId/messages', validate({ params: requestParams }), (req, res) => {
    res.json({ thread: requests.thread(viewerOf(res), req.params.requestId) });
  });

  router.post(
    '/:requestId/messages',
    validate({ params: requestParams, body: messageCreateSchema }),
    (req, res) => {
      res.status(201).json(requests.message(viewerOf(res), req.params.requestId, req.body));
    },
  );

  return router;
}
