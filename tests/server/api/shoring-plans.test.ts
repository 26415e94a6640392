import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { planShoring, rentedShores } from '@/lib/calc';
import { shoringPlanInputSchema } from '@/shared/schemas/calc/shoring';
import { liveShoring } from '@/lib/ui/bearing/live-shoring';
import { memberSchema } from '@/shared/schemas/members';
import {
  shoringAnswerSchema,
  shoringResultSchema,
  type ShoringPlanBodyInput,
} from '@/shared/schemas/shoring-plans';
import { expectApprox } from '@/tests/helpers/approx';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId: string;
let memberId: string;

// Demo beam (invented layout; published default psf): floor joists 12 ft on side A and 10 ft on side B →
// 11 ft × (12 psf dead, HUD RSDG Table 3.2; 40 psf live, ASCE 7 Table 4.3-1) = 132 plf D + 440 plf L.
const loading = {
  kind: 'beam' as const,
  edition: 'ASCE 7-22' as const,
  clearSpanFt: 10,
  sources: [{ kind: 'floor' as const, tributaryFt: 11, deadPsf: 12, livePsf: 40 }],
};

beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  jobId = (await owner.post('/api/jobs').send({ name: 'Split-level' }).expect(201)).body.id;
  const member = await owner
    .post(`/api/jobs/${jobId}/members`)
    .send({
      label: 'Family room beam',
      input: { ...loading, materialId: 'lvl-2.0e', sizeId: '2-ply-1.75x11.875' },
    })
    .expect(201);
  memberId = member.body.id;
});
afterEach(() => server.close());

const studs = {
  materialId: 'sawn-spruce-pine-fir-no1-no2',
  studSizeId: '2x4',
  studSpacingIn: 16,
  heightFt: 8,
  weakAxisBracing: 'mid-height-blocking' as const,
};
const body: ShoringPlanBodyInput = {
  layout: 'both-sides',
  joistSpanAFt: 12,
  joistSpanBFt: 10,
  studs,
  standsOn: 'floor-framing-perpendicular',
};

const put = (b: object) => owner.put(`/api/members/${memberId}/shoring`).send(b);

describe('the shoring plan of a member', () => {
  it('is null until saved, then the server’s own plan from the member’s saved loads', async () => {
    expect((await owner.get(`/api/members/${memberId}/shoring`).expect(200)).body).toEqual({ shoring: null });
    const saved = shoringAnswerSchema.parse((await put(body).expect(200)).body).shoring;
    const engine = planShoring(
      shoringPlanInputSchema.parse({
        member: loading,
        layout: 'both-sides',
        joistSpanAFt: 12,
        joistSpanBFt: 10,
        studs,
        standsOn: 'floor-framing-perpendicular',
      }),
    );
    // ASCE 7-22 §2.4.1: D + L = 132 + 440 = 572 plf on the member.
    expectApprox(engine.load.wPlf, 572, { abs: 1e-6 });
    expect(saved?.result.plan.walls.map((w) => w.loadPlf)).toEqual(engine.walls.map((w) => w.loadPlf));
    expect(saved?.result.plan.walls[0].standing.verdict).toBe('check-floor-below');
    expect(saved?.result.plan.caution).toMatch(/Preliminary check only/);
    expect(saved?.result.plan.cautions.join(' ')).toMatch(/shoring itself may need an engineer/);
    expect(saved?.result.sequence.join(' ')).toMatch(/do not jack/);
    // Default wall length: the clear span plus 1 ft past each end (common practice) = 12 ft.
    expect(saved?.result.wallLengthFt).toBe(12);
    expect(saved?.result.takeoff?.[0]).toMatchObject({ side: 'A', studCount: 10, plates: 2 });
    const read = shoringAnswerSchema.parse((await owner.get(`/api/members/${memberId}/shoring`)).body);
    expect(read.shoring?.input).toMatchObject({ layout: 'both-sides', method: 'stud-walls' });
  });

  it('the plan the planner computes on the device is the one the server saves, for studs and for shores', async () => {
    const member = memberSchema.parse((await owner.get(`/api/members/${memberId}`).expect(200)).body);
    const shores: ShoringPlanBodyInput = { ...body, method: 'rented-shores', shoreRatedCapacityLb: 3000 };
    for (const plan of [body, shores]) {
      const saved = shoringAnswerSchema.parse((await put(plan).expect(200)).body).shoring;
      const live = liveShoring(member.input, plan);
      if (!live.ok) throw new Error(JSON.stringify(live.errors));
      expect(shoringResultSchema.parse(live.result)).toEqual(saved?.result);
    }
  });

  it('on the device, bad planner input gives the same field message the server answers with', async () => {
    const member = memberSchema.parse((await owner.get(`/api/members/${memberId}`).expect(200)).body);
    const bad = { ...body, setbackFt: -1 };
    const answer = await put(bad).expect(400);
    const live = liveShoring(member.input, bad);
    expect(live.ok).toBe(false);
    if (live.ok) return;
    expect(live.errors.setbackFt).toEqual(answer.body.error.fields.setbackFt);
  });

  it('a wall stood along the floor joists is not acceptable: the plan does not pass', async () => {
    const saved = shoringAnswerSchema.parse(
      (await put({ ...body, standsOn: 'floor-framing-parallel' }).expect(200)).body,
    );
    expect(saved.shoring?.result.pass).toBe(false);
    expect(saved.shoring?.result.plan.walls[0].standing.verdict).toBe('not-acceptable');
    expect(saved.shoring?.result.plan.warnings.join(' ')).toMatch(/along the joists/);
  });

  it('rented shores are spaced by the rated capacity the user reads off them', async () => {
    const res = await put({ ...body, method: 'rented-shores', shoreRatedCapacityLb: 3000 }).expect(200);
    const saved = shoringAnswerSchema.parse(res.body).shoring;
    const wall = saved?.result.plan.walls[0];
    const expected = rentedShores(wall?.loadPlf ?? 0, 3000, 12);
    expect(saved?.result.shores?.[0]).toMatchObject({ side: 'A', count: expected.count, pass: true });
    expect(saved?.result.takeoff).toBeNull();
  });

  it.each([
    ['rented shores without a rated capacity', { ...body, method: 'rented-shores' }, 'shoreRatedCapacityLb'],
    ['a setback past the joist span', { ...body, setbackFt: 10.5 }, 'setbackFt'],
    ['one joist span of two', { ...body, joistSpanBFt: undefined }, 'joistSpanBFt'],
    ['an unknown stud size', { ...body, studs: { ...studs, studSizeId: '2x5' } }, 'studs.studSizeId'],
  ])('%s: 400 at the field, nothing saved', async (_what, b, field) => {
    const res = await put(b).expect(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
    expect((await owner.get(`/api/members/${memberId}/shoring`)).body).toEqual({ shoring: null });
  });

  it('another firm 404, an engineer 403, an archived job 409', async () => {
    const other = (await signedUpAgent(server.app)).agent;
    await other.get(`/api/members/${memberId}/shoring`).expect(404);
    await other.put(`/api/members/${memberId}/shoring`).send(body).expect(404);
    const engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
    await engineer.get(`/api/members/${memberId}/shoring`).expect(403);
    await owner.delete(`/api/jobs/${jobId}`).expect(204);
    await put(body).expect(409);
    expect((await owner.get(`/api/members/${memberId}/shoring`).expect(200)).body).toEqual({ shoring: null });
  });
});
