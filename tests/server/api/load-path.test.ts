import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { evaluateLoadPath } from '@/lib/calc';
import type { MemberCheckInputBody } from '@/shared/schemas/calc/member';
import {
  bearingSavedSchema,
  elementSchema,
  jobLoadPathSchema,
  type BearingSetBody,
  type ElementCreateBody,
  type JobLoadPath,
} from '@/shared/schemas/load-path-elements';
import { memberSchema } from '@/shared/schemas/members';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId: string;

beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  jobId = (await owner.post('/api/jobs').send({ name: 'Load path house' }).expect(201)).body.id;
});
afterEach(() => server.close());

const DFL2 = 'sawn-douglas-fir-larch-no2';

// Invented demo chain: a 12 ft LVL kitchen beam under 12 ft of floor (10 psf dead, 40 psf live: ASCE 7
// Table 4.3-1 dwelling live load), its left end on jack studs over the foundation wall, its right end on a
// 6x6 post down to an old 3-ply 2x10 basement girder of unread grade, mid-span.
const beamInput: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-22',
  clearSpanFt: 12,
  sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
};
const girderInput: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-22',
  clearSpanFt: 12,
  bearingLeftIn: 4,
  bearingRightIn: 4,
  sources: [{ kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 }],
  materialId: DFL2,
  sizeId: '3-ply-2x10',
  gradeUnknown: true,
};
const post = (label: string, heightFt: number): ElementCreateBody => ({
  label,
  element: { kind: 'post', materialId: DFL2, sizeId: '6x6', heightFt },
});

async function addElement(body: ElementCreateBody): Promise<string> {
  const res = await owner.post(`/api/jobs/${jobId}/elements`).send(body).expect(201);
  return elementSchema.parse(res.body).id;
}
const setEnd = (path: string, body: BearingSetBody) => owner.put(`/api/${path}`).send(body);
async function loadPath(): Promise<JobLoadPath> {
  return jobLoadPathSchema.parse((await owner.get(`/api/jobs/${jobId}/load-path`).expect(200)).body);
}
const stateOf = (lp: JobLoadPath, id: string) => lp.result.elements.find((e) => e.id === id)?.state;

/** The chain of the browser test, built through the API: beam → post → girder mid-span; jacks → wall. */
async function buildChain() {
  const beam = (
    await owner
      .post(`/api/jobs/${jobId}/members`)
      .send({ label: 'Kitchen beam', input: beamInput })
      .expect(201)
  ).body.id as string;
  const wall = await addElement({
    label: 'Foundation wall',
    element: { kind: 'foundation-wall', confirmed: true },
  });
  const girder = await addElement({
    label: 'Basement girder',
    element: { kind: 'girder', input: girderInput },
  });
  await setEnd(`elements/${girder}/ends/left`, { ontoId: wall }).expect(200);
  await setEnd(`elements/${girder}/ends/right`, { ontoId: wall }).expect(200);
  const jacks = await setEnd(`members/${beam}/ends/left`, {
    onto: {
      label: 'Jack studs',
      element: {
        kind: 'wall',
        studMaterialId: 'sawn-spruce-pine-fir-no1-no2',
        studSizeId: '2x4',
        jackStuds: 2,
        heightFt: 8,
      },
    },
  }).expect(200);
  const jacksId = bearingSavedSchema.parse(jacks.body).created?.id as string;
  await setEnd(`elements/${jacksId}/ends/bottom`, { ontoId: wall }).expect(200);
  const postRes = await setEnd(`members/${beam}/ends/right`, { onto: post('Post under the beam', 8) }).expect(
    200,
  );
  const postId = bearingSavedSchema.parse(postRes.body).created?.id as string;
  const onGirder = await setEnd(`elements/${postId}/ends/bottom`, {
    ontoId: girder,
    atFt: 6,
    through: 'squash-blocks',
  }).expect(200);
  return { beam, wall, girder, jacksId, postId, saved: bearingSavedSchema.parse(onGirder.body) };
}

