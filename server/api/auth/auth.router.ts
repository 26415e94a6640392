import { createHash } from 'node:crypto';
import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { ORG_HEADER, requireUser, signedInUser, startSession } from '@/server/middleware/auth';
import {
  passwordResetLimit,
  signInLimit,
  signUpLimit,
  type RateLimitOptions,
} from '@/server/middleware/auth-limits';
import { validate } from '@/server/middleware/validate';
import type { Sessions } from '@/server/services/sessions';
import {
  passwordResetRequestSchema,
  passwordResetSchema,
  signInSchema,
  signUpSchema,
  type SessionRow,
} from '@/shared/schemas/auth';
import type { MeService } from '@/server/api/me/me.service';
import { listSessionsOf } from './auth.repository';
import type { AuthService } from './auth.service';

const resetParams = z.object({ resetToken: z.string().min(1).max(200) });
const verifyParams = z.object({ verifyToken: z.string().min(1).max(200) });

/** A session's id is its cookie's secret: a list shows a short one-way handle of it instead. */
const sessionHandle = (sessionId: string) =>
  createHash('sha256').update(sessionId).digest('hex').slice(0, 16);

export function authRouter(deps: {
  db: Db;
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
      await startSession(deps.sessions, req, res, userId);
      res.status(201).json(deps.me.describe(userId, orgId));
    },
  );

  router.post(
    '/sign-in',
    signInLimit(deps.signInLimit),
    validate({ body: signInSchema }),
    async (req, res) => {
      const { userId } = await deps.auth.signIn(req.body);
      await startSession(deps.sessions, req, res, userId);
      res.json(deps.me.describe(userId, req.get(ORG_HEADER)));
    },
  );

  router.post('/sign-out', async (_req, res) => {
    if (res.locals.session) await deps.sessions.invalidateSession(res.locals.session.id);
    res.append('Set-Cookie', deps.sessions.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  /** The person's sessions (every browser signed in), this one marked `current`. */
  router.get('/sessions', requireUser, (_req, res) => {
    const currentId = res.locals.session?.id;
    const rows = listSessionsOf(deps.db, signedInUser(res).id, Math.floor(Date.now() / 1000));
    const sessions: SessionRow[] = rows.map((row) => ({
      id: sessionHandle(row.id),
      createdAt: row.createdAt,
      expiresAt: new Date(row.expiresAt * 1000).toISOString(),
      userAgent: row.userAgent,
      current: row.id === currentId,
    }));
    res.json({ sessions });
  });

  /** Ends every session of the person, this one too. */
  router.post('/sign-out-everywhere', requireUser, async (_req, res) => {
    await deps.sessions.invalidateUserSessions(signedInUser(res).id);
    res.append('Set-Cookie', deps.sessions.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  /** Mails a new confirmation link to the signed-in person, unless they are confirmed already. */
  router.post('/verify-email', requireUser, passwordResetLimit(deps.signUpLimit), (_req, res) => {
    deps.auth.resendVerification(signedInUser(res).id);
    res.status(204).end();
  });

  /** Confirms the address with the link's token (no sign-in needed: the link is the proof). */
  router.post('/verify-email/:verifyToken', validate({ params: verifyParams }), (req, res) => {
    deps.auth.verifyEmail(req.params.verifyToken);
    res.status(204).end();
  });

  /** Always 204, whether or not the address has an account. */
  router.post(
    '/password-reset',
    passwordResetLimit(deps.signUpLimit),
    validate({ body: passwordResetRequestSchema }),
    (req, res) => {
      deps.auth.requestPasswordReset(req.body.email);
      res.status(204).end();
    },
  );

  /** Sets the new password, ends every other session and signs this browser in. */
  router.post(
    '/password-reset/:resetToken',
    validate({ params: resetParams, body: passwordResetSchema }),
    async (req, res) => {
      const { userId } = await deps.auth.resetPassword(req.params.resetToken, req.body.password);
      res.locals.session = null;
      await startSession(deps.sessions, req, res, userId);
      res.json(deps.me.describe(userId, req.get(ORG_HEADER)));
    },
  );

  return router;
}
