import request from 'supertest';
import { count } from 'drizzle-orm';
import { afterEach, describe, expect, it } from 'vitest';
import { users } from '@/db/schema';
import type { AppOptions } from '@/server/app';
import { createTestServer, signUpBody, signedUpAgent, type TestServer } from '@/tests/helpers/server';

let server: TestServer | undefined;
afterEach(() => server?.close());

const LIMITS: Partial<AppOptions> = {
  signInLimit: { windowMs: 60_000, limit: 3 },
  signUpLimit: { windowMs: 60_000, limit: 3 },
};

async function start(options: Partial<AppOptions> = {}): Promise<TestServer> {
  server = await createTestServer({ ...LIMITS, ...options });
  return server;
}

const signIn = (app: TestServer['app'], email: string, password: string, forwardedFor?: string) => {
  const req = request(app).post('/api/auth/sign-in');
  if (forwardedFor) req.set('X-Forwarded-For', forwardedFor);
  return req.send({ email, password });
};

describe('sign-in throttle and X-Forwarded-For', () => {
  it('without TRUST_PROXY, a new X-Forwarded-For on each try does not reset the count', async () => {
    const { app } = await start();
    const { body } = await signedUpAgent(app);
    for (const address of ['203.0.113.1', '203.0.113.2', '203.0.113.3']) {
      await signIn(app, body.email, 'wrong password', address).expect(401);
    }
    const res = await signIn(app, body.email, body.password, '198.51.100.9');
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('rate_limited');
  });

  it('with TRUST_PROXY=loopback, the address the proxy reports is the client and counts alone', async () => {
    const { app } = await start({ trustProxy: 'loopback' });
    const { body } = await signedUpAgent(app);
    for (let attempt = 0; attempt < 3; attempt += 1) {
      await signIn(app, body.email, 'wrong password', '203.0.113.1').expect(401);
    }
    await signIn(app, body.email, body.password, '203.0.113.1').expect(429);
    await signIn(app, body.email, body.password, '203.0.113.2').expect(200);
  });

  it('a proxy that is not the trusted one cannot name the client', async () => {
    const { app } = await start({ trustProxy: '10.1.2.3' });
    const { body } = await signedUpAgent(app);
    for (const address of ['203.0.113.1', '203.0.113.2', '203.0.113.3']) {
      await signIn(app, body.email, 'wrong password', address).expect(401);
    }
    await signIn(app, body.email, body.password, '203.0.113.4').expect(429);
  });
});

describe('sign-up throttle', () => {
  const userCount = () => server?.db.select({ n: count() }).from(users).get()?.n ?? 0;

  it('counts every sign-up from one address, made or refused, and then answers 429 creating nothing', async () => {
    const { app } = await start();
    const taken = signUpBody();
    await request(app).post('/api/auth/sign-up').send(taken).expect(201);
    await request(app).post('/api/auth/sign-up').send(taken).expect(409);
    await request(app)
      .post('/api/auth/sign-up')
      .send({ ...taken, password: 'short' })
      .expect(400);
    const before = userCount();
    const res = await request(app).post('/api/auth/sign-up').send(signUpBody());
    expect(res.status).toBe(429);
    expect(res.body.error).toEqual({
      code: 'rate_limited',
      message: 'Too many sign-ups from this address. Try again in 1 minute.',
      requestId: expect.any(String),
    });
    await request(app)
      .post('/api/auth/sign-up')
      .set('X-Forwarded-For', '203.0.113.8')
      .send(signUpBody())
      .expect(429);
    expect(userCount()).toBe(before);
  });

  it('behind a trusted proxy, each client address has its own count', async () => {
    const { app } = await start({ trustProxy: 1 });
    const from = (address: string) => request(app).post('/api/auth/sign-up').set('X-Forwarded-For', address);
    for (let n = 0; n < 3; n += 1) await from('203.0.113.1').send(signUpBody()).expect(201);
    await from('203.0.113.1').send(signUpBody()).expect(429);
    await from('203.0.113.2').send(signUpBody()).expect(201);
  });
});
