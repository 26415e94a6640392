import { randomBytes } from 'node:crypto';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { openDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { insertDemoData } from '@/db/seed';
import { devMailPageUrl } from './api/dev-mail/dev-mail.router';
import { refreshLoadPath } from './api/load-path/load-path.service';
import { evaluate } from './api/members/member-evaluation';
import { createApp } from './app';
import { loadEnv } from './env';
import { startFakeSmtp, type FakeSmtp } from './services/fake-smtp';
import { startCalcPool } from './services/calc-pool';
import { createSmtpMailer } from './services/mail/mailer';
import { hashPassword } from './services/password';
import { createLocalStorage } from './services/storage/file-storage';

async function main(): Promise<void> {
  const env = loadEnv();
  const production = env.NODE_ENV === 'production';
  const log = (line: string) => console.log(line);

  const database = openDatabase(env.DATABASE_URL);
  migrateDatabase(database.db);
  if (
    env.SEED_DEMO &&
    (await insertDemoData(database.db, hashPassword, evaluate, (tx, job) => {
      refreshLoadPath(tx, job.orgId, job, () => 'seed');
    }))
  ) {
    log('Demo firms, people, jobs and members added (password tributary-demo)');
  }

  let fakeSmtp: FakeSmtp | undefined;
  if (!env.SMTP_HOST) {
    fakeSmtp = await startFakeSmtp(database.db);
    log(`Fake SMTP server capturing mail on ${fakeSmtp.host}:${fakeSmtp.port}`);
  }
  const mailer = createSmtpMailer(
    database.db,
    {
      host: env.SMTP_HOST ?? fakeSmtp?.host ?? '127.0.0.1',
      port: env.SMTP_PORT ?? fakeSmtp?.port ?? 25,
      user: env.SMTP_USER,
      pass: env.SMTP_PASS,
      from: env.MAIL_FROM,
    },
    { log },
  );

  const devMailKey =
    fakeSmtp && !production ? (env.DEV_MAIL_KEY ?? randomBytes(24).toString('base64url')) : undefined;
  const app = createApp({
    db: database.db,
    mailer,
    storage: createLocalStorage(env.STORAGE_DIR),
    appOrigin: env.APP_ORIGIN,
    production,
    sessionDays: env.SESSION_DAYS,
    trustProxy: env.TRUST_PROXY,
    devMailKey,
    webDir: env.WEB_DIR,
    log: env.NODE_ENV === 'test' ? undefined : log,
  });

  startCalcPool();
  const server = createServer(app);
  server.listen(env.PORT, env.HOST, () => {
    const { port } = server.address() as AddressInfo;
    if (devMailKey)
      log(`Captured mail, from this machine only: ${devMailPageUrl(env.APP_ORIGIN, port, devMailKey)}`);
    log(`Tributary listening on http://${env.HOST}:${port}`);
  });

  let stopping = false;
  const shutdown = (signal: string) => {
    if (stopping) return;
    stopping = true;
    log(`${signal} received, shutting down`);
    setTimeout(() => process.exit(1), 10_000);
    server.close(async () => {
      await mailer.close();
      await fakeSmtp?.close();
      database.close();
      process.exit(0);
    });
    server.closeIdleConnections();
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
