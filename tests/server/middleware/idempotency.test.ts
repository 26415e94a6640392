import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { sql } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it, onTestFinished } from 'vitest';
import { idempotencyKeys } from '@/db/schema';
import { IDEMPOTENCY_TTL_MS, sweepKeptWrites } from '@/server/services/idempotency/idempotency-store';
import { createLocalStorage, type FileStorage } from '@/server/services/storage/file-storage';
import { databaseDump } from '@/tests/helpers/db-dump';
import { requestWorld } from '@/tests/helpers/design-requests';
import { SAMPLE_HEADER, SAMPLE_PNG } from '@/tests/helpers/sample-bodies';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

/** A storage whose first `put` fails (a full disk, say), then works: the upload answers 500 once. */
function flakyStorage(dir: string): FileStorage {
  const inner = createLocalStorage(dir);
  let failures = 1;
  return {
    ...inner,
    put: async (bytes) => {
      if (failures > 0) {
        failures -= 1;
        throw new Error('disk full (test)');
      }
      return inner.put(bytes);
    },
  };
}

let server: TestServer;
let owner: Agent;
beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
});
afterEach(() => server.close());

const count = (table: string) =>
  server.db.get<{ n: number }>(sql.raw(`select count(*) as n from ${table}`))?.n ?? -1;
const KEY = 'key-0001-retried-write';

describe('a write retried with the same Idempotency-Key', () => {
  it('makes one job: the retry gets the same 201 answer, marked replayed, and runs nothing', async () => {
    const first = await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' });
    expect(first.status).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const audits = count('audit_events');
    const again = await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' });
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(count('jobs')).toBe(1);
    expect(count('audit_events')).toBe(audits);
  });

  it('makes one member, one screen, one shoring save and one checklist change', async () => {
    const jobId = (await owner.post('/api/jobs').send({ name: 'Basement' }).expect(201)).body.id;
    const twice = async (send: () => Promise<{ status: number; body: unknown }>) => {
      const a = await send();
      const b = await send();
      expect(a.status).toBeLessThan(300);
      expect(b.status).toBe(a.status);
      expect(b.body).toEqual(a.body);
      return a.body as { id?: string; version?: number };
    };
    const member = await twice(() =>
      owner
        .post(`/api/jobs/${jobId}/members`)
        .set('Idempotency-Key', 'member-key-1')
        .send({ label: 'H1', input: SAMPLE_HEADER }),
    );
    expect(count('members')).toBe(1);
    await twice(() =>
      owner
        .post(`/api/jobs/${jobId}/screens`)
        .set('Idempotency-Key', 'screen-key-1')
        .send({ wallLabel: 'Kitchen', answers: { sag: { value: 'no', basis: 'seen' } } }),
    );
    expect(count('bearing_screens')).toBe(1);
    expect(count('bearing_screen_versions')).toBe(1);
    const plan = {
      layout: 'one-side',
      joistSpanAFt: 12,
      studs: {
        materialId: 'sawn-spruce-pine-fir-no1-no2',
        studSizeId: '2x4',
        studSpacingIn: 16,
        heightFt: 8,
      },
      standsOn: 'floor-framing-perpendicular',
    };
    const shoring = (await twice(() =>
      owner.put(`/api/members/${member.id}/shoring`).set('Idempotency-Key', 'shoring-key-1').send(plan),
    )) as { shoring: { version: number } };
    // A second save would have made version 2: the retry ran nothing.
    expect(shoring.shoring.version).toBe(1);
    expect(count('shoring_plans')).toBe(1);
    const edit = () =>
      owner
        .patch(`/api/jobs/${jobId}/checklist/permit`)
        .set('Idempotency-Key', 'checklist-key-1')
        .send({ state: 'done' });
    await twice(edit);
    const item = (await owner.get(`/api/jobs/${jobId}/checklist`).expect(200)).body.items.find(
      (i: { key: string }) => i.key === 'permit',
    );
    expect(item.version).toBe(1);
  });

  it('makes one photo: an upload retried (a new multipart boundary) matches on its fields and bytes', async () => {
    const world = await requestWorld(server);
    const requestId = await world.draft();
    const upload = () =>
      world.firm.agent
        .post(`/api/requests/${requestId}/attachments`)
        .set('Idempotency-Key', 'photo-key-0001')
        .field('caption', 'Joists over the wall')
        .attach('file', SAMPLE_PNG, 'attic.png');
    const first = await upload();
    expect(first.status).toBe(201);
    const again = await upload();
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(count('attachments')).toBe(1);
  });

  it('with another body, path or method: 409 idempotency_key_reused, and nothing changes', async () => {
    await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' }).expect(201);
    const before = databaseDump(server.db);
    const other = await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Garage' });
    expect(other.status).toBe(409);
    expect(other.body.error.code).toBe('idempotency_key_reused');
    const jobId = (await owner.get('/api/jobs').expect(200)).body.jobs[0].id;
    const before2 = databaseDump(server.db);
    expect(before2).toEqual(before);
    const patch = await owner.patch(`/api/jobs/${jobId}`).set('Idempotency-Key', KEY).send({ name: 'Attic' });
    expect(patch.status).toBe(409);
    expect(patch.body.error.code).toBe('idempotency_key_reused');
    expect(databaseDump(server.db)).toEqual(before);
    expect((await owner.get(`/api/jobs/${jobId}`).expect(200)).body.name).toBe('Attic');
  });

  it('keeps a 4xx answer too: the same refused body gets the same 400', async () => {
    const first = await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: '' });
    expect(first.status).toBe(400);
    const again = await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: '' });
    expect(again.status).toBe(400);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body.error.fields).toEqual(first.body.error.fields);
  });

  it('is per person: another person’s write under the same key runs as their own', async () => {
    const other = (await signedUpAgent(server.app)).agent;
    await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' }).expect(201);
    const theirs = await other.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' });
    expect(theirs.status).toBe(201);
    expect(theirs.headers['idempotent-replayed']).toBeUndefined();
    expect(count('jobs')).toBe(2);
  });
});

