import { desc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { mailOutbox } from '@/db/schema';
import type { CapturedMail } from '@/shared/schemas/mail';

/** Messages the local fake SMTP server received, newest first. */
export function listCapturedMail(db: DbOrTx, limit: number): CapturedMail[] {
  return db
    .select({
      id: mailOutbox.id,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      text: mailOutbox.text,
      html: mailOutbox.html,
      createdAt: mailOutbox.createdAt,
    })
    .from(mailOutbox)
    .where(eq(mailOutbox.captured, true))
    .orderBy(desc(mailOutbox.createdAt), desc(sql`${mailOutbox}.rowid`))
    .limit(limit)
    .all();
}
