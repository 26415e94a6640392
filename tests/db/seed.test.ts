import { count } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEMO_PRICES } from '@/db/demo-prices';
import { DEMO_PASSWORD, insertDemoData } from '@/db/seed';
import { DEMO_CHAINS } from '@/db/seed-load-path';
import { DEMO_MEMBERS, demoMemberInput } from '@/db/seed-members';
import { refreshLoadPath } from '@/server/api/load-path/load-path.service';
import { jobLoadPathSchema } from '@/shared/schemas/load-path-elements';
import { jobs, members, users } from '@/db/schema';
import { ENGINE_VERSION, checkMember, prescriptiveVerdict } from '@/lib/calc';
import { evaluate } from '@/server/api/members/member-evaluation';
import { hashPassword } from '@/server/services/password';
import { meSchema } from '@/shared/schemas/auth';
import { jobSchema } from '@/shared/schemas/jobs';
import { memberSchema } from '@/shared/schemas/members';
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

  it('adds no members without the members check (the database layer does not import the server)', async () => {
    await insertDemoData(server.db, hashPassword);
    expect(server.db.select({ n: count() }).from(members).get()?.n).toBe(0);
  });
});

describe('demo members (an invented scenario)', () => {
  beforeEach(async () => {
    await insertDemoData(server.db, hashPassword, evaluate, (tx, job) => {
      refreshLoadPath(tx, job.orgId, job, () => 'seed');
    });
  });

  const signIn = async () => {
    const agent = request.agent(server.app);
    await agent
      .post('/api/auth/sign-in')
      .send({ email: 'contractor@demo.tributary.test', password: DEMO_PASSWORD })
      .expect(200);
    return agent;
  };

  it('puts headers and beams on the demo jobs: some pass, one fails, the beams need an engineer', async () => {
    const agent = await signIn();
    const list = (await agent.get('/api/jobs').expect(200)).body.jobs.map((j: unknown) => jobSchema.parse(j));
    const states: Record<string, string> = {};
    for (const job of list) {
      const rows = (await agent.get(`/api/jobs/${job.id}/members`).expect(200)).body.members;
      expect(rows.map((m: { label: string }) => m.label)).toEqual(
        (DEMO_MEMBERS[job.name] ?? []).map((m) => m.label),
      );
      for (const row of rows) states[row.label] = row.summary.state;
    }
    // No demo member's load path is closed, so none says "passes" (the failing one still fails).
    expect(states).toEqual({
      'Kitchen pass-through header': 'load-path-open',
      'Dining-room beam': 'load-path-open',
      'Hall doorway header': 'load-path-open',
      'Linen closet header': 'fails',
      'Family room beam': 'load-path-open',
    });
  });

  it('the family-room job shows its demo chain, open only for want of the new pad’s confirmation', async () => {
    const agent = await signIn();
    const list = (await agent.get('/api/jobs').expect(200)).body.jobs.map((j: unknown) => jobSchema.parse(j));
    const job = list.find((j: { name: string }) => j.name === 'Split-level family room wall');
    const lp = jobLoadPathSchema.parse((await agent.get(`/api/jobs/${job?.id}/load-path`).expect(200)).body);
    expect(lp.elements.map((e) => e.label)).toEqual(
      DEMO_CHAINS[job?.name ?? ''].elements.map((e) => e.label),
    );
    const beam = lp.result.elements.find((e) => e.label === 'Family room beam');
    expect(beam?.checkState).toBe('passes');
    expect(beam?.state).toBe('load-path-open');
    expect(beam?.openReasons).toEqual(['Right end → Post by the stair: its own load path is open.']);
    const pad = lp.result.elements.find((e) => e.label === 'New pad in the basement');
    expect(pad?.openReasons).toEqual(['Confirm the new pad: it is to be poured as sized (and inspected).']);
  });

  it("stores the engine's own result of each stored input, as a save would, with the job's load context", async () => {
    const agent = await signIn();
    const list = (await agent.get('/api/jobs').expect(200)).body.jobs.map((j: unknown) => jobSchema.parse(j));
    let checked = 0;
    for (const job of list) {
      for (const row of (await agent.get(`/api/jobs/${job.id}/members`).expect(200)).body.members) {
        const member = memberSchema.parse((await agent.get(`/api/members/${row.id}`).expect(200)).body);
        const demo = (DEMO_MEMBERS[job.name] ?? []).find((m) => m.label === member.label);
        if (!demo) throw new Error(`${member.label} is not a demo member of ${job.name}`);
        expect(member.input).toEqual(JSON.parse(JSON.stringify(demoMemberInput(job, demo))));
        expect(member.input.edition).toBe(job.loadStandard);
        expect(member.input.roofPitchIn12).toBe(job.roofPitchIn12);
        expect(member.input.snow?.groundSnowPsf).toBe(job.groundSnowPsf);
        expect(member.engineVersion).toBe(ENGINE_VERSION);
        expect(member.result).toEqual(
          JSON.parse(JSON.stringify(checkMember(member.input, { diagrams: true }))),
        );
        if (member.kind === 'header') {
          const facts = {
            member: member.input,
            buildingWidthFt: job.buildingWidthFt,
            groundSnowPsf: job.groundSnowPsf,
          };
          expect(member.prescriptive).toEqual(JSON.parse(JSON.stringify(prescriptiveVerdict(facts))));
        } else {
          expect(member.prescriptive).toBeNull();
        }
        checked++;
      }
    }
    expect(checked).toBe(Object.values(DEMO_MEMBERS).flat().length);
  });
});
