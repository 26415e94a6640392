import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/** `email` is stored trimmed and lower-cased (the shared e-mail schema does that), so a plain unique index suffices. */
export const users = sqliteTable('users', {
  id: text('id').primaryKey(),
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  passwordHash: text('password_hash').notNull(),
  createdAt: text('created_at').notNull(),
});

/** lucia v3 session rows; `expires_at` is Unix seconds, as @lucia-auth/adapter-drizzle writes it. */
export const sessions = sqliteTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: integer('expires_at').notNull(),
  },
  (t) => [index('sessions_user').on(t.userId)],
);
