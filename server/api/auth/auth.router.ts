import { Router } from 'express';
import { ORG_HEADER, startSession } from '@/server/middleware/auth';
import { signInLimit, signUpLimit, type RateLimitOptions } from '@/server/middleware/auth-limits';
import { validate } from '@/server/middleware/validate';
import type { Sessions } from '@/server/services/sessions';
import { signInSchema, signUpSchema } from '@/shared/schemas/auth';
import type { MeService } from '@/server/api/me/me.service';
import type { AuthService } from './auth.service';

export function authRouter(deps: {
  auth: AuthService;
  me: MeService;
  sessions: Sessions;
  signInLimit: RateLimitOptions;
  signUpLimit: RateLimitOptions;
}): Router {
  const router = Router();

  router.post(
    '/sign-up',
    signUpLimit(deps.signUpLimit),
    validate({ body: signUpSchema }),
    async (req, res) => {
      const { userId, orgId } = await deps.auth.signUp(req.body);
      await startSession(deps.sessions, res, userId);
      res.status(201).json(deps.me.describe(userId, orgId));
    },
  );

  router.post(
    '/sign-in',
    signInLimit(deps.signInLimit),
    validate({ body: signInSchema }),
    async (req, res) => {
      const { userId } = await deps.auth.signIn(req.body);
      await startSession(deps.sessions, res, userId);
      res.json(deps.me.describe(userId, req.get(ORG_HEADER)));
    },
  );

  router.post('/sign-out', async (_req, res) => {
    if (res.locals.session) await deps.sessions.invalidateSession(res.locals.session.id);
    res.append('Set-Cookie', deps.sessions.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  return router;
}
