import type { Request } from 'express';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { devMailPageUrl } from '@/server/api/dev-mail/dev-mail.router';
import { isFromThisMachine } from '@/server/middleware/machine-only';
import {
  DEV_MAIL_PATH,
  TEST_DEV_MAIL_KEY,
  createTestServer,
  signedUpAgent,
  type TestServer,
} from '@/tests/helpers/server';

let server: TestServer;
beforeEach(async () => {
  server = await createTestServer();
});
afterEach(() => server.close());

const NOT_THERE = {
  error: { code: 'not_found', message: 'No such API route', requestId: expect.any(String) },
};

/** An owner invites someone, so the captured mail holds a link into the firm. */
async function mailAnInvitation(): Promise<void> {
  const { agent } = await signedUpAgent(server.app);
  await agent.post('/api/orgs/current/invitations').send({ email: 'new@example.test', role: 'owner' });
  await server.mailer.idle();
}

describe('GET /api/dev/mail', () => {
  it('lists the invitation links to a request from this machine with the key', async () => {
    await mailAnInvitation();
    const res = await request(server.app).get(DEV_MAIL_PATH).expect(200);
    expect(res.body.messages[0].text).toMatch(/\/invite\/[\w-]+/);
  });

  it.each([
    ['no key', '/api/dev/mail'],
    ['an empty key', '/api/dev/mail?key='],
    ['a wrong key', '/api/dev/mail?key=guessed-key-0123456789'],
    ['the key with one character changed', `/api/dev/mail?key=${TEST_DEV_MAIL_KEY.slice(0, -1)}X`],
  ])('answers the plain API 404 to %s, signed in as an owner too', async (_label, path) => {
    await mailAnInvitation();
    const { agent } = await signedUpAgent(server.app);
    for (const res of [await request(server.app).get(path), await agent.get(path)]) {
      expect(res.status).toBe(404);
      expect(res.body).toEqual(NOT_THERE);
      expect(res.text).not.toContain('/invite/');
    }
  });

  it.each([
    ['X-Forwarded-For', '203.0.113.7'],
    ['Forwarded', 'for=203.0.113.7'],
    ['X-Real-IP', '203.0.113.7'],
    ['X-Forwarded-Host', 'tributary.example'],
  ])(
    'answers 404 with the key when a proxy header (%s) says the request came from elsewhere',
    async (header, value) => {
      await mailAnInvitation();
      const res = await request(server.app).get(DEV_MAIL_PATH).set(header, value);
      expect(res.status).toBe(404);
      expect(res.body).toEqual(NOT_THERE);
    },
  );

  it('answers 404 with the key when the Host is not loopback (a domain rebound to 127.0.0.1)', async () => {
    await mailAnInvitation();
    for (const host of ['attacker.example', 'attacker.example:8080', '127.0.0.1.attacker.example']) {
      const res = await request(server.app).get(DEV_MAIL_PATH).set('Host', host);
      expect(res.status).toBe(404);
    }
    for (const host of ['localhost:8080', '127.0.0.1', '[::1]:8080']) {
      await request(server.app).get(DEV_MAIL_PATH).set('Host', host).expect(200);
    }
  });

  it('is not mounted without a key, nor in production even with one', async () => {
    await server.close();
    server = await createTestServer({ devMailKey: undefined });
    await request(server.app).get('/api/dev/mail?key=').expect(404);
    await server.close();
    server = await createTestServer({ production: true });
    await request(server.app).get(DEV_MAIL_PATH).expect(404);
  });
});

describe('isFromThisMachine', () => {
  const fake = (remoteAddress: string, headers: Record<string, string>) =>
    ({ socket: { remoteAddress }, headers }) as unknown as Request;

  it('accepts a loopback peer (IPv4, IPv6, IPv4-mapped) with a loopback Host and no proxy header', () => {
    for (const peer of ['127.0.0.1', '127.8.9.10', '::1', '::ffff:127.0.0.1']) {
      expect(isFromThisMachine(fake(peer, { host: '127.0.0.1:8080' }))).toBe(true);
    }
  });

  it('refuses any other peer, whatever the headers claim', () => {
    for (const peer of ['203.0.113.7', '10.0.0.2', '::ffff:192.168.1.4', 'fe80::1', '']) {
      expect(isFromThisMachine(fake(peer, { host: 'localhost:8080' }))).toBe(false);
    }
  });

  it('refuses a loopback peer without a Host header', () => {
    expect(isFromThisMachine(fake('127.0.0.1', {}))).toBe(false);
  });
});

describe('devMailPageUrl', () => {
  it('uses APP_ORIGIN when it is loopback, else 127.0.0.1 and the port', () => {
    expect(devMailPageUrl('http://localhost:8081', 8080, 'k')).toBe('http://localhost:8081/dev/mail?key=k');
    expect(devMailPageUrl('https://app.example.test', 8080, 'k')).toBe(
      'http://127.0.0.1:8080/dev/mail?key=k',
    );
  });
});