describe('creating and changing chains', () => {
  it('a member with nothing under its ends is "load path open", never "passes", on the job page list', async () => {
    const created = memberSchema.parse(
      (
        await owner
          .post(`/api/jobs/${jobId}/members`)
          .send({ label: 'Kitchen beam', input: beamInput })
          .expect(201)
      ).body,
    );
    expect(created.summary).toMatchObject({
      state: 'load-path-open',
      checkState: 'engineer-needed',
      loadPath: {
        closed: false,
        openReasons: ['Left end: say what it bears on.', 'Right end: say what it bears on.'],
      },
    });
    const list = await owner.get(`/api/jobs/${jobId}/members`).expect(200);
    expect(list.body.members[0].summary.state).toBe('load-path-open');
  });

  it('answers the engine’s own evaluation of the stored rows (the route adds no arithmetic)', async () => {
    const { beam } = await buildChain();
    const lp = await loadPath();
    const job = (await owner.get(`/api/jobs/${jobId}`).expect(200)).body;
    const member = memberSchema.parse((await owner.get(`/api/members/${beam}`).expect(200)).body);
    const bearingsOf = (id: string) =>
      lp.bearings.filter((b) => b.fromId === id).map(({ id: _id, fromId: _from, ...b }) => b);
    const again = evaluateLoadPath({
      edition: job.loadStandard,
      nodes: [
        {
          id: beam,
          label: member.label,
          element: { kind: 'member', input: member.input },
          bearings: bearingsOf(beam),
        },
        ...lp.elements.map((e) => ({
          id: e.id,
          label: e.label,
          element: e.element,
          bearings: bearingsOf(e.id),
        })),
      ],
    });
    expect(lp.result.elements.map((e) => [e.label, e.state])).toEqual(
      again.elements.map((e) => [e.label, e.state]),
    );
    expect(lp.result.atGround).toEqual(again.atGround);
    // Equilibrium (engine's own property, here on stored data): everything applied reaches the ground.
    for (const t of ['D', 'L'] as const)
      expect(lp.result.atGround[t]).toBeCloseTo(lp.result.applied[t] ?? NaN, 6);
  });

  it('the girder fails under the post’s point load: "fails" on it, "load path open" above it, with the reason', async () => {
    const { beam, girder, postId, saved } = await buildChain();
    expect(stateOf(saved.loadPath, girder)).toBe('fails');
    expect(stateOf(saved.loadPath, postId)).toBe('load-path-open');
    expect(stateOf(saved.loadPath, beam)).toBe('load-path-open');
    const onGirder = saved.loadPath.result.elements.find((e) => e.id === girder);
    expect(onGirder?.incoming.map((i) => [i.fromLabel, i.atFt])).toEqual([['Post under the beam', 6]]);
    expect(onGirder?.assumptions.join(' ')).toMatch(/weakest grade/);
    const member = memberSchema.parse((await owner.get(`/api/members/${beam}`).expect(200)).body);
    expect(member.summary.state).toBe('load-path-open');
    expect(member.summary.loadPath?.openReasons).toEqual([
      'Right end → Post under the beam: its own load path is open.',
    ]);
  });

  it('a post and pad under the girder (now two spans) close the chain; the beam then shows its own state', async () => {
    const { beam, girder } = await buildChain();
    await owner
      .patch(`/api/elements/${girder}`)
      .send({
        element: {
          kind: 'girder',
          input: { ...girderInput, clearSpanFt: 5.75, secondClearSpanFt: 5.95, centreBearingIn: 5.5 },
        },
      })
      .expect(200);
    const newPost = await setEnd(`elements/${girder}/ends/centre`, {
      onto: post('New post under the girder', 7),
    }).expect(200);
    const newPostId = bearingSavedSchema.parse(newPost.body).created?.id as string;
    const closed = bearingSavedSchema.parse(
      (
        await setEnd(`elements/${newPostId}/ends/bottom`, {
          onto: {
            label: 'New pad',
            element: { kind: 'footing', data: { footing: 'new-pad', confirmed: true } },
          },
        }).expect(200)
      ).body,
    );
    expect(closed.loadPath.result.elements.every((e) => e.state === 'passes')).toBe(true);
    expect(closed.loadPath.result.elements.every((e) => e.closed)).toBe(true);
    const member = memberSchema.parse((await owner.get(`/api/members/${beam}`).expect(200)).body);
    expect(member.summary).toMatchObject({
      state: 'engineer-needed',
      loadPath: { closed: true, openReasons: [] },
    });
  });
});

