import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signedUpAgent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
beforeEach(async () => {
  server = await createTestServer();
});
afterEach(() => server.close());

async function confirmationTokens(email: string): Promise<string[]> {
  return (await server.capturedMail())
    .filter((m) => m.to === email && m.subject === 'Confirm your e-mail address for Tributary')
    .map((m) => m.text.match(/\/verify-email\/([\w-]+)/)?.[1] ?? '');
}

describe('e-mail verification', () => {
  it('sign-up mails a link; until it is followed the person can look around but not invite', async () => {
    const { agent, body, me } = await signedUpAgent(server.app, {}, { confirmed: false });
    expect((me.user as { emailVerified?: boolean }).emailVerified).toBe(false);
    await agent.get('/api/jobs').expect(200);
    await agent.post('/api/jobs').send({ name: 'Looking around' }).expect(201);
    const before = databaseDump(server.db);
    const refused = await agent
      .post('/api/orgs/current/invitations')
      .send({ email: 'crew@example.test', role: 'contractor' })
      .expect(403);
    expect(refused.body.error.message).toMatch(/^Confirm your e-mail address first/);
    expect(databaseDump(server.db)).toEqual(before);

    const [token] = await confirmationTokens(body.email);
    await request(server.app).post(`/api/auth/verify-email/${token}`).expect(204);
    expect((await agent.get('/api/me').expect(200)).body.user.emailVerified).toBe(true);
    await agent
      .post('/api/orgs/current/invitations')
      .send({ email: 'crew@example.test', role: 'contractor' })
      .expect(201);
    await request(server.app).post(`/api/auth/verify-email/${token}`).expect(404);
  });

  it('a new link voids the older one; a confirmed person gets no more links', async () => {
    const { agent, body } = await signedUpAgent(server.app, {}, { confirmed: false });
    await agent.post('/api/auth/verify-email').expect(204);
    const [newer, older] = await confirmationTokens(body.email);
    await request(server.app).post(`/api/auth/verify-email/${older}`).expect(404);
    await request(server.app).post(`/api/auth/verify-email/${newer}`).expect(204);
    await agent.post('/api/auth/verify-email').expect(204);
    expect(await confirmationTokens(body.email)).toHaveLength(2);
    await request(server.app).post('/api/auth/verify-email').expect(401);
  });

  it('joining through an e-mailed invitation confirms the address', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'joined@example.test', role: 'owner' })
      .expect(201);
    const invite = (await server.capturedMail()).find((m) => m.to === 'joined@example.test');
    const token = invite?.text.match(/\/invite\/([\w-]+)/)?.[1];
    const joined = await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Joined Person', password: 'a long enough password' })
      .expect(201);
    expect(joined.body.user.emailVerified).toBe(true);
  });
});
