import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@/shared/schemas/auth';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

/**
 * Two contracting firms (A and B), each with an owner, a contractor and an estimator, plus an engineering
 * firm: every role of firm A is tried against firm B's job, and every signed-out route is tried bare.
 */
let server: TestServer;
const people: Record<string, Agent> = {};
let jobOfA = '';
let jobOfB = '';

async function inviteAndAccept(owner: Agent, email: string, role: Role): Promise<Agent> {
  await owner.post('/api/orgs/current/invitations').send({ email, role }).expect(201);
  const mail = server.capturedMail().find((m) => m.to === email);
  const token = mail?.text.match(/\/invite\/([A-Za-z0-9_-]+)/)?.[1];
  const agent = request.agent(server.app);
  await agent
    .post(`/api/invitations/${token}/accept`)
    .send({ name: `${role} person`, password: 'a long enough password' })
    .expect(201);
  return agent;
}

beforeAll(async () => {
  server = await createTestServer();
  for (const firm of ['a', 'b']) {
    const owner = (await signedUpAgent(server.app, { firmName: `Firm ${firm}` })).agent;
    people[`${firm}-owner`] = owner;
    people[`${firm}-contractor`] = await inviteAndAccept(
      owner,
      `contractor.${firm}@example.test`,
      'contractor',
    );
    people[`${firm}-estimator`] = await inviteAndAccept(owner, `estimator.${firm}@example.test`, 'estimator');
  }
  people.engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
  jobOfA = (await people['a-contractor'].post('/api/jobs').send({ name: 'A job' }).expect(201)).body.id;
  jobOfB = (await people['b-estimator'].post('/api/jobs').send({ name: 'B job' }).expect(201)).body.id;
});
afterAll(() => server.close());

const rolesOfA = ['a-owner', 'a-contractor', 'a-estimator'];

describe('organization isolation', () => {
  it.each(rolesOfA)('%s lists only firm A jobs and can read, change and archive them', async (who) => {
    const list = await people[who].get('/api/jobs').expect(200);
    expect(list.body.jobs.map((j: { id: string }) => j.id)).toEqual([jobOfA]);
    await people[who].get(`/api/jobs/${jobOfA}`).expect(200);
    await people[who]
      .patch(`/api/jobs/${jobOfA}`)
      .send({ notes: `edited by ${who}` })
      .expect(200);
  });

  it.each(rolesOfA)(
    '%s gets 404 (never 403, never data) on firm B job for GET, PATCH, DELETE',
    async (who) => {
      const responses = [
        await people[who].get(`/api/jobs/${jobOfB}`),
        await people[who].patch(`/api/jobs/${jobOfB}`).send({ name: 'taken over' }),
        await people[who].delete(`/api/jobs/${jobOfB}`),
      ];
      for (const res of responses) {
        expect(res.status).toBe(404);
        expect(res.body).toEqual({ error: { code: 'not_found', message: 'Job not found' } });
      }
      const stillB = await people['b-owner'].get(`/api/jobs/${jobOfB}`).expect(200);
      expect(stillB.body).toMatchObject({ name: 'B job', archivedAt: null });
    },
  );

  it('an X-Org-Id header naming a firm the user is not in does not open it', async () => {
    const me = await people['b-owner'].get('/api/me').expect(200);
    const res = await people['a-owner'].get(`/api/jobs/${jobOfB}`).set('X-Org-Id', me.body.activeOrgId);
    expect(res.status).toBe(404);
    const list = await people['a-owner'].get('/api/jobs').set('X-Org-Id', me.body.activeOrgId).expect(200);
    expect(list.body.jobs.map((j: { id: string }) => j.id)).toEqual([jobOfA]);
  });

  it('the engineer gets 403 on every jobs route', async () => {
    await people.engineer.get('/api/jobs').expect(403);
    await people.engineer.post('/api/jobs').send({ name: 'not mine' }).expect(403);
    await people.engineer.get(`/api/jobs/${jobOfA}`).expect(403);
    await people.engineer.patch(`/api/jobs/${jobOfA}`).send({ name: 'x' }).expect(403);
    await people.engineer.delete(`/api/jobs/${jobOfA}`).expect(403);
  });

  it('only owners see members; contractors and estimators get 403', async () => {
    await people['a-owner'].get('/api/orgs/current/members').expect(200);
    await people['a-contractor'].get('/api/orgs/current/members').expect(403);
    await people['a-estimator'].get('/api/orgs/current/members').expect(403);
    await people.engineer.get('/api/orgs/current/members').expect(403);
  });
});

describe('signed out', () => {
  const routes: [label: string, method: 'get' | 'post' | 'patch' | 'delete', path: () => string][] = [
    ['GET /api/me', 'get', () => '/api/me'],
    ['GET /api/jobs', 'get', () => '/api/jobs'],
    ['POST /api/jobs', 'post', () => '/api/jobs'],
    ['GET /api/jobs/:jobId', 'get', () => `/api/jobs/${jobOfA}`],
    ['PATCH /api/jobs/:jobId', 'patch', () => `/api/jobs/${jobOfA}`],
    ['DELETE /api/jobs/:jobId', 'delete', () => `/api/jobs/${jobOfA}`],
    ['GET /api/orgs/current/members', 'get', () => '/api/orgs/current/members'],
    ['POST /api/orgs/current/invitations', 'post', () => '/api/orgs/current/invitations'],
    ['DELETE /api/orgs/current/invitations/:id', 'delete', () => '/api/orgs/current/invitations/some-id'],
  ];

  it.each(routes)('%s answers 401', async (_label, method, path) => {
    const res = await request(server.app)[method](path()).send({ name: 'x' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  });
});
