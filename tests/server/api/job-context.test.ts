import { and, eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { auditEvents } from '@/db/schema';
import { checkMember, prescriptiveVerdict } from '@/lib/calc';
import { jobUpdateResultSchema, type JobUpdateResult } from '@/shared/schemas/job-update';
import { jobSchema, type JobInput } from '@/shared/schemas/jobs';
import { jobPathInput } from '@/server/api/load-path/load-path.service';
import { planJobRecompute } from '@/server/api/members/job-context';
import { evaluateMember } from '@/server/api/members/member-evaluation';
import { memberSchema, type Member, type MemberCreateBody } from '@/shared/schemas/members';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId: string;

/** Invented demo job: 28 ft wide, 25 psf ground snow, a 6 in 12 gable roof, ASCE 7-22. */
const job: JobInput = {
  name: 'Test cape',
  buildingWidthFt: 28,
  groundSnowPsf: 25,
  roofType: 'gable',
  roofPitchIn12: 6,
  loadStandard: 'ASCE 7-22',
};

beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  jobId = (await owner.post('/api/jobs').send(job).expect(201)).body.id;
});
afterEach(() => server.close());

/**
 * Invented demo headers over 6 ft under 13 ft of roof and 6 ft of ceiling, taking the job's edition, snow,
 * roof type and slope as the editor prefills them.
 */
const header = (label: string, sizeId: string): MemberCreateBody => ({
  label,
  input: {
    kind: 'header',
    edition: 'ASCE 7-22',
    clearSpanFt: 6,
    roofPitchIn12: 6,
    snow: { groundSnowPsf: 25, roofType: 'gable' },
    sources: [
      { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
      { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
    ],
    materialId: 'sawn-douglas-fir-larch-no2',
    sizeId,
  },
});

/** Invented demo beam set apart from the job: its own edition and slope, no snow. */
const ownBeam: MemberCreateBody = {
  label: 'Basement beam',
  input: {
    kind: 'beam',
    edition: 'ASCE 7-16',
    clearSpanFt: 12,
    roofPitchIn12: 4,
    sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
    materialId: 'lvl-2.0e',
    sizeId: '2-ply-1.75x11.875',
  },
};

async function create(body: MemberCreateBody): Promise<Member> {
  return memberSchema.parse((await owner.post(`/api/jobs/${jobId}/members`).send(body).expect(201)).body);
}

async function read(id: string): Promise<Member> {
  return memberSchema.parse((await owner.get(`/api/members/${id}`).expect(200)).body);
}

async function patchJob(body: Partial<JobInput>): Promise<JobUpdateResult> {
  return jobUpdateResultSchema.parse((await owner.patch(`/api/jobs/${jobId}`).send(body).expect(200)).body);
}

const asJson = (value: unknown) => JSON.parse(JSON.stringify(value));

describe('a job PATCH that changes what members take from the job', () => {
  it('checks again every member that takes the ground snow, and says which changed state', async () => {
    // 2-ply 2x10 passes at 25 psf ground snow and fails bending at 80 psf; 2-ply 2x12 passes both, but 80 psf
    // is past what header tables cover, so it then needs an engineer (the engine's own numbers, checked below)
    const weak = await create(header('Kitchen doorway', '2-ply-2x10'));
    const strong = await create(header('Hall opening', '2-ply-2x12'));
    const beam = await create(ownBeam);
    expect([weak.summary.checkState, strong.summary.checkState]).toEqual(['passes', 'passes']);
    // Nothing says what their ends bear on: on the job page both read "load path open", never "passes".
    expect([weak.summary.state, strong.summary.state]).toEqual(['load-path-open', 'load-path-open']);

    const res = await patchJob({ groundSnowPsf: 80, groundSnowSource: 'Town building department letter' });
    expect(res.groundSnowPsf).toBe(80);
    // The notice names each member's own check before and after; its load-path state shows on the job page.
    expect(res.recomputed).toEqual([
      {
        memberId: weak.id,
        label: 'Kitchen doorway',
        kind: 'header',
        fields: ['groundSnowPsf'],
        before: 'passes',
        after: 'fails',
      },
      {
        memberId: strong.id,
        label: 'Hall opening',
        kind: 'header',
        fields: ['groundSnowPsf'],
        before: 'passes',
        after: 'engineer-needed',
      },
    ]);

    const after = await read(weak.id);
    expect(after.input.snow?.groundSnowPsf).toBe(80);
    expect(after.result).toEqual(asJson(checkMember(after.input, { diagrams: true })));
    expect(after.prescriptive).toEqual(
      asJson(prescriptiveVerdict({ member: after.input, buildingWidthFt: 28, groundSnowPsf: 80 })),
    );
    expect(after.summary).toMatchObject({ state: 'fails', pass: false, governingCheck: 'bending' });
    expect(after.summary.governingRatio).toBeGreaterThan(1);
    // the beam has no snow of its own (0 psf, not the job's 25): it keeps its input and its result
    expect(await read(beam.id)).toEqual(beam);
  });

  it('hands a changed edition and roof slope to members that took them, and leaves members set apart alone', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x12'));
    const beam = await create(ownBeam);
    const res = await patchJob({ loadStandard: 'ASCE 7-16', roofPitchIn12: 8 });
    expect(res.recomputed.map((r) => [r.label, r.fields])).toEqual([
      ['Kitchen doorway', ['loadStandard', 'roofPitchIn12']],
    ]);
    const after = await read(taking.id);
    expect(after.input.edition).toBe('ASCE 7-16');
    expect(after.input.roofPitchIn12).toBe(8);
    expect(after.result).toEqual(asJson(checkMember(after.input, { diagrams: true })));
    expect(after.result.combinations.map((c) => c.name)).toEqual(
      checkMember({ ...taking.input, edition: 'ASCE 7-16', roofPitchIn12: 8 }).combinations.map(
        (c) => c.name,
      ),
    );
    expect(await read(beam.id)).toEqual(beam);
  });

  it('moves the roof type of a member that took it, and gives a member without snow the job’s new snow', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x12'));
    const noSnowJob = (
      await owner
        .post('/api/jobs')
        .send({ ...job, groundSnowPsf: 0 })
        .expect(201)
    ).body.id;
    const bare = memberSchema.parse(
      (
        await owner
          .post(`/api/jobs/${noSnowJob}/members`)
          .send({ ...ownBeam, input: { ...ownBeam.input, edition: 'ASCE 7-22', roofPitchIn12: 6 } })
          .expect(201)
      ).body,
    );
    await patchJob({ roofType: 'hip' });
    expect((await read(taking.id)).input.snow?.roofType).toBe('hip');
    const res = jobUpdateResultSchema.parse(
      (await owner.patch(`/api/jobs/${noSnowJob}`).send({ groundSnowPsf: 30 }).expect(200)).body,
    );
    expect(res.recomputed.map((r) => r.fields)).toEqual([['groundSnowPsf']]);
    expect((await read(bare.id)).input.snow).toMatchObject({ groundSnowPsf: 30, roofType: 'gable' });
  });

  it("checks every header again for a new building width (the prescriptive verdict reads the job's)", async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x12'));
    await create(ownBeam);
    const res = await patchJob({ buildingWidthFt: 40 });
    expect(res.recomputed.map((r) => [r.memberId, r.fields])).toEqual([[taking.id, ['buildingWidthFt']]]);
    const after = await read(taking.id);
    expect(after.prescriptive).toEqual(
      asJson(prescriptiveVerdict({ member: after.input, buildingWidthFt: 40, groundSnowPsf: 25 })),
    );
  });

  it('records each recomputation in the audit log, by the person who changed the job', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x10'));
    await patchJob({ groundSnowPsf: 40 });
    const rows = server.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.action, 'member.recompute'), eq(auditEvents.subject, taking.id)))
      .all();
    expect(rows).toHaveLength(1);
    expect(rows[0].detail).toEqual({ jobId, fields: ['groundSnowPsf'] });
  });

  it('changes no member for a PATCH of other fields', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x10'));
    const res = await patchJob({ name: 'Renamed', notes: 'Plaster ceilings', groundSnowSource: 'Map' });
    expect(res.recomputed).toEqual([]);
    expect(await read(taking.id)).toEqual(taking);
  });

  it('changes nothing on a bad PATCH (400 with field errors)', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x10'));
    const bad = await owner
      .patch(`/api/jobs/${jobId}`)
      .send({ groundSnowPsf: -5, roofPitchIn12: 6 })
      .expect(400);
    expect(bad.body.error.fields.groundSnowPsf).toBeDefined();
    expect(await read(taking.id)).toEqual(taking);
    expect((await owner.get(`/api/jobs/${jobId}`).expect(200)).body.groundSnowPsf).toBe(25);
  });

  it('leaves the members of an archived job as they were', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x10'));
    await owner.delete(`/api/jobs/${jobId}`).expect(204);
    const res = await patchJob({ groundSnowPsf: 80 });
    expect(res.recomputed).toEqual([]);
    expect(await read(taking.id)).toEqual(taking);
  });
});

