import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { auditEvents, designRequests } from '@/db/schema';
import type { RequestState, StatusChange } from '@/shared/schemas/requests/workflow';
import { ONE_PIXEL_PNG, mailTo, requestWorld } from '@/tests/helpers/design-requests';
import { createTestServer, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;
beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
});
afterEach(() => server.close());

type To = StatusChange['to'];
type Side = 'firm' | 'engineer';
const TARGETS: To[] = ['in-review', 'needs-info', 'designed', 'closed', 'declined'];

/**
 * The state changes the issue allows, and only those: Sent → In review → Needs info ↔ In review → Designed
 * → Closed, Declined by the engineer from an open state; the contractor may say a Needs info question is
 * answered (back to In review).
 */
const ALLOWED: Record<RequestState, Record<Side, To[]>> = {
  draft: { firm: [], engineer: [] },
  sent: { firm: [], engineer: ['in-review', 'declined'] },
  'in-review': { firm: [], engineer: ['needs-info', 'designed', 'declined'] },
  'needs-info': { firm: ['in-review'], engineer: ['in-review', 'declined'] },
  designed: { firm: ['closed'], engineer: [] },
  closed: { firm: [], engineer: [] },
  declined: { firm: [], engineer: [] },
};

const agentOf = (side: Side) => (side === 'firm' ? world.firm.agent : world.engineer.agent);
const move = (side: Side, id: string, to: To, reason = '') =>
  agentOf(side).post(`/api/requests/${id}/status`).send({ to, reason });
const row = (id: string) => server.db.select().from(designRequests).where(eq(designRequests.id, id)).get();

/** The fee quoted and accepted, a structured reply and a design document for the current version. */
async function readyToDesign(id: string) {
  await world.engineer.agent
    .post(`/api/requests/${id}/fee`)
    .send({ feeUsd: 650, turnaroundDays: 5, siteVisit: false })
    .expect(200);
  await world.firm.agent.post(`/api/requests/${id}/fee/accept`).expect(200);
  await world.engineer.agent.post(`/api/requests/${id}/reply`).send(sampleReply()).expect(201);
  await world.engineer.agent
    .post(`/api/requests/${id}/attachments`)
    .field('purpose', 'design')
    .attach('file', ONE_PIXEL_PNG, 'design.png')
    .expect(201);
}

/** Invented demo reply: a 2-ply 1-3/4 x 9-1/4 LVL. */
const sampleReply = () => ({
  members: [
    {
      memberId: world.memberId,
      material: 'lvl',
      designation: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
      plies: 2,
      widthIn: 3.5,
      depthIn: 9.25,
      plyFastening: '2 rows 16d at 12 in',
      bearingLeftIn: 3,
      bearingRightIn: 3,
      posts: '(2) 2x6 each end',
      footing: 'None needed: bears on the existing wall',
    },
  ],
  verifyInField: [{ item: 'Joist size and spacing over the opening', photo: true }],
  feeUsd: 650,
  turnaroundDays: 5,
});

/** A request brought to `state` through the API. */
async function requestIn(state: RequestState): Promise<string> {
  if (state === 'draft') return world.draft();
  const id = await world.sent(state === 'sent' || state === 'declined' ? 'sent' : 'in-review');
  if (state === 'declined') await move('engineer', id, 'declined', 'Outside my state of licence').expect(200);
  if (state === 'needs-info')
    await move('engineer', id, 'needs-info', 'What bears under the left end?').expect(200);
  if (state === 'in-review' || state === 'designed' || state === 'closed') await readyToDesign(id);
  if (state === 'designed' || state === 'closed') await move('engineer', id, 'designed').expect(200);
  if (state === 'closed') await move('firm', id, 'closed').expect(200);
  return id;
}

describe('every state change from every state, by both sides', () => {
  describe.each(Object.keys(ALLOWED) as RequestState[])('from %s', (state) => {
    it('refuses every change the issue does not list, and changes nothing', async () => {
      const id = await requestIn(state);
      for (const side of ['firm', 'engineer'] as const) {
        for (const to of TARGETS.filter((t) => !ALLOWED[state][side].includes(t))) {
          const before = row(id);
          const res = await move(side, id, to, 'a reason');
          const expected = side === 'engineer' && state === 'draft' ? [404] : [403, 409];
          expect(expected, `${side} ${state} → ${to}: ${res.text}`).toContain(res.status);
          expect(row(id), `${side} ${state} → ${to}`).toEqual(before);
        }
      }
    });

    const allowed = (['firm', 'engineer'] as const).flatMap((side) =>
      ALLOWED[state][side].map((to) => [side, to] as const),
    );
    if (allowed.length === 0) return;
    it.each(allowed)('allows the %s to move it to %s', async (side, to) => {
      const id = await requestIn(state);
      const res = await move(side, id, to, 'a reason').expect(200);
      expect(res.body.status).toBe(to);
      expect(res.body.thread.at(-1)).toMatchObject({ kind: 'event', event: to, side });
    });
  });
});

