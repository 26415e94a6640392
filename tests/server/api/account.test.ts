import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { authTokens, sessions } from '@/db/schema';
import { sessionListSchema } from '@/shared/schemas/auth';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signUpBody, signedUpAgent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let lines: string[];
beforeEach(async () => {
  lines = [];
  server = await createTestServer({ log: (line) => lines.push(line) });
});
afterEach(() => server.close());

const cookieValue = (res: request.Response) =>
  ((res.headers['set-cookie'] as unknown as string[] | undefined) ?? [])
    .find((c) => c.startsWith('tributary_session='))
    ?.split(';')[0]
    .split('=')[1] ?? '';

async function resetLinkFor(email: string): Promise<string> {
  await request(server.app).post('/api/auth/password-reset').send({ email }).expect(204);
  const mail = (await server.capturedMail()).find((m) => m.to === email);
  const token = mail?.text.match(/\/reset-password\/([\w-]+)/)?.[1];
  if (!token) throw new Error(`no reset link mailed to ${email}`);
  return token;
}

describe('sessions', () => {
  it('lists every browser signed in, the current one marked, by a handle that is not the cookie', async () => {
    const { agent: phone, body, me } = await signedUpAgent(server.app);
    const laptop = request.agent(server.app);
    const signedIn = await laptop
      .post('/api/auth/sign-in')
      .set('User-Agent', 'Laptop browser')
      .send({ email: body.email, password: body.password })
      .expect(200);
    const list = sessionListSchema.parse((await laptop.get('/api/auth/sessions').expect(200)).body).sessions;
    expect(list).toHaveLength(2);
    expect(list.filter((s) => s.current).map((s) => s.userAgent)).toEqual(['Laptop browser']);
    const stored = server.db.select().from(sessions).where(eq(sessions.userId, me.user.id)).all();
    for (const row of list) {
      expect(stored.map((s) => s.id)).not.toContain(row.id);
      expect(row.id).not.toBe(cookieValue(signedIn));
      expect(Date.parse(row.expiresAt)).toBeGreaterThan(Date.now());
      expect(row.createdAt).toEqual(expect.any(String));
    }
    const fromPhone = sessionListSchema.parse(
      (await phone.get('/api/auth/sessions').expect(200)).body,
    ).sessions;
    expect(fromPhone.filter((s) => s.current)).toHaveLength(1);
    expect(fromPhone.find((s) => s.current)?.id).not.toBe(list.find((s) => s.current)?.id);
  });

  it('signing out everywhere ends every session of the person, and only theirs', async () => {
    const { agent: phone, body, me } = await signedUpAgent(server.app);
    const { agent: someoneElse } = await signedUpAgent(server.app);
    const laptop = request.agent(server.app);
    await laptop.post('/api/auth/sign-in').send({ email: body.email, password: body.password }).expect(200);
    const res = await laptop.post('/api/auth/sign-out-everywhere').expect(204);
    expect(String(res.headers['set-cookie'])).toMatch(/tributary_session=;/);
    await laptop.get('/api/me').expect(401);
    await phone.get('/api/me').expect(401);
    await someoneElse.get('/api/me').expect(200);
    expect(server.db.select().from(sessions).where(eq(sessions.userId, me.user.id)).all()).toEqual([]);
  });
});

describe('password reset by e-mail', () => {
  it('mails a single-use link; using it sets the password, ends every other session and signs this browser in', async () => {
    const { agent: other, body } = await signedUpAgent(server.app);
    const token = await resetLinkFor(body.email);
    const browser = request.agent(server.app);
    const res = await browser
      .post(`/api/auth/password-reset/${token}`)
      .send({ password: 'a brand new passphrase' })
      .expect(200);
    expect(res.body.user.email).toBe(body.email);
    await browser.get('/api/me').expect(200);
    await other.get('/api/me').expect(401);
    await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: body.email, password: body.password })
      .expect(401);
    await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: body.email, password: 'a brand new passphrase' })
      .expect(200);
    const again = await request(server.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ password: 'yet another passphrase' });
    expect(again.status).toBe(404);
    expect(lines.join('\n')).not.toContain(token);
    expect(lines.join('\n')).toContain('/api/auth/password-reset/:resetToken');
  });

  it('answers an unknown address exactly as a known one, and mails nothing', async () => {
    const { body } = await signedUpAgent(server.app);
    const known = await request(server.app).post('/api/auth/password-reset').send({ email: body.email });
    const unknown = await request(server.app)
      .post('/api/auth/password-reset')
      .send({ email: 'nobody@example.test' });
    expect([known.status, known.text]).toEqual([unknown.status, unknown.text]);
    const resets = (await server.capturedMail()).filter((m) => m.subject === 'Reset your Tributary password');
    expect(resets.map((m) => m.to)).toEqual([body.email]);
  });

  it('an expired link and a link replaced by a newer one do not work', async () => {
    const { body } = await signedUpAgent(server.app);
    const first = await resetLinkFor(body.email);
    const second = await resetLinkFor(body.email);
    await request(server.app)
      .post(`/api/auth/password-reset/${first}`)
      .send({ password: 'a new passphrase one' })
      .expect(404);
    server.db
      .update(authTokens)
      .set({ expiresAt: new Date(Date.now() - 1000).toISOString() })
      .run();
    await request(server.app)
      .post(`/api/auth/password-reset/${second}`)
      .send({ password: 'a new passphrase two' })
      .expect(404);
  });

  it('refuses the e-mail address as the new password, changing nothing', async () => {
    const { body } = await signedUpAgent(server.app);
    const token = await resetLinkFor(body.email);
    const before = databaseDump(server.db);
    const res = await request(server.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ password: body.email.toUpperCase() })
      .expect(400);
    expect(res.body.error.fields).toEqual({ password: ['Use a password that is not your e-mail address'] });
    expect(databaseDump(server.db)).toEqual(before);
  });
});

describe('passwords', () => {
  it('sign-up and accepting an invitation refuse the e-mail address (or its name part) as the password', async () => {
    const email = 'pat.example@example.test';
    for (const password of [email, 'PAT.EXAMPLE@example.test']) {
      const res = await request(server.app).post('/api/auth/sign-up').send(signUpBody({ email, password }));
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual({ password: ['Use a password that is not your e-mail address'] });
    }
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'longname.invitee@example.test', role: 'estimator' });
    const token = (await server.capturedMail())[0].text.match(/\/invite\/([\w-]+)/)?.[1];
    const res = await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Invitee', password: 'longname.invitee' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ password: ['Use a password that is not your e-mail address'] });
  });
});
