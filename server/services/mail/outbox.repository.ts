import { and, asc, eq, lte, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { mailOutbox } from '@/db/schema';
import type { OutgoingMail } from './mailer';

/**
 * Queues one e-mail: call it inside the transaction of the change the mail tells about, so the mail exists
 * exactly when the change does. Delivery happens later, with retries.
 */
export function enqueueMail(db: DbOrTx, mail: OutgoingMail): string {
  const id = newId();
  const now = new Date().toISOString();
  db.insert(mailOutbox)
    .values({ id, ...mail, html: mail.html, createdAt: now, status: 'pending', nextAttemptAt: now })
    .run();
  return id;
}

/** A queued mail; one queued before every mail had an HTML part goes out as text only. */
export interface DueMail extends Omit<OutgoingMail, 'html'> {
  html?: string;
  id: string;
  attempts: number;
}

/** Pending mail whose next attempt is due, oldest first. */
export function listDueMail(db: DbOrTx, now: Date, limit: number): DueMail[] {
  return db
    .select({
      id: mailOutbox.id,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      text: mailOutbox.text,
      html: mailOutbox.html,
      attempts: mailOutbox.attempts,
    })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, now.toISOString())))
    .orderBy(asc(mailOutbox.nextAttemptAt), asc(sql`${mailOutbox}.rowid`))
    .limit(limit)
    .all()
    .map((row) => ({ ...row, html: row.html ?? undefined }));
}

export function markSent(db: DbOrTx, id: string, attempts: number, at: Date): void {
  db.update(mailOutbox)
    .set({ status: 'sent', attempts, sentAt: at.toISOString(), nextAttemptAt: null, lastError: null })
    .where(eq(mailOutbox.id, id))
    .run();
}

/** Records a failed attempt: another one at `nextAttemptAt`, or none (`failed`) when that is null. */
export function markAttemptFailed(
  db: DbOrTx,
  id: string,
  failure: { attempts: number; error: string; nextAttemptAt: Date | null },
): void {
  db.update(mailOutbox)
    .set({
      status: failure.nextAttemptAt ? 'pending' : 'failed',
      attempts: failure.attempts,
      lastError: failure.error.slice(0, 500),
      nextAttemptAt: failure.nextAttemptAt?.toISOString() ?? null,
    })
    .where(eq(mailOutbox.id, id))
    .run();
}
