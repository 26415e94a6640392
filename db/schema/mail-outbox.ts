import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/** `pending` waits for (another) attempt; `sent` went to SMTP; `failed` ran out of attempts. */
export const outboxStatuses = ['pending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof outboxStatuses)[number];

/**
 * Every e-mail the app sends is a row here, written in the same transaction as the change it tells about,
 * then delivered (with retries) by the mail delivery loop. The local fake SMTP server sets `captured` when
 * a message arrives, so the development mail page lists what really went over the wire. `status` defaults
 * to `sent` only for rows from before delivery had retries (they were sent, or failed, at once); new mail is
 * written `pending`.
 */
export const mailOutbox = sqliteTable(
  'mail_outbox',
  {
    id: text('id').primaryKey(),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html'),
    createdAt: text('created_at').notNull(),
    captured: integer('captured', { mode: 'boolean' }).notNull().default(false),
    status: text('status', { enum: outboxStatuses }).notNull().default('sent'),
    attempts: integer('attempts').notNull().default(0),
    /** ISO time of the next attempt while `pending`. */
    nextAttemptAt: text('next_attempt_at'),
    /** The SMTP error of the last failed attempt (for the log and the operator, never the client). */
    lastError: text('last_error'),
    sentAt: text('sent_at'),
  },
  (t) => [index('mail_outbox_due').on(t.status, t.nextAttemptAt)],
);
