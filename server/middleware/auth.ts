import type { Request, RequestHandler, Response } from 'express';
import type { Session, User } from 'lucia';
import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import { listMemberships } from '@/server/api/me/me.repository';
import { pickActiveMembership } from '@/server/api/me/me.service';
import type { Sessions } from '@/server/services/sessions';
import type { Membership, Role } from '@/shared/schemas/auth';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      user: User | null;
      session: Session | null;
      /** The active firm, set by `requireMember`. */
      member: Membership;
    }
  }
}

/** Header a client sends to pick its active firm when the user belongs to more than one. */
export const ORG_HEADER = 'x-org-id';

/**
 * Reads the lucia session cookie; a session lucia extended gets a fresh cookie, an unknown or expired one
 * a blank cookie.
 */
export function readSession(sessions: Sessions): RequestHandler {
  return async (req, res, next) => {
    res.locals.user = null;
    res.locals.session = null;
    const sessionId = sessions.readSessionCookie(req.headers.cookie ?? '');
    if (!sessionId) return next();
    const { session, user } = await sessions.validateSession(sessionId);
    if (!session) {
      res.append('Set-Cookie', sessions.createBlankSessionCookie().serialize());
      return next();
    }
    if (session.fresh) res.append('Set-Cookie', sessions.createSessionCookie(session.id).serialize());
    res.locals.user = user;
    res.locals.session = session;
    next();
  };
}

export const requireUser: RequestHandler = (_req, res, next) => {
  if (!res.locals.user) throw new AppError('unauthorized', 'Sign in to continue');
  next();
};

/** Signed in and a member of the active firm (the `X-Org-Id` header's firm, else the earliest). */
export function requireMember(db: Db): RequestHandler {
  return (req, res, next) => {
    const user = res.locals.user;
    if (!user) throw new AppError('unauthorized', 'Sign in to continue');
    const active = pickActiveMembership(listMemberships(db, user.id), req.get(ORG_HEADER));
    if (!active) throw new AppError('forbidden', 'This account does not belong to any firm');
    res.locals.member = active;
    next();
  };
}

/** Runs after `requireMember`: the active firm's role must be one of `roles`. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    if (!roles.includes(res.locals.member.role)) {
      throw new AppError('forbidden', 'Your role in this firm cannot do that');
    }
    next();
  };
}

/** Runs after `requireUser` or `requireMember`: the person must have confirmed their e-mail address. */
export const requireVerifiedEmail: RequestHandler = (_req, res, next) => {
  if (!res.locals.user?.emailVerified) {
    throw new AppError(
      'forbidden',
      'Confirm your e-mail address first: follow the link we sent, or ask for a new one',
    );
  }
  next();
};

/**
 * Opens a new session for `userId` and sets its cookie, noting when and from which browser (its User-Agent,
 * shortened) so the person can tell their sessions apart. A session the request already carried is ended
 * first, so signing in never keeps an older session id alive in this browser.
 */
export async function startSession(
  sessions: Sessions,
  req: Request,
  res: Response,
  userId: string,
): Promise<void> {
  if (res.locals.session) await sessions.invalidateSession(res.locals.session.id);
  const session = await sessions.createSession(userId, {
    createdAt: new Date().toISOString(),
    userAgent: req.get('user-agent')?.slice(0, 200) ?? null,
  });
  res.locals.session = session;
  res.append('Set-Cookie', sessions.createSessionCookie(session.id).serialize());
}

/** The signed-in user of a request that passed `requireUser` or `requireMember`. */
export function signedInUser(res: Response): User {
  const user = res.locals.user;
  if (!user) throw new AppError('unauthorized', 'Sign in to continue');
  return user;
}
