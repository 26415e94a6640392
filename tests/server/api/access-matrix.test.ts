import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@/shared/schemas/auth';
import { routeParams, type ApiRoute } from '@/tests/helpers/api-routes';
import { API_ROUTES, createRouteWorld, routeLabel, type RouteWorld } from '@/tests/helpers/route-world';
import { sampleBody } from '@/tests/helpers/sample-bodies';
import { createTestServer, type TestServer } from '@/tests/helpers/server';

/**
 * Every /api route, read from the router itself, tried signed out, as each role, and with another firm's
 * ids. A route gets its expectations from ACCESS below: a route added without a rule there fails.
 */

type Rule =
  | { kind: 'public' }
  | { kind: 'signed-in' }
  | { kind: 'firm'; roles: Role[] }
  | { kind: 'dev-mail-key' }
  | { kind: 'request' };

const CONTRACTING: Role[] = ['owner', 'contractor', 'estimator'];

/** Routes anyone may call, by exact method and path: each one is a decision, never a default. */
const PUBLIC = new Set([
  'GET /api/health',
  'POST /api/auth/sign-up',
  'POST /api/auth/sign-in',
  'POST /api/auth/sign-out',
  'POST /api/auth/password-reset',
  'POST /api/auth/password-reset/:resetToken',
  'POST /api/auth/verify-email/:verifyToken',
  'GET /api/invitations/:token',
  'POST /api/invitations/:token/accept',
  'GET /api/request-invitations/:requestToken',
  'POST /api/request-invitations/:requestToken/accept',
]);

/**
 * Design request routes (`request` rule): open to every role at the door, the service decides by the
 * viewer's side. On a fresh Draft of firm A, its roles get a 2xx, or here the answer the Draft's state or
 * the firm's side gives (409: not in this state; 403: the engineer's to do). An engineer the request is not
 * addressed to gets 404 on every route with a request id, and their own (empty) inbox.
 */
const REQUEST_FIRM_ANSWER: Record<string, 403 | 409> = {
  'POST /api/requests/:requestId/revisions': 409,
  'POST /api/requests/:requestId/status': 409,
  'POST /api/requests/:requestId/fee': 403,
  'POST /api/requests/:requestId/fee/accept': 409,
  'POST /api/requests/:requestId/reply': 403,
  'POST /api/requests/:requestId/messages': 409,
  // A Draft has no package yet.
  'GET /api/requests/:requestId/package.pdf': 409,
  'GET /api/requests/:requestId/package.json': 409,
  'GET /api/requests/:requestId/loads.csv': 409,
  'GET /api/requests/:requestId/photos.zip': 409,
};
/** Who may change the price book and budgets: the owner and the estimator (contractors read). */
const BUDGET_WRITERS: Role[] = ['owner', 'estimator'];

/** Routes whose rule differs from their area's, by exact method and path. */
const BY_ROUTE = new Map<string, Rule>([
  ['PUT /api/members/:memberId/budget', { kind: 'firm', roles: BUDGET_WRITERS }],
  ['POST /api/jobs/:jobId/budgets', { kind: 'firm', roles: BUDGET_WRITERS }],
  ['PATCH /api/price-book/settings', { kind: 'firm', roles: BUDGET_WRITERS }],
  ['POST /api/price-book/items', { kind: 'firm', roles: BUDGET_WRITERS }],
  ['PATCH /api/price-book/items/:itemId', { kind: 'firm', roles: BUDGET_WRITERS }],
  ['DELETE /api/price-book/items/:itemId', { kind: 'firm', roles: BUDGET_WRITERS }],
  ['POST /api/price-book/import', { kind: 'firm', roles: BUDGET_WRITERS }],
]);

/** Areas by path: a route is in an area when its path is the area's or lies below it. */
const AREAS: [area: string, rule: Rule][] = [
  ['/api/me', { kind: 'signed-in' }],
  ['/api/auth/sessions', { kind: 'signed-in' }],
  ['/api/auth/sign-out-everywhere', { kind: 'signed-in' }],
  ['/api/auth/verify-email', { kind: 'signed-in' }],
  ['/api/calc', { kind: 'signed-in' }],
  ['/api/orgs/current', { kind: 'firm', roles: ['owner'] }],
  ['/api/jobs', { kind: 'firm', roles: CONTRACTING }],
  ['/api/members', { kind: 'firm', roles: CONTRACTING }],
  ['/api/elements', { kind: 'firm', roles: CONTRACTING }],
  ['/api/screens', { kind: 'firm', roles: CONTRACTING }],
  ['/api/job-progress', { kind: 'firm', roles: CONTRACTING }],
  ['/api/dev/mail', { kind: 'dev-mail-key' }],
  ['/api/requests', { kind: 'request' }],
  ['/api/price-book', { kind: 'firm', roles: CONTRACTING }],
  ['/api/budgets', { kind: 'firm', roles: CONTRACTING }],
];

/** Routes that end the caller's sessions: each try gets a session of its own, and a new one after. */
const SESSION_ENDING = new Set(['POST /api/auth/sign-out-everywhere']);

function ruleFor(route: ApiRoute): Rule | undefined {
  if (PUBLIC.has(`${route.method.toUpperCase()} ${route.path}`)) return { kind: 'public' };
  const own = BY_ROUTE.get(`${route.method.toUpperCase()} ${route.path}`);
  if (own) return own;
  return AREAS.find(([area]) => route.path === area || route.path.startsWith(`${area}/`))?.[1];
}

const routes = API_ROUTES;
const label = routeLabel;

