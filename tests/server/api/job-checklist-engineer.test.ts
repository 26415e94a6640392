import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { checklistSchema, jobProgressListSchema, type Checklist } from '@/shared/schemas/job-checklist';
import { ONE_PIXEL_PNG, requestWorld, sampleReply } from '@/tests/helpers/design-requests';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signedUpAgent, type TestServer } from '@/tests/helpers/server';

/** The engineer's "verify in the field" items on the job checklist (issue 10). */

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;
beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
});
afterEach(() => server.close());

const checklist = async (): Promise<Checklist> =>
  checklistSchema.parse((await world.firm.agent.get(`/api/jobs/${world.jobId}/checklist`).expect(200)).body);
const patchItem = (itemId: string, body: object, agent = world.firm.agent, jobId = world.jobId) =>
  agent.patch(`/api/jobs/${jobId}/checklist/engineer/${itemId}`).send(body);
const uploadPhoto = async (requestId: string, agent = world.firm.agent) =>
  (
    await agent
      .post(`/api/requests/${requestId}/attachments`)
      .field('purpose', 'photo')
      .field('caption', 'Joists over the opening, tape across')
      .attach('file', ONE_PIXEL_PNG, 'joists.png')
      .expect(201)
  ).body.id as string;

describe("the engineer's items on the job checklist", () => {
  it('a structured reply puts its field items on the checklist, tied to the version, and progress counts them', async () => {
    expect((await checklist()).engineerItems).toEqual([]);
    const id = await world.sent('in-review');
    await world.reply(id);
    const list = await checklist();
    expect(list.engineerItems).toMatchObject([
      {
        requestId: id,
        requestNumber: 1,
        version: 1,
        item: 'Joist size and spacing over the opening',
        photoAsked: true,
        photos: [],
        state: 'to-do',
        note: '',
        updatedBy: null,
      },
      { item: 'Jack studs bear on the subfloor, not on finish flooring', photoAsked: false, state: 'to-do' },
    ]);
    expect(list.items).toHaveLength(12);
    expect(list.progress.total).toBe(14);
    const progress = jobProgressListSchema.parse((await world.firm.agent.get('/api/job-progress')).body);
    expect(progress.jobs.find((j) => j.jobId === world.jobId)?.progress.total).toBe(14);
  });

  it('sets state and note with who and when; a photo asked for is needed before done (400, nothing changes)', async () => {
    const id = await world.sent('in-review');
    await world.reply(id);
    const [photoItem, plain] = (await checklist()).engineerItems;

    const before = databaseDump(server.db);
    const refused = await patchItem(photoItem.id, { state: 'done' }).expect(400);
    expect(refused.body.error.fields.photoIds[0]).toMatch(/asked for a photo/);
    expect(databaseDump(server.db)).toEqual(before);

    const done = await patchItem(plain.id, { state: 'done', note: 'Checked from below' }).expect(200);
    const setPlain = checklistSchema.parse(done.body).engineerItems[1];
    expect(setPlain).toMatchObject({ state: 'done', note: 'Checked from below' });
    expect(setPlain.updatedByName).toMatch(/Test Person/);
    expect(setPlain.updatedAt).not.toBeNull();

    const photoId = await uploadPhoto(id);
    const withPhoto = await patchItem(photoItem.id, { state: 'done', photoIds: [photoId] }).expect(200);
    expect(checklistSchema.parse(withPhoto.body).engineerItems[0]).toMatchObject({
      state: 'done',
      photos: [{ id: photoId, fileName: 'joists.png', caption: 'Joists over the opening, tape across' }],
    });
    expect(checklistSchema.parse(withPhoto.body).progress.done).toBe(2);
  });

  it("refuses another request's file, the engineer's file, a PDF and an unknown id as photos", async () => {
    const id = await world.sent('in-review');
    await world.reply(id);
    const [photoItem] = (await checklist()).engineerItems;
    const otherRequest = await world.draft();
    const elsewhere = await uploadPhoto(otherRequest);
    const engineerFile = (
      await world.engineer.agent
        .post(`/api/requests/${id}/attachments`)
        .field('purpose', 'design')
        .attach('file', ONE_PIXEL_PNG, 'design.png')
        .expect(201)
    ).body.id as string;
    const pdf = (
      await world.firm.agent
        .post(`/api/requests/${id}/attachments`)
        .field('purpose', 'photo')
        .attach(
          'file',
          Buffer.from('%PDF-1.4\n%âãÏÓ\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n'),
          'plan.pdf',
        )
        .expect(201)
    ).body.id as string;
    for (const photoId of [elsewhere, engineerFile, pdf, 'no-such-file']) {
      const before = databaseDump(server.db);
      const res = await patchItem(photoItem.id, { photoIds: [photoId] }).expect(400);
      expect(res.body.error.fields.photoIds).toHaveLength(1);
      expect(databaseDump(server.db)).toEqual(before);
    }
  });

  it('a new reply keeps what was set on the same item; a reopened request shows the new version only', async () => {
    const id = await world.sent('in-review');
    await world.reply(id);
    const [, plain] = (await checklist()).engineerItems;
    await patchItem(plain.id, { state: 'not-needed', note: 'Slab on grade' }).expect(200);

    await world.designed(id, {
      ...sampleReply(world.memberId),
      verifyInField: [
        { item: 'jack studs bear on the subfloor,  not on finish flooring', photo: false },
        { item: 'Footing under the left post', photo: true },
      ],
    });
    const afterDesign = (await checklist()).engineerItems;
    expect(afterDesign.map((i) => [i.version, i.item, i.state, i.note])).toEqual([
      [1, 'jack studs bear on the subfloor,  not on finish flooring', 'not-needed', 'Slab on grade'],
      [1, 'Footing under the left post', 'to-do', ''],
    ]);

    await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ question: 'Can the left post move 2 ft?' })
      .expect(201);
    // Until the engineer answers version 2, the checklist keeps version 1's answer.
    expect((await checklist()).engineerItems.map((i) => i.version)).toEqual([1, 1]);
    await world.reply(id, {
      ...sampleReply(world.memberId),
      verifyInField: [{ item: 'Footing under the left post', photo: true }],
    });
    const v2 = (await checklist()).engineerItems;
    expect(v2.map((i) => [i.version, i.item])).toEqual([[2, 'Footing under the left post']]);
  });

  it("a declined request's items leave the checklist", async () => {
    const id = await world.sent('in-review');
    await world.reply(id);
    expect((await checklist()).engineerItems).toHaveLength(2);
    await world.engineer.agent
      .post(`/api/requests/${id}/status`)
      .send({ to: 'declined', reason: 'Outside my licence' })
      .expect(200);
    expect((await checklist()).engineerItems).toEqual([]);
  });
});

