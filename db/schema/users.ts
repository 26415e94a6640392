import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/** `email` is stored trimmed and lower-cased (the shared e-mail schema does that), so a plain unique index suffices. */
export const users = sqliteTable('users', {
  id: text('id').primaryKey(),
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  passwordHash: text('password_hash').notNull(),
  createdAt: text('created_at').notNull(),
  /** When the person followed the e-mailed confirmation link (or joined through an e-mailed invitation). */
  emailVerifiedAt: text('email_verified_at'),
});

/**
 * lucia v3 session rows; `expires_at` is Unix seconds. `created_at`
 * and `user_agent` let a person tell their sessions apart (null on sessions from before they were kept).
 */
export const sessions = sqliteTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: integer('expires_at').notNull(),
    createdAt: text('created_at'),
    userAgent: text('user_agent'),
  },
  (t) => [index('sessions_user').on(t.userId)],
);

export const authTokenPurposes = ['password-reset', 'email-verification'] as const;

/**
 * Single-use tokens e-mailed to a person (a password reset or e-mail confirmation link). Only the SHA-256 of the token is kept; a
 * token is good once (`used_at`) and until `expires_at` (ISO time).
 */
export const authTokens = sqliteTable(
  'auth_tokens',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose', { enum: authTokenPurposes }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    createdAt: text('created_at').notNull(),
    expiresAt: text('expires_at').notNull(),
    usedAt: text('used_at'),
  },
  (t) => [index('auth_tokens_user').on(t.userId)],
);
