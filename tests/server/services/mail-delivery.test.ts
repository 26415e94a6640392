import { count, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { invitations, mailOutbox } from '@/db/schema';
import { startFakeSmtp, type FakeSmtp } from '@/server/services/fake-smtp';
import { DEFAULT_RETRY, retryWaitMs } from '@/server/services/mail/mailer';
import { enqueueMail } from '@/server/services/mail/outbox.repository';
import {
  TEST_RETRY,
  createTestServer,
  signedUpAgent,
  type Agent,
  type TestServer,
} from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let logged: string[];
let revived: FakeSmtp | undefined;
beforeEach(async () => {
  logged = [];
  server = await createTestServer({ log: (line) => logged.push(line) });
  owner = (await signedUpAgent(server.app)).agent;
});
afterEach(async () => {
  await revived?.close();
  revived = undefined;
  await server.close();
});

/** The outbox rows of invitations (sign-up's confirmation mail is there too). */
const outboxRows = () =>
  server.db
    .select()
    .from(mailOutbox)
    .all()
    .filter((row) => row.subject.includes('invited you'));
const invitationRow = () => outboxRows()[0];

describe('mail goes through the outbox', () => {
  it('an invitation while the mail server is down succeeds; its mail goes out once the server is back', async () => {
    const { port } = server.smtp;
    await server.smtp.close();
    const res = await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'while.down@example.test', role: 'estimator' });
    expect(res.status).toBe(201);
    await server.mailer.idle();
    const [row] = outboxRows();
    expect(row).toMatchObject({ to: 'while.down@example.test', status: 'pending', captured: false });
    expect(row.attempts).toBeGreaterThanOrEqual(1);
    expect(row.lastError).toMatch(/ECONNREFUSED/);
    expect(logged.join('\n')).toContain(`Mail ${row.id}: attempt 1 failed`);
    expect(logged.join('\n')).not.toContain('while.down@example.test');
    expect(logged.join('\n')).not.toContain('/invite/');

    revived = await startFakeSmtp(server.db, { port });
    await vi.waitFor(() => expect(invitationRow()).toMatchObject({ status: 'sent', captured: true }), {
      timeout: 5000,
      interval: 25,
    });
    const sent = invitationRow();
    expect(sent?.sentAt).toEqual(expect.any(String));
    expect(sent?.lastError).toBeNull();
    const token = sent?.text.match(/\/invite\/([\w-]+)/)?.[1];
    await request(server.app).get(`/api/invitations/${token}`).expect(200);
  });

  it('gives up after the last attempt: the mail is marked failed and the invitation stays', async () => {
    await server.smtp.close();
    await owner.post('/api/orgs/current/invitations').send({ email: 'never@example.test', role: 'owner' });
    await vi.waitFor(() => expect(invitationRow()?.status).toBe('failed'), {
      timeout: 5000,
      interval: 25,
    });
    expect(invitationRow()?.attempts).toBe(TEST_RETRY.maxAttempts);
    expect(logged.join('\n')).toContain('no attempts left, marked failed');
    expect(server.db.select({ n: count() }).from(invitations).get()?.n).toBe(1);
  });

  it('each invitation writes exactly one outbox row with its link, in the same transaction', async () => {
    for (const email of ['one@example.test', 'two@example.test', 'one@example.test']) {
      await owner.post('/api/orgs/current/invitations').send({ email, role: 'contractor' }).expect(201);
    }
    const pending = server.db.select().from(invitations).all();
    const mail = (await server.capturedMail()).filter((m) => m.subject.includes('invited you'));
    expect(outboxRows()).toHaveLength(3);
    expect(pending.map((i) => i.email).sort()).toEqual(['one@example.test', 'two@example.test']);
    expect(mail.map((m) => m.to).sort()).toEqual([
      'one@example.test',
      'one@example.test',
      'two@example.test',
    ]);
    expect(outboxRows().every((row) => row.status === 'sent' && row.attempts === 1)).toBe(true);
  });

  it('mail queued without a wake (left over from before a restart) is found by the timer', async () => {
    const id = enqueueMail(server.db, {
      to: 'left.over@example.test',
      subject: 'Left over',
      text: 'Body',
      html: '<p>Body</p>',
    });
    await vi.waitFor(
      () =>
        expect(server.db.select().from(mailOutbox).where(eq(mailOutbox.id, id)).get()?.status).toBe('sent'),
      { timeout: 5000, interval: 25 },
    );
  });
});

describe('retryWaitMs', () => {
  it('doubles from the first wait and stops growing at the longest', () => {
    const waits = Array.from({ length: 10 }, (_, i) => retryWaitMs(DEFAULT_RETRY, i + 1) / 1000);
    expect(waits).toEqual([30, 60, 120, 240, 480, 960, 1920, 3600, 3600, 3600]);
  });

  it('spreads the default attempts over about a day', () => {
    let totalMs = 0;
    for (let attempt = 1; attempt < DEFAULT_RETRY.maxAttempts; attempt += 1)
      totalMs += retryWaitMs(DEFAULT_RETRY, attempt);
    expect(totalMs / 3_600_000).toBeGreaterThan(20);
    expect(totalMs / 3_600_000).toBeLessThan(26);
  });
});
