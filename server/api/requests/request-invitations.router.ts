import { Router } from 'express';
import { z } from 'zod';
import type { MeService } from '@/server/api/me/me.service';
import { startSession } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Sessions } from '@/server/services/sessions';
import { acceptRequestInvitationSchema } from '@/shared/schemas/requests/views';
import type { RequestInvitationsService } from './request-invitations.service';

const tokenParams = z.object({ requestToken: z.string().min(1).max(200) });

/** Public: the holder of the mailed link may preview it; accepting binds the request (see the service). */
export function requestInvitationsRouter(deps: {
  invitations: RequestInvitationsService;
  me: MeService;
  sessions: Sessions;
}): Router {
  const router = Router();

  router.get('/:requestToken', validate({ params: tokenParams }), (req, res) => {
    res.json(deps.invitations.preview(req.params.requestToken));
  });

  router.post(
    '/:requestToken/accept',
    validate({ params: tokenParams, body: acceptRequestInvitationSchema }),
    async (req, res) => {
      const result = await deps.invitations.accept(req.params.requestToken, req.body, res.locals.user?.id);
      if (result.newAccount) await startSession(deps.sessions, req, res, result.userId);
      res
        .status(result.newAccount ? 201 : 200)
        .json({ requestId: result.requestId, me: deps.me.describe(result.userId, result.orgId) });
    },
  );

  return router;
}