describe('who may set them', () => {
  it('the engineer 403; another firm 404; an item of another job 404; an archived job 409 — nothing changes', async () => {
    const id = await world.sent('in-review');
    await world.reply(id);
    const [, plain] = (await checklist()).engineerItems;
    const other = await signedUpAgent(server.app);
    const otherJob = await world.firm.agent.post('/api/jobs').send({ name: 'Other job' }).expect(201);
    const before = databaseDump(server.db);

    await world.engineer.agent.get(`/api/jobs/${world.jobId}/checklist`).expect(403);
    await patchItem(plain.id, { state: 'done' }, world.engineer.agent).expect(403);
    await patchItem(plain.id, { state: 'done' }, other.agent).expect(404);
    await patchItem(plain.id, { state: 'done' }, world.firm.agent, otherJob.body.id).expect(404);
    await patchItem('no-such-item', { state: 'done' }).expect(404);
    await patchItem(plain.id, {}).expect(400);
    await patchItem(plain.id, { state: 'finished' }).expect(400);
    await patchItem(plain.id, { photoIds: ['a', 'a'] }).expect(400);
    expect(databaseDump(server.db)).toEqual(before);

    await world.firm.agent.delete(`/api/jobs/${world.jobId}`).expect(204);
    await patchItem(plain.id, { state: 'done' }).expect(409);
  });
});
