import { and, eq, like } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { auditEvents, designRequestVersions, designRequests, mailOutbox } from '@/db/schema';
import { startFakeSmtp } from '@/server/services/fake-smtp';
import { requestDetailSchema, requestListSchema } from '@/shared/schemas/requests/views';
import { mailTo, requestWorld } from '@/tests/helpers/design-requests';
import { SAMPLE_HEADER } from '@/tests/helpers/sample-bodies';
import { TEST_APP_ORIGIN, createTestServer, signedUpAgent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;
beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
});
afterEach(() => server.close());

const requestRows = () => server.db.select().from(designRequests).all();
const versionRows = () => server.db.select().from(designRequestVersions).all();

describe('compose', () => {
  it('makes a numbered Draft the engineer cannot see', async () => {
    const id = await world.draft();
    const res = await world.firm.agent.get(`/api/requests/${id}`).expect(200);
    const detail = requestDetailSchema.parse(res.body);
    expect(detail).toMatchObject({ number: 1, status: 'draft', version: 0, viewer: 'firm', snapshot: null });
    expect(detail.draft?.memberIds).toEqual([world.memberId]);
    expect(detail.actions).toEqual(expect.arrayContaining(['edit', 'send']));
    await world.engineer.agent.get(`/api/requests/${id}`).expect(404);
    expect(
      requestListSchema.parse((await world.engineer.agent.get('/api/requests').expect(200)).body).requests,
    ).toEqual([]);
  });

  it('refuses a member of another job, and stores nothing', async () => {
    const other = await world.firm.agent.post('/api/jobs').send({ name: 'Other job' }).expect(201);
    const res = await world.firm.agent
      .post(`/api/jobs/${other.body.id}/requests`)
      .send({ memberIds: [world.memberId] })
      .expect(400);
    expect(res.body.error.fields['memberIds.0']).toEqual(['No such member on this job']);
    expect(requestRows()).toEqual([]);
  });

  it('keeps every phone-back item and the constraints in the working copy', async () => {
    const id = await world.draft();
    const phoneBack = {
      joists: {
        size: '2x8',
        spacingIn: 16,
        species: 'Douglas Fir-Larch',
        tapeInPhoto: true,
        flag: 'measured',
      },
      roofingLayers: 2,
      heavyAbove: ['air-handler', 'solar'],
      heavyAboveNote: 'Air handler on a platform in the attic',
      sag: { sagIn: 0.5, stringLine: true, flag: 'measured' },
      damage: {
        sistered: true,
        notched: false,
        bored: true,
        rot: false,
        note: 'Two joists bored for a drain',
      },
      below: { girder: 'Built-up 3-ply 2x10', columns: 'Steel lally column', footings: 'Unknown' },
      yardStock: [{ product: '1-3/4 in LVL', eGrade: '2.0E' }],
      ductsOrPipes: 'A 6 in duct in the third bay',
    };
    const constraints = {
      mount: 'flush',
      maxDepthIn: 9.25,
      postsMayGo: 'Ends only',
      longestPieceFt: 16,
      heaviestPieceLb: 250,
    };
    const res = await world.firm.agent
      .patch(`/api/requests/${id}`)
      .send({ phoneBack, constraints })
      .expect(200);
    expect(res.body.draft.phoneBack).toEqual(phoneBack);
    expect(res.body.draft.constraints).toEqual(constraints);
  });
});

