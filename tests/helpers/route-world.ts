import request from 'supertest';
import { openDatabase } from '@/db/client';
import { createApp } from '@/server/app';
import type { Mailer } from '@/server/services/mail/mailer';
import type { Role } from '@/shared/schemas/auth';
import { listApiRoutes, routeParams, type ApiRoute } from './api-routes';
import { SAMPLE_HEADER, SAMPLE_PNG, SAMPLE_UPLOADS, sampleBody } from './sample-bodies';
import { confirmEmail, signUpBody, type TestServer } from './server';

const noMail: Mailer = {
  wake: () => undefined,
  idle: () => Promise.resolve(),
  close: () => Promise.resolve(),
};

/** Every /api route of an app built as the server builds it (with the dev mail route mounted). */
export const API_ROUTES = listApiRoutes(
  createApp({ db: openDatabase(':memory:').db, mailer: noMail, appOrigin: 'http://x.test', devMailKey: 'k' }),
);

export const routeLabel = (route: ApiRoute) => `${route.method.toUpperCase()} ${route.path}`;

export interface Person {
  name: string;
  role: Role;
  firm: 'A' | 'B' | 'E';
  email: string;
  password: string;
  /** `tributary_session=…` of a session of this person. */
  cookie: string;
}

const sessionCookie = (res: request.Response) =>
  ((res.headers['set-cookie'] as unknown as string[] | undefined) ?? [])
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('tributary_session=') && c !== 'tributary_session=') ?? '';

/**
 * Firm A (an owner, a contractor, an estimator), an engineering firm E (an engineer) and firm B (an owner),
 * with a way to make a fresh value for any route parameter in a firm and to call any route.
 */