describe('Designed needs the fee accepted, a reply and a design document for the current version', () => {
  it('refuses each one missing', async () => {
    const id = await world.sent('in-review');
    const none = await move('engineer', id, 'designed').expect(409);
    expect(none.body.error.message).toMatch(
      /not accepted a fee.*no structured reply to version 1.*no design document/,
    );
    await world.engineer.agent
      .post(`/api/requests/${id}/fee`)
      .send({ feeUsd: 400, turnaroundDays: 3 })
      .expect(200);
    await world.firm.agent.post(`/api/requests/${id}/fee/accept`).expect(200);
    await world.engineer.agent.post(`/api/requests/${id}/reply`).send(sampleReply()).expect(201);
    const noDocument = await move('engineer', id, 'designed').expect(409);
    expect(noDocument.body.error.message).toBe('Not Designed yet: no design document answers version 1');
    expect(row(id)?.status).toBe('in-review');
  });

  it('a design document of an older version does not answer a revision', async () => {
    const id = await world.sent('in-review');
    await readyToDesign(id);
    await world.firm.agent.post(`/api/requests/${id}/revisions`).send({ note: 'Post moved' }).expect(201);
    const res = await move('engineer', id, 'designed').expect(409);
    expect(res.body.error.message).toContain(
      'no structured reply to version 2; no design document answers version 2',
    );
  });
});

describe('the fee step', () => {
  it('is quoted by the engineer in review and accepted by the firm, once', async () => {
    const id = await world.sent();
    const quote = { feeUsd: 650, turnaroundDays: 5, siteVisit: true, note: 'Site visit included' };
    await world.engineer.agent.post(`/api/requests/${id}/fee`).send(quote).expect(409);
    await move('engineer', id, 'in-review').expect(200);
    await world.firm.agent.post(`/api/requests/${id}/fee`).send(quote).expect(403);
    await world.firm.agent.post(`/api/requests/${id}/fee/accept`).expect(409);
    const quoted = await world.engineer.agent.post(`/api/requests/${id}/fee`).send(quote).expect(200);
    expect(quoted.body.fee).toMatchObject({
      feeUsd: 650,
      turnaroundDays: 5,
      siteVisit: true,
      acceptedAt: null,
    });
    await world.engineer.agent.post(`/api/requests/${id}/fee/accept`).expect(403);
    const accepted = await world.firm.agent.post(`/api/requests/${id}/fee/accept`).expect(200);
    expect(accepted.body.fee.acceptedAt).toEqual(expect.any(String));
    await world.firm.agent.post(`/api/requests/${id}/fee/accept`).expect(409);
    const requoted = await world.engineer.agent
      .post(`/api/requests/${id}/fee`)
      .send({ ...quote, feeUsd: 900 })
      .expect(200);
    expect(requoted.body.fee).toMatchObject({ feeUsd: 900, acceptedAt: null });
    const mails = await mailTo(server, world.firm.body.email);
    expect(mails.map((m) => m.subject)).toEqual(
      expect.arrayContaining([
        expect.stringContaining('fee quoted: $650'),
        expect.stringContaining('fee quoted: $900'),
      ]),
    );
    expect((await mailTo(server, world.engineer.body.email)).map((m) => m.subject)).toEqual(
      expect.arrayContaining([expect.stringContaining('fee accepted')]),
    );
  });
});

describe('the structured reply', () => {
  it('answers the current version with the engineer’s member and the items to verify in the field', async () => {
    const id = await requestIn('in-review');
    await world.firm.agent.post(`/api/requests/${id}/reply`).send(sampleReply()).expect(403);
    const res = await world.engineer.agent.post(`/api/requests/${id}/reply`).send(sampleReply()).expect(201);
    expect(res.body.reply).toMatchObject({ version: 1, reply: { members: [{ material: 'lvl', plies: 2 }] } });
    const seen = await world.firm.agent.get(`/api/requests/${id}`).expect(200);
    expect(seen.body.reply.reply.verifyInField).toEqual([
      { item: 'Joist size and spacing over the opening', photo: true },
    ]);
    expect(seen.body.reply.reply.members[0].designation).toBe('2-ply 1-3/4 x 9-1/4 LVL 2.0E');
    const [mail] = await mailTo(server, world.firm.body.email);
    expect(mail.subject).toContain('the engineer replied to version 1');
    expect(mail.text).toContain(`/requests/${id}`);
  });

  it('refuses a member the request does not hold, a W shape in plies, and a reply before review', async () => {
    const sent = await world.sent();
    await world.engineer.agent.post(`/api/requests/${sent}/reply`).send(sampleReply()).expect(409);
    const id = await requestIn('in-review');
    const stranger = {
      ...sampleReply(),
      members: [{ ...sampleReply().members[0], memberId: 'not-a-member' }],
    };
    const res = await world.engineer.agent.post(`/api/requests/${id}/reply`).send(stranger).expect(400);
    expect(res.body.error.fields['members.0.memberId']).toEqual(['Not a member of this request']);
    const steel = {
      ...sampleReply(),
      members: [{ ...sampleReply().members[0], material: 'steel-w', designation: 'W8x18' }],
    };
    await world.engineer.agent.post(`/api/requests/${id}/reply`).send(steel).expect(400);
    const flitch = {
      ...sampleReply(),
      members: [{ ...sampleReply().members[0], material: 'flitch', designation: '2-2x10 + 3/8 x 9 plate' }],
    };
    await world.engineer.agent.post(`/api/requests/${id}/reply`).send(flitch).expect(201);
  });
});

