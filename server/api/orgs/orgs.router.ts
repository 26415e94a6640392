import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, requireVerifiedEmail, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { createInvitationSchema } from '@/shared/schemas/orgs';
import type { OrgsService } from './orgs.service';

const invitationParams = z.object({ invitationId: z.string().min(1).max(100) });

/** The active firm (`current`): members and invitations, owners only. */
export function orgsRouter(deps: { db: Db; orgs: OrgsService }): Router {
  const router = Router();
  router.use('/current', requireMember(deps.db), requireRole('owner'));

  router.get('/current/members', (_req, res) => {
    res.json(deps.orgs.members(res.locals.member.orgId));
  });

  router.post(
    '/current/invitations',
    requireVerifiedEmail,
    validate({ body: createInvitationSchema }),
    (req, res) => {
      const actor = { userId: signedInUser(res).id, orgId: res.locals.member.orgId };
      res.status(201).json(deps.orgs.invite(actor, req.body));
    },
  );

  router.delete('/current/invitations/:invitationId', validate({ params: invitationParams }), (req, res) => {
    const actor = { userId: signedInUser(res).id, orgId: res.locals.member.orgId };
    deps.orgs.revoke(actor, req.params.invitationId);
    res.status(204).end();
  });

  return router;
}