let server: TestServer;
let world: RouteWorld;
beforeAll(async () => {
  server = await createTestServer();
  world = await createRouteWorld(server);
});
afterAll(() => server.close());

const firmA = ['owner', 'contractor', 'estimator'] as const;

/** Checks every answer shares: never a 5xx, never cacheable, never a word of firm B's. */
function expectSafe(res: request.Response, what: string) {
  expect(res.status, `${what}: ${res.text}`).toBeLessThan(500);
  expect(res.headers['cache-control'], what).toBe('no-store');
  // A binary answer (a PDF, an image) has no text: its bytes are read as Latin-1 so a leaked name still shows.
  const text = res.text ?? (Buffer.isBuffer(res.body) ? res.body.toString('latin1') : '');
  for (const marker of world.firmBMarkers)
    expect(text, `${what} leaks firm B's ${marker}`).not.toContain(marker);
}

describe('the route list comes from the router', () => {
  it('finds the known routes and gives every one an access rule', () => {
    expect(routes.length).toBeGreaterThanOrEqual(20);
    expect(routes.map(label)).toEqual(
      expect.arrayContaining(['GET /api/jobs/:jobId', 'POST /api/auth/sign-up']),
    );
    expect(routes.filter((route) => !ruleFor(route)).map(label)).toEqual([]);
  });

  it('has a valid sample body for every route that takes one', () => {
    for (const route of routes.filter((r) => r.schemas.body)) {
      const schema = route.schemas.body!;
      const parsed = schema.safeParse(sampleBody(schema, label(route)));
      expect(parsed.error?.issues ?? [], label(route)).toEqual([]);
    }
  });
});

describe.each(routes.map((route) => [label(route), route] as const))('%s', (_label, route) => {
  const rule: Rule | { kind: 'missing' } = ruleFor(route) ?? { kind: 'missing' };

  it('signed out', async () => {
    const params = await world.makeParams(route, world.people.owner);
    const res = await world.send(route, params);
    expectSafe(res, 'signed out');
    if (rule.kind === 'signed-in' || rule.kind === 'firm' || rule.kind === 'request') {
      expect(res.status).toBe(401);
    }
    if (rule.kind === 'dev-mail-key') expect(res.status).toBe(404);
  });

  it.each([...firmA, 'engineer'] as const)('as the %s', async (who) => {
    const person = world.people[who];
    // Public routes may start or end a session: each try gets a session of its own.
    const endsSessions = SESSION_ENDING.has(label(route));
    const cookie = rule.kind === 'public' || endsSessions ? await world.signIn(person) : person.cookie;
    const params = await world.makeParams(route, world.people.owner);
    const res = await world.send(route, params, { cookie });
    if (endsSessions) person.cookie = await world.signIn(person);
    expectSafe(res, who);
    if (rule.kind === 'signed-in') expect(res.status, res.text).toBeLessThan(300);
    if (rule.kind === 'dev-mail-key') expect(res.status).toBe(404);
    if (rule.kind === 'firm') {
      if (rule.roles.includes(person.role)) expect(res.status, res.text).toBeLessThan(300);
      else expect(res.status, res.text).toBe(403);
    }
    if (rule.kind === 'request') expectRequestAnswer(res, person.role);
  });

  const hasIds = routeParams(route.path).length > 0;

  /** What firm A's roles and the engineer get on a fresh Draft of firm A (see REQUEST_FIRM_ANSWER). */
  function expectRequestAnswer(res: request.Response, role: Role) {
    if (role === 'engineer') {
      if (hasIds) expect(res.status, res.text).toBe(404);
      else expect(res.status, res.text).toBeLessThan(300);
      return;
    }
    const answer = REQUEST_FIRM_ANSWER[label(route)];
    if (answer) expect(res.status, res.text).toBe(answer);
    else expect(res.status, res.text).toBeLessThan(300);
  }

  if (rule.kind === 'request') {
    it.each(firmA)("as firm A's %s naming firm B in X-Org-Id: its own firm's answer", async (who) => {
      const person = world.people[who];
      const res = await world.send(route, await world.makeParams(route, world.people.owner), {
        cookie: person.cookie,
        orgId: world.firmBOrgId,
      });
      expectSafe(res, `${who} naming firm B`);
      expectRequestAnswer(res, person.role);
    });
    if (!hasIds) return;
    it.each(firmA)("as firm A's %s with firm B's ids: 404", async (who) => {
      const res = await world.send(route, await world.makeParams(route, world.people.ownerOfB), {
        cookie: world.people[who].cookie,
      });
      expectSafe(res, `${who} with firm B's ids`);
      expect(res.status, res.text).toBe(404);
    });
    return;
  }

  if (rule.kind !== 'firm') return;

  it.each(firmA)("as firm A's %s naming firm B in X-Org-Id: its own firm, never B's", async (who) => {
    const person = world.people[who];
    const res = await world.send(route, await world.makeParams(route, world.people.owner), {
      cookie: person.cookie,
      orgId: world.firmBOrgId,
    });
    expectSafe(res, `${who} naming firm B`);
    if (rule.roles.includes(person.role)) expect(res.status, res.text).toBeLessThan(300);
    else expect(res.status, res.text).toBe(403);
  });

  if (!hasIds) return;
  it.each(firmA)("as firm A's %s with firm B's ids: 404 (403 for a role the route refuses)", async (who) => {
    const person = world.people[who];
    const res = await world.send(route, await world.makeParams(route, world.people.ownerOfB), {
      cookie: person.cookie,
    });
    expectSafe(res, `${who} with firm B's ids`);
    expect(res.status, res.text).toBe(rule.roles.includes(person.role) ? 404 : 403);
  });
});
