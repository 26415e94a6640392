import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { jobListSchema } from '@/shared/schemas/jobs';
import { SAMPLE_HEADER } from '@/tests/helpers/sample-bodies';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
});
afterEach(() => server.close());

const newJob = async (agent: Agent, name: string) =>
  (await agent.post('/api/jobs').send({ name }).expect(201)).body.id as string;
const newMember = async (agent: Agent, jobId: string, label: string, clearSpanFt: number) =>
  (
    await agent
      .post(`/api/jobs/${jobId}/members`)
      .send({ label, input: { ...SAMPLE_HEADER, clearSpanFt } })
      .expect(201)
  ).body as { summary: { state: string } };

describe('GET /api/jobs member states', () => {
  it('counts each job’s members by the state they show, zero for a job with none, another firm’s never', async () => {
    const busy = await newJob(owner, 'Two members (demo)');
    const empty = await newJob(owner, 'No members (demo)');
    const short = await newMember(owner, busy, 'Short header', 6);
    // 2-ply 2x10 over 16 ft under 13 ft of roof: past what it carries (invented demo inputs).
    const long = await newMember(owner, busy, 'Long header', 16);
    expect(long.summary.state).toBe('fails');
    const other = (await signedUpAgent(server.app, { firmName: 'Other Remodeling' })).agent;
    await newMember(other, await newJob(other, 'Their job (demo)'), 'Their header', 16);

    const { jobs } = jobListSchema.parse((await owner.get('/api/jobs').expect(200)).body);
    expect(jobs.map((j) => j.name).sort()).toEqual(['No members (demo)', 'Two members (demo)']);
    const expected = { passes: 0, fails: 0, 'engineer-needed': 0, 'load-path-open': 0 };
    for (const m of [short, long]) expected[m.summary.state as keyof typeof expected] += 1;
    expect(jobs.find((j) => j.id === busy)?.memberStates).toEqual(expected);
    expect(jobs.find((j) => j.id === empty)?.memberStates).toEqual({
      passes: 0,
      fails: 0,
      'engineer-needed': 0,
      'load-path-open': 0,
    });
  });
});