describe('revisions and reopening', () => {
  it('a Designed request reopens with a question as a new version, back in review', async () => {
    const id = await requestIn('designed');
    await world.firm.agent.post(`/api/requests/${id}/revisions`).send({ note: 'x' }).expect(400);
    const res = await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ note: 'Asking about the post', question: 'Can the left post be a 4x4?' })
      .expect(201);
    expect(res.body).toMatchObject({ status: 'in-review', version: 2 });
    expect(
      res.body.thread.map((e: { event: string | null; body: string }) => e.event ?? e.body).slice(-2),
    ).toEqual(['reopened', 'Can the left post be a 4x4?']);
    const mails = await mailTo(server, world.engineer.body.email);
    expect(mails[0].subject).toContain('v2');
  });

  it.each(['closed', 'declined'] as const)('a %s request cannot be revised or edited', async (state) => {
    const id = await requestIn(state);
    await world.firm.agent.post(`/api/requests/${id}/revisions`).send({ note: 'late' }).expect(409);
    await world.firm.agent.patch(`/api/requests/${id}`).send({ questions: 'late' }).expect(409);
  });

  it('Declined keeps its reason and needs one', async () => {
    const id = await world.sent();
    await move('engineer', id, 'declined').expect(400);
    await move('engineer', id, 'declined', 'Not licensed in PA').expect(200);
    expect(row(id)?.declineReason).toBe('Not licensed in PA');
    const [mail] = await mailTo(server, world.firm.body.email);
    expect(mail.subject).toContain('now Declined (Not licensed in PA)');
  });
});

describe('messages and the record', () => {
  it('go both ways, mail the other side and mark it unread; a Draft has no thread to write in', async () => {
    const draft = await world.draft();
    await world.firm.agent.post(`/api/requests/${draft}/messages`).send({ body: 'Hello' }).expect(409);
    const id = await world.sent();
    await world.engineer.agent.get(`/api/requests/${id}`).expect(200);
    await world.engineer.agent
      .post(`/api/requests/${id}/messages`)
      .send({ body: 'Which way do the joists run?' })
      .expect(201);
    const list = await world.firm.agent.get('/api/requests').expect(200);
    expect(list.body.requests.find((r: { id: string }) => r.id === id).unread).toBe(true);
    await world.firm.agent.post(`/api/requests/${id}/messages`).send({ body: 'Front to back' }).expect(201);
    const thread = await world.engineer.agent.get(`/api/requests/${id}/messages`).expect(200);
    expect(
      thread.body.thread
        .filter((e: { kind: string }) => e.kind === 'message')
        .map((e: { side: string; body: string }) => [e.side, e.body]),
    ).toEqual([
      ['engineer', 'Which way do the joists run?'],
      ['firm', 'Front to back'],
    ]);
    expect((await mailTo(server, world.firm.body.email))[0].subject).toContain('a message from the engineer');
    expect((await mailTo(server, world.engineer.body.email))[0].subject).toContain(
      'a message from the contractor',
    );
  });

  it('every action is an audit event in the sending firm’s log, naming who and which side', async () => {
    const id = await requestIn('closed');
    const events = server.db.select().from(auditEvents).where(eq(auditEvents.subject, id)).all();
    expect(events.map((e) => e.action)).toEqual([
      'request.create',
      'request.send',
      'request.status',
      'request.fee-quote',
      'request.fee-accept',
      'request.reply',
      'request.upload',
      'request.status',
      'request.status',
    ]);
    const orgs = new Set(events.map((e) => e.orgId));
    expect(orgs.size).toBe(1);
    expect(events.find((e) => e.action === 'request.reply')).toMatchObject({
      userId: world.engineer.me.user.id,
      detail: { side: 'engineer', version: 1 },
    });
  });
});
