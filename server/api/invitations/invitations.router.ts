import { Router } from 'express';
import { z } from 'zod';
import type { MeService } from '@/server/api/me/me.service';
import { startSession } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Sessions } from '@/server/services/sessions';
import { acceptInvitationSchema } from '@/shared/schemas/orgs';
import type { InvitationsService } from './invitations.service';

const tokenParams = z.object({ token: z.string().min(1).max(200) });

/** Public: anyone holding the e-mailed link may preview it; accepting follows the rules in the service. */
export function invitationsRouter(deps: {
  invitations: InvitationsService;
  me: MeService;
  sessions: Sessions;
}): Router {
  const router = Router();

  router.get('/:token', validate({ params: tokenParams }), (req, res) => {
    res.json(deps.invitations.preview(req.params.token));
  });

  router.post(
    '/:token/accept',
    validate({ params: tokenParams, body: acceptInvitationSchema }),
    async (req, res) => {
      const result = await deps.invitations.accept(req.params.token, req.body, res.locals.user?.id);
      if (result.newAccount) await startSession(deps.sessions, req, res, result.userId);
      res.status(result.newAccount ? 201 : 200).json(deps.me.describe(result.userId, result.orgId));
    },
  );

  return router;
}
