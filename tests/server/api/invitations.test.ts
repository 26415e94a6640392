import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { auditEvents, invitations } from '@/db/schema';
import { meSchema } from '@/shared/schemas/auth';
import { invitationPreviewSchema, invitationRowSchema, membersResponseSchema } from '@/shared/schemas/orgs';
import { capturedMailListSchema } from '@/shared/schemas/mail';
import {
  DEV_MAIL_PATH,
  TEST_APP_ORIGIN,
  createTestServer,
  signUpBody,
  signedUpAgent,
  type TestServer,
} from '@/tests/helpers/server';

let server: TestServer;
beforeEach(async () => {
  server = await createTestServer();
});
afterEach(() => server.close());

/** The token in the newest captured e-mail to `to`. */
async function tokenMailedTo(to: string): Promise<string> {
  const mail = (await server.capturedMail()).find((m) => m.to === to);
  const match = mail?.text.match(new RegExp(`${TEST_APP_ORIGIN}/invite/([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no invitation mail to ${to}`);
  return match[1];
}

describe('invitations', () => {
  it('owner invites, the mail is captured, the invitee previews and accepts as a new person', async () => {
    const { agent: owner, body: ownerBody } = await signedUpAgent(server.app);
    const created = await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'New.Hire@Example.TEST', role: 'estimator' })
      .expect(201);
    const row = invitationRowSchema.parse(created.body);
    expect(row).toMatchObject({ email: 'new.hire@example.test', role: 'estimator', acceptedAt: null });
    const days = (Date.parse(row.expiresAt) - Date.parse(row.createdAt)) / 86_400_000;
    expectApprox(days, 7, { abs: 1 / 86_400 });

    await server.mailer.idle();
    const mailList = capturedMailListSchema.parse(
      (await request(server.app).get(DEV_MAIL_PATH).expect(200)).body,
    );
    const invitationMails = mailList.messages.filter((m) => m.subject.includes('invited you'));
    expect(invitationMails).toHaveLength(1);
    expect(invitationMails[0].subject).toBe(
      `${ownerBody.name} invited you to ${ownerBody.firmName} on Tributary`,
    );
    const token = await tokenMailedTo('new.hire@example.test');
    const stored = server.db.select().from(invitations).where(eq(invitations.id, row.id)).get();
    expect(stored?.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored?.tokenHash).not.toContain(token);

    const preview = invitationPreviewSchema.parse(
      (await request(server.app).get(`/api/invitations/${token}`).expect(200)).body,
    );
    expect(preview).toMatchObject({
      orgName: ownerBody.firmName,
      email: 'new.hire@example.test',
      role: 'estimator',
      invitedBy: ownerBody.name,
      hasAccount: false,
    });

    const invitee = request.agent(server.app);
    const accepted = await invitee
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Nell Hire', password: 'a long enough password' })
      .expect(201);
    const me = meSchema.parse(accepted.body);
    expect(me.role).toBe('estimator');
    expect(me.user).toMatchObject({ email: 'new.hire@example.test', name: 'Nell Hire' });
    await invitee.get('/api/jobs').expect(200);

    const members = membersResponseSchema.parse(
      (await owner.get('/api/orgs/current/members').expect(200)).body,
    );
    expect(members.members.map((m) => [m.email, m.role])).toEqual([
      [ownerBody.email, 'owner'],
      ['new.hire@example.test', 'estimator'],
    ]);
    expect(members.invitations).toEqual([]);
    const actions = server.db.select({ action: auditEvents.action }).from(auditEvents).all();
    expect(actions.map((a) => a.action)).toEqual(
      expect.arrayContaining(['invitation.create', 'invitation.accept']),
    );
  });

  it('a used, unknown or expired token answers 404', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'once@example.test', role: 'contractor' });
    const token = await tokenMailedTo('once@example.test');
    await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Once', password: 'a long enough password' })
      .expect(201);
    await request(server.app).get(`/api/invitations/${token}`).expect(404);
    await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Twice', password: 'a long enough password' })
      .expect(404);
    await request(server.app).get('/api/invitations/not-a-real-token').expect(404);

    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'late@example.test', role: 'contractor' });
    const lateToken = await tokenMailedTo('late@example.test');
    server.db
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000).toISOString() })
      .where(eq(invitations.email, 'late@example.test'))
      .run();
    const res = await request(server.app).get(`/api/invitations/${lateToken}`).expect(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('a new person must send a name and a password', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'blank@example.test', role: 'contractor' });
    const res = await request(server.app)
      .post(`/api/invitations/${await tokenMailedTo('blank@example.test')}/accept`)
      .send({})
      .expect(400);
    expect(res.body.error.fields).toEqual({ name: ['Enter your name'], password: ['Choose a password'] });
  });

  it('an existing account accepts while signed in as that e-mail; anyone else gets 401 or 403', async () => {
    const { agent: owner, body: ownerBody } = await signedUpAgent(server.app);
    const { agent: existing, body: existingBody } = await signedUpAgent(server.app);
    const { agent: stranger } = await signedUpAgent(server.app);
    await owner.post('/api/orgs/current/invitations').send({ email: existingBody.email, role: 'contractor' });
    const token = await tokenMailedTo(existingBody.email);
    const preview = await request(server.app).get(`/api/invitations/${token}`).expect(200);
    expect(preview.body.hasAccount).toBe(true);

    await request(server.app).post(`/api/invitations/${token}/accept`).send({}).expect(401);
    const wrong = await stranger.post(`/api/invitations/${token}/accept`).send({}).expect(403);
    expect(wrong.body.error.code).toBe('forbidden');

    const res = await existing.post(`/api/invitations/${token}/accept`).send({}).expect(200);
    const me = meSchema.parse(res.body);
    expect(me.memberships.map((m) => m.orgName)).toEqual([existingBody.firmName, ownerBody.firmName]);
    expect(me.role).toBe('contractor');
    expect(me.activeOrgId).toBe(me.memberships[1].orgId);
    const asOwnFirm = await existing.get('/api/me').expect(200);
    expect(asOwnFirm.body.role).toBe('owner');
    const asNewFirm = await existing.get('/api/me').set('X-Org-Id', me.activeOrgId).expect(200);
    expect(asNewFirm.body.role).toBe('contractor');
  });

  it('only an owner may invite or list members', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'crew@example.test', role: 'contractor' });
    const crew = request.agent(server.app);
    await crew
      .post(`/api/invitations/${await tokenMailedTo('crew@example.test')}/accept`)
      .send({ name: 'Crew Lead', password: 'a long enough password' })
      .expect(201);
    const res = await crew
      .post('/api/orgs/current/invitations')
      .send({ email: 'friend@example.test', role: 'owner' })
      .expect(403);
    expect(res.body.error.code).toBe('forbidden');
    await crew.get('/api/orgs/current/members').expect(403);
    const { agent: engineer } = await signedUpAgent(server.app, { firmKind: 'engineering' });
    await engineer
      .post('/api/orgs/current/invitations')
      .send({ email: 'x@example.test', role: 'owner' })
      .expect(403);
    const invitationMails = (await server.capturedMail()).filter((m) => m.subject.includes('invited you'));
    expect(invitationMails.map((m) => m.to)).toEqual(['crew@example.test']);
  });

  it('inviting an existing member is a 409; engineers cannot be invited into a contracting firm', async () => {
    const { agent: owner, body } = await signedUpAgent(server.app);
    const dup = await owner
      .post('/api/orgs/current/invitations')
      .send({ email: body.email, role: 'contractor' });
    expect(dup.status).toBe(409);
    const engineer = await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'eng@example.test', role: 'engineer' })
      .expect(400);
    expect(Object.keys(engineer.body.error.fields)).toEqual(['role']);
  });

  it('a new invitation to the same e-mail replaces the pending one; the owner can revoke it', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'twice@example.test', role: 'contractor' });
    const firstToken = await tokenMailedTo('twice@example.test');
    const second = await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'twice@example.test', role: 'estimator' })
      .expect(201);
    await request(server.app).get(`/api/invitations/${firstToken}`).expect(404);
    const listed = await owner.get('/api/orgs/current/members').expect(200);
    expect(listed.body.invitations.map((i: { id: string }) => i.id)).toEqual([second.body.id]);

    const { agent: otherOwner } = await signedUpAgent(server.app);
    await otherOwner.delete(`/api/orgs/current/invitations/${second.body.id}`).expect(404);
    await owner.delete(`/api/orgs/current/invitations/${second.body.id}`).expect(204);
    await owner.delete(`/api/orgs/current/invitations/${second.body.id}`).expect(404);
    await request(server.app)
      .get(`/api/invitations/${await tokenMailedTo('twice@example.test')}`)
      .expect(404);
  });
});

describe('sign-up e-mail normalisation meets invitations', () => {
  it('an invitation to a mixed-case e-mail matches the account signed up in lower case', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    const body = signUpBody({ email: 'mixed.case@example.test' });
    await request(server.app).post('/api/auth/sign-up').send(body).expect(201);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'MIXED.Case@example.test', role: 'contractor' });
    const preview = await request(server.app).get(
      `/api/invitations/${await tokenMailedTo('mixed.case@example.test')}`,
    );
    expect(preview.body.hasAccount).toBe(true);
  });
});
