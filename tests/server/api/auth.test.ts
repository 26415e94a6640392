import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { sessions, users } from '@/db/schema';
import { meSchema } from '@/shared/schemas/auth';
import { apiErrorBodySchema } from '@/shared/errors';
import { createTestServer, signUpBody, signedUpAgent, type TestServer } from '@/tests/helpers/server';
import { ADDRESS_LIMIT_MULTIPLE } from '@/server/middleware/auth-limits';

let server: TestServer;
beforeEach(async () => {
  server = await createTestServer({ signInLimit: { windowMs: 60_000, limit: 3 } });
});
afterEach(() => server.close());

const cookieOf = (res: request.Response): string => {
  const header = res.headers['set-cookie'] as unknown as string[] | undefined;
  return header?.find((c) => c.startsWith('tributary_session=')) ?? '';
};

describe('POST /api/auth/sign-up', () => {
  it('creates the user and a contracting firm with the user as owner, and sets an httpOnly Lax cookie', async () => {
    const body = signUpBody({ email: '  New.Owner@Example.TEST ' });
    const res = await request(server.app).post('/api/auth/sign-up').send(body).expect(201);
    const me = meSchema.parse(res.body);
    expect(me.user.email).toBe('new.owner@example.test');
    expect(me.role).toBe('owner');
    expect(me.memberships).toEqual([
      { orgId: me.activeOrgId, orgName: body.firmName, orgKind: 'contracting', role: 'owner' },
    ]);
    const cookie = cookieOf(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const stored = server.db.select().from(users).where(eq(users.id, me.user.id)).get();
    expect(stored?.passwordHash.startsWith('scrypt$')).toBe(true);
    expect(stored?.passwordHash).not.toContain(body.password);
  });

  it('makes the user an engineer of a new engineering firm', async () => {
    const res = await request(server.app)
      .post('/api/auth/sign-up')
      .send(signUpBody({ firmKind: 'engineering' }))
      .expect(201);
    expect(res.body.role).toBe('engineer');
    expect(res.body.memberships[0].orgKind).toBe('engineering');
  });

  it('answers bad input with 400 and a message per field', async () => {
    const res = await request(server.app)
      .post('/api/auth/sign-up')
      .send({ name: '', email: 'not-an-email', password: 'short', firmName: '', firmKind: 'bakery' })
      .expect(400);
    const { error } = apiErrorBodySchema.parse(res.body);
    expect(error.code).toBe('bad_request');
    expect(error.fields).toEqual({
      name: ['Enter your name'],
      email: ['Enter a valid e-mail address'],
      password: ['Use at least 10 characters'],
      firmName: ['Enter your firm’s name'],
      firmKind: [expect.any(String)],
    });
  });

  it('refuses a second account with the same e-mail (any case) with 409', async () => {
    const body = signUpBody();
    await request(server.app).post('/api/auth/sign-up').send(body).expect(201);
    const res = await request(server.app)
      .post('/api/auth/sign-up')
      .send({ ...body, email: body.email.toUpperCase() })
      .expect(409);
    expect(res.body.error.code).toBe('conflict');
    expect(res.body.error.fields.email).toEqual(['An account with this e-mail already exists']);
  });
});

describe('POST /api/auth/sign-in', () => {
  it('signs in with the right password (e-mail in any case) and answers Me', async () => {
    const { body } = await signedUpAgent(server.app);
    const agent = request.agent(server.app);
    const res = await agent
      .post('/api/auth/sign-in')
      .send({ email: body.email.toUpperCase(), password: body.password })
      .expect(200);
    expect(meSchema.parse(res.body).user.email).toBe(body.email);
    expect(cookieOf(res)).toMatch(/^tributary_session=\w+/);
    await agent.get('/api/me').expect(200);
  });

  it('gives the same 401 for a wrong password and an unknown e-mail', async () => {
    const { body } = await signedUpAgent(server.app);
    const wrong = await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: body.email, password: 'not the password' })
      .expect(401);
    const unknown = await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@example.test', password: 'not the password' })
      .expect(401);
    expect(wrong.body).toEqual({
      error: { code: 'unauthorized', message: 'E-mail or password is wrong', requestId: expect.any(String) },
    });
    expect(unknown.body).toEqual({ error: { ...wrong.body.error, requestId: unknown.body.error.requestId } });
    expect(cookieOf(wrong)).toBe('');
  });

  it('answers 429 once failed attempts for an e-mail pass the limit, even with the right password', async () => {
    const { body } = await signedUpAgent(server.app);
    for (let attempt = 0; attempt < 3; attempt += 1) {
      await request(server.app)
        .post('/api/auth/sign-in')
        .send({ email: body.email, password: 'wrong one' })
        .expect(401);
    }
    const limited = await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: body.email, password: body.password })
      .expect(429);
    expect(limited.body.error.code).toBe('rate_limited');
    await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: 'someone.else@example.test', password: 'wrong one' })
      .expect(401);
  });
  it('answers 429 when one address fails across many e-mails', async () => {
    // The test server allows 3 failures per e-mail, so 30 per address (ADDRESS_LIMIT_MULTIPLE = 10).
    for (let attempt = 0; attempt < 3 * ADDRESS_LIMIT_MULTIPLE; attempt += 1) {
      await request(server.app)
        .post('/api/auth/sign-in')
        .send({ email: `spray-${attempt}@example.test`, password: 'wrong one' })
        .expect(401);
    }
    const limited = await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: 'spray-last@example.test', password: 'wrong one' })
      .expect(429);
    expect(limited.body.error.code).toBe('rate_limited');
  });
});

