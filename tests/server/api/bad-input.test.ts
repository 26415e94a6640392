import { count } from 'drizzle-orm';
import type { SQLiteTable } from 'drizzle-orm/sqlite-core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import * as schema from '@/db/schema';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId = '';
beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  jobId = (await owner.post('/api/jobs').send({ name: 'Kept as is', stories: 2 }).expect(201)).body.id;
});
afterEach(() => server.close());

const tables: Record<string, SQLiteTable> = {
  organizations: schema.organizations,
  users: schema.users,
  memberships: schema.memberships,
  sessions: schema.sessions,
  invitations: schema.invitations,
  jobs: schema.jobs,
  auditEvents: schema.auditEvents,
  mailOutbox: schema.mailOutbox,
};

function rowCounts(): Record<string, number> {
  return Object.fromEntries(
    Object.entries(tables).map(([name, table]) => [
      name,
      server.db.select({ n: count() }).from(table).get()?.n ?? 0,
    ]),
  );
}

describe('bad input changes nothing', () => {
  const cases: [
    label: string,
    send: () => Promise<{ status: number; body: { error: { fields?: object } } }>,
  ][] = [
    ['job without a name', () => owner.post('/api/jobs').send({ name: '   ' })],
    ['job with a future year', () => owner.post('/api/jobs').send({ name: 'x', yearBuilt: 3000 })],
    ['job with negative snow', () => owner.post('/api/jobs').send({ name: 'x', groundSnowPsf: -5 })],
    ['job with a number as text', () => owner.post('/api/jobs').send({ name: 'x', stories: '2' })],
    ['job patch with 9 stories', () => owner.patch(`/api/jobs/${jobId}`).send({ stories: 9 })],
    ['job patch with an unknown roof', () => owner.patch(`/api/jobs/${jobId}`).send({ roofType: 'dome' })],
    [
      'invitation with a bad e-mail',
      () => owner.post('/api/orgs/current/invitations').send({ email: 'x', role: 'owner' }),
    ],
    [
      'sign-up with a short password',
      () =>
        owner
          .post('/api/auth/sign-up')
          .send({ name: 'n', email: 'n@example.test', password: 'short', firmName: 'f' }),
    ],
  ];

  it.each(cases)('%s: 400 with field messages, no row written', async (_label, send) => {
    const before = rowCounts();
    const res = await send();
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields ?? {}).length).toBeGreaterThan(0);
    expect(rowCounts()).toEqual(before);
    const job = await owner.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body).toMatchObject({ name: 'Kept as is', stories: 2, roofType: 'gable' });
  });

  it('malformed JSON answers 400 in the shared error shape', async () => {
    const before = rowCounts();
    const res = await owner.post('/api/jobs').set('Content-Type', 'application/json').send('{"name": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'bad_request',
        message: 'The request body is not valid JSON',
        requestId: expect.any(String),
      },
    });
    expect(rowCounts()).toEqual(before);
  });
});
