import { count } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { bearingScreenVersions, bearingScreens } from '@/db/schema';
import { ENGINE_VERSION, screenWall } from '@/lib/calc';
import type { ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';
import {
  screenListSchema,
  screenSchema,
  screenWithHistorySchema,
  type Screen,
} from '@/shared/schemas/bearing-screens';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId: string;

beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  jobId = (await owner.post('/api/jobs').send({ name: 'Test bungalow', yearBuilt: 1924 }).expect(201)).body
    .id;
});
afterEach(() => server.close());

const seen = (value: string) => ({ value, basis: 'seen' });

/** An interior wall under an attic with every answer seen and none pointing to load (invented example). */
const nonbearing = {
  exterior: seen('no'),
  above: seen('attic'),
  joistDirection: { ...seen('parallel'), from: 'above' },
  furring: seen('no'),
  beamAbove: seen('no'),
  hiddenPost: seen('no'),
  purlinBraces: seen('no'),
  wallAbove: seen('no'),
  below: seen('joists-only'),
  ridge: seen('board'),
  ceilingJoistsTie: seen('no'),
  bracedWall: seen('no'),
  sag: seen('no'),
} as ScreenAnswers;

async function create(wallLabel: string, answers: unknown): Promise<Screen> {
  const res = await owner.post(`/api/jobs/${jobId}/screens`).send({ wallLabel, answers }).expect(201);
  return screenSchema.parse(res.body);
}

const screenCount = () => server.db.select({ n: count() }).from(bearingScreens).get()?.n;

describe('bearing screens: create, read, list, update with history', () => {
  it('stores the server’s own outcome, whatever the client thinks', async () => {
    const created = await create('Hall / kitchen', nonbearing);
    expect(created).toMatchObject({ jobId, wallLabel: 'Hall / kitchen', outcome: 'likely-nonbearing' });
    expect(created.version).toBe(1);
    expect(created.engineVersion).toBe(ENGINE_VERSION);
    expect(created.result).toEqual(JSON.parse(JSON.stringify(screenWall(nonbearing))));
    const read = screenWithHistorySchema.parse((await owner.get(`/api/screens/${created.id}`)).body);
    expect(read.history).toEqual([]);
    expect(read.updatedByName).toMatch(/Test Person/);
  });

  it('ceiling joists tying the rafters: engineer required, and the job is marked engineer needed', async () => {
    await create('Hall / kitchen', nonbearing);
    const tied = await create('Living / dining', { ...nonbearing, ceilingJoistsTie: seen('yes') });
    expect(tied.outcome).toBe('engineer-required');
    const list = screenListSchema.parse((await owner.get(`/api/jobs/${jobId}/screens`).expect(200)).body);
    expect(list.screens.map((s) => s.wallLabel)).toEqual(['Hall / kitchen', 'Living / dining']);
    expect(list.engineerNeeded.needed).toBe(true);
    expect(list.engineerNeeded.reasons).toHaveLength(1);
    expect(list.engineerNeeded.reasons[0]).toMatchObject({ screenId: tied.id, wallLabel: 'Living / dining' });
    expect(list.engineerNeeded.reasons[0].reason).toMatch(/Roof thrust/);
  });

  it('PATCH screens again, bumps the version and keeps the earlier one in the history', async () => {
    const created = await create('Hall / kitchen', nonbearing);
    const res = await owner
      .patch(`/api/screens/${created.id}`)
      .send({ answers: { ...nonbearing, sag: seen('yes') } })
      .expect(200);
    const patched = screenSchema.parse(res.body);
    expect(patched).toMatchObject({ version: 2, outcome: 'engineer-required', wallLabel: 'Hall / kitchen' });
    const renamed = await owner.patch(`/api/screens/${created.id}`).send({ wallLabel: 'Hall' }).expect(200);
    expect(renamed.body).toMatchObject({ version: 3, outcome: 'engineer-required' });
    const read = screenWithHistorySchema.parse((await owner.get(`/api/screens/${created.id}`)).body);
    expect(read.history.map((v) => [v.version, v.outcome, v.wallLabel])).toEqual([
      [2, 'engineer-required', 'Hall / kitchen'],
      [1, 'likely-nonbearing', 'Hall / kitchen'],
    ]);
    expect(read.history[1].answers).toEqual(nonbearing);
    expect(server.db.select({ n: count() }).from(bearingScreenVersions).get()?.n).toBe(3);
  });

  it('a partly answered screen saves as "can\'t tell yet" with where to look', async () => {
    const created = await create('Bedroom', { joistDirection: { value: 'unsure' } });
    expect(created.outcome).toBe('cant-tell');
    expect(created.result.lookAt.length).toBeGreaterThan(0);
  });
});

describe('bad input: 400 at the field, nothing changes', () => {
  it.each([
    ['no wall label', { wallLabel: '  ', answers: {} }, 'wallLabel'],
    [
      'an unknown answer value',
      { wallLabel: 'W', answers: { below: { value: 'cellar', basis: 'seen' } } },
      'answers.below',
    ],
    [
      'a known value without seen or assumed',
      { wallLabel: 'W', answers: { sag: { value: 'no' } } },
      'answers.sag',
    ],
    ['a negative joist span', { wallLabel: 'W', answers: { joistSpanAFt: -3 } }, 'answers.joistSpanAFt'],
  ])('%s', async (_what, body, field) => {
    const res = await owner.post(`/api/jobs/${jobId}/screens`).send(body).expect(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
    expect(screenCount()).toBe(0);
  });

  it('an empty PATCH is refused and the screen stays as it was', async () => {
    const created = await create('Hall', nonbearing);
    await owner.patch(`/api/screens/${created.id}`).send({}).expect(400);
    const read = await owner.get(`/api/screens/${created.id}`).expect(200);
    expect(read.body.version).toBe(1);
  });
});

describe('roles, firms and archived jobs', () => {
  it('another firm gets 404 for the job and the screen; an engineer gets 403', async () => {
    const created = await create('Hall', nonbearing);
    const other = (await signedUpAgent(server.app)).agent;
    await other.get(`/api/jobs/${jobId}/screens`).expect(404);
    await other.post(`/api/jobs/${jobId}/screens`).send({ wallLabel: 'x', answers: {} }).expect(404);
    await other.get(`/api/screens/${created.id}`).expect(404);
    await other.patch(`/api/screens/${created.id}`).send({ wallLabel: 'x' }).expect(404);
    const engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
    await engineer.get(`/api/screens/${created.id}`).expect(403);
    await engineer.get(`/api/jobs/${jobId}/screens`).expect(403);
    expect((await owner.get(`/api/screens/${created.id}`)).body.wallLabel).toBe('Hall');
  });

  it('screens of an archived job stay readable and cannot change (409)', async () => {
    const created = await create('Hall', nonbearing);
    await owner.delete(`/api/jobs/${jobId}`).expect(204);
    await owner.get(`/api/screens/${created.id}`).expect(200);
    const post = await owner.post(`/api/jobs/${jobId}/screens`).send({ wallLabel: 'x', answers: {} });
    const patch = await owner.patch(`/api/screens/${created.id}`).send({ wallLabel: 'x' });
    expect([post.status, patch.status]).toEqual([409, 409]);
    expect(screenCount()).toBe(1);
  });
});
