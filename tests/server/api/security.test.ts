import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import nodemailer from 'nodemailer';
import request from 'supertest';
import { enqueueMail } from '@/server/services/mail/outbox.repository';
import { afterEach, describe, expect, it } from 'vitest';
import {
  DEV_MAIL_PATH,
  TEST_APP_ORIGIN,
  createTestServer,
  signUpBody,
  signedUpAgent,
  type TestServer,
} from '@/tests/helpers/server';

let server: TestServer | undefined;
afterEach(() => server?.close());

describe('security headers', () => {
  it('sends a CSP the web bundle runs under, and the usual helmet headers', async () => {
    server = await createTestServer();
    const res = await request(server.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ ok: true });
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("style-src 'self' 'unsafe-inline'");
    expect(csp).toContain("img-src 'self' data: blob:");
    expect(csp).toContain("font-src 'self' data:");
    expect(csp).not.toContain('upgrade-insecure-requests');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('in production: HSTS, upgrade-insecure-requests, Secure cookies, and no dev mail route', async () => {
    server = await createTestServer({ production: true });
    const res = await request(server.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    expect(String(res.headers['content-security-policy'])).toContain('upgrade-insecure-requests');
    expect(String(res.headers['set-cookie'])).toMatch(/; Secure/);
    const mail = await request(server.app).get(DEV_MAIL_PATH).expect(404);
    expect(mail.body.error.code).toBe('not_found');
  });
});

describe('origin check', () => {
  it('refuses a cross-site POST with 403 and lets same-origin and app-origin POSTs through', async () => {
    server = await createTestServer();
    const { agent } = await signedUpAgent(server.app);
    const evil = await agent.post('/api/jobs').set('Origin', 'https://evil.example').send({ name: 'CSRF' });
    expect(evil.status).toBe(403);
    expect(evil.body).toEqual({
      error: { code: 'forbidden', message: 'Cross-site request refused', requestId: expect.any(String) },
    });
    const signIn = await request(server.app)
      .post('/api/auth/sign-in')
      .set('Origin', 'null')
      .send({ email: 'a@example.test', password: 'whatever' });
    expect(signIn.status).toBe(403);
    await agent.post('/api/jobs').set('Origin', TEST_APP_ORIGIN).send({ name: 'From the app' }).expect(201);
    const list = await agent.get('/api/jobs').set('Origin', 'https://evil.example').expect(200);
    expect(list.body.jobs.map((j: { name: string }) => j.name)).toEqual(['From the app']);
  });

  it('compares scheme, host and port with APP_ORIGIN, never with the Host the request brought', async () => {
    server = await createTestServer();
    const refused = [
      ['http://tributary.local:8080', 'tributary.local:8080'],
      ['https://tributary.test', 'tributary.test'],
      ['http://tributary.test:8080', 'tributary.test'],
      ['http://tributary.test.evil.example', 'tributary.test'],
      ['http://sub.tributary.test', 'tributary.test'],
      ['null', 'tributary.test'],
      ['not a url', 'tributary.test'],
    ];
    for (const [origin, host] of refused) {
      const res = await request(server.app)
        .post('/api/auth/sign-up')
        .set('Host', host)
        .set('Origin', origin)
        .send(signUpBody());
      expect([origin, res.status]).toEqual([origin, 403]);
    }
    for (const origin of ['http://tributary.test', 'http://TRIBUTARY.test:80']) {
      const res = await request(server.app)
        .post('/api/auth/sign-up')
        .set('Origin', origin)
        .send(signUpBody());
      expect([origin, res.status]).toEqual([origin, 201]);
    }
  });
});

describe('caching', () => {
  it('every API answer, success or error, says Cache-Control: no-store', async () => {
    server = await createTestServer();
    const { agent } = await signedUpAgent(server.app);
    const job = await agent.post('/api/jobs').send({ name: 'Private' }).expect(201);
    const answers = [
      job,
      await agent.get('/api/me').expect(200),
      await agent.get('/api/jobs').expect(200),
      await agent.get(`/api/jobs/${job.body.id}`).expect(200),
      await agent.get('/api/orgs/current/members').expect(200),
      await request(server.app).get('/api/me').expect(401),
      await request(server.app).get('/api/invitations/unknown').expect(404),
      await request(server.app).get('/api/nope').expect(404),
    ];
    for (const res of answers) expect(res.headers['cache-control']).toBe('no-store');
  });
});

describe('routing', () => {
  it('answers unknown /api paths with a JSON 404', async () => {
    server = await createTestServer();
    const res = await request(server.app).get('/api/nope').expect(404);
    expect(res.body).toEqual({
      error: { code: 'not_found', message: 'No such API route', requestId: expect.any(String) },
    });
    await request(server.app).post('/api/nope/deeper').send({}).expect(404);
  });

  it('serves the exported web app with an SPA fallback after the API', async () => {
    const webDir = mkdtempSync(join(tmpdir(), 'tributary-web-'));
    try {
      writeFileSync(join(webDir, 'index.html'), '<!doctype html><title>Tributary</title>');
      writeFileSync(join(webDir, 'app.js'), 'console.log(1)');
      mkdirSync(join(webDir, '_expo/static/js/web'), { recursive: true });
      writeFileSync(join(webDir, '_expo/static/js/web/entry-abc123.js'), 'console.log(2);'.repeat(200));
      server = await createTestServer({ webDir });
      const deep = await request(server.app).get('/jobs/123/members').expect(200);
      expect(deep.headers['content-type']).toMatch(/text\/html/);
      expect(deep.text).toContain('<title>Tributary</title>');
      const asset = await request(server.app).get('/app.js').expect(200);
      expect(asset.text).toBe('console.log(1)');
      expect(asset.headers['cache-control']).toBe('no-cache');
      const hashed = await request(server.app).get('/_expo/static/js/web/entry-abc123.js').expect(200);
      expect(hashed.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      const gzipped = await request(server.app)
        .get('/_expo/static/js/web/entry-abc123.js')
        .set('Accept-Encoding', 'gzip');
      expect(gzipped.headers['content-encoding']).toBe('gzip');
      await request(server.app).get('/api/unknown').expect(404);
    } finally {
      rmSync(webDir, { recursive: true, force: true });
    }
  });

  it('lists captured mail in development, including mail that did not come through the app', async () => {
    server = await createTestServer();
    enqueueMail(server.db, {
      to: 'someone@example.test',
      subject: 'Hello',
      text: 'Body text',
      html: '<p>Body text</p>',
    });
    server.mailer.wake();
    await server.mailer.idle();
    const outside = nodemailer.createTransport({ host: server.smtp.host, port: server.smtp.port });
    await outside.sendMail({
      from: 'x@example.test',
      to: 'other@example.test',
      subject: 'Outside',
      text: 'Raw',
    });
    outside.close();
    const res = await request(server.app).get(DEV_MAIL_PATH).expect(200);
    expect(res.body.messages).toEqual([
      {
        id: expect.any(String),
        to: 'other@example.test',
        subject: 'Outside',
        text: 'Raw\n',
        html: null,
        createdAt: expect.any(String),
      },
      {
        id: expect.any(String),
        to: 'someone@example.test',
        subject: 'Hello',
        text: 'Body text',
        html: '<p>Body text</p>',
        createdAt: expect.any(String),
      },
    ]);
  });
});
