import { count } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEMO_PRICES } from '@/db/demo-prices';
import { DEMO_PASSWORD, insertDemoData } from '@/db/seed';
import { jobs, users } from '@/db/schema';
import { hashPassword } from '@/server/services/password';
import { meSchema } from '@/shared/schemas/auth';
import { createTestServer, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
beforeEach(async () => {
  server = await createTestServer();
});
afterEach(() => server.close());

describe('demo data', () => {
  it('is added once to an empty database and never again', async () => {
    expect(await insertDemoData(server.db, hashPassword)).toBe(true);
    expect(await insertDemoData(server.db, hashPassword)).toBe(false);
    expect(server.db.select({ n: count() }).from(users).get()?.n).toBe(4);
    expect(server.db.select({ n: count() }).from(jobs).get()?.n).toBe(3);
  });

  it('gives the demo firm a price book of invented prices, every fixed item priced', async () => {
    await insertDemoData(server.db, hashPassword);
    const agent = request.agent(server.app);
    await agent
      .post('/api/auth/sign-in')
      .send({ email: 'estimator@demo.tributary.test', password: DEMO_PASSWORD })
      .expect(200);
    const book = (await agent.get('/api/price-book').expect(200)).body;
    expect(book.unpriced).toEqual([]);
    expect(book.items).toHaveLength(DEMO_PRICES.length);
    expect(book.items.every((i: { note: string }) => i.note === 'Invented demo price')).toBe(true);
  });

  it('is not added when someone already signed up', async () => {
    await request(server.app)
      .post('/api/auth/sign-up')
      .send({ name: 'First', email: 'first@example.test', password: 'a long enough password', firmName: 'F' })
      .expect(201);
    expect(await insertDemoData(server.db, hashPassword)).toBe(false);
    expect(server.db.select({ n: count() }).from(jobs).get()?.n).toBe(0);
  });

  it.each([
    ['owner@demo.tributary.test', 'owner', 'contracting', 3],
    ['contractor@demo.tributary.test', 'contractor', 'contracting', 3],
    ['estimator@demo.tributary.test', 'estimator', 'contracting', 3],
    ['engineer@demo.tributary.test', 'engineer', 'engineering', null],
  ] as const)('%s signs in with the demo password as %s', async (email, role, kind, jobCount) => {
    await insertDemoData(server.db, hashPassword);
    const agent = request.agent(server.app);
    const res = await agent.post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD }).expect(200);
    const me = meSchema.parse(res.body);
    expect([me.role, me.memberships[0].orgKind]).toEqual([role, kind]);
    const list = await agent.get('/api/jobs');
    if (jobCount === null) expect(list.status).toBe(403);
    else expect(list.body.jobs).toHaveLength(jobCount);
  });
});
