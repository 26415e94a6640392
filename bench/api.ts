import { Agent, createServer, request } from 'node:http';
import type { AddressInfo } from 'node:net';
import { openDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { createApp } from '@/server/app';
import type { Mailer } from '@/server/services/mail/mailer';
import { memberCase, shortlistCase, spanTableCase } from './cases';

// API benchmark (node --import tsx bench/api.ts): the real app on a fresh in-memory database, one signed-in
// client firing sequential requests over loopback HTTP with keep-alive. DESIGN.md §9: the API holds
// hundreds of requests per second on two cores.

const CHECK_REQUESTS = 500;
const SHORTLIST_REQUESTS = 200;
const SPAN_TABLE_REQUESTS = 50;
const WARM_UP_REQUESTS = 50;

/** Mail the benchmark queues stays in the outbox: nothing delivers it. */
const noMail: Mailer = {
  wake: () => undefined,
  idle: () => Promise.resolve(),
  close: () => Promise.resolve(),
};

interface Answer {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
}

function post(port: number, agent: Agent, path: string, body: unknown, cookie = ''): Promise<Answer> {
  const payload = JSON.stringify(body);
  return new Promise((resolve, reject) => {
    const req = request(
      {
        host: '127.0.0.1',
        port,
        path,
        method: 'POST',
        agent,
        headers: {
          'content-type': 'application/json',
          'content-length': Buffer.byteLength(payload),
          ...(cookie ? { cookie } : {}),
        },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () =>
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            body: Buffer.concat(chunks).toString('utf8'),
          }),
        );
        res.on('error', reject);
      },
    );
    req.on('error', reject);
    req.end(payload);
  });
}

async function expectOk(answer: Promise<Answer>, path: string): Promise<Answer> {
  const { status, headers, body } = await answer;
  if (status !== 200 && status !== 201) throw new Error(`${path} answered ${status}: ${body.slice(0, 200)}`);
  return { status, headers, body };
}

async function main(): Promise<void> {
  const database = openDatabase(':memory:');
  migrateDatabase(database.db);
  const app = createApp({ db: database.db, mailer: noMail, appOrigin: 'http://127.0.0.1' });
  const server = createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  const agent = new Agent({ keepAlive: true, maxSockets: 1 });

  const person = {
    name: 'Bench Person',
    email: 'bench@example.test',
    password: 'a long bench password',
    firmName: 'Bench Firm',
    firmKind: 'contracting',
  };
  await expectOk(post(port, agent, '/api/auth/sign-up', person), '/api/auth/sign-up');
  const signIn = await expectOk(
    post(port, agent, '/api/auth/sign-in', { email: person.email, password: person.password }),
    '/api/auth/sign-in',
  );
  const setCookie = signIn.headers['set-cookie'];
  const cookie = (Array.isArray(setCookie) ? setCookie : [setCookie ?? ''])
    .map((c) => c.split(';')[0])
    .join('; ');

  const fire = async (path: string, body: unknown, count: number) => {
    for (let i = 0; i < count; i++) await expectOk(post(port, agent, path, body, cookie), path);
  };
  const rate = async (label: string, path: string, body: unknown, count: number) => {
    await fire(path, body, Math.min(WARM_UP_REQUESTS, count));
    const start = performance.now();
    await fire(path, body, count);
    const seconds = (performance.now() - start) / 1000;
    const perSecond = (count / seconds).toFixed(0);
    const msEach = ((seconds * 1000) / count).toFixed(2);
    console.log(`${label.padEnd(48)} ${perSecond.padStart(6)} requests/s   ${msEach.padStart(7)} ms each`);
  };

  await rate(`POST /api/calc/check × ${CHECK_REQUESTS}`, '/api/calc/check', memberCase, CHECK_REQUESTS);
  await rate(
    `POST /api/calc/shortlist (every size) × ${SHORTLIST_REQUESTS}`,
    '/api/calc/shortlist',
    shortlistCase,
    SHORTLIST_REQUESTS,
  );
  await rate(
    `POST /api/calc/span-table (sawn × 8) × ${SPAN_TABLE_REQUESTS}`,
    '/api/calc/span-table',
    spanTableCase,
    SPAN_TABLE_REQUESTS,
  );

  agent.destroy();
  await new Promise<void>((resolve, reject) => server.close((error) => (error ? reject(error) : resolve())));
  database.close();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
