import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { databaseDump } from '@/tests/helpers/db-dump';
import { requestWorld } from '@/tests/helpers/design-requests';
import { SAMPLE_HEADER, SAMPLE_PNG } from '@/tests/helpers/sample-bodies';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

/** Client ids on create and `baseVersion` on edits (docs/sync-protocol.md), for every synced record. */

let server: TestServer;
let owner: Agent;
let firmB: Agent;
beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app, { firmName: 'Firm A' })).agent;
  firmB = (await signedUpAgent(server.app, { firmName: 'Firm B' })).agent;
});
afterEach(() => server.close());

const count = (table: string) =>
  server.db.get<{ n: number }>(sql.raw(`select count(*) as n from ${table}`))?.n ?? -1;
const plan = {
  layout: 'one-side',
  joistSpanAFt: 12,
  studs: { materialId: 'sawn-spruce-pine-fir-no1-no2', studSizeId: '2x4', studSpacingIn: 16, heightFt: 8 },
  standsOn: 'floor-framing-perpendicular',
};

describe('a create with a device-chosen id', () => {
  it('makes the job with that id; sent again: 200 replayed, one row; other content: 409 id_taken', async () => {
    const id = randomUUID();
    const made = await owner.post('/api/jobs').send({ id, name: 'Attic' }).expect(201);
    expect(made.body).toMatchObject({ id, version: 1 });
    const again = await owner.post('/api/jobs').send({ id, name: 'Attic' }).expect(200);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(made.body);
    const other = await owner.post('/api/jobs').send({ id, name: 'Garage' }).expect(409);
    expect(other.body.error.code).toBe('id_taken');
    expect(count('jobs')).toBe(1);
  });

  it('answers 409 id_taken for an id of another firm’s job, and reveals nothing of it', async () => {
    const id = randomUUID();
    await owner.post('/api/jobs').send({ id, name: 'Secret kitchen of firm A' }).expect(201);
    const before = databaseDump(server.db);
    const res = await firmB.post('/api/jobs').send({ id, name: 'Secret kitchen of firm A' }).expect(409);
    expect(res.body.error.code).toBe('id_taken');
    expect(res.text).not.toContain('Secret kitchen');
    expect(res.body.error.current).toBeUndefined();
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('works the same for members, screens, shoring plans and photos', async () => {
    const jobId = (await owner.post('/api/jobs').send({ name: 'Basement' }).expect(201)).body.id;
    const memberId = randomUUID();
    const member = { id: memberId, label: 'H1', input: SAMPLE_HEADER };
    expect((await owner.post(`/api/jobs/${jobId}/members`).send(member).expect(201)).body.id).toBe(memberId);
    await owner.post(`/api/jobs/${jobId}/members`).send(member).expect(200);
    const bJob = (await firmB.post('/api/jobs').send({ name: 'B job' }).expect(201)).body.id;
    const taken = await firmB.post(`/api/jobs/${bJob}/members`).send(member).expect(409);
    expect(taken.body.error.code).toBe('id_taken');
    expect(count('members')).toBe(1);

    const screenId = randomUUID();
    const screen = { id: screenId, wallLabel: 'Kitchen', answers: { sag: { value: 'no', basis: 'seen' } } };
    expect((await owner.post(`/api/jobs/${jobId}/screens`).send(screen).expect(201)).body.version).toBe(1);
    await owner.post(`/api/jobs/${jobId}/screens`).send(screen).expect(200);
    await owner
      .post(`/api/jobs/${jobId}/screens`)
      .send({ ...screen, wallLabel: 'Dining' })
      .expect(409);
    expect(count('bearing_screens')).toBe(1);

    const planId = randomUUID();
    const saved = await owner
      .put(`/api/members/${memberId}/shoring`)
      .send({ ...plan, id: planId })
      .expect(200);
    expect(saved.body.shoring).toMatchObject({ id: planId, version: 1 });
    const replay = await owner
      .put(`/api/members/${memberId}/shoring`)
      .send({ ...plan, id: planId })
      .expect(200);
    expect(replay.headers['idempotent-replayed']).toBe('true');
    expect(replay.body.shoring.version).toBe(1);
    const bMember = (
      await firmB.post(`/api/jobs/${bJob}/members`).send({ label: 'B1', input: SAMPLE_HEADER }).expect(201)
    ).body.id;
    const bPlan = await firmB
      .put(`/api/members/${bMember}/shoring`)
      .send({ ...plan, id: planId })
      .expect(409);
    expect(bPlan.body.error.code).toBe('id_taken');

    const world = await requestWorld(server);
    const requestId = await world.draft();
    const photoId = randomUUID();
    const upload = (caption: string) =>
      world.firm.agent
        .post(`/api/requests/${requestId}/attachments`)
        .field('id', photoId)
        .field('caption', caption)
        .attach('file', SAMPLE_PNG, 'attic.png');
    expect((await upload('Joists').expect(201)).body.id).toBe(photoId);
    expect((await upload('Joists').expect(200)).headers['idempotent-replayed']).toBe('true');
    expect((await upload('Other').expect(409)).body.error.code).toBe('id_taken');
    expect(count('attachments')).toBe(1);
  });

  it('refuses an id that is not a UUID with a 400 at the field', async () => {
    const res = await owner.post('/api/jobs').send({ id: 'my-job', name: 'Attic' }).expect(400);
    expect(res.body.error.fields.id).toHaveLength(1);
    expect(count('jobs')).toBe(0);
  });
});

describe('an edit made on an older version (an out-of-order replay)', () => {
  it('job: 409 version_conflict with the job as GET answers it, and nothing is written', async () => {
    const job = (await owner.post('/api/jobs').send({ name: 'Attic' }).expect(201)).body;
    const edited = await owner
      .patch(`/api/jobs/${job.id}`)
      .send({ name: 'Attic 2', baseVersion: 1 })
      .expect(200);
    expect(edited.body.version).toBe(2);
    const before = databaseDump(server.db);
    const stale = await owner
      .patch(`/api/jobs/${job.id}`)
      .send({ name: 'Attic old', baseVersion: 1 })
      .expect(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(stale.body.error.current).toEqual((await owner.get(`/api/jobs/${job.id}`).expect(200)).body);
    expect(databaseDump(server.db)).toEqual(before);
    // Without baseVersion the write applies, as before (last writer wins).
    expect((await owner.patch(`/api/jobs/${job.id}`).send({ notes: 'x' }).expect(200)).body.version).toBe(3);
  });

  it('member, screen, checklist item and shoring plan: the same, each with its own GET', async () => {
    const jobId = (await owner.post('/api/jobs').send({ name: 'Basement' }).expect(201)).body.id;
    const memberId = (
      await owner.post(`/api/jobs/${jobId}/members`).send({ label: 'H1', input: SAMPLE_HEADER }).expect(201)
    ).body.id;
    await owner.patch(`/api/members/${memberId}`).send({ wall: 'North', baseVersion: 1 }).expect(200);
    let before = databaseDump(server.db);
    const member = await owner
      .patch(`/api/members/${memberId}`)
      .send({ wall: 'South', baseVersion: 1 })
      .expect(409);
    expect(member.body.error.current).toEqual((await owner.get(`/api/members/${memberId}`)).body);
    expect(member.body.error.current.version).toBe(2);
    expect(databaseDump(server.db)).toEqual(before);

    const screenId = (
      await owner
        .post(`/api/jobs/${jobId}/screens`)
        .send({ wallLabel: 'Kitchen', answers: { sag: { value: 'no', basis: 'seen' } } })
        .expect(201)
    ).body.id;
    await owner
      .patch(`/api/screens/${screenId}`)
      .send({ wallLabel: 'Kitchen 2', baseVersion: 1 })
      .expect(200);
    before = databaseDump(server.db);
    const screen = await owner
      .patch(`/api/screens/${screenId}`)
      .send({ wallLabel: 'K3', baseVersion: 1 })
      .expect(409);
    expect(screen.body.error.current).toEqual((await owner.get(`/api/screens/${screenId}`)).body);
    expect(databaseDump(server.db)).toEqual(before);

    const permit = `/api/jobs/${jobId}/checklist/permit`;
    await owner.patch(permit).send({ state: 'done', baseVersion: 0 }).expect(200);
    before = databaseDump(server.db);
    const item = await owner.patch(permit).send({ state: 'to-do', baseVersion: 0 }).expect(409);
    const listed = (await owner.get(`/api/jobs/${jobId}/checklist`)).body.items.find(
      (i: { key: string }) => i.key === 'permit',
    );
    expect(item.body.error.current).toEqual(listed);
    expect(listed).toMatchObject({ state: 'done', version: 1 });
    expect(databaseDump(server.db)).toEqual(before);

    const shoring = `/api/members/${memberId}/shoring`;
    await owner.put(shoring).send(plan).expect(200);
    await owner
      .put(shoring)
      .send({ ...plan, joistSpanAFt: 11, baseVersion: 1 })
      .expect(200);
    before = databaseDump(server.db);
    const stale = await owner
      .put(shoring)
      .send({ ...plan, joistSpanAFt: 10, baseVersion: 1 })
      .expect(409);
    expect(stale.body.error.current).toEqual((await owner.get(shoring)).body.shoring);
    expect(stale.body.error.current.version).toBe(2);
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('a job change that checks its members again moves their versions on', async () => {
    const jobId = (await owner.post('/api/jobs').send({ name: 'Basement' }).expect(201)).body.id;
    const memberId = (
      await owner.post(`/api/jobs/${jobId}/members`).send({ label: 'H1', input: SAMPLE_HEADER }).expect(201)
    ).body.id;
    await owner.patch(`/api/jobs/${jobId}`).send({ buildingWidthFt: 30 }).expect(200);
    expect((await owner.get(`/api/members/${memberId}`).expect(200)).body.version).toBe(2);
  });
});
