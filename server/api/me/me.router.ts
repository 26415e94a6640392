import { Router } from 'express';
import { ORG_HEADER, requireUser, signedInUser } from '@/server/middleware/auth';
import type { MeService } from './me.service';

export function meRouter(deps: { me: MeService }): Router {
  const router = Router();
  router.get('/', requireUser, (req, res) => {
    res.json(deps.me.describe(signedInUser(res).id, req.get(ORG_HEADER)));
  });
  return router;
}