describe('a job change checked in the calculation pool first', () => {
  it('plans the checks and the load path from exactly what the change then stores', async () => {
    const taking = await create(header('Kitchen doorway', '2-ply-2x10'));
    const apart = await create(ownBeam);
    const orgId = (await owner.get('/api/me').expect(200)).body.memberships[0].orgId as string;
    const before = jobSchema.parse((await owner.get(`/api/jobs/${jobId}`).expect(200)).body);
    const plan = planJobRecompute(server.db, orgId, before, { ...before, groundSnowPsf: 50 });
    // Only the member that takes the job's snow is planned; the beam set apart keeps its own.
    expect(plan.members.map((m) => m.id)).toEqual([taking.id]);

    await patchJob({ groundSnowPsf: 50 });
    const after = jobSchema.parse((await owner.get(`/api/jobs/${jobId}`).expect(200)).body);
    // The transaction's own load path input is the one the pool evaluated, so its answer is the one used.
    expect(JSON.stringify(jobPathInput(server.db, orgId, after))).toBe(plan.pathJson);
    const stored = await read(taking.id);
    const { id: _id, ...planned } = plan.members[0];
    expect(stored.input).toEqual(evaluateMember(planned).input);
    expect(asJson(stored.result)).toEqual(asJson(evaluateMember(planned).result));
    expect(await read(apart.id)).toMatchObject({ input: apart.input });
  });
});