describe('send', () => {
  it('an unconfirmed person cannot send', async () => {
    const fresh = await signedUpAgent(server.app, {}, { confirmed: false });
    const job = await fresh.agent.post('/api/jobs').send({ name: 'Unconfirmed job' }).expect(201);
    await fresh.agent
      .post(`/api/jobs/${job.body.id}/members`)
      .send({ label: 'H1', input: SAMPLE_HEADER })
      .expect(201);
    const draft = await fresh.agent.post(`/api/jobs/${job.body.id}/requests`).send({}).expect(201);
    await fresh.agent.post(`/api/requests/${draft.body.id}/send`).expect(403);
    expect(versionRows()).toEqual([]);
  });

  it('refuses a copy that is not ready, naming the fields', async () => {
    const res = await world.firm.agent.post(`/api/jobs/${world.jobId}/requests`).send({}).expect(201);
    const refused = await world.firm.agent.post(`/api/requests/${res.body.id}/send`).expect(400);
    expect(Object.keys(refused.body.error.fields)).toEqual(
      expect.arrayContaining(['engineerEmail', 'memberIds', 'jurisdiction.state']),
    );
    expect(requestRows()[0].status).toBe('draft');
  });

  it('freezes version 1, binds the confirmed engineer and mails them a link, in the outbox', async () => {
    const id = await world.sent();
    const detail = requestDetailSchema.parse(
      (await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body,
    );
    expect(detail).toMatchObject({ status: 'sent', version: 1, engineerBound: true });
    expect(detail.snapshot?.members.map((m) => m.label)).toEqual(['Kitchen header']);
    expect(detail.snapshot?.job).toMatchObject({
      loadStandard: 'ASCE 7-22',
      groundSnowSource: 'County table (demo)',
    });
    expect(
      detail.snapshot?.members[0].result.inputs.every((i) =>
        ['measured', 'assumed', 'default'].includes(i.flag),
      ),
    ).toBe(true);
    const [mail] = await mailTo(server, world.engineer.body.email);
    expect(mail.subject).toContain('Design request 1 v1 from Sample Remodeling');
    expect(mail.text).toContain(`${TEST_APP_ORIGIN}/requests/${id}`);
    // The HTML part as the fake SMTP server received it: the same link, in an anchor.
    const wire = server.db.select().from(mailOutbox).where(eq(mailOutbox.id, mail.id)).get();
    expect(wire?.captured).toBe(true);
    expect(wire?.html).toContain(`href="${TEST_APP_ORIGIN}/requests/${id}"`);
    expect(wire?.html).toContain('Sample Remodeling');
    const actions = server.db.select().from(auditEvents).where(eq(auditEvents.subject, id)).all();
    expect(actions.map((a) => a.action)).toEqual(['request.create', 'request.send']);
  });

  it('the snapshot stays the same when the job and the member are edited afterwards', async () => {
    const id = await world.sent();
    const before = (await world.engineer.agent.get(`/api/requests/${id}`).expect(200)).body.snapshot;
    await world.firm.agent
      .patch(`/api/jobs/${world.jobId}`)
      .send({ groundSnowPsf: 60, notes: 'Changed' })
      .expect(200);
    await world.firm.agent
      .patch(`/api/members/${world.memberId}`)
      .send({ label: 'Renamed', input: { ...SAMPLE_HEADER, clearSpanFt: 9 } })
      .expect(200);
    const after = (await world.engineer.agent.get(`/api/requests/${id}`).expect(200)).body.snapshot;
    expect(after).toEqual(before);
    expect(after.members[0].input.clearSpanFt).toBe(6);
    expect(after.job.groundSnowPsf).toBe(30);
  });

  it('the engineer’s inbox lists it newest first with an unread mark that opening clears', async () => {
    const first = await world.sent();
    const second = await world.sent();
    const inbox = requestListSchema.parse((await world.engineer.agent.get('/api/requests').expect(200)).body);
    expect(inbox.requests.map((r) => [r.id, r.unread])).toEqual([
      [second, true],
      [first, true],
    ]);
    await world.engineer.agent.get(`/api/requests/${first}`).expect(200);
    const after = (await world.engineer.agent.get('/api/requests').expect(200)).body.requests;
    expect(after.find((r: { id: string }) => r.id === first).unread).toBe(false);
    const filtered = await world.engineer.agent.get('/api/requests?state=in-review').expect(200);
    expect(filtered.body.requests).toEqual([]);
    await world.engineer.agent.get('/api/requests?state=nonsense').expect(400);
  });

  it('a mail server that is down: the request still sends, the mail goes out when it is back', async () => {
    const { port } = server.smtp;
    await server.smtp.close();
    const id = await world.sent();
    await server.mailer.idle();
    const requestMail = () =>
      server.db
        .select()
        .from(mailOutbox)
        .where(and(eq(mailOutbox.to, world.engineer.body.email), like(mailOutbox.subject, 'Design request%')))
        .get();
    expect(requestMail()).toMatchObject({ status: 'pending', captured: false });
    expect((await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body.status).toBe('sent');
    const revived = await startFakeSmtp(server.db, { port });
    try {
      await expect.poll(() => requestMail()?.status, { timeout: 5000, interval: 25 }).toBe('sent');
      expect(requestMail()?.text).toContain(`/requests/${id}`);
    } finally {
      await revived.close();
    }
  });
});

describe('revise', () => {
  it('makes version 2 with the change list, inputs and results side by side, and mails the engineer', async () => {
    const id = await world.sent();
    await world.firm.agent
      .patch(`/api/members/${world.memberId}`)
      .send({ input: { ...SAMPLE_HEADER, clearSpanFt: 7 } })
      .expect(200);
    await world.firm.agent.patch(`/api/requests/${id}`).send({ questions: 'Flush or dropped?' }).expect(200);
    const res = await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ note: 'Opening is 7 ft' })
      .expect(201);
    const detail = requestDetailSchema.parse(res.body);
    expect(detail.version).toBe(2);
    const v2 = detail.versions[1];
    expect(v2.note).toBe('Opening is 7 ft');
    // Worded as the request page words it (lib/requests/version-diff): member, section, field, ft-in, flag.
    expect(v2.changes).toContainEqual({
      group: 'Kitchen header',
      section: 'Span and bearing',
      field: 'Clear span',
      before: `6' 0" (assumed)`,
      after: `7' 0" (assumed)`,
      kind: 'changed',
    });
    expect(v2.changes).toContainEqual({
      group: 'Job and request',
      section: 'Questions',
      field: 'Questions for the engineer',
      before: 'Can the beam be flush with the joists?',
      after: 'Flush or dropped?',
      kind: 'changed',
    });
    // The results follow the span: the reactions grew (more span, more tributary load on each end).
    const left = v2.changes.find((c) => c.field === 'Largest reaction, left end');
    expect(left).toMatchObject({ group: 'Kitchen header', section: 'Result of the preliminary check' });
    expect(Number(left?.after?.replace(/\D/g, ''))).toBeGreaterThan(Number(left?.before?.replace(/\D/g, '')));
    expect(v2.changes.some((c) => /members\.|\.input\./.test(`${c.group} ${c.field}`))).toBe(false);
    expect(detail.versions[0].changes).toEqual([]);
    const mails = await mailTo(server, world.engineer.body.email);
    expect(mails.map((m) => m.subject)).toEqual([
      expect.stringContaining('v2'),
      expect.stringContaining('v1'),
    ]);
  });

  it('edits the working copy and sends it as one step: fields and members changed, listed for the engineer', async () => {
    const id = await world.sent();
    const second = await world.firm.agent
      .post(`/api/jobs/${world.jobId}/members`)
      .send({ label: 'Porch header', wall: 'Porch', input: SAMPLE_HEADER })
      .expect(201);
    const res = await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({
        note: 'The porch header too',
        draft: {
          memberIds: [world.memberId, second.body.id],
          questions: 'Can both be flush?',
          conditions: { framingDirection: 'Joists run front to back' },
        },
      })
      .expect(201);
    const detail = requestDetailSchema.parse(res.body);
    expect(detail.version).toBe(2);
    expect(detail.draft?.questions).toBe('Can both be flush?');
    expect(detail.snapshot?.members.map((m) => m.label)).toEqual(['Kitchen header', 'Porch header']);
    expect(detail.snapshot?.questions).toBe('Can both be flush?');
    const changes = detail.versions[1].changes;
    expect(changes).toContainEqual(
      expect.objectContaining({
        group: 'Job and request',
        field: 'Questions for the engineer',
        after: 'Can both be flush?',
      }),
    );
    expect(changes).toContainEqual(
      expect.objectContaining({
        section: 'Conditions',
        field: 'Framing direction',
        after: 'Joists run front to back',
      }),
    );
    // The new member is one group, marked added, its inputs listed with nothing before.
    const porch = changes.filter((c) => c.group === 'Porch header (added)');
    expect(porch.length).toBeGreaterThan(0);
    expect(porch.every((c) => c.kind === 'added' && c.before === null)).toBe(true);
    expect(porch).toContainEqual(expect.objectContaining({ field: 'Clear span', after: `6' 0" (assumed)` }));
    const engineerView = await world.engineer.agent.get(`/api/requests/${id}`).expect(200);
    expect(engineerView.body.versions[1].changes).toEqual(detail.versions[1].changes);
    expect(engineerView.body.draft).toBeNull();
  });

  it('a refused edit sends nothing: a member of another job, or a new engineer, leaves version 1 as it was', async () => {
    const id = await world.sent();
    const before = requestDetailSchema.parse(
      (await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body,
    );
    const bad = await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ note: 'x', draft: { memberIds: ['not-a-member'], questions: 'Changed?' } })
      .expect(400);
    expect(bad.body.error.fields['memberIds.0']).toBeDefined();
    await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ note: 'x', draft: { engineerEmail: 'someone.else@example.test' } })
      .expect(409);
    await world.firm.agent.post(`/api/requests/${id}/revisions`).send({ note: 'x', draft: {} }).expect(400);
    const after = requestDetailSchema.parse(
      (await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body,
    );
    expect(after.version).toBe(1);
    expect(after.draft).toEqual(before.draft);
    expect(after.versions).toEqual(before.versions);
    expect((await mailTo(server, world.engineer.body.email)).map((m) => m.subject)).toEqual([
      expect.stringContaining('v1'),
    ]);
  });

  it('the engineer cannot revise, and the revision screen’s edits are the firm’s', async () => {
    const id = await world.sent();
    await world.engineer.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ note: 'mine', draft: { questions: 'Hijack' } })
      .expect(403);
    const detail = requestDetailSchema.parse(
      (await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body,
    );
    expect(detail.version).toBe(1);
    expect(detail.draft?.questions).toBe('Can the beam be flush with the joists?');
  });

  it('the engineer of a sent request cannot change', async () => {
    const id = await world.sent();
    await world.firm.agent
      .patch(`/api/requests/${id}`)
      .send({ engineerEmail: 'someone.else@example.test' })
      .expect(409);
    expect(requestRows()[0].engineerEmail).toBe(world.engineer.body.email);
  });
});

