import { once } from 'node:events';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';
import { databaseDump } from '@/tests/helpers/db-dump';

let server: TestServer;
let owner: Agent;
let logged: string[];
beforeEach(async () => {
  logged = [];
  server = await createTestServer({ log: (line) => logged.push(line) });
  owner = (await signedUpAgent(server.app)).agent;
});
afterEach(() => server.close());

const JOB = JSON.stringify({ name: 'Sent in a body nobody can read' });
const SIGN_IN = JSON.stringify({ email: 'nobody@example.test', password: 'not the password' });

/** supertest re-encodes a Buffer body, so compressed bodies go over a real socket with fetch. */
async function rawPost(path: string, headers: Record<string, string>, body: Buffer) {
  const listener = createServer(server.app).listen(0, '127.0.0.1');
  await once(listener, 'listening');
  try {
    const { port } = listener.address() as AddressInfo;
    const res = await fetch(`http://127.0.0.1:${port}${path}`, {
      method: 'POST',
      headers,
      body: new Uint8Array(body),
    });
    return { status: res.status, body: (await res.json()) as unknown };
  } finally {
    listener.close();
  }
}

/** Each case answers `status` with `message`, writes nothing and logs no stack trace. */
async function expectRefused(send: () => request.Test, status: number, message: string) {
  const before = databaseDump(server.db);
  const res = await send();
  expect(res.status).toBe(status);
  expect(res.body).toEqual({ error: { code: 'bad_request', message, requestId: expect.any(String) } });
  expect(databaseDump(server.db)).toEqual(before);
  expect(logged.filter((line) => line.includes('"level":"error"'))).toEqual([]);
}

describe('a malformed percent-encoding in the path', () => {
  const message = 'The request path has a broken percent-encoding';

  it.each(['/api/invitations/%ZZ', '/api/invitations/%E0%A4%A', '/api/invitations/%'])(
    'GET %s signed out: 400',
    async (path) => {
      await expectRefused(() => request(server.app).get(path), 400, message);
    },
  );

  it('POST /api/invitations/%ZZ/accept signed out, GET and PATCH /api/jobs/%ZZ signed in: 400', async () => {
    await expectRefused(() => request(server.app).post('/api/invitations/%ZZ/accept').send({}), 400, message);
    await expectRefused(() => owner.get('/api/jobs/%ZZ'), 400, message);
    await expectRefused(() => owner.patch('/api/jobs/%ZZ').send({ name: 'x' }), 400, message);
  });
});

describe('a JSON body that cannot be read', () => {
  const post = (headers: Record<string, string>, body: string | Buffer) => () =>
    owner.post('/api/jobs').set(headers).send(body);

  it('charset=latin1 (or any non-UTF charset): 415', async () => {
    const message = 'Send the JSON body in UTF-8';
    await expectRefused(post({ 'Content-Type': 'application/json; charset=latin1' }, JOB), 415, message);
    await expectRefused(post({ 'Content-Type': 'application/json; charset=koi8-r' }, JOB), 415, message);
  });

  it('an unknown Content-Encoding: 415', async () => {
    const message = 'Send the body uncompressed or with Content-Encoding gzip, deflate or br';
    const json = { 'Content-Type': 'application/json' };
    await expectRefused(post({ ...json, 'Content-Encoding': 'br2' }, JOB), 415, message);
    await expectRefused(post({ ...json, 'Content-Encoding': 'compress' }, JOB), 415, message);
  });

  it('a broken or cut-off gzip body: 400; a whole one is read as usual', async () => {
    const message = 'The compressed request body is broken';
    const gzip = { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' };
    const whole = gzipSync(Buffer.from(SIGN_IN));
    for (const broken of [Buffer.from('this is not gzip'), whole.subarray(0, whole.length - 12)]) {
      const before = databaseDump(server.db);
      const res = await rawPost('/api/auth/sign-in', gzip, broken);
      expect(res).toEqual({
        status: 400,
        body: { error: { code: 'bad_request', message, requestId: expect.any(String) } },
      });
      expect(databaseDump(server.db)).toEqual(before);
    }
    const read = await rawPost('/api/auth/sign-in', gzip, whole);
    expect(read.status).toBe(401);
    expect(logged.filter((line) => line.includes('"level":"error"'))).toEqual([]);
  });
});
