import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@/shared/schemas/auth';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

/**
 * Two contracting firms (A and B), each with an owner, a contractor and an estimator, plus an engineering
 * firm: every role of firm A is tried against firm B's job and member, and every signed-out route is tried
 * bare.
 */
let server: TestServer;
const people: Record<string, Agent> = {};
let jobOfA = '';
let jobOfB = '';
let memberOfA = '';
let memberOfB = '';

/** Invented demo header: 2-ply 2x10 Douglas Fir-Larch No.2 over 6 ft under 12 ft of roof. */
const header = {
  label: 'Hall header',
  input: {
    kind: 'header',
    edition: 'ASCE 7-22',
    clearSpanFt: 6,
    sources: [{ kind: 'roof', tributaryFt: 12, deadPsf: 15, roofLivePsf: 20 }],
    materialId: 'sawn-douglas-fir-larch-no2',
    sizeId: '2-ply-2x10',
  },
};

async function inviteAndAccept(owner: Agent, email: string, role: Role): Promise<Agent> {
  await owner.post('/api/orgs/current/invitations').send({ email, role }).expect(201);
  const mail = (await server.capturedMail()).find((m) => m.to === email);
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
  memberOfA = (await people['a-owner'].post(`/api/jobs/${jobOfA}/members`).send(header).expect(201)).body.id;
  memberOfB = (await people['b-contractor'].post(`/api/jobs/${jobOfB}/members`).send(header).expect(201)).body
    .id;
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
        expect(res.body).toEqual({
          error: { code: 'not_found', message: 'Job not found', requestId: expect.any(String) },
        });
      }
      const stillB = await people['b-owner'].get(`/api/jobs/${jobOfB}`).expect(200);
      expect(stillB.body).toMatchObject({ name: 'B job', archivedAt: null });
    },
  );

  it.each(rolesOfA)('%s reads, lists, adds, changes and deletes firm A members', async (who) => {
    await people[who].get(`/api/members/${memberOfA}`).expect(200);
    const list = await people[who].get(`/api/jobs/${jobOfA}/members`).expect(200);
    expect(list.body.members.map((m: { id: string }) => m.id)).toContain(memberOfA);
    await people[who]
      .patch(`/api/members/${memberOfA}`)
      .send({ wall: `edited by ${who}` })
      .expect(200);
    const added = await people[who]
      .post(`/api/jobs/${jobOfA}/members`)
      .send({ ...header, label: `added by ${who}` })
      .expect(201);
    await people[who].delete(`/api/members/${added.body.id}`).expect(204);
  });

  it.each(rolesOfA)(
    '%s gets 404 (never 403, never data) on firm B members and on firm B job members',
    async (who) => {
      const memberResponses = [
        await people[who].get(`/api/members/${memberOfB}`),
        await people[who].patch(`/api/members/${memberOfB}`).send({ label: 'taken over' }),
        await people[who].delete(`/api/members/${memberOfB}`),
      ];
      for (const res of memberResponses) {
        expect(res.status).toBe(404);
        expect(res.body).toEqual({
          error: { code: 'not_found', message: 'Member not found', requestId: expect.any(String) },
        });
      }
      const jobResponses = [
        await people[who].get(`/api/jobs/${jobOfB}/members`),
        await people[who].post(`/api/jobs/${jobOfB}/members`).send(header),
      ];
      for (const res of jobResponses) {
        expect(res.status).toBe(404);
        expect(res.body).toEqual({
          error: { code: 'not_found', message: 'Job not found', requestId: expect.any(String) },
        });
      }
      const stillB = await people['b-owner'].get(`/api/members/${memberOfB}`).expect(200);
      expect(stillB.body).toMatchObject({ label: 'Hall header', jobId: jobOfB });
      const listB = await people['b-owner'].get(`/api/jobs/${jobOfB}/members`).expect(200);
      expect(listB.body.members.map((m: { id: string }) => m.id)).toEqual([memberOfB]);
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

  it('the engineer gets 403 on every members route', async () => {
    await people.engineer.get(`/api/jobs/${jobOfA}/members`).expect(403);
    await people.engineer.post(`/api/jobs/${jobOfA}/members`).send(header).expect(403);
    await people.engineer.get(`/api/members/${memberOfA}`).expect(403);
    await people.engineer.patch(`/api/members/${memberOfA}`).send({ label: 'x' }).expect(403);
    await people.engineer.delete(`/api/members/${memberOfA}`).expect(403);
    await people['a-owner'].get(`/api/members/${memberOfA}`).expect(200);
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
    ['GET /api/jobs/:jobId/members', 'get', () => `/api/jobs/${jobOfA}/members`],
    ['POST /api/jobs/:jobId/members', 'post', () => `/api/jobs/${jobOfA}/members`],
    ['GET /api/members/:memberId', 'get', () => `/api/members/${memberOfA}`],
    ['PATCH /api/members/:memberId', 'patch', () => `/api/members/${memberOfA}`],
    ['DELETE /api/members/:memberId', 'delete', () => `/api/members/${memberOfA}`],
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