export async function createRouteWorld(server: TestServer) {
  const people: Record<'owner' | 'contractor' | 'estimator' | 'engineer' | 'ownerOfB', Person> = {} as never;
  /** Strings only firm B's rows hold: none may show up in an answer to anyone else. */
  const firmBMarkers: string[] = [];
  let firmBOrgId = '';
  let tokenCount = 0;

  const mailedToken = async (email: string) => {
    const mail = (await server.capturedMail()).find((m) => m.to === email);
    const token = mail?.text.match(/\/invite\/([\w-]+)/)?.[1];
    if (!token) throw new Error(`no invitation mailed to ${email}`);
    return token;
  };

  const invite = (owner: Person, email: string, role: Role) =>
    request(server.app)
      .post('/api/orgs/current/invitations')
      .set('Cookie', owner.cookie)
      .send({ email, role })
      .expect(201);

  /** Calls `route` with its parameters filled in and `body` (default: its sample body). */
  function send(
    route: ApiRoute,
    params: Record<string, string>,
    options: { cookie?: string; orgId?: string; body?: unknown } = {},
  ) {
    const path = route.path.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(params[name]));
    const req = request(server.app)[route.method](path);
    if (options.cookie) req.set('Cookie', options.cookie);
    if (options.orgId) req.set('X-Org-Id', options.orgId);
    const upload = SAMPLE_UPLOADS.get(routeLabel(route));
    if (upload && !('body' in options)) {
      const { fields, fileName } = upload();
      for (const [key, value] of Object.entries(fields)) req.field(key, value);
      return req.attach('file', SAMPLE_PNG, fileName);
    }
    const body =
      'body' in options
        ? options.body
        : route.schemas.body && sampleBody(route.schemas.body, routeLabel(route));
    if (body === undefined) return req;
    // superagent sends objects and arrays as JSON itself; any other JSON value goes as its text.
    return typeof body === 'object' && body !== null
      ? req.send(body)
      : req.set('Content-Type', 'application/json').send(JSON.stringify(body));
  }

  /**
   * A fresh value for the route parameter `name`, owned by `owner`'s firm: `token` is an invitation link's
   * token; `version` is 1 of the request made for `requestId` (sent); `resetToken` and `verifyToken` a password reset or confirmation link's (of a throwaway account);
   * `<thing>Id` is the id the route `POST …/<thing>s` answers, made with its sample body (its own
   * parameters made the same way). A parameter that fits neither needs a line here.
   */
  async function makeParam(name: string, owner: Person, made: Record<string, string> = {}): Promise<string> {
    if (name === 'requestId') return makeDesignRequest(owner);
    if (name === 'version') {
      // The request made for `requestId` is a Draft: send it, so its version 1 exists.
      if (made.requestId)
        await request(server.app).post(`/api/requests/${made.requestId}/send`).set('Cookie', owner.cookie);
      return '1';
    }
    if (name === 'attachmentId') {
      const requestId = made.requestId ?? (await makeDesignRequest(owner));
      const res = await request(server.app)
        .post(`/api/requests/${requestId}/attachments`)
        .set('Cookie', owner.cookie)
        .field('caption', `World photo ${(tokenCount += 1)}`)
        .attach('file', SAMPLE_PNG, 'world.png')
        .expect(201);
      return res.body.id;
    }
    if (name === 'requestToken') {
      const email = `world-engineer-${(tokenCount += 1)}-${owner.firm.toLowerCase()}@example.test`;
      const requestId = await makeDesignRequest(owner, email);
      await request(server.app)
        .post(`/api/requests/${requestId}/send`)
        .set('Cookie', owner.cookie)
        .expect(200);
      const mail = (await server.capturedMail()).find((m) => m.to === email);
      const token = mail?.text.match(/\/request-invite\/([\w-]+)/)?.[1];
      if (!token) throw new Error(`no request invitation mailed to ${email}`);
      return token;
    }
    if (name === 'token') {
      const email = `world-token-${(tokenCount += 1)}-${owner.firm.toLowerCase()}@example.test`;
      await invite(owner, email, 'estimator');
      return mailedToken(email);
    }
    if (name === 'verifyToken') {
      const body = signUpBody();
      await request(server.app).post('/api/auth/sign-up').send(body).expect(201);
      const mail = (await server.capturedMail()).find((m) => m.to === body.email);
      const token = mail?.text.match(/\/verify-email\/([\w-]+)/)?.[1];
      if (!token) throw new Error(`no confirmation link mailed to ${body.email}`);
      return token;
    }
    if (name === 'resetToken') {
      // A throwaway account's link: using it ends that account's sessions, no one else's.
      const body = signUpBody();
      await request(server.app).post('/api/auth/sign-up').send(body).expect(201);
      await request(server.app).post('/api/auth/password-reset').send({ email: body.email }).expect(204);
      const mail = (await server.capturedMail()).find((m) => m.to === body.email);
      const token = mail?.text.match(/\/reset-password\/([\w-]+)/)?.[1];
      if (!token) throw new Error(`no reset link mailed to ${body.email}`);
      return token;
    }
    // Checklist items are fixed per job: any key names one.
    if (name === 'itemKey') return 'permit';
    if (name === 'engineerItemId') return makeEngineerItem(owner, made.jobId);
    // An end of the member or element named before it: a member's left end, an element's (a post's) bottom.
    if (name === 'end') return made.memberId ? 'left' : 'bottom';
    const stem = name.match(/^(\w+)Id$/)?.[1];
    const create = API_ROUTES.find((r) => r.method === 'post' && stem && r.path.endsWith(`/${stem}s`));
    if (!create)
      throw new Error(`No way to make :${name}: add one to makeParam in tests/helpers/route-world.ts`);
    const res = await send(create, await makeParams(create, owner), { cookie: owner.cookie });
    if (res.status !== 201) throw new Error(`${routeLabel(create)} answered ${res.status}: ${res.text}`);
    if (owner.firm === 'B') {
      for (const key of ['id', 'name', 'label', 'email']) {
        if (typeof res.body[key] === 'string') firmBMarkers.push(res.body[key]);
      }
    }
    return res.body.id;
  }

  async function makeParams(route: ApiRoute, owner: Person): Promise<Record<string, string>> {
    const params: Record<string, string> = {};
    for (const name of routeParams(route.path)) params[name] = await makeParam(name, owner, params);
    return params;
  }

  /**
   * A Draft design request of a new job of `owner`'s firm with one member, ready to send to `engineerEmail`
   * (by default an address nobody in the world has, so the world's engineer is never addressed).
   */
  async function makeDesignRequest(owner: Person, engineerEmail?: string): Promise<string> {
    const as = <T extends request.Test>(req: T) => req.set('Cookie', owner.cookie);
    const job = await as(request(server.app).post('/api/jobs')).send({
      name: `Request job ${owner.firm}-${(tokenCount += 1)}`,
    });
    const member = await as(request(server.app).post(`/api/jobs/${job.body.id}/members`)).send({
      label: `Request member ${owner.firm}-${tokenCount}`,
      input: SAMPLE_HEADER,
    });
    const res = await as(request(server.app).post(`/api/jobs/${job.body.id}/requests`)).send({
      memberIds: [member.body.id],
      engineerEmail: engineerEmail ?? `outside-engineer-${tokenCount}@example.test`,
      jurisdiction: { state: 'PA' },
    });
    if (res.status !== 201) throw new Error(`a design request could not be made: ${res.text}`);
    if (owner.firm === 'B') firmBMarkers.push(job.body.id, job.body.name, member.body.id, res.body.id);
    return res.body.id;
  }

  /** An engineer of their own firm for each contracting firm, so no engineer sees two firms' requests. */
  const engineers = new Map<Person['firm'], Person>();

  /**
   * An engineer's "verify in the field" item on `jobId`'s checklist: a member and a request sent to the
   * firm's engineer, who takes it into review and replies with one item asking for a photo.
   */
  async function makeEngineerItem(owner: Person, jobId: string | undefined): Promise<string> {
    if (!jobId) throw new Error(':engineerItemId needs a :jobId before it');
    const engineer =
      owner.firm === 'A'
        ? people.engineer
        : (engineers.get(owner.firm) ?? (await founder(`engineer-of-${owner.firm}`, 'E')));
    engineers.set(owner.firm, engineer);
    const as = <T extends request.Test>(req: T, who: Person) => req.set('Cookie', who.cookie);
    const member = await as(request(server.app).post(`/api/jobs/${jobId}/members`), owner)
      .send({ label: `Item member ${owner.firm}-${(tokenCount += 1)}`, input: SAMPLE_HEADER })
      .expect(201);
    const draft = await as(request(server.app).post(`/api/jobs/${jobId}/requests`), owner)
      .send({ memberIds: [member.body.id], engineerEmail: engineer.email, jurisdiction: { state: 'PA' } })
      .expect(201);
    const requestId: string = draft.body.id;
    await as(request(server.app).post(`/api/requests/${requestId}/send`), owner).expect(200);
    await as(request(server.app).post(`/api/requests/${requestId}/status`), engineer)
      .send({ to: 'in-review' })
      .expect(200);
    await as(request(server.app).post(`/api/requests/${requestId}/reply`), engineer)
      .send({
        members: [{ memberId: member.body.id, material: 'lvl', designation: '2-ply 1-3/4 x 9-1/4 LVL' }],
        verifyInField: [{ item: `Bearing under the left end ${tokenCount}`, photo: false }],
      })
      .expect(201);
    const list = await as(request(server.app).get(`/api/jobs/${jobId}/checklist`), owner).expect(200);
    const item = (list.body.engineerItems as { id: string; requestId: string }[]).find(
      (i) => i.requestId === requestId,
    );
    if (!item) throw new Error('the reply made no checklist item');
    if (owner.firm === 'B') firmBMarkers.push(member.body.label, item.id, requestId);
    return item.id;
  }

  async function join(owner: Person, name: string, role: Role): Promise<Person> {
    const email = `${name}@example.test`;
    await invite(owner, email, role);
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
    await confirmEmail(server.app, body.email);
    if (firm === 'B') firmBOrgId = res.body.activeOrgId;
    const role: Role = firm === 'E' ? 'engineer' : 'owner';
    return { name, role, firm, email: body.email, password: body.password, cookie: sessionCookie(res) };
  }

  /** A new session of `person` (for routes that start or end one). */
  async function signIn(person: Person): Promise<string> {
    const res = await request(server.app)
      .post('/api/auth/sign-in')
      .send({ email: person.email, password: person.password })
      .expect(200);
    return sessionCookie(res);
  }

  people.owner = await founder('owner', 'A');
  people.contractor = await join(people.owner, 'contractor', 'contractor');
  people.estimator = await join(people.owner, 'estimator', 'estimator');
  people.engineer = await founder('engineer', 'E');
  people.ownerOfB = await founder('ownerOfB', 'B');
  firmBMarkers.push(people.ownerOfB.email, firmBOrgId);
  // One row of every kind a route names for firm B, so every answer can be searched for them.
  for (const route of API_ROUTES) await makeParams(route, people.ownerOfB);

  return { people, firmBMarkers, firmBOrgId, send, makeParams, signIn };
}

export type RouteWorld = Awaited<ReturnType<typeof createRouteWorld>>;
