import { index, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { roles } from '@/shared/schemas/auth';
import { organizations } from './organizations';
import { users } from './users';

/** The e-mailed token is never stored: only its SHA-256 (hex), so a leaked table cannot be replayed. */
export const invitations = sqliteTable(
  'invitations',
  {
    id: text('id').primaryKey(),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: roles }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
    expiresAt: text('expires_at').notNull(),
    acceptedAt: text('accepted_at'),
  },
  (t) => [index('invitations_org').on(t.orgId)],
);
