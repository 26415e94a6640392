import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { databaseDump } from '@/tests/helpers/db-dump';
import {
  createTestServer,
  signUpBody,
  signedUpAgent,
  type Agent,
  type TestServer,
} from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId = '';
beforeAll(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  jobId = (await owner.post('/api/jobs').send({ name: 'Visible job' }).expect(201)).body.id;
});
afterAll(() => server.close());

/** Zero-width space, Hangul filler, blank Braille, word joiner, BOM: all show nothing. */
const INVISIBLE_NAME = '\u200b\u3164\u2800\u2060\ufeff';

describe('a name made only of invisible characters is refused like an empty one, and nothing changes', () => {
  const cases: [label: string, send: () => request.Test, field: string, message: string][] = [
    [
      'a job name',
      () => owner.post('/api/jobs').send({ name: INVISIBLE_NAME }),
      'name',
      'Give the job a name',
    ],
    [
      'a job renamed',
      () => owner.patch(`/api/jobs/${jobId}`).send({ name: INVISIBLE_NAME }),
      'name',
      'Give the job a name',
    ],
    [
      'a person signing up',
      () =>
        request(server.app)
          .post('/api/auth/sign-up')
          .send(signUpBody({ name: INVISIBLE_NAME })),
      'name',
      'Enter your name',
    ],
    [
      'a firm signing up',
      () =>
        request(server.app)
          .post('/api/auth/sign-up')
          .send(signUpBody({ firmName: INVISIBLE_NAME })),
      'firmName',
      'Enter your firm’s name',
    ],
  ];

  it.each(cases)('%s: 400 at the field', async (_label, send, field, message) => {
    const before = databaseDump(server.db);
    const res = await send();
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ [field]: [message] });
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('an invited person accepting with an invisible name: 400 at the field', async () => {
    await owner
      .post('/api/orgs/current/invitations')
      .send({ email: 'blank.name@example.test', role: 'estimator' });
    const token = (await server.capturedMail())[0].text.match(/\/invite\/([\w-]+)/)?.[1];
    const before = databaseDump(server.db);
    const res = await request(server.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: INVISIBLE_NAME, password: 'a long enough password' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ name: ['Enter your name'] });
    expect(databaseDump(server.db)).toEqual(before);
  });
});