describe('the engineer without a bound account', () => {
  it('gets an invitation that binds the request to the account they make', async () => {
    const id = await world.draft(world.firm.agent, 'new.engineer@example.test');
    await world.firm.agent.post(`/api/requests/${id}/send`).expect(200);
    const [mail] = await mailTo(server, 'new.engineer@example.test');
    const token = mail.text.match(/\/request-invite\/([\w-]+)/)?.[1];
    expect(token).toBeDefined();
    const preview = await request(server.app).get(`/api/request-invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ email: 'new.engineer@example.test', number: 1, hasAccount: false });
    const missing = await request(server.app)
      .post(`/api/request-invitations/${token}/accept`)
      .send({})
      .expect(400);
    expect(Object.keys(missing.body.error.fields)).toEqual(['name', 'password', 'firmName']);
    const agent = request.agent(server.app);
    const accepted = await agent
      .post(`/api/request-invitations/${token}/accept`)
      .send({ name: 'New Engineer', password: 'a long enough password', firmName: 'New Structural' })
      .expect(201);
    expect(accepted.body).toMatchObject({
      requestId: id,
      me: { role: 'engineer', user: { emailVerified: true } },
    });
    const seen = await agent.get(`/api/requests/${id}`).expect(200);
    expect(seen.body).toMatchObject({ viewer: 'engineer', status: 'sent' });
    await request(server.app).get(`/api/request-invitations/${token}`).expect(404);
  });

  it('an unconfirmed engineer account is not bound at send; the link binds it once signed in, confirming it', async () => {
    const unconfirmed = await signedUpAgent(server.app, { firmKind: 'engineering' }, { confirmed: false });
    const id = await world.draft(world.firm.agent, unconfirmed.body.email);
    const sent = await world.firm.agent.post(`/api/requests/${id}/send`).expect(200);
    expect(sent.body.engineerBound).toBe(false);
    await unconfirmed.agent.get(`/api/requests/${id}`).expect(404);
    const mail = (await mailTo(server, unconfirmed.body.email)).find((m) => /request-invite/.test(m.text));
    const token = mail?.text.match(/\/request-invite\/([\w-]+)/)?.[1];
    await request(server.app).post(`/api/request-invitations/${token}/accept`).send({}).expect(401);
    await world.engineer.agent.post(`/api/request-invitations/${token}/accept`).send({}).expect(403);
    const res = await unconfirmed.agent.post(`/api/request-invitations/${token}/accept`).send({}).expect(200);
    expect(res.body.me.user.emailVerified).toBe(true);
    await unconfirmed.agent.get(`/api/requests/${id}`).expect(200);
  });
});
