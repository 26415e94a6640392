import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '@/db/client';
import { createApp } from '@/server/app';
import type { Mailer } from '@/server/services/mail/mailer';
import type { Role } from '@/shared/schemas/auth';
import { listApiRoutes, routeParams, type ApiRoute } from '@/tests/helpers/api-routes';
import { sampleBody } from '@/tests/helpers/sample-bodies';
import { createTestServer, signUpBody, type TestServer } from '@/tests/helpers/server';

/**
 * Every /api route, read from the router itself, tried signed out, as each role, and with another firm's
 * ids. A route gets its expectations from ACCESS below: a route added without a rule there fails.
 */

type Rule =
  { kind: 'public' } | { kind: 'signed-in' } | { kind: 'firm'; roles: Role[] } | { kind: 'dev-mail-key' };

const CONTRACTING: Role[] = ['owner', 'contractor', 'estimator'];

/** Routes anyone may call, by exact method and path: each one is a decision, never a default. */
const PUBLIC = new Set([
  'GET /api/health',
  'POST /api/auth/sign-up',
  'POST /api/auth/sign-in',
  'POST /api/auth/sign-out',
  'GET /api/invitations/:token',
  'POST /api/invitations/:token/accept',
]);

/** Areas by path: a route is in an area when its path is the area's or lies below it. */
const AREAS: [area: string, rule: Rule][] = [
  ['/api/me', { kind: 'signed-in' }],
  ['/api/calc', { kind: 'signed-in' }],
  ['/api/orgs/current', { kind: 'firm', roles: ['owner'] }],
  ['/api/jobs', { kind: 'firm', roles: CONTRACTING }],
  ['/api/members', { kind: 'firm', roles: CONTRACTING }],
  ['/api/dev/mail', { kind: 'dev-mail-key' }],
];

function ruleFor(route: ApiRoute): Rule | undefined {
  if (PUBLIC.has(`${route.method.toUpperCase()} ${route.path}`)) return { kind: 'public' };
  return AREAS.find(([area]) => route.path === area || route.path.startsWith(`${area}/`))?.[1];
}

const noMail: Mailer = {
  wake: () => undefined,
  idle: () => Promise.resolve(),
  close: () => Promise.resolve(),
};
const routes = listApiRoutes(
  createApp({ db: openDatabase(':memory:').db, mailer: noMail, appOrigin: 'http://x.test', devMailKey: 'k' }),
);
const label = (route: ApiRoute) => `${route.method.toUpperCase()} ${route.path}`;

interface Person {
  name: string;
  role: Role;
  firm: 'A' | 'B' | 'E';
  email: string;
  password: string;
  cookie: string;
}

let server: TestServer;
const people: Record<string, Person> = {};
/** Strings only firm B's rows hold: none may show up in an answer to anyone else. */
const firmBMarkers: string[] = [];
let firmBOrgId = '';

const sessionCookie = (res: request.Response) =>
  ((res.headers['set-cookie'] as unknown as string[] | undefined) ?? [])
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('tributary_session=') && c !== 'tributary_session=') ?? '';

async function signIn(person: Pick<Person, 'email' | 'password'>): Promise<string> {
  const res = await request(server.app).post('/api/auth/sign-in').send(person).expect(200);
  return sessionCookie(res);
}

function send(route: ApiRoute, params: Record<string, string>, cookie?: string, orgHeader?: string) {
  const path = route.path.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(params[name]));
  const req = request(server.app)[route.method](path);
  if (cookie) req.set('Cookie', cookie);
  if (orgHeader) req.set('X-Org-Id', orgHeader);
  return route.schemas.body ? req.send(sampleBody(route.schemas.body, label(route)) as object) : req;
}

/** The newest invitation token mailed to `email`. */
async function mailedToken(email: string): Promise<string> {
  const mail = (await server.capturedMail()).find((m) => m.to === email);
  const token = mail?.text.match(/\/invite\/([\w-]+)/)?.[1];
  if (!token) throw new Error(`no invitation mailed to ${email}`);
  return token;
}

let tokenCount = 0;

/**
 * A fresh value for the route parameter `name`, owned by `owner`'s firm: `token` is an invitation link's
 * token; `<thing>Id` is the id the route `POST …/<thing>s` answers, made with its sample body (its own
 * parameters made the same way). A parameter that fits neither needs a line here.
 */
async function makeParam(name: string, owner: Person): Promise<string> {
  if (name === 'token') {
    const email = `matrix-token-${(tokenCount += 1)}-${owner.firm.toLowerCase()}@example.test`;
    await request(server.app)
      .post('/api/orgs/current/invitations')
      .set('Cookie', owner.cookie)
      .send({ email, role: 'estimator' })
      .expect(201);
    return mailedToken(email);
  }
  const stem = name.match(/^(\w+)Id$/)?.[1];
  const create = routes.find((r) => r.method === 'post' && stem && r.path.endsWith(`/${stem}s`));
  if (!create) throw new Error(`No way to make :${name}: add one to makeParam in this file`);
  const res = await send(create, await makeParams(create, owner), owner.cookie);
  if (res.status !== 201) throw new Error(`${label(create)} answered ${res.status}: ${res.text}`);
  if (owner.firm === 'B') {
    for (const key of ['id', 'name', 'label', 'email']) {
      if (typeof res.body[key] === 'string') firmBMarkers.push(res.body[key]);
    }
  }
  return res.body.id;
}

