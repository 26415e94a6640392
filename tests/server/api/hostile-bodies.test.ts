import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiRoute } from '@/tests/helpers/api-routes';
import { databaseDump } from '@/tests/helpers/db-dump';
import { hostileValue, oneFieldOff } from '@/tests/helpers/hostile-arbitrary';
import { API_ROUTES, createRouteWorld, routeLabel, type RouteWorld } from '@/tests/helpers/route-world';
import { sampleBody } from '@/tests/helpers/sample-bodies';
import { createTestServer, type TestServer } from '@/tests/helpers/server';

/**
 * Every route that takes a JSON body, fed bodies generated from its own zod schema (fast-check) and the
 * hand-made hostile cases: never a 5xx; a body the schema refuses gets 400, 413 or 415 and leaves the
 * database unchanged byte for byte.
 */

const REFUSED = [400, 413, 415];
const RUNS = 40;

let server: TestServer;
let world: RouteWorld;
beforeAll(async () => {
  // The sign-in throttle counts refused bodies as failures; its own tests cover it.
  server = await createTestServer({ signInLimit: { windowMs: 60_000, limit: 100_000 } });
  world = await createRouteWorld(server);
});
afterAll(() => server.close());

const bodyRoutes = API_ROUTES.filter((route) => route.schemas.body);

/** Who may call the route: firm routes and signed-in routes as firm A's owner, public ones signed out. */
const PUBLIC_BODY_ROUTES = new Set([
  'POST /api/auth/password-reset',
  'POST /api/auth/password-reset/:resetToken',
  'POST /api/auth/sign-up',
  'POST /api/auth/sign-in',
  'POST /api/invitations/:token/accept',
  'POST /api/request-invitations/:requestToken/accept',
]);

async function caller(route: ApiRoute) {
  const params = await world.makeParams(route, world.people.owner);
  await server.mailer.idle();
  const cookie = PUBLIC_BODY_ROUTES.has(routeLabel(route)) ? undefined : world.people.owner.cookie;
  return { params, cookie };
}

/** What the server makes of a value sent as JSON (undefined fields dropped, -0 and Infinity changed). */
const overTheWire = (body: unknown) => JSON.parse(JSON.stringify(body ?? null)) as unknown;

function expectRefusedAndUnchanged(
  res: request.Response,
  before: ReturnType<typeof databaseDump>,
  what: string,
) {
  expect(REFUSED, `${what}: ${res.status} ${res.text.slice(0, 300)}`).toContain(res.status);
  expect(res.headers['content-type']).toMatch(/application\/json/);
  expect(res.body.error.code).toBe('bad_request');
  expect(databaseDump(server.db), what).toEqual(before);
}

it('covers every route with a JSON body', () => {
  expect(bodyRoutes.length).toBeGreaterThanOrEqual(10);
});

describe.each(bodyRoutes.map((route) => [routeLabel(route), route] as const))('%s', (_label, route) => {
  const schema = route.schemas.body!;

  const bodies: [what: string, arbitrary: () => fc.Arbitrary<unknown>][] = [
    ['bodies generated from its schema', () => hostileValue(schema)],
    [
      'sample bodies with one field off',
      () => oneFieldOff(schema, sampleBody(schema, routeLabel(route)) as Record<string, unknown>),
    ],
  ];

  it.each(bodies)(`${RUNS} %s: never 5xx; refused ones change nothing`, async (_what, arbitrary) => {
    const { params, cookie } = await caller(route);
    await fc.assert(
      fc.asyncProperty(arbitrary(), async (body) => {
        const before = databaseDump(server.db);
        const res = await world.send(route, params, { cookie, body: body ?? null });
        expect(res.status, res.text.slice(0, 300)).toBeLessThan(500);
        if (!schema.safeParse(overTheWire(body)).success) {
          expectRefusedAndUnchanged(res, before, JSON.stringify(body)?.slice(0, 200) ?? 'undefined');
        }
        await server.mailer.idle();
      }),
      { numRuns: RUNS },
    );
  });

  const raw = (params: Record<string, string>, cookie: string | undefined) => {
    const path = route.path.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(params[name]));
    const req = request(server.app)[route.method](path);
    return cookie ? req.set('Cookie', cookie) : req;
  };

  const json = { 'Content-Type': 'application/json' };
  const valid = () => JSON.stringify(sampleBody(schema, routeLabel(route)));
  const cases: [what: string, headers: Record<string, string>, body: () => string][] = [
    ['malformed JSON', json, () => '{"name": '],
    ['a JSON array', json, () => '[1, 2, 3]'],
    ['a JSON string', json, () => '"just text"'],
    ['a JSON number', json, () => '42'],
    ['JSON null', json, () => 'null'],
    ['JSON nested 20,000 deep', json, () => '['.repeat(20_000) + ']'.repeat(20_000)],
    ['a body over 200 KB', json, () => JSON.stringify({ padding: 'x'.repeat(210 * 1024) })],
    ['charset=latin1', { 'Content-Type': 'application/json; charset=latin1' }, valid],
    ['Content-Encoding br2', { ...json, 'Content-Encoding': 'br2' }, valid],
    ['Content-Encoding gzip on plain text', { ...json, 'Content-Encoding': 'gzip' }, valid],
    ['a form body', { 'Content-Type': 'application/x-www-form-urlencoded' }, () => 'name=x&role=owner'],
    ['a text body', { 'Content-Type': 'text/plain' }, valid],
  ];

  it.each(cases)('%s: refused, nothing changes', async (what, headers, body) => {
    const { params, cookie } = await caller(route);
    const before = databaseDump(server.db);
    const res = await raw(params, cookie).set(headers).send(body());
    expectRefusedAndUnchanged(res, before, what);
  });

  const sample = sampleBody(schema, routeLabel(route)) as Record<string, unknown>;
  const arrays = Object.keys(sample).filter((key) => Array.isArray(sample[key]));
  if (arrays.length > 0) {
    it.each(arrays)('99,000 entries in %s: 400 with a few messages, nothing changes', async (key) => {
      const { params, cookie } = await caller(route);
      const before = databaseDump(server.db);
      const res = await world.send(route, params, {
        cookie,
        body: { ...sample, [key]: Array(99_000).fill(2) },
      });
      expectRefusedAndUnchanged(res, before, key);
      expect(Object.values(res.body.error.fields ?? {}).flat().length).toBeLessThanOrEqual(30);
    });
  }

  it('prototype keys in the body pollute nothing', async () => {
    const { params, cookie } = await caller(route);
    const poisoned = `{"__proto__": {"polluted": true}, "constructor": {"prototype": {"polluted": true}}, ${valid().slice(1)}`;
    const res = await raw(params, cookie).set(json).send(poisoned);
    expect(res.status, res.text).toBeLessThan(500);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype).not.toHaveProperty('polluted');
  });
});
