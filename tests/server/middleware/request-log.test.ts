import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  DEV_MAIL_PATH,
  TEST_DEV_MAIL_KEY,
  confirmEmail,
  createTestServer,
  signUpBody,
  type TestServer,
} from '@/tests/helpers/server';

let server: TestServer;
let lines: string[];
beforeEach(async () => {
  lines = [];
  server = await createTestServer({ log: (line) => lines.push(line) });
});
afterEach(() => server.close());

const parsed = () => lines.map((line) => JSON.parse(line) as Record<string, unknown>);

describe('request log', () => {
  it('writes one JSON line per request, with the id the response header and an error body carry', async () => {
    const ok = await request(server.app).get('/api/health').expect(200);
    const refused = await request(server.app).get('/api/me').expect(401);
    const entries = parsed();
    expect(entries).toHaveLength(2);
    expect(entries[0]).toEqual({
      time: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      level: 'info',
      requestId: ok.headers['x-request-id'],
      method: 'GET',
      path: '/api/health',
      status: 200,
      ms: expect.any(Number),
      userId: null,
    });
    expect(entries[1]).toMatchObject({
      level: 'warn',
      status: 401,
      requestId: refused.headers['x-request-id'],
    });
    expect(refused.body.error.requestId).toBe(refused.headers['x-request-id']);
    expect(ok.headers['x-request-id']).not.toBe(refused.headers['x-request-id']);
  });

  it('names the signed-in user by id', async () => {
    const res = await request(server.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    const agentCookie = String(res.headers['set-cookie']).split(';')[0];
    await request(server.app).get('/api/me').set('Cookie', agentCookie).expect(200);
    expect(parsed().at(-1)).toMatchObject({ path: '/api/me', userId: res.body.user.id });
  });

  it('keeps passwords, cookies, invitation tokens and links, and the dev mail key out of every line', async () => {
    const owner = signUpBody({ password: 'owner secret passphrase' });
    const signedUp = await request(server.app).post('/api/auth/sign-up').send(owner).expect(201);
    const cookie = String(signedUp.headers['set-cookie']).split(';')[0];
    await confirmEmail(server.app, owner.email);
    await request(server.app)
      .post('/api/orgs/current/invitations')
      .set('Cookie', cookie)
      .send({ email: 'logged.invitee@example.test', role: 'estimator' })
      .expect(201);
    const mail = (await server.capturedMail()).find((m) => m.subject.includes('invited you'))!;
    const link = mail.text.match(/http\S+\/invite\/[\w-]+/)?.[0] ?? '';
    const token = link.split('/').at(-1) ?? '';
    await request(server.app).get(`/api/invitations/${token}`).expect(200);
    await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Invitee', password: 'invitee secret passphrase' })
      .expect(201);
    await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: owner.email, password: 'wrong secret guess' });
    await request(server.app).get(DEV_MAIL_PATH).expect(200);

    const log = lines.join('\n');
    expect(lines.length).toBeGreaterThanOrEqual(6);
    for (const secret of [
      'owner secret passphrase',
      'invitee secret passphrase',
      'wrong secret guess',
      cookie.split('=')[1],
      token,
      link,
      TEST_DEV_MAIL_KEY,
    ]) {
      expect(secret.length).toBeGreaterThan(8);
      expect(log).not.toContain(secret);
    }
    expect(log).toContain('/api/invitations/:token/accept');
  });

  it('logs a 5xx with its stack as one error line under the request id the client was given', async () => {
    server.db.$client.exec('DROP TABLE jobs');
    const res = await request(server.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    const cookie = String(res.headers['set-cookie']).split(';')[0];
    const failed = await request(server.app).get('/api/jobs').set('Cookie', cookie).expect(500);
    expect(failed.body.error).toEqual({
      code: 'internal',
      message: 'Something went wrong on our side',
      requestId: failed.headers['x-request-id'],
    });
    const errorLine = parsed().find((entry) => entry.level === 'error' && 'error' in entry);
    expect(errorLine).toMatchObject({ requestId: failed.headers['x-request-id'], path: '/api/jobs' });
    expect(String(errorLine?.error)).toMatch(/no such table: jobs[\s\S]*at /);
  });
});
