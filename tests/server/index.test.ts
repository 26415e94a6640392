import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@/db/seed';
import { startServer } from '@/tests/helpers/start-server';

const signInAsDemoOwner = (baseUrl: string) =>
  fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'owner@demo.tributary.test', password: DEMO_PASSWORD }),
  });

describe('node --import tsx server/index.ts', () => {
  it('migrates, adds demo data, prints its address, serves the API and stops cleanly on SIGTERM', async () => {
    const server = await startServer({ env: { SEED_DEMO: undefined } });
    try {
      expect(server.output()).toContain(`Tributary listening on ${server.baseUrl}`);
      const health = await fetch(`${server.baseUrl}/api/health`);
      expect(await health.json()).toEqual({ ok: true });
      expect((await signInAsDemoOwner(server.baseUrl)).status).toBe(200);
    } finally {
      expect(await server.stop()).toBe(0);
    }
  }, 60_000);

  it('prints the captured-mail link with its key; the API answers it and nothing without the key', async () => {
    const server = await startServer({ env: { DEV_MAIL_KEY: undefined } });
    try {
      const printed = server.output().match(/Captured mail, from this machine only: (\S+)/)?.[1] ?? '';
      const page = new URL(printed);
      expect(page.origin).toBe(server.baseUrl);
      expect(page.pathname).toBe('/dev/mail');
      const key = page.searchParams.get('key') ?? '';
      expect(key.length).toBeGreaterThanOrEqual(32);
      const listed = await fetch(`${server.baseUrl}/api/dev/mail?key=${encodeURIComponent(key)}`);
      expect(listed.status).toBe(200);
      expect((await fetch(`${server.baseUrl}/api/dev/mail`)).status).toBe(404);
    } finally {
      await server.stop();
    }
  }, 60_000);

  it('a production start on an empty database adds no demo firm and has no dev mail page', async () => {
    const production = {
      NODE_ENV: 'production',
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: '9',
      SEED_DEMO: undefined,
    };
    const server = await startServer({ env: production });
    try {
      expect(server.output()).not.toContain('Demo firms');
      expect(server.output()).not.toContain('Captured mail');
      expect((await signInAsDemoOwner(server.baseUrl)).status).toBe(401);
      expect((await fetch(`${server.baseUrl}/api/dev/mail?key=`)).status).toBe(404);
    } finally {
      await server.stop();
    }
  }, 60_000);
});
