import { and, eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { designRequestVersions } from '@/db/schema';
import { requestPackageSchema } from '@/shared/schemas/requests/package';
import { requestDetailSchema, requestVersionSnapshotSchema } from '@/shared/schemas/requests/views';
import { requestWorld } from '@/tests/helpers/design-requests';
import { SAMPLE_HEADER } from '@/tests/helpers/sample-bodies';
import { createTestServer, signedUpAgent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;
beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
});
afterEach(() => server.close());

/** A request sent with the 6 ft header, then revised with the opening at 7 ft (version 2). */
async function sentThenRevised(): Promise<string> {
  const id = await world.sent();
  await world.firm.agent
    .patch(`/api/members/${world.memberId}`)
    .send({ input: { ...SAMPLE_HEADER, clearSpanFt: 7 } })
    .expect(200);
  await world.firm.agent.post(`/api/requests/${id}/revisions`).send({ note: 'Opening is 7 ft' }).expect(201);
  return id;
}

describe('GET /api/requests/:requestId/versions/:version', () => {
  it('gives each sent version as frozen, to the firm and the addressed engineer', async () => {
    const id = await sentThenRevised();
    const v1 = requestVersionSnapshotSchema.parse(
      (await world.engineer.agent.get(`/api/requests/${id}/versions/1`).expect(200)).body,
    );
    const v2 = requestVersionSnapshotSchema.parse(
      (await world.firm.agent.get(`/api/requests/${id}/versions/2`).expect(200)).body,
    );
    expect(v1.snapshot.members[0].input.clearSpanFt).toBe(6);
    expect(v2).toMatchObject({ version: 2, note: 'Opening is 7 ft' });
    expect(v2.snapshot.members[0].input.clearSpanFt).toBe(7);
  });

  it('reads a version that was never sent, a bad number and another firm’s request as missing or refused', async () => {
    const id = await world.sent();
    await world.firm.agent.get(`/api/requests/${id}/versions/2`).expect(404);
    await world.firm.agent.get(`/api/requests/${id}/versions/zero`).expect(400);
    const other = await signedUpAgent(server.app, { firmName: 'Other Remodeling' });
    await other.agent.get(`/api/requests/${id}/versions/1`).expect(404);
  });
});

describe('a change list stored before the lists were worded', () => {
  it('reads in words, made again from the two snapshots, in the detail and the package', async () => {
    const id = await sentThenRevised();
    const worded = requestDetailSchema.parse(
      (await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body,
    ).versions[1].changes;
    // The old shape: dotted paths with raw values, as version 2 would have stored it.
    const legacy = [{ path: 'members.Kitchen header (abcdef12).input.clearSpanFt', before: 6, after: 7 }];
    server.db
      .update(designRequestVersions)
      .set({ changes: legacy as never })
      .where(and(eq(designRequestVersions.requestId, id), eq(designRequestVersions.version, 2)))
      .run();
    const detail = requestDetailSchema.parse(
      (await world.engineer.agent.get(`/api/requests/${id}`).expect(200)).body,
    );
    expect(detail.versions[1].changes).toEqual(worded);
    expect(detail.versions[1].changes).toContainEqual(
      expect.objectContaining({ group: 'Kitchen header', field: 'Clear span', after: `7' 0" (assumed)` }),
    );
    const pkg = requestPackageSchema.parse(
      (await world.engineer.agent.get(`/api/requests/${id}/package.json`).expect(200)).body,
    );
    expect(pkg.changes).toEqual(worded);
  });
});
