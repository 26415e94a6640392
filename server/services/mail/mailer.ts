import nodemailer from 'nodemailer';
import type { Db } from '@/db/client';
import { newId } from '@/db/new-id';
import { mailOutbox } from '@/db/schema';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

export interface SmtpTarget {
  host: string;
  port: number;
  user?: string;
  pass?: string;
  from: string;
}

/** Header that ties a message to its outbox row, so the local fake SMTP server can mark it captured. */
export const OUTBOX_ID_HEADER = 'X-Tributary-Outbox-Id';

/** Records every e-mail in `mail_outbox`, then hands it to the SMTP server over nodemailer. */
export function createSmtpMailer(db: Db, target: SmtpTarget): Mailer {
  const transport = nodemailer.createTransport({
    host: target.host,
    port: target.port,
    secure: target.port === 465,
    auth: target.user && target.pass ? { user: target.user, pass: target.pass } : undefined,
  });
  return {
    async send(mail) {
      const id = newId();
      db.insert(mailOutbox)
        .values({ id, ...mail, html: mail.html ?? null, createdAt: new Date().toISOString() })
        .run();
      await transport.sendMail({ from: target.from, ...mail, headers: { [OUTBOX_ID_HEADER]: id } });
    },
    close: () => transport.close(),
  };
}
