import { index, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { orgKinds, roles } from '@/shared/schemas/auth';
import { users } from './users';

export const organizations = sqliteTable('organizations', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  kind: text('kind', { enum: orgKinds }).notNull(),
  createdAt: text('created_at').notNull(),
});

export const memberships = sqliteTable(
  'memberships',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    role: text('role', { enum: roles }).notNull(),
    createdAt: text('created_at').notNull(),
  },
  (t) => [uniqueIndex('memberships_user_org').on(t.userId, t.orgId), index('memberships_org').on(t.orgId)],
);
