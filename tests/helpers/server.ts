import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Express } from 'express';
import request from 'supertest';
import { openDatabase, type Db } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { createApp, type AppOptions } from '@/server/app';
import { listCapturedMail } from '@/server/api/dev-mail/dev-mail.repository';
import { startFakeSmtp, type FakeSmtp } from '@/server/services/fake-smtp';
import { createSmtpMailer, type Mailer, type RetryPolicy } from '@/server/services/mail/mailer';
import { createLocalStorage } from '@/server/services/storage/file-storage';
import type { CapturedMail, CapturedMailList } from '@/shared/schemas/mail';
import type { SignUpInput } from '@/shared/schemas/auth';

export const TEST_APP_ORIGIN = 'http://tributary.test';
/** Key of the test server's GET /api/dev/mail. */
export const TEST_DEV_MAIL_KEY = 'test-dev-mail-key-0123456789';
export const DEV_MAIL_PATH = `/api/dev/mail?key=${TEST_DEV_MAIL_KEY}`;
/** Mail retries within a test's patience: 50 ms, 100 ms, 200 ms, then failed after the fourth attempt. */
export const TEST_RETRY: RetryPolicy = { firstWaitMs: 50, maxWaitMs: 200, maxAttempts: 4 };

export interface TestServer {
  app: Express;
  db: Db;
  smtp: FakeSmtp;
  mailer: Mailer;
  /** The folder the app's file storage writes uploads to (removed on close). */
  storageDir: string;
  /** What the fake SMTP server received, newest first, once the outbox has nothing left to deliver now. */
  capturedMail(): Promise<CapturedMail[]>;
  close(): Promise<void>;
}

/**
 * A fresh `:memory:` database built by the real migrations, the real fake SMTP server on a free loopback
 * port with the real nodemailer mailer in front of it, and `createApp` over both.
 */
export async function createTestServer(options: Partial<AppOptions> = {}): Promise<TestServer> {
  const database = openDatabase(':memory:');
  migrateDatabase(database.db);
  const smtp = await startFakeSmtp(database.db);
  const mailer = createSmtpMailer(
    database.db,
    { host: smtp.host, port: smtp.port, from: 'test@tributary.test' },
    { retry: TEST_RETRY, pollMs: 25, log: options.log },
  );
  const storageDir = mkdtempSync(join(tmpdir(), 'tributary-test-storage-'));
  const app = createApp({
    db: database.db,
    mailer,
    storage: createLocalStorage(storageDir),
    appOrigin: TEST_APP_ORIGIN,
    devMailKey: TEST_DEV_MAIL_KEY,
    // Suites sign up many people from one address; the sign-up limit has its own tests.
    signUpLimit: { windowMs: 60_000, limit: 10_000 },
    ...options,
  });
  return {
    app,
    db: database.db,
    smtp,
    mailer,
    storageDir,
    async capturedMail() {
      await mailer.idle();
      return listCapturedMail(database.db, 1000);
    },
    async close() {
      await mailer.close();
      await smtp.close();
      database.close();
      rmSync(storageDir, { recursive: true, force: true });
    },
  };
}

let counter = 0;

/** A sign-up body with a unique e-mail; override any field. */
export function signUpBody(overrides: Partial<SignUpInput> = {}): SignUpInput {
  counter += 1;
  return {
    name: `Test Person ${counter}`,
    email: `person${counter}.${Date.now()}@example.test`,
    password: 'correct horse battery',
    firmName: `Test Firm ${counter}`,
    firmKind: 'contracting',
    ...overrides,
  };
}

/**
 * Follows the confirmation link mailed to `email`, read from the dev mail route (the outbox delivers in
 * the background, so it waits a little for the mail).
 */
export async function confirmEmail(app: Express, email: string): Promise<void> {
  for (let wait = 0; wait < 200; wait += 1) {
    const res = await request(app).get(DEV_MAIL_PATH).expect(200);
    const mail = (res.body as CapturedMailList).messages.find(
      (m) => m.to === email && /verify-email/.test(m.text),
    );
    const token = mail?.text.match(/\/verify-email\/([\w-]+)/)?.[1];
    if (token) {
      await request(app).post(`/api/auth/verify-email/${token}`).expect(204);
      return;
    }
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
  throw new Error(`no confirmation link mailed to ${email}`);
}

/**
 * Signs up a new person (and firm), confirms the e-mail address unless `confirmed: false`, and returns a
 * cookie-keeping agent with the answer's `Me`.
 */
export async function signedUpAgent(
  app: Express,
  overrides: Partial<SignUpInput> = {},
  options: { confirmed?: boolean } = {},
) {
  const agent = request.agent(app);
  const body = signUpBody(overrides);
  const res = await agent.post('/api/auth/sign-up').send(body).expect(201);
  if (options.confirmed !== false) await confirmEmail(app, body.email);
  return { agent, body, me: res.body as { user: { id: string }; activeOrgId: string; role: string } };
}

export type Agent = request.Agent;
