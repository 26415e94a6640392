import { Lucia, TimeSpan } from 'lucia';
import type { Db } from '@/db/client';
import { createSessionAdapter } from './session-adapter';

export const SESSION_COOKIE = 'tributary_session';

export interface SessionOptions {
  sessionDays: number;
  secureCookies: boolean;
}

/** lucia v3 over prepared statements (session-adapter.ts): sliding expiry of `sessionDays`, httpOnly SameSite=Lax cookie. */
export function createSessions(db: Db, options: SessionOptions) {
  return new Lucia(createSessionAdapter(db), {
    sessionExpiresIn: new TimeSpan(options.sessionDays, 'd'),
    sessionCookie: {
      name: SESSION_COOKIE,
      attributes: { secure: options.secureCookies, sameSite: 'lax' },
    },
    getUserAttributes: (attributes) => ({
      email: attributes.email,
      name: attributes.name,
      emailVerified: attributes.emailVerifiedAt !== null,
    }),
    getSessionAttributes: (attributes) => ({
      createdAt: attributes.createdAt,
      userAgent: attributes.userAgent,
    }),
  });
}

export type Sessions = ReturnType<typeof createSessions>;

declare module 'lucia' {
  interface Register {
    Lucia: Sessions;
    DatabaseUserAttributes: { email: string; name: string; emailVerifiedAt: string | null };
    DatabaseSessionAttributes: { createdAt: string | null; userAgent: string | null };
  }
}
