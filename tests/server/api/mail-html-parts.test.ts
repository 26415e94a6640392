import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CapturedMail } from '@/shared/schemas/mail';
import { requestWorld } from '../../helpers/design-requests';
import { createTestServer, signedUpAgent, type TestServer } from '../../helpers/server';

const HOSTILE = 'Dana <script>alert(1)</script>';
const ESCAPED = 'Dana &lt;script&gt;alert(1)&lt;/script&gt;';

let server: TestServer;
beforeAll(async () => {
  server = await createTestServer();
});
afterAll(() => server.close());

/** The anchors' targets, with the `&amp;` of an attribute read back. */
const hrefs = (html: string) => [...html.matchAll(/href="([^"]*)"/g)].map((m) => m[1].replace(/&amp;/g, '&'));
const links = (text: string) => text.match(/https?:\/\/\S+/g) ?? [];

/** Both parts as the fake SMTP server captured them: the same links, and no markup a person typed. */
function expectBothParts(mail: CapturedMail | undefined, typed?: { raw: string; escaped: string }) {
  expect(mail).toBeDefined();
  const html = mail!.html ?? '';
  expect(html).toMatch(/^<!doctype html>/);
  expect(hrefs(html)).toEqual(links(mail!.text));
  expect(links(mail!.text).length).toBeGreaterThan(0);
  expect(html).not.toMatch(/<script/i);
  if (typed) {
    expect(mail!.text).toContain(typed.raw);
    expect(html).toContain(typed.escaped);
  }
}

describe('every mail goes out with an HTML part beside the text', () => {
  it('e-mail confirmation and password reset: the person’s name escaped', async () => {
    const { body } = await signedUpAgent(server.app, { name: HOSTILE }, { confirmed: false });
    await request(server.app).post('/api/auth/password-reset').send({ email: body.email }).expect(204);
    const mail = (await server.capturedMail()).filter((m) => m.to === body.email);
    expectBothParts(
      mail.find((m) => /verify-email/.test(m.text)),
      { raw: HOSTILE, escaped: ESCAPED },
    );
    expectBothParts(
      mail.find((m) => /reset-password/.test(m.text)),
      { raw: HOSTILE, escaped: ESCAPED },
    );
  });

  it('an invitation to a firm: the inviter’s and the firm’s names escaped', async () => {
    const owner = await signedUpAgent(server.app, { name: HOSTILE, firmName: 'Sample & <b>Sons</b>' });
    await owner.agent
      .post('/api/orgs/current/invitations')
      .send({ email: 'html.invitee@example.test', role: 'estimator' })
      .expect(201);
    const [mail] = (await server.capturedMail()).filter((m) => m.to === 'html.invitee@example.test');
    expectBothParts(mail, { raw: HOSTILE, escaped: ESCAPED });
    expect(mail.html).toContain('Sample &amp; &lt;b&gt;Sons&lt;/b&gt;');
  });

  it('send, revision, state change and reply: to the engineer and to the contractor', async () => {
    const world = await requestWorld(server, {
      contractorName: HOSTILE,
      jobName: 'Job <img src=x onerror=alert(1)>',
    });
    const id = await world.sent('in-review');
    await world.firm.agent.post(`/api/requests/${id}/revisions`).send({ note: 'Post moved' }).expect(201);
    await world.reply(id);
    const all = await server.capturedMail();
    const toEngineer = all.filter(
      (m) => m.to === world.engineer.body.email && /^Design request/.test(m.subject),
    );
    const toFirm = all.filter((m) => m.to === world.firm.body.email && /^Design request/.test(m.subject));
    const sent = toEngineer.find((m) => / v1 /.test(m.subject));
    const revised = toEngineer.find((m) => / v2 /.test(m.subject));
    expect(revised?.text).toContain('revised (version 2)');
    for (const mail of [sent, revised]) {
      expectBothParts(mail, { raw: HOSTILE, escaped: ESCAPED });
      expect(mail!.html).not.toContain('<img');
    }
    const inReview = toFirm.find((m) => /now In review/.test(m.subject));
    const replied = toFirm.find((m) => /the engineer replied/.test(m.subject));
    for (const mail of [inReview, replied]) {
      expectBothParts(mail);
      expect(mail!.html).toContain('Job &lt;img src=x onerror=alert(1)&gt;');
    }
  });
});
