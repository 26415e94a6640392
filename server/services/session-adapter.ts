import { eq, lte, sql } from 'drizzle-orm';
import type { Adapter, DatabaseSession, DatabaseUser } from 'lucia';
import type { Db } from '@/db/client';
import { rawPreparedPerDb } from '@/db/prepared';
import { sessions, users } from '@/db/schema';

type SessionRow = typeof sessions.$inferSelect;

function toDatabaseSession({ id, userId, expiresAt, ...attributes }: SessionRow): DatabaseSession {
  return { id, userId, expiresAt: new Date(expiresAt * 1000), attributes };
}

const unixSeconds = (date: Date) => Math.floor(date.getTime() / 1000);

/** Prepares on first use, so an app can be built over a database not migrated yet (route listings do). */
function once<T>(build: () => T): () => T {
  let statement: T | undefined;
  return () => (statement ??= build());
}

/**
 * lucia's storage over the sessions and users tables, with every statement built and prepared once
 * (drizzle `.prepare()`; the session read raw, see rawPreparedPerDb): a signed-in request reads its session
 * and user in one prepared join instead of two queries built anew each time (as a general-purpose adapter
 * would). Only the user columns
 * lucia hands on are read, never the password hash.
 */
export function createSessionAdapter(db: Db): Adapter {
  // Every signed-in request reads this: a raw prepared join, rows as arrays in the order selected.
  const sessionAndUser = rawPreparedPerDb(
    () =>
      db
        .select({
          id: sessions.id,
          userId: sessions.userId,
          expiresAt: sessions.expiresAt,
          createdAt: sessions.createdAt,
          userAgent: sessions.userAgent,
          email: users.email,
          name: users.name,
          emailVerifiedAt: users.emailVerifiedAt,
        })
        .from(sessions)
        .innerJoin(users, eq(users.id, sessions.userId))
        .where(eq(sessions.id, sql.placeholder('id'))),
    (values): [DatabaseSession, DatabaseUser] => {
      const [id, userId, expiresAt, createdAt, userAgent, email, name, emailVerifiedAt] = values as [
        string,
        string,
        number,
        string | null,
        string | null,
        string,
        string,
        string | null,
      ];
      return [
        toDatabaseSession({ id, userId, expiresAt, createdAt, userAgent }),
        { id: userId, attributes: { email, name, emailVerifiedAt } },
      ];
    },
  );
  const userSessions = once(() =>
    db
      .select()
      .from(sessions)
      .where(eq(sessions.userId, sql.placeholder('userId')))
      .prepare(),
  );
  const insertSession = once(() =>
    db
      .insert(sessions)
      .values({
        id: sql.placeholder('id'),
        userId: sql.placeholder('userId'),
        expiresAt: sql.placeholder('expiresAt'),
        createdAt: sql.placeholder('createdAt'),
        userAgent: sql.placeholder('userAgent'),
      })
      .prepare(),
  );
  const updateExpiry = once(() =>
    db
      .update(sessions)
      .set({ expiresAt: sql.placeholder('expiresAt') as unknown as number })
      .where(eq(sessions.id, sql.placeholder('id')))
      .prepare(),
  );
  const deleteOne = once(() =>
    db
      .delete(sessions)
      .where(eq(sessions.id, sql.placeholder('id')))
      .prepare(),
  );
  const deleteOfUser = once(() =>
    db
      .delete(sessions)
      .where(eq(sessions.userId, sql.placeholder('userId')))
      .prepare(),
  );
  const deleteExpired = once(() =>
    db
      .delete(sessions)
      .where(lte(sessions.expiresAt, sql.placeholder('now')))
      .prepare(),
  );

  return {
    async getSessionAndUser(id): Promise<[DatabaseSession | null, DatabaseUser | null]> {
      return sessionAndUser.get(db, id) ?? [null, null];
    },
    async getUserSessions(userId) {
      return userSessions().all({ userId }).map(toDatabaseSession);
    },
    async setSession(session) {
      insertSession().run({
        id: session.id,
        userId: session.userId,
        expiresAt: unixSeconds(session.expiresAt),
        createdAt: session.attributes.createdAt,
        userAgent: session.attributes.userAgent,
      });
    },
    async updateSessionExpiration(id, expiresAt) {
      updateExpiry().run({ id, expiresAt: unixSeconds(expiresAt) });
    },
    async deleteSession(id) {
      deleteOne().run({ id });
    },
    async deleteUserSessions(userId) {
      deleteOfUser().run({ userId });
    },
    async deleteExpiredSessions() {
      deleteExpired().run({ now: unixSeconds(new Date()) });
    },
  };
}
