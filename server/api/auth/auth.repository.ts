import { eq } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { memberships, organizations, users } from '@/db/schema';
import type { OrgKind, Role } from '@/shared/schemas/auth';

export function findUserByEmail(db: DbOrTx, email: string) {
  return db.select().from(users).where(eq(users.email, email)).get();
}

export function insertUser(db: DbOrTx, user: { email: string; name: string; passwordHash: string }): string {
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
