import { count, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { auditEvents, members } from '@/db/schema';
import { ENGINE_VERSION, checkMember, prescriptiveVerdict } from '@/lib/calc';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { memberListSchema, memberSchema, type Member, type MemberCreateBody } from '@/shared/schemas/members';
import type { JobInput } from '@/shared/schemas/jobs';
import { expectApprox } from '@/tests/helpers/approx';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let ownerId: string;
let jobId: string;

/** Invented demo job: 28 ft wide, 25 psf ground snow. */
const job: JobInput = { name: 'Test ranch', buildingWidthFt: 28, groundSnowPsf: 25, adoptedCode: 'IRC 2024' };

beforeEach(async () => {
  server = await createTestServer();
  const signedUp = await signedUpAgent(server.app);
  owner = signedUp.agent;
  ownerId = signedUp.me.user.id;
  jobId = (await owner.post('/api/jobs').send(job).expect(201)).body.id;
});
afterEach(() => server.close());

const DFL2 = 'sawn-douglas-fir-larch-no2';

/** Invented demo header: 2-ply 2x10 Douglas Fir-Larch No.2 over 6 ft, under 13 ft of roof and 6 ft of ceiling. */
const header: MemberCreateBody = {
  label: 'Kitchen doorway',
  wall: 'Kitchen / dining',
  input: {
    kind: 'header',
    edition: 'ASCE 7-22',
    clearSpanFt: 6,
    sources: [
      { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
      { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
    ],
    materialId: DFL2,
    sizeId: '2-ply-2x10',
    flags: { clearSpanFt: 'measured' },
  },
};

/** Invented demo beam: 2-ply 1-3/4 x 11-7/8 LVL over 12 ft under 12 ft of floor. */
const beam: MemberCreateBody = {
  label: 'Living room beam',
  input: {
    kind: 'beam',
    edition: 'ASCE 7-22',
    clearSpanFt: 12,
    sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
    materialId: 'lvl-2.0e',
    sizeId: '2-ply-1.75x11.875',
  },
};

const withInput = (body: MemberCreateBody, input: Partial<MemberCreateBody['input']>): MemberCreateBody => ({
  ...body,
  input: { ...body.input, ...input },
});

async function create(body: MemberCreateBody, onJob = jobId): Promise<Member> {
  return memberSchema.parse((await owner.post(`/api/jobs/${onJob}/members`).send(body).expect(201)).body);
}

/** The API answers JSON: the engine's own result as it reads after the trip (no undefined keys, no -0). */
const asJson = (value: unknown) => JSON.parse(JSON.stringify(value));

const memberCount = () => server.db.select({ n: count() }).from(members).get()?.n;

describe('members: create, read, list, update, delete', () => {
  it('creates a member (201), reads it back and lists it', async () => {
    const created = await create(header);
    expect(created).toMatchObject({
      jobId,
      kind: 'header',
      label: 'Kitchen doorway',
      wall: 'Kitchen / dining',
      materialId: DFL2,
      sizeId: '2-ply-2x10',
      engineVersion: ENGINE_VERSION,
      createdBy: ownerId,
      updatedBy: ownerId,
    });
    expect(created.input).toEqual(memberCheckInputSchema.parse({ ...header.input, label: header.label }));
    const read = await owner.get(`/api/members/${created.id}`).expect(200);
    expect(read.body).toEqual(asJson(created));

    const list = memberListSchema.parse((await owner.get(`/api/jobs/${jobId}/members`).expect(200)).body);
    const { input: _input, result: _result, prescriptive: _prescriptive, ...listItem } = created;
    expect(list.members).toEqual([listItem]);
    const raw = await owner.get(`/api/jobs/${jobId}/members`).expect(200);
    expect(Object.keys(raw.body.members[0])).not.toContain('result');
  });

  it('lists in the order the members were made', async () => {
    for (const label of ['First', 'Second', 'Third']) await create({ ...header, label });
    const list = await owner.get(`/api/jobs/${jobId}/members`).expect(200);
    expect(list.body.members.map((m: { label: string }) => m.label)).toEqual(['First', 'Second', 'Third']);
  });

  it('lists only the members of the job asked for', async () => {
    const otherJob = (await owner.post('/api/jobs').send({ name: 'Other job' }).expect(201)).body.id;
    await create(header);
    const onOther = await create(beam, otherJob);
    const list = await owner.get(`/api/jobs/${otherJob}/members`).expect(200);
    expect(list.body.members.map((m: { id: string }) => m.id)).toEqual([onOther.id]);
  });

  it('PATCH changes only the fields sent; the label is written into the stored input too', async () => {
    const created = await create(header);
    const res = await owner.patch(`/api/members/${created.id}`).send({ label: 'Renamed' }).expect(200);
    const patched = memberSchema.parse(res.body);
    expect(patched).toMatchObject({ label: 'Renamed', wall: created.wall, createdAt: created.createdAt });
    expect(patched.input).toEqual({ ...created.input, label: 'Renamed' });
    expect(patched.result.member.label).toBe('Renamed');
    expect(patched.updatedAt >= created.updatedAt).toBe(true);

    const walled = await owner.patch(`/api/members/${created.id}`).send({ wall: 'Hall' }).expect(200);
    expect(walled.body).toMatchObject({ label: 'Renamed', wall: 'Hall' });
    const empty = await owner.patch(`/api/members/${created.id}`).send({}).expect(400);
    expect(empty.body.error.fields).toEqual({ _: ['Change at least one field'] });
  });

  it('deletes a member for good (204), then answers 404 for it', async () => {
    const kept = await create(beam);
    const created = await create(header);
    await owner.delete(`/api/members/${created.id}`).expect(204);
    await owner.get(`/api/members/${created.id}`).expect(404);
    await owner.delete(`/api/members/${created.id}`).expect(404);
    expect(server.db.select({ id: members.id }).from(members).all()).toEqual([{ id: kept.id }]);
  });

  it('writes an audit event for every change', async () => {
    const created = await create(header);
    await owner.patch(`/api/members/${created.id}`).send({ label: 'Renamed', wall: 'Hall' }).expect(200);
    await owner.delete(`/api/members/${created.id}`).expect(204);
    const events = server.db
      .select({ action: auditEvents.action, detail: auditEvents.detail, userId: auditEvents.userId })
      .from(auditEvents)
      .where(eq(auditEvents.subject, created.id))
      .all();
    expect(events).toEqual([
      {
        action: 'member.create',
        detail: { jobId, kind: 'header', label: 'Kitchen doorway' },
        userId: ownerId,
      },
      { action: 'member.update', detail: { jobId, fields: ['label', 'wall'] }, userId: ownerId },
      { action: 'member.delete', detail: { jobId, label: 'Renamed' }, userId: ownerId },
    ]);
  });

  it('answers 404 for a job or member that does not exist', async () => {
    await owner.get('/api/jobs/no-such-job/members').expect(404);
    await owner.post('/api/jobs/no-such-job/members').send(header).expect(404);
    await owner.get('/api/members/no-such-member').expect(404);
    await owner.patch('/api/members/no-such-member').send({ label: 'x' }).expect(404);
    await owner.delete('/api/members/no-such-member').expect(404);
  });

  it('is signed-in only', async () => {
    await request(server.app).get(`/api/jobs/${jobId}/members`).expect(401);
  });
});

describe('members: the server recomputes on every save', () => {
  it('stores the engine result of the stored input, with diagrams, and the header verdict on the job facts', async () => {
    const created = await create(header);
    expect(created.result).toEqual(asJson(checkMember(created.input, { diagrams: true })));
    expect(created.result.diagram?.samples.length).toBeGreaterThan(2);
    expect(created.prescriptive).toEqual(
      asJson(prescriptiveVerdict({ member: created.input, buildingWidthFt: 28, groundSnowPsf: 25 })),
    );
    // Passes its own check; nothing yet says what its ends bear on, so its state is "load path open".
    expect(created.summary).toEqual({
      state: 'load-path-open',
      checkState: 'passes',
      loadPath: {
        closed: false,
        openReasons: ['Left end: say what it bears on.', 'Right end: say what it bears on.'],
      },
      pass: true,
      governingCheck: created.result.governing.check,
      governingRatio: created.result.governing.ratio,
      warningsCount: created.result.warnings.length,
      sizeLabel: created.result.member.sizeLabel,
      materialLabel: created.result.member.materialLabel,
      engineerReasons: [],
    });
  });

  it('ignores a result, summary or engine version the client sends', async () => {
    const forged = {
      ...header,
      result: { pass: true },
      summary: { state: 'passes' },
      engineVersion: 'forged',
    };
    const res = await owner.post(`/api/jobs/${jobId}/members`).send(forged).expect(201);
    expect(res.body.engineVersion).toBe(ENGINE_VERSION);
    expect(res.body.result).toEqual(asJson(checkMember(res.body.input, { diagrams: true })));
  });

  it('a PATCH changing the span changes the stored result', async () => {
    const created = await create(header);
    const res = await owner
      .patch(`/api/members/${created.id}`)
      .send({ input: { ...header.input, clearSpanFt: 9 } })
      .expect(200);
    const patched = memberSchema.parse(res.body);
    expect(patched.result).toEqual(asJson(checkMember(patched.input, { diagrams: true })));
    expect(patched.input.label).toBe(header.label);
    // Design span = clear span + half the 3 in default bearing at each end (shared/schemas/calc/member.ts).
    expectApprox(patched.result.spans.designSpanFt, 9.25, { abs: 1e-9 });
    expectApprox(created.result.spans.designSpanFt, 6.25, { abs: 1e-9 });
    // Bending governs both under D + Lr; for a uniform load M = wL²/8 (AWC Design Aid No. 6, simple beam,
    // uniformly distributed load), so with the same section and factors the ratio grows with L².
    expect([created.result.governing.check, patched.result.governing.check]).toEqual(['bending', 'bending']);
    expectApprox(patched.result.governing.ratio / created.result.governing.ratio, (9.25 / 6.25) ** 2, {
      rel: 1e-9,
    });
    expect(patched.summary).toMatchObject({ state: 'fails', pass: false, engineerReasons: [] });
    const read = await owner.get(`/api/members/${created.id}`).expect(200);
    expect(read.body.result).toEqual(asJson(patched.result));
  });

  it('a beam needs an engineer, with every reason code header tables would not cover it', async () => {
    const created = await create(beam);
    expect(created.prescriptive).toBeNull();
    expect(created.summary.pass).toBe(true);
    expect(created.summary.checkState).toBe('engineer-needed');
    expect(created.summary.state).toBe('load-path-open');
    expect(created.summary.engineerReasons).toEqual([
      'it is a beam replacing a wall, not a header over an opening',
      'LVL 2.0E (generic) is not sawn lumber (the tables cover sawn 2x headers)',
      'no roof load is given (exterior header tables assume roof and ceiling)',
    ]);
  });

  it('a passing header outside the header tables (a point load) needs an engineer', async () => {
    const post = { kind: 'point', pointKind: 'post-above', atFt: 3, deadLb: 200, liveLb: 300 } as const;
    const created = await create(withInput(header, { sources: [...header.input.sources, post] }));
    expect(created.summary).toMatchObject({ checkState: 'engineer-needed', pass: true });
    expect(created.prescriptive?.verdict).toBe('engineer-needed');
    expect(created.summary.engineerReasons).toEqual(created.prescriptive?.reasons);
    expect(created.summary.engineerReasons).toContain(
      'it carries point loads (girder truss, post, strut or similar)',
    );
  });

  it("the header verdict reads the job's building width", async () => {
    const unknownWidth = (await owner.post('/api/jobs').send({ name: 'Width not known' }).expect(201)).body
      .id;
    const created = await create(header, unknownWidth);
    expect(created.summary.checkState).toBe('engineer-needed');
    expect(created.summary.engineerReasons).toEqual(['the building width is not known']);
  });

  it('a failing member is "fails", whatever the tables say', async () => {
    const created = await create(withInput(header, { clearSpanFt: 12, sizeId: '2-ply-2x4' }));
    expect(created.summary).toMatchObject({ state: 'fails', pass: false, engineerReasons: [] });
  });
});

describe('members: bad input is a 400 with field errors and changes nothing', () => {
  const cases: [label: string, body: object, field: string][] = [
    [
      'letters in the clear span',
      withInput(header, { clearSpanFt: '13 ft' as unknown as number }),
      'input.clearSpanFt',
    ],
    [
      'a negative tributary width',
      withInput(header, { sources: [{ kind: 'roof', tributaryFt: -4, deadPsf: 15, roofLivePsf: 20 }] }),
      'input.sources.0.tributaryFt',
    ],
    ['an empty label', { ...header, label: '   ' }, 'label'],
    [
      'an unknown material (the engine says so)',
      withInput(header, { materialId: 'no-such-wood' }),
      'input.materialId',
    ],
    ['an unknown size (the engine says so)', withInput(header, { sizeId: '9-ply-2x99' }), 'input.sizeId'],
  ];

  it.each(cases)('POST with %s', async (_label, body, field) => {
    const res = await owner.post(`/api/jobs/${jobId}/members`).send(body).expect(400);
    expect(res.body.error.code).toBe('bad_request');
    expect(Object.keys(res.body.error.fields)).toEqual([field]);
    expect(memberCount()).toBe(0);
    expect(server.db.select().from(auditEvents).where(eq(auditEvents.action, 'member.create')).all()).toEqual(
      [],
    );
  });

  it.each(cases)('PATCH with %s', async (_label, body, field) => {
    const created = await create(header);
    const before = await owner.get(`/api/members/${created.id}`).expect(200);
    const res = await owner.patch(`/api/members/${created.id}`).send(body).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual([field]);
    const after = await owner.get(`/api/members/${created.id}`).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('names the message at the field', async () => {
    const res = await owner
      .post(`/api/jobs/${jobId}/members`)
      .send(withInput(header, { materialId: 'no-such-wood' }))
      .expect(400);
    expect(res.body.error.fields['input.materialId']).toEqual(['Unknown material "no-such-wood"']);
  });
});

describe('members of an archived job', () => {
  it('stay readable and cannot be changed (409)', async () => {
    const created = await create(header);
    await owner.delete(`/api/jobs/${jobId}`).expect(204);
    await owner.get(`/api/members/${created.id}`).expect(200);
    const list = await owner.get(`/api/jobs/${jobId}/members`).expect(200);
    expect(list.body.members).toHaveLength(1);
    const responses = [
      await owner.post(`/api/jobs/${jobId}/members`).send(header),
      await owner.patch(`/api/members/${created.id}`).send({ label: 'Changed' }),
      await owner.delete(`/api/members/${created.id}`),
    ];
    for (const res of responses) expect(res.body.error.code).toBe('conflict');
    expect(responses.map((res) => res.status)).toEqual([409, 409, 409]);
    const after = await owner.get(`/api/members/${created.id}`).expect(200);
    expect(after.body).toEqual(asJson(created));
  });
});
