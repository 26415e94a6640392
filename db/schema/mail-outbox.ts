import { integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/**
 * Every e-mail the app sends gets a row before it goes to SMTP. The local fake SMTP server sets `captured`
 * when the message arrives, so the development mail page lists what really went over the wire.
 */
export const mailOutbox = sqliteTable('mail_outbox', {
  id: text('id').primaryKey(),
  to: text('to').notNull(),
  subject: text('subject').notNull(),
  text: text('text').notNull(),
  html: text('html'),
  createdAt: text('created_at').notNull(),
  captured: integer('captured', { mode: 'boolean' }).notNull().default(false),
});