async function makeParams(route: ApiRoute, owner: Person): Promise<Record<string, string>> {
  const params: Record<string, string> = {};
  for (const name of routeParams(route.path)) params[name] = await makeParam(name, owner);
  return params;
}

async function join(owner: Person, name: string, role: Role): Promise<Person> {
  const email = `${name}@example.test`;
  await request(server.app)
    .post('/api/orgs/current/invitations')
    .set('Cookie', owner.cookie)
    .send({ email, role })
    .expect(201);
  const password = 'a long enough password';
  const res = await request(server.app)
    .post(`/api/invitations/${await mailedToken(email)}/accept`)
    .send({ name, password })
    .expect(201);
  return { name, role, firm: owner.firm, email, password, cookie: sessionCookie(res) };
}

async function founder(name: string, firm: Person['firm']): Promise<Person> {
  const body = signUpBody({
    firmKind: firm === 'E' ? 'engineering' : 'contracting',
    firmName: `Firm ${firm}`,
  });
  const res = await request(server.app).post('/api/auth/sign-up').send(body).expect(201);
  if (firm === 'B') firmBOrgId = res.body.activeOrgId;
  const role: Role = firm === 'E' ? 'engineer' : 'owner';
  return { name, role, firm, email: body.email, password: body.password, cookie: sessionCookie(res) };
}

beforeAll(async () => {
  server = await createTestServer();
  people.owner = await founder('owner', 'A');
  people.contractor = await join(people.owner, 'contractor', 'contractor');
  people.estimator = await join(people.owner, 'estimator', 'estimator');
  people.engineer = await founder('engineer', 'E');
  people.ownerOfB = await founder('ownerOfB', 'B');
  firmBMarkers.push(people.ownerOfB.email, firmBOrgId);
  // One row of every kind a route names for firm B, so every answer below can be searched for them.
  for (const route of routes) await makeParams(route, people.ownerOfB);
});
afterAll(() => server.close());

const firmA = ['owner', 'contractor', 'estimator'] as const;

/** Checks every answer shares: never a 5xx, never cacheable, never a word of firm B's. */
function expectSafe(res: request.Response, what: string) {
  expect(res.status, `${what}: ${res.text}`).toBeLessThan(500);
  expect(res.headers['cache-control'], what).toBe('no-store');
  for (const marker of firmBMarkers)
    expect(res.text, `${what} leaks firm B's ${marker}`).not.toContain(marker);
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
    const params = await makeParams(route, people.owner);
    const res = await send(route, params);
    expectSafe(res, 'signed out');
    if (rule.kind === 'signed-in' || rule.kind === 'firm') expect(res.status).toBe(401);
    if (rule.kind === 'dev-mail-key') expect(res.status).toBe(404);
  });

  it.each([...firmA, 'engineer'])('as the %s', async (who) => {
    const person = people[who];
    // Public routes may start or end a session: each try gets a session of its own.
    const cookie = rule.kind === 'public' ? await signIn(person) : person.cookie;
    const params = await makeParams(route, people.owner);
    const res = await send(route, params, cookie);
    expectSafe(res, who);
    if (rule.kind === 'signed-in') expect(res.status, res.text).toBeLessThan(300);
    if (rule.kind === 'dev-mail-key') expect(res.status).toBe(404);
    if (rule.kind === 'firm') {
      if (rule.roles.includes(person.role)) expect(res.status, res.text).toBeLessThan(300);
      else expect(res.status, res.text).toBe(403);
    }
  });

  if (rule.kind !== 'firm') return;
  const hasIds = routeParams(route.path).length > 0;

  it.each(firmA)("as firm A's %s naming firm B in X-Org-Id: its own firm, never B's", async (who) => {
    const person = people[who];
    const res = await send(route, await makeParams(route, people.owner), person.cookie, firmBOrgId);
    expectSafe(res, `${who} naming firm B`);
    if (rule.roles.includes(person.role)) expect(res.status, res.text).toBeLessThan(300);
    else expect(res.status, res.text).toBe(403);
  });

  if (!hasIds) return;
  it.each(firmA)("as firm A's %s with firm B's ids: 404 (403 for a role the route refuses)", async (who) => {
    const person = people[who];
    const res = await send(route, await makeParams(route, people.ownerOfB), person.cookie);
    expectSafe(res, `${who} with firm B's ids`);
    expect(res.status, res.text).toBe(rule.roles.includes(person.role) ? 404 : 403);
  });
});