describe('a change re-checks everything below it', () => {
  it('a heavier beam load raises the load on the post, the girder and the foundation wall', async () => {
    const { beam, girder, postId } = await buildChain();
    const before = await loadPath();
    const liveOn = (lp: JobLoadPath, id: string) =>
      lp.result.elements.find((e) => e.id === id)?.incoming.reduce((sum, i) => sum + (i.load.L ?? 0), 0) ??
      NaN;
    await owner
      .patch(`/api/members/${beam}`)
      .send({
        input: { ...beamInput, sources: [{ kind: 'floor', tributaryFt: 14, deadPsf: 10, livePsf: 40 }] },
      })
      .expect(200);
    const after = await loadPath();
    // Live load on the post: the beam's right reaction, 40 psf × trib × design span / 2 (simple span).
    const span = after.result.elements.find((e) => e.id === beam)?.memberResult?.spans.designSpanFt ?? NaN;
    expect(liveOn(after, postId)).toBeCloseTo((40 * 14 * span) / 2, 6);
    expect(liveOn(after, postId) / liveOn(before, postId)).toBeCloseTo(14 / 12, 9);
    expect(liveOn(after, girder)).toBeCloseTo(liveOn(after, postId), 9);
    expect(after.result.atGround.L).toBeGreaterThan(before.result.atGround.L ?? 0);
  });

  it('deleting the post leaves the beam’s right end open, and its bearings go with it', async () => {
    const { beam, postId } = await buildChain();
    await owner.delete(`/api/elements/${postId}`).expect(204);
    const lp = await loadPath();
    expect(lp.bearings.some((b) => b.fromId === postId || b.ontoId === postId)).toBe(false);
    expect(lp.result.elements.find((e) => e.id === beam)?.openReasons).toContain(
      'Right end: say what it bears on.',
    );
  });
});