describe('sessions', () => {
  it('signs out with 204, blanks the cookie, and the old session no longer works', async () => {
    const { agent, me } = await signedUpAgent(server.app);
    await agent.get('/api/me').expect(200);
    const res = await agent.post('/api/auth/sign-out').expect(204);
    expect(cookieOf(res)).toMatch(/tributary_session=;/);
    await agent.get('/api/me').expect(401);
    expect(server.db.select().from(sessions).where(eq(sessions.userId, me.user.id)).all()).toHaveLength(0);
  });

  it('refuses an expired session with 401 and blanks its cookie', async () => {
    const { agent, me } = await signedUpAgent(server.app);
    const pastUnixSeconds = Math.floor(Date.now() / 1000) - 60;
    server.db
      .update(sessions)
      .set({ expiresAt: pastUnixSeconds })
      .where(eq(sessions.userId, me.user.id))
      .run();
    const res = await agent.get('/api/me').expect(401);
    expect(res.body.error.code).toBe('unauthorized');
    expect(cookieOf(res)).toMatch(/tributary_session=;/);
  });

  it('extends a session in its second half (sliding expiry) and sends a fresh cookie', async () => {
    const { agent, me } = await signedUpAgent(server.app);
    const dayS = 24 * 60 * 60;
    const soon = Math.floor(Date.now() / 1000) + 10 * dayS;
    server.db.update(sessions).set({ expiresAt: soon }).where(eq(sessions.userId, me.user.id)).run();
    const res = await agent.get('/api/me').expect(200);
    expect(cookieOf(res)).toMatch(/Max-Age=2592000/);
    const [row] = server.db.select().from(sessions).where(eq(sessions.userId, me.user.id)).all();
    expect(row.expiresAt).toBeGreaterThan(soon + 19 * dayS);
  });

  it('answers 401 on /api/me without a session', async () => {
    const res = await request(server.app).get('/api/me').expect(401);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('unauthorized');
  });
});

describe('signing in again', () => {
  it('ends the session the browser already had', async () => {
    const { agent, body, me } = await signedUpAgent(server.app);
    const [first] = server.db.select().from(sessions).where(eq(sessions.userId, me.user.id)).all();
    await agent.post('/api/auth/sign-in').send({ email: body.email, password: body.password }).expect(200);
    const rows = server.db.select().from(sessions).where(eq(sessions.userId, me.user.id)).all();
    expect(rows).toHaveLength(1);
    expect(rows[0].id).not.toBe(first.id);
    await agent.get('/api/me').expect(200);
  });
});
