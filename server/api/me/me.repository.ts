import { asc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { memberships, organizations, users } from '@/db/schema';
import type { Membership } from '@/shared/schemas/auth';

/** The user's firms, earliest membership first. */
export function listMemberships(db: DbOrTx, userId: string): Membership[] {
  return db
    .select({
      orgId: organizations.id,
      orgName: organizations.name,
      orgKind: organizations.kind,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(organizations, eq(organizations.id, memberships.orgId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(memberships.createdAt), asc(sql`${memberships}.rowid`))
    .all();
}

export function findUser(db: DbOrTx, userId: string) {
  return db
    .select({ id: users.id, email: users.email, name: users.name, emailVerifiedAt: users.emailVerifiedAt })
    .from(users)
    .where(eq(users.id, userId))
    .get();
}