describe('answers that are not kept', () => {
  it('a 5xx: the retry runs again and makes the one row', async () => {
    await server.close();
    const dir = mkdtempSync(join(tmpdir(), 'tributary-flaky-storage-'));
    onTestFinished(() => rmSync(dir, { recursive: true, force: true }));
    server = await createTestServer({ storage: flakyStorage(dir) });
    const world = await requestWorld(server);
    const requestId = await world.draft();
    const upload = () =>
      world.firm.agent
        .post(`/api/requests/${requestId}/attachments`)
        .set('Idempotency-Key', 'photo-key-5xx')
        .attach('file', SAMPLE_PNG, 'attic.png');
    expect((await upload()).status).toBe(500);
    expect(count('idempotency_keys')).toBe(0);
    const retry = await upload();
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBeUndefined();
    expect(count('attachments')).toBe(1);
  });

  it('a 403 (a role that may not write here) and a 401 (signed out)', async () => {
    const engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
    await engineer.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' }).expect(403);
    await owner.post('/api/auth/sign-out').expect(204);
    await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' }).expect(401);
    expect(count('idempotency_keys')).toBe(0);
  });

  it('refuses a key that is too short or not plain text with a 400 naming the header', async () => {
    for (const key of ['short', 'x'.repeat(101), 'has spaces in it']) {
      const res = await owner.post('/api/jobs').set('Idempotency-Key', key).send({ name: 'Attic' });
      expect(res.status, key).toBe(400);
      expect(res.body.error.fields['Idempotency-Key']).toHaveLength(1);
    }
    expect(count('jobs')).toBe(0);
  });
});

describe('kept answers expire', () => {
  it('after a day: the sweep removes them and the key runs a write again', async () => {
    await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' }).expect(201);
    const dayAgo = new Date(Date.now() - IDEMPOTENCY_TTL_MS - 1000).toISOString();
    server.db.update(idempotencyKeys).set({ createdAt: dayAgo }).run();
    const again = await owner.post('/api/jobs').set('Idempotency-Key', KEY).send({ name: 'Attic' });
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBeUndefined();
    expect(count('jobs')).toBe(2);
    server.db.update(idempotencyKeys).set({ createdAt: dayAgo }).run();
    expect(sweepKeptWrites(server.db, new Date())).toBe(1);
    expect(count('idempotency_keys')).toBe(0);
  });
});
