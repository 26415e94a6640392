import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from './users';

/**
 * A write's answer kept under the Idempotency-Key its person sent (docs/sync-protocol.md), so a retry of the
 * same write gets the same answer and runs nothing. `status` is null while the first attempt is still being
 * handled; `response` is the answer's JSON (null for an empty answer). Rows older than a day are swept.
 */
export const idempotencyKeys = sqliteTable(
  'idempotency_keys',
  {
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    key: text('key').notNull(),
    method: text('method').notNull(),
    path: text('path').notNull(),
    /** SHA-256 (hex) of the body: canonical JSON, or an upload's fields with its file's own hash. */
    bodyHash: text('body_hash').notNull(),
    status: integer('status'),
    response: text('response', { mode: 'json' }).$type<unknown>(),
    createdAt: text('created_at').notNull(),
  },
  (t) => [
    uniqueIndex('idempotency_keys_user_key').on(t.userId, t.key),
    index('idempotency_keys_created').on(t.createdAt),
  ],
);
