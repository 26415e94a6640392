import express from 'express';
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
import { requestId, requestLog } from '@/server/middleware/request-log';

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
      msg: 'request completed',
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

  it('logs a 5xx as the request’s one line, at error level with its stack, under the id the client was given', async () => {
    server.db.$client.exec('DROP TABLE jobs');
    const res = await request(server.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    const cookie = String(res.headers['set-cookie']).split(';')[0];
    const failed = await request(server.app).get('/api/jobs').set('Cookie', cookie).expect(500);
    expect(failed.body.error).toEqual({
      code: 'internal',
      message: 'Something went wrong on our side',
      requestId: failed.headers['x-request-id'],
    });
    const forRequest = parsed().filter((entry) => entry.requestId === failed.headers['x-request-id']);
    expect(forRequest).toHaveLength(1);
    const errorLine = forRequest[0];
    expect(errorLine).toMatchObject({ level: 'error', path: '/api/jobs', status: 500 });
    expect(String(errorLine?.error)).toMatch(/no such table: jobs[\s\S]*at /);
  });
});

describe('request log: secrets', () => {
  it('keeps password reset and confirmation tokens and their links out, naming the segment instead', async () => {
    const person = signUpBody({ password: 'first secret passphrase' });
    await request(server.app).post('/api/auth/sign-up').send(person).expect(201);
    await request(server.app).post('/api/auth/password-reset').send({ email: person.email }).expect(204);
    const mail = await server.capturedMail();
    const resetLink =
      mail.find((m) => /reset-password/.test(m.text))?.text.match(/http\S+\/reset-password\/[\w-]+/)?.[0] ??
      '';
    const verifyLink =
      mail.find((m) => /verify-email/.test(m.text))?.text.match(/http\S+\/verify-email\/[\w-]+/)?.[0] ?? '';
    const resetToken = resetLink.split('/').at(-1) ?? '';
    const verifyToken = verifyLink.split('/').at(-1) ?? '';
    await request(server.app).post(`/api/auth/verify-email/${verifyToken}`).expect(204);
    await request(server.app)
      .post(`/api/auth/password-reset/${resetToken}`)
      .send({ password: 'second secret passphrase' })
      .expect(200);
    // The web pages the links open go through the same log (the SPA fallback answers them).
    for (const page of [
      `/reset-password/${resetToken}`,
      `/verify-email/${verifyToken}`,
      `/invite/${resetToken}`,
    ]) {
      await request(server.app).get(page);
    }

    const log = lines.join('\n');
    for (const secret of [
      resetToken,
      verifyToken,
      resetLink,
      verifyLink,
      'first secret passphrase',
      'second secret passphrase',
    ]) {
      expect(secret.length).toBeGreaterThan(8);
      expect(log).not.toContain(secret);
    }
    const paths = parsed().map((entry) => entry.path);
    expect(paths).toEqual(
      expect.arrayContaining([
        '/api/auth/password-reset/:resetToken',
        '/api/auth/verify-email/:verifyToken',
        '/reset-password/:resetToken',
        '/verify-email/:verifyToken',
        '/invite/:token',
      ]),
    );
  });

  it('censors passwords, cookies, tokens and links in anything a route logs through req.log', async () => {
    const app = express();
    app.use(
      requestId,
      requestLog((line) => lines.push(line)),
    );
    app.post('/echo', express.json(), (req, res) => {
      req.log.info({ body: req.body, headers: req.headers }, 'route note');
      res.status(204).end();
    });
    await request(app)
      .post('/echo')
      .set('Cookie', 'tributary_session=cookie-secret-value')
      .set('Authorization', 'Bearer header-secret-value')
      .send({
        password: 'body secret password',
        token: 'body-secret-token',
        link: 'http://x/invite/link-secret',
      })
      .expect(204);
    const note = parsed().find((entry) => entry.msg === 'route note') as { body: object; headers: object };
    expect(note.body).toEqual({ password: '[redacted]', token: '[redacted]', link: '[redacted]' });
    expect(note.headers).toMatchObject({ cookie: '[redacted]', authorization: '[redacted]' });
    for (const secret of [
      'cookie-secret-value',
      'header-secret-value',
      'body secret password',
      'body-secret-token',
      'link-secret',
    ]) {
      expect(lines.join('\n')).not.toContain(secret);
    }
  });
});
