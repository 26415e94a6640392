import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { authTokens, memberships, organizations, sessions, users, type authTokenPurposes } from '@/db/schema';

type AuthTokenPurpose = (typeof authTokenPurposes)[number];
import type { OrgKind, Role } from '@/shared/schemas/auth';

export function findUserByEmail(db: DbOrTx, email: string) {
  return db.select().from(users).where(eq(users.email, email)).get();
}

export function insertUser(
  db: DbOrTx,
  user: { email: string; name: string; passwordHash: string; emailVerifiedAt?: string },
): string {
  const id = newId();
  db.insert(users)
    .values({ id, ...user, createdAt: new Date().toISOString() })
    .run();
  return id;
}

export function insertOrganization(db: DbOrTx, org: { name: string; kind: OrgKind }): string {
  const id = newId();
  db.insert(organizations)
    .values({ id, ...org, createdAt: new Date().toISOString() })
    .run();
  return id;
}

export function insertMembership(
  db: DbOrTx,
  membership: { userId: string; orgId: string; role: Role },
): void {
  db.insert(memberships)
    .values({ id: newId(), ...membership, createdAt: new Date().toISOString() })
    .run();
}

export function markEmailVerified(db: DbOrTx, userId: string, at: Date): void {
  db.update(users).set({ emailVerifiedAt: at.toISOString() }).where(eq(users.id, userId)).run();
}

export function updatePasswordHash(db: DbOrTx, userId: string, passwordHash: string): void {
  db.update(users).set({ passwordHash }).where(eq(users.id, userId)).run();
}

export function deleteSessionsOf(db: DbOrTx, userId: string): void {
  db.delete(sessions).where(eq(sessions.userId, userId)).run();
}

/** The user's sessions that have not expired, newest first. */
export function listSessionsOf(db: DbOrTx, userId: string, nowUnixSeconds: number) {
  return db
    .select()
    .from(sessions)
    .where(and(eq(sessions.userId, userId), gt(sessions.expiresAt, nowUnixSeconds)))
    .orderBy(desc(sessions.createdAt))
    .all();
}

export function insertAuthToken(
  db: DbOrTx,
  token: { userId: string; purpose: AuthTokenPurpose; tokenHash: string; expiresAt: Date },
): void {
  db.insert(authTokens)
    .values({
      id: newId(),
      ...token,
      createdAt: new Date().toISOString(),
      expiresAt: token.expiresAt.toISOString(),
    })
    .run();
}

/** Unused tokens of one purpose are dropped when a new one is made: only the newest link works. */
export function deleteUnusedTokens(db: DbOrTx, userId: string, purpose: AuthTokenPurpose): void {
  db.delete(authTokens)
    .where(and(eq(authTokens.userId, userId), eq(authTokens.purpose, purpose), isNull(authTokens.usedAt)))
    .run();
}

/** An unused, unexpired token of `purpose`, or undefined. */
export function findOpenToken(db: DbOrTx, tokenHash: string, purpose: AuthTokenPurpose, now: Date) {
  return db
    .select()
    .from(authTokens)
    .where(
      and(
        eq(authTokens.tokenHash, tokenHash),
        eq(authTokens.purpose, purpose),
        isNull(authTokens.usedAt),
        gt(authTokens.expiresAt, now.toISOString()),
      ),
    )
    .get();
}

/** Marks the token used; false when another request used it first. */
export function markTokenUsed(db: DbOrTx, id: string, at: Date): boolean {
  return (
    db
      .update(authTokens)
      .set({ usedAt: at.toISOString() })
      .where(and(eq(authTokens.id, id), isNull(authTokens.usedAt)))
      .run().changes > 0
  );
}