describe('refused changes write nothing', () => {
  it('a cycle (A on B on A) is a 400 naming the loop', async () => {
    const a = await addElement(post('Post A', 7));
    const b = await addElement(post('Post B', 7));
    await setEnd(`elements/${a}/ends/bottom`, { ontoId: b }).expect(200);
    const before = databaseDump(server.db);
    const res = await setEnd(`elements/${b}/ends/bottom`, { ontoId: a }).expect(400);
    expect(res.body.error.message).toMatch(/loop.*Post (A|B) → Post (A|B) → Post (A|B)/);
    expect(res.body.error.fields.ontoId[0]).toMatch(/loop/);
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('a landing on a girder with no position, an end the element lacks, and bad element data are 400s', async () => {
    const girder = await addElement({ label: 'Girder', element: { kind: 'girder', input: girderInput } });
    const p = await addElement(post('Post', 7));
    const before = databaseDump(server.db);
    const noPosition = await setEnd(`elements/${p}/ends/bottom`, { ontoId: girder }).expect(400);
    expect(noPosition.body.error.fields.atFt[0]).toMatch(/Say where on Girder/);
    const noCentre = await setEnd(`elements/${girder}/ends/centre`, { ontoId: p }).expect(400);
    expect(noCentre.body.error.message).toMatch(/no centre end/);
    const badPost = await owner
      .post(`/api/jobs/${jobId}/elements`)
      .send({ label: 'Post', element: { kind: 'post', materialId: DFL2, sizeId: '6x6', heightFt: 0 } })
      .expect(400);
    expect(badPost.body.error.fields['element.heightFt'][0]).toMatch(/above 0/);
    const member = await owner
      .post(`/api/jobs/${jobId}/elements`)
      .send({ label: 'Sneaky', element: { kind: 'member', input: beamInput } })
      .expect(400);
    expect(member.body.error.fields['element.kind']).toBeDefined();
    const shortened = await owner
      .patch(`/api/elements/${girder}`)
      .send({ element: { kind: 'post', materialId: DFL2, sizeId: '6x6', heightFt: 7 } })
      .expect(400);
    expect(shortened.body.error.fields['element.kind'][0]).toMatch(/kind of an element stays/);
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('shortening a girder so a post lands off it is refused, naming the element', async () => {
    const { girder } = await buildChain();
    const before = databaseDump(server.db);
    const res = await owner
      .patch(`/api/elements/${girder}`)
      .send({ element: { kind: 'girder', input: { ...girderInput, clearSpanFt: 5 } } })
      .expect(400);
    expect(res.body.error.fields.element).toBeDefined();
    expect(databaseDump(server.db)).toEqual(before);
  });
});

describe('role and firm rules', () => {
  it('another firm gets 404 on the job, its elements and its ends; nothing changes', async () => {
    const { beam, postId } = await buildChain();
    const other = (await signedUpAgent(server.app)).agent;
    const before = databaseDump(server.db);
    const answers = [
      await other.get(`/api/jobs/${jobId}/load-path`),
      await other.get(`/api/jobs/${jobId}/elements`),
      await other.post(`/api/jobs/${jobId}/elements`).send(post('Theirs', 7)),
      await other.get(`/api/elements/${postId}`),
      await other.patch(`/api/elements/${postId}`).send({ label: 'Taken' }),
      await other.delete(`/api/elements/${postId}`),
      await other.put(`/api/members/${beam}/ends/left`).send({ ontoId: postId }),
      await other.delete(`/api/members/${beam}/ends/left`),
    ];
    expect(answers.map((r) => r.status)).toEqual([404, 404, 404, 404, 404, 404, 404, 404]);
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('bearing on another firm’s element is refused as not in this job', async () => {
    const beam = (
      await owner.post(`/api/jobs/${jobId}/members`).send({ label: 'Beam', input: beamInput }).expect(201)
    ).body.id;
    const other = (await signedUpAgent(server.app)).agent;
    const theirJob = (await other.post('/api/jobs').send({ name: 'Theirs' }).expect(201)).body.id;
    const theirPost = (await other.post(`/api/jobs/${theirJob}/elements`).send(post('Theirs', 7)).expect(201))
      .body.id;
    const res = await setEnd(`members/${beam}/ends/left`, { ontoId: theirPost }).expect(400);
    expect(res.body.error.fields.ontoId[0]).toMatch(/not in this job/);
  });

  it('an engineer gets 403', async () => {
    const engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
    await engineer.get(`/api/jobs/${jobId}/load-path`).expect(403);
    await engineer.post(`/api/jobs/${jobId}/elements`).send(post('Post', 7)).expect(403);
  });

  it('an archived job’s load path reads and cannot change (409)', async () => {
    const { beam, postId } = await buildChain();
    await owner.delete(`/api/jobs/${jobId}`).expect(204);
    await owner.get(`/api/jobs/${jobId}/load-path`).expect(200);
    const answers = [
      await owner.post(`/api/jobs/${jobId}/elements`).send(post('Late', 7)),
      await owner.patch(`/api/elements/${postId}`).send({ label: 'Late' }),
      await owner.delete(`/api/elements/${postId}`),
      await setEnd(`members/${beam}/ends/left`, { ontoId: postId }),
      await owner.delete(`/api/members/${beam}/ends/left`),
    ];
    expect(answers.map((r) => r.status)).toEqual([409, 409, 409, 409, 409]);
  });

  it('signed out: 401', async () => {
    await request(server.app).get(`/api/jobs/${jobId}/load-path`).expect(401);
  });
});
