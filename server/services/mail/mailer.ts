import nodemailer from 'nodemailer';
import type { Db } from '@/db/client';
import { listDueMail, markAttemptFailed, markSent, type DueMail } from './outbox.repository';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** Every mail has an HTML part beside the text, made by `htmlBody` (html-body.ts). */
  html: string;
}

/**
 * Delivers the mail queued in `mail_outbox` (see `enqueueMail`): on `wake`, on a timer, and again after
 * each failure with a growing wait, so mail queued while the SMTP server is down goes out once it is back.
 */
export interface Mailer {
  /** Runs a delivery pass soon; call it once the transaction that queued mail has committed. */
  wake(): void;
  /** Resolves when no delivery pass is running or waiting to start. */
  idle(): Promise<void>;
  /** Stops the timer, lets the running pass finish and closes the SMTP connection. */
  close(): Promise<void>;
}

export interface SmtpTarget {
  host: string;
  port: number;
  user?: string;
  pass?: string;
  from: string;
}

export interface RetryPolicy {
  /** Wait after the first failed attempt; each later one doubles it. */
  firstWaitMs: number;
  /** Longest wait between two attempts. */
  maxWaitMs: number;
  /** Attempts in all before the mail is marked `failed`. */
  maxAttempts: number;
}

/** 30 s, 1, 2, 4 … minutes, at most an hour apart, for about a day (30 attempts). */
export const DEFAULT_RETRY: RetryPolicy = { firstWaitMs: 30_000, maxWaitMs: 60 * 60_000, maxAttempts: 30 };

export interface MailerOptions {
  retry?: RetryPolicy;
  /** How often the timer looks for due mail. */
  pollMs?: number;
  /** Failed attempts, by outbox id (never the address or the body: invitation links are in it). */
  log?: (line: string) => void;
}

/** Header that ties a message to its outbox row, so the local fake SMTP server can mark it captured. */
export const OUTBOX_ID_HEADER = 'X-Tributary-Outbox-Id';

const BATCH = 20;

/** Wait before attempt `attempts + 1`, after `attempts` failed ones. */
export function retryWaitMs(policy: RetryPolicy, attempts: number): number {
  return Math.min(policy.maxWaitMs, policy.firstWaitMs * 2 ** (attempts - 1));
}

/** The outbox delivered over nodemailer to `target`. */
export function createSmtpMailer(db: Db, target: SmtpTarget, options: MailerOptions = {}): Mailer {
  const retry = options.retry ?? DEFAULT_RETRY;
  const log = options.log ?? (() => undefined);
  const transport = nodemailer.createTransport({
    host: target.host,
    port: target.port,
    secure: target.port === 465,
    auth: target.user && target.pass ? { user: target.user, pass: target.pass } : undefined,
    // nodemailer waits minutes by default; a dead server should cost a retry, not a stuck pass.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });

  async function deliver(mail: DueMail): Promise<void> {
    const attempts = mail.attempts + 1;
    try {
      const { id, attempts: _attempts, ...message } = mail;
      await transport.sendMail({ from: target.from, ...message, headers: { [OUTBOX_ID_HEADER]: id } });
      markSent(db, mail.id, attempts, new Date());
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      const again = attempts < retry.maxAttempts;
      const nextAttemptAt = again ? new Date(Date.now() + retryWaitMs(retry, attempts)) : null;
      markAttemptFailed(db, mail.id, { attempts, error: reason, nextAttemptAt });
      log(
        `Mail ${mail.id}: attempt ${attempts} failed (${reason}); ` +
          (nextAttemptAt ? `next at ${nextAttemptAt.toISOString()}` : 'no attempts left, marked failed'),
      );
    }
  }

  async function pass(): Promise<void> {
    for (;;) {
      const due = listDueMail(db, new Date(), BATCH);
      for (const mail of due) await deliver(mail);
      if (due.length < BATCH) return;
    }
  }

  let running: Promise<void> | undefined;
  let rerun = false;
  let scheduled = false;
  let closed = false;

  function run(): void {
    if (closed) return;
    if (running) {
      rerun = true;
      return;
    }
    running = (async () => {
      do {
        rerun = false;
        await pass();
      } while (rerun && !closed);
    })()
      .catch((error: unknown) => log(`Mail delivery pass failed: ${String(error)}`))
      .finally(() => {
        running = undefined;
      });
  }

  // The DOM typings the client needs make setInterval's result a number here; Node's has unref.
  const timer = setInterval(run, options.pollMs ?? 5_000) as unknown as NodeJS.Timeout;
  timer.unref();

  async function idle(): Promise<void> {
    while (scheduled || running) {
      if (running) await running;
      else await new Promise((resolve) => setImmediate(resolve));
    }
  }

  return {
    wake() {
      if (scheduled || closed) return;
      scheduled = true;
      setImmediate(() => {
        scheduled = false;
        run();
      });
    },
    idle,
    async close() {
      closed = true;
      clearInterval(timer);
      await idle();
      transport.close();
    },
  };
}
