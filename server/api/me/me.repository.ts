import { asc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { rawPreparedPerDb } from '@/db/prepared';
import { memberships, organizations, users } from '@/db/schema';
import type { Membership, OrgKind, Role } from '@/shared/schemas/auth';

const membershipsOf = rawPreparedPerDb(
  (db) =>
    db
      .select({
        orgId: organizations.id,
        orgName: organizations.name,
        orgKind: organizations.kind,
        role: memberships.role,
      })
      .from(memberships)
      .innerJoin(organizations, eq(organizations.id, memberships.orgId))
      .where(eq(memberships.userId, sql.placeholder('userId')))
      .orderBy(asc(memberships.createdAt), asc(sql`${memberships}.rowid`)),
  (values): Membership => {
    const [orgId, orgName, orgKind, role] = values as [string, string, OrgKind, Role];
    return { orgId, orgName, orgKind, role };
  },
);

/** The user's firms, earliest membership first (every signed-in firm request reads this, raw). */
export function listMemberships(db: DbOrTx, userId: string): Membership[] {
  return membershipsOf.all(db, userId);
}

export function findUser(db: DbOrTx, userId: string) {
  return db
    .select({ id: users.id, email: users.email, name: users.name, emailVerifiedAt: users.emailVerifiedAt })
    .from(users)
    .where(eq(users.id, userId))
    .get();
}
