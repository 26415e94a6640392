import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { z } from 'zod';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_FIELD_MESSAGES } from '@/shared/errors';
import { boundedRecord } from '@/shared/schemas/bounded-record';
import type { ShortlistInputBody } from '@/shared/schemas/calc/shortlist';
import { listApiRoutes } from '@/tests/helpers/api-routes';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';
import { unboundedCollections } from '@/tests/helpers/zod-bounds';

let server: TestServer;
let owner: Agent;
beforeAll(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
});
afterAll(() => server.close());

/** Invented demo header loads: 13 ft of roof and 6 ft of ceiling. */
const shortlistBody: ShortlistInputBody = {
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [
    { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
  ],
  materialIds: ['sawn-douglas-fir-larch-no2'],
};

describe('every array and record a route accepts has a maximum', () => {
  it('the walker finds an unbounded array or record, and accepts bounded ones', () => {
    const loose = z.object({
      tags: z.array(z.string()),
      prices: z.record(z.string(), z.number()).optional(),
    });
    expect(unboundedCollections(loose)).toEqual([
      '(root).tags: array without a maximum',
      '(root).prices: record without a limit on its entries',
    ]);
    const tight = z.object({
      tags: z.array(z.array(z.string()).max(3)).max(5),
      byKind: z.record(z.enum(['a', 'b']), z.number()),
      prices: boundedRecord(z.number(), { maxEntries: 9, maxKeyLength: 20, message: 'At most 9' }),
    });
    expect(unboundedCollections(tight)).toEqual([]);
  });

  it('holds for the body, query and params schema of every /api route', () => {
    const routes = listApiRoutes(server.app);
    expect(routes.filter((route) => route.schemas.body).length).toBeGreaterThanOrEqual(8);
    const unbounded = routes.flatMap((route) =>
      (['body', 'query', 'params'] as const).flatMap((part) => {
        const schema = route.schemas[part];
        return schema
          ? unboundedCollections(schema, `${route.method.toUpperCase()} ${route.path} ${part}`)
          : [];
      }),
    );
    expect(unbounded).toEqual([]);
  });
});

/** A 400 that lists at most MAX_FIELD_MESSAGES messages and stays small. */
function expectShortRefusal(res: { status: number; text: string; body: { error: { fields?: object } } }) {
  expect(res.status).toBe(400);
  const messages = Object.values(res.body.error.fields ?? {}).flat();
  expect(messages.length).toBeGreaterThan(0);
  expect(messages.length).toBeLessThanOrEqual(MAX_FIELD_MESSAGES);
  expect(res.text.length).toBeLessThan(8 * 1024);
}

describe('a huge bad body gets a short answer', () => {
  it('99,000 ply counts (a 194 KB body): 400 naming plies, a few messages', async () => {
    const res = await owner
      .post('/api/calc/shortlist')
      .send({ ...shortlistBody, plies: Array(99_000).fill(2) });
    expectShortRefusal(res);
    expect(res.body.error.fields).toEqual({ plies: ['At most 4 ply counts'] });
  });

  it('15,000 negative prices: refused by their count alone, one message', async () => {
    const pricePerFt = Object.fromEntries(Array.from({ length: 15_000 }, (_, i) => [`p${i}`, -1]));
    const res = await owner.post('/api/calc/shortlist').send({ ...shortlistBody, pricePerFt });
    expectShortRefusal(res);
    expect(res.body.error.fields).toEqual({ pricePerFt: [`At most ${CALC_BOUNDS.prices} prices`] });
  });

  it('as many negative prices as allowed: the first MAX_FIELD_MESSAGES messages and how many there were', async () => {
    const pricePerFt = Object.fromEntries(
      Array.from({ length: CALC_BOUNDS.prices }, (_, i) => [`p${i}`, -1]),
    );
    const res = await owner.post('/api/calc/shortlist').send({ ...shortlistBody, pricePerFt });
    expectShortRefusal(res);
    expect(res.body.error.message).toBe(
      `Some fields need attention (the first ${MAX_FIELD_MESSAGES} of ${CALC_BOUNDS.prices} problems are listed)`,
    );
  });

  it('as many good prices as allowed pass the size limit; one more does not', async () => {
    const prices = (n: number) => Object.fromEntries(Array.from({ length: n }, (_, i) => [`size-${i}`, 1]));
    await owner
      .post('/api/calc/shortlist')
      .send({ ...shortlistBody, pricePerFt: prices(CALC_BOUNDS.prices) })
      .expect(200);
    const res = await owner
      .post('/api/calc/shortlist')
      .send({ ...shortlistBody, pricePerFt: prices(CALC_BOUNDS.prices + 1) });
    expectShortRefusal(res);
    expect(res.body.error.fields).toEqual({ pricePerFt: [`At most ${CALC_BOUNDS.prices} prices`] });
  });

  it('40 load sources, every field wrong: at most MAX_FIELD_MESSAGES messages', async () => {
    const bad = { kind: 'roof', tributaryFt: -1, deadPsf: -1, livePsf: -1, roofLivePsf: -1, snowPsf: -1 };
    const res = await owner
      .post('/api/calc/shortlist')
      .send({ ...shortlistBody, sources: Array(40).fill(bad) });
    expectShortRefusal(res);
  });
});
