import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { PASSWORD_IS_COMMON } from '@/server/services/common-password';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signUpBody, signedUpAgent, type TestServer } from '@/tests/helpers/server';

// "Common" is the passwords-common list of @zxcvbn-ts/language-common 4.1.3, scored by @zxcvbn-ts/core 4.2.

let server: TestServer;
beforeEach(async () => {
  server = await createTestServer();
});
afterEach(() => server.close());

const refused = { password: [PASSWORD_IS_COMMON] };

describe('common passwords are refused at the password field, and nothing changes', () => {
  it('on sign-up', async () => {
    const before = databaseDump(server.db);
    for (const password of ['1234567890', 'Password123!']) {
      const res = await request(server.app).post('/api/auth/sign-up').send(signUpBody({ password }));
      expect(res.status, password).toBe(400);
      expect(res.body.error.fields).toEqual(refused);
    }
    expect(databaseDump(server.db)).toEqual(before);
    await request(server.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
  });

  it('on a password reset, leaving the link usable', async () => {
    const { body } = await signedUpAgent(server.app);
    await request(server.app).post('/api/auth/password-reset').send({ email: body.email }).expect(204);
    const mail = (await server.capturedMail()).find(
      (m) => m.to === body.email && /reset-password/.test(m.text),
    );
    const token = mail?.text.match(/\/reset-password\/([\w-]+)/)?.[1];
    const before = databaseDump(server.db);
    const res = await request(server.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ password: 'qwertyuiop' })
      .expect(400);
    expect(res.body.error.fields).toEqual(refused);
    expect(databaseDump(server.db)).toEqual(before);
    await request(server.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ password: 'a new unrelated passphrase' })
      .expect(200);
  });

  it('when a new person accepts an invitation', async () => {
    const { agent: owner } = await signedUpAgent(server.app);
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'common.invitee@example.test', role: 'estimator' })
      .expect(201);
    const mail = (await server.capturedMail()).find((m) => m.to === 'common.invitee@example.test');
    const token = mail?.text.match(/\/invite\/([\w-]+)/)?.[1];
    const before = databaseDump(server.db);
    const res = await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Invitee', password: 'basketball' })
      .expect(400);
    expect(res.body.error.fields).toEqual(refused);
    expect(databaseDump(server.db)).toEqual(before);
  });
});
