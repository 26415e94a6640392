import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { checklistSchema, jobProgressListSchema, type Checklist } from '@/shared/schemas/job-checklist';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;

beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
});
afterEach(() => server.close());

const newJob = async (yearBuilt: number | null) =>
  (
    await owner
      .post('/api/jobs')
      .send({ name: `Job ${yearBuilt}`, yearBuilt })
      .expect(201)
  ).body.id as string;
const checklist = async (jobId: string): Promise<Checklist> =>
  checklistSchema.parse((await owner.get(`/api/jobs/${jobId}/checklist`).expect(200)).body);
const item = (list: Checklist, key: string) => list.items.find((i) => i.key === key);

// EPA Renovation, Repair and Painting rule (40 CFR 745): lead-safe practice for housing built before 1978.
describe('lead-safe practice is raised by the year built', () => {
  it.each([
    [1957, 'to-do', true, /Built in 1957, before 1978/],
    [null, 'to-do', true, /Year built unknown/],
    [1977, 'to-do', true, /before 1978/],
    [1978, 'not-needed', false, /in or after 1978/],
    [1995, 'not-needed', false, /in or after 1978/],
  ] as const)('built %s → %s (raised %s)', async (year, state, raised, because) => {
    const lead = item(await checklist(await newJob(year)), 'lead-safe');
    expect(lead).toMatchObject({ state, raised, updatedBy: null });
    expect(lead?.because).toMatch(because);
  });
});

describe('the checklist', () => {
  it('lists every item of the trade with its starting state and progress', async () => {
    const list = await checklist(await newJob(1957));
    expect(list.items.map((i) => i.key)).toEqual([
      'utilities-electrical',
      'utilities-plumbing',
      'utilities-ducts',
      'utilities-gas',
      'lead-safe',
      'asbestos',
      'permit',
      'engineer-design',
      'shoring',
      'footing-inspection',
      'framing-inspection',
      'final-inspection',
    ]);
    expect(list.progress).toEqual({ done: 0, notNeeded: 0, toDo: 12, total: 12 });
  });

  it('PATCH sets the state and note, with who and when, and the progress follows', async () => {
    const jobId = await newJob(1957);
    const res = await owner
      .patch(`/api/jobs/${jobId}/checklist/permit`)
      .send({ state: 'done', note: 'Permit B-1042 posted' })
      .expect(200);
    const list = checklistSchema.parse(res.body);
    expect(item(list, 'permit')).toMatchObject({ state: 'done', note: 'Permit B-1042 posted' });
    expect(item(list, 'permit')?.updatedByName).toMatch(/Test Person/);
    expect(item(list, 'permit')?.updatedAt).not.toBeNull();
    await owner.patch(`/api/jobs/${jobId}/checklist/utilities-gas`).send({ state: 'not-needed' }).expect(200);
    const note = await owner.patch(`/api/jobs/${jobId}/checklist/permit`).send({ note: 'Final' }).expect(200);
    expect(item(checklistSchema.parse(note.body), 'permit')).toMatchObject({ state: 'done', note: 'Final' });
    expect((await checklist(jobId)).progress).toEqual({ done: 1, notNeeded: 1, toDo: 10, total: 12 });
    const progress = jobProgressListSchema.parse((await owner.get('/api/job-progress').expect(200)).body);
    expect(progress.jobs).toEqual([
      { jobId, progress: { done: 1, notNeeded: 1, toDo: 10, total: 12 }, engineerNeeded: false },
    ]);
  });

  it('a raised lead-safe item set "not needed" must say why (400 at the note), nothing changes', async () => {
    const jobId = await newJob(1950);
    const res = await owner
      .patch(`/api/jobs/${jobId}/checklist/lead-safe`)
      .send({ state: 'not-needed' })
      .expect(400);
    expect(res.body.error.fields.note[0]).toMatch(/Say why/);
    expect(item(await checklist(jobId), 'lead-safe')?.state).toBe('to-do');
    await owner
      .patch(`/api/jobs/${jobId}/checklist/lead-safe`)
      .send({ state: 'not-needed', note: 'Certified renovator test: no lead-based paint' })
      .expect(200);
  });

  it('an engineer-required screen raises the engineer’s design item and marks the job', async () => {
    const jobId = await newJob(1990);
    await owner
      .post(`/api/jobs/${jobId}/screens`)
      .send({ wallLabel: 'Living / dining', answers: { bracedWall: { value: 'yes', basis: 'seen' } } })
      .expect(201);
    const design = item(await checklist(jobId), 'engineer-design');
    expect(design).toMatchObject({ state: 'to-do', raised: true });
    expect(design?.because).toMatch(/Living \/ dining/);
    const progress = jobProgressListSchema.parse((await owner.get('/api/job-progress')).body);
    expect(progress.jobs[0].engineerNeeded).toBe(true);
  });

  it.each([
    ['an unknown state', 'permit', { state: 'maybe' }, 'state'],
    ['an empty body', 'permit', {}, '_'],
    ['a note over 500 characters', 'permit', { note: 'x'.repeat(501) }, 'note'],
    ['an unknown item', 'roof-color', { state: 'done' }, 'itemKey'],
  ])('%s: 400', async (_what, key, body, field) => {
    const jobId = await newJob(1990);
    const res = await owner.patch(`/api/jobs/${jobId}/checklist/${key}`).send(body).expect(400);
    expect(Object.keys(res.body.error.fields ?? { _: [] })).toContain(field);
    expect((await checklist(jobId)).progress.done).toBe(0);
  });
});

describe('roles, firms and archived jobs', () => {
  it('another firm gets 404, an engineer 403, an archived job 409', async () => {
    const jobId = await newJob(1990);
    const other = (await signedUpAgent(server.app)).agent;
    await other.get(`/api/jobs/${jobId}/checklist`).expect(404);
    await other.patch(`/api/jobs/${jobId}/checklist/permit`).send({ state: 'done' }).expect(404);
    expect((await other.get('/api/job-progress').expect(200)).body.jobs).toEqual([]);
    const engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
    await engineer.get(`/api/jobs/${jobId}/checklist`).expect(403);
    await engineer.get('/api/job-progress').expect(403);
    await owner.delete(`/api/jobs/${jobId}`).expect(204);
    await owner.get(`/api/jobs/${jobId}/checklist`).expect(200);
    await owner.patch(`/api/jobs/${jobId}/checklist/permit`).send({ state: 'done' }).expect(409);
    expect((await checklist(jobId)).progress.done).toBe(0);
  });
});
