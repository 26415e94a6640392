import type { AddressInfo } from 'node:net';
import { eq } from 'drizzle-orm';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Db } from '@/db/client';
import { newId } from '@/db/new-id';
import { mailOutbox } from '@/db/schema';
import { OUTBOX_ID_HEADER } from './mail/mailer';

export interface FakeSmtp {
  host: string;
  port: number;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

function recipients(to: AddressObject | AddressObject[] | undefined): string {
  const list = Array.isArray(to) ? to : to ? [to] : [];
  return list.flatMap((group) => group.value.map((address) => address.address ?? '')).join(', ');
}

/**
 * Local SMTP server for development and tests: accepts any message on loopback, parses it and marks its
 * outbox row captured (or stores it when it came from elsewhere), so the dev mail page can list it. The
 * message is stored before the SMTP reply, so `sendMail` resolving means the mail is visible.
 */
export function startFakeSmtp(db: Db, options: { host?: string; port?: number } = {}): Promise<FakeSmtp> {
  const host = options.host ?? '127.0.0.1';
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const outboxId = parsed.headers.get(OUTBOX_ID_HEADER.toLowerCase());
          const known = typeof outboxId === 'string' ? outboxId : undefined;
          // The HTML part is kept as it arrived, so a test reads what really went over the wire.
          const html = typeof parsed.html === 'string' ? parsed.html : null;
          const updated = known
            ? db.update(mailOutbox).set({ captured: true, html }).where(eq(mailOutbox.id, known)).run()
                .changes
            : 0;
          if (updated === 0) {
            db.insert(mailOutbox)
              .values({
                id: newId(),
                to: recipients(parsed.to),
                subject: parsed.subject ?? '',
                text: parsed.text ?? '',
                html,
                createdAt: new Date().toISOString(),
                captured: true,
                // Mail from elsewhere was delivered by its sender: the outbox must not send it again.
                status: 'sent',
              })
              .run();
          }
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => {
      const { port } = server.server.address() as AddressInfo;
      resolve({ host, port, close: () => new Promise((done) => server.close(() => done())) });
    });
  });
}
