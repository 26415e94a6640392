import { PDFParse } from 'pdf-parse';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEMO_PRICES } from '@/db/demo-prices';
import { amountText, catalogueItem, type PriceUnit } from '@/lib/budget';
import { CAUTION_TEXT } from '@/lib/calc';
import { formatDollars } from '@/lib/format/money';
import { toCsv } from '@/lib/format/csv';
import {
  jobBudgetSchema,
  memberBudgetViewSchema,
  sentBudgetSchema,
  type MemberBudgetView,
} from '@/shared/schemas/budgets';
import type { MemberCreateBody } from '@/shared/schemas/members';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let jobId: string;
let memberId: string;

/** Invented demo beam: 2-ply 1-3/4 x 11-7/8 LVL over 12 ft under 12 ft of floor, flush. */
const beam: MemberCreateBody = {
  label: 'Living room beam',
  input: {
    kind: 'beam',
    edition: 'ASCE 7-22',
    clearSpanFt: 12,
    sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
    materialId: 'lvl-2.0e',
    sizeId: '2-ply-1.75x11.875',
    mount: 'flush',
    joistDepthIn: 11.875,
  },
};

/** The demo firm's invented prices as an import file. */
const demoCsv = toCsv([
  ['key', 'value'],
  ...DEMO_PRICES.map(([key, amount]) => [key, amountText(amount, catalogueItem(key)!.unit as PriceUnit)]),
]);

async function join(role: 'estimator' | 'contractor'): Promise<Agent> {
  const email = `${role}-${Date.now()}@example.test`;
  await owner.post('/api/orgs/current/invitations').send({ email, role }).expect(201);
  const mail = (await server.capturedMail()).find((m) => m.to === email);
  const token = mail!.text.match(/\/invite\/([\w-]+)/)![1];
  const agent = request.agent(server.app);
  await agent
    .post(`/api/invitations/${token}/accept`)
    .send({ name: `The ${role}`, password: 'a long enough password' })
    .expect(201);
  return agent;
}

beforeEach(async () => {
  server = await createTestServer();
  owner = (await signedUpAgent(server.app)).agent;
  await owner.post('/api/price-book/import').send({ csv: demoCsv }).expect(200);
  jobId = (
    await owner
      .post('/api/jobs')
      .send({ name: 'Budget ranch', address: '1 Demo Way', yearBuilt: 1990, stories: 1 })
      .expect(201)
  ).body.id;
  memberId = (await owner.post(`/api/jobs/${jobId}/members`).send(beam).expect(201)).body.id;
});
afterEach(() => server.close());

const view = async (agent: Agent = owner): Promise<MemberBudgetView> =>
  memberBudgetViewSchema.parse((await agent.get(`/api/members/${memberId}/budget`).expect(200)).body);
const line = (v: MemberBudgetView, id: string) => v.lines.find((l) => l.id === id);
const priceOf = (key: string) => new Map(DEMO_PRICES).get(key)!;

describe('a member budget', () => {
  it('prices the member by stock length with every line shown, a range and the comparison', async () => {
    const v = await view();
    expect(v.caution).toBe(CAUTION_TEXT);
    expect(v.missingPrices).toEqual([]);
    // 12 ft clear + 3 in bearing each end = 12.5 ft to buy → 14 ft; 2 plies (common practice: even lengths).
    expect(line(v, 'member')).toMatchObject({
      quantity: 28,
      unit: 'ply-lf',
      unitCents: priceOf('lvl/11.875'),
    });
    expect(line(v, 'hangers')?.quantity).toBeGreaterThan(0);
    expect(v.range.lowCents).toBeLessThanOrEqual(v.range.highCents);
    expect(v.range.lowLabel).not.toBe(v.range.highLabel);
    expect(v.comparison.filter((c) => c.cheapest)).toHaveLength(1);
    expect(v.comparison.find((c) => c.preliminary)?.totalCents).toBe(v.totalCents);
    const cheapest = v.comparison.find((c) => c.cheapest)!;
    for (const c of v.comparison.filter((c) => c.passes && c.complete))
      expect(cheapest.totalCents).toBeLessThanOrEqual(c.totalCents);
    expect(v.scenarios.map((s) => s.id)).toEqual(
      expect.arrayContaining([
        'mount-dropped',
        'material-steel',
        'material-flitch',
        'post-and-footing',
        'post-and-footing-slab',
        'old-house',
      ]),
    );
    expect(v.schedule.framingDays).toBeGreaterThan(0);
  });

  it('moves when a price changes', async () => {
    const before = await view();
    const item = (await owner.get('/api/price-book').expect(200)).body.items.find(
      (i: { key: string }) => i.key === 'lvl/11.875',
    );
    await owner
      .patch(`/api/price-book/items/${item.id}`)
      .send({ amount: item.amount + 100 })
      .expect(200);
    const after = await view();
    // One dollar more per ply-lf over 28 ply-lf.
    expect(line(after, 'member')!.amountCents - line(before, 'member')!.amountCents).toBe(2800);
    expect(after.totalCents).toBeGreaterThan(before.totalCents);
    expect(after.range.lowCents).toBeGreaterThan(before.range.lowCents);
  });

  it('keeps the estimator’s overrides with their notes; contractors read, engineers and other firms never', async () => {
    const estimator = await join('estimator');
    const contractor = await join('contractor');
    const saved = await estimator
      .put(`/api/members/${memberId}/budget`)
      .send({
        choices: { shoring: 'rented', oldHouse: ['vent-stack'] },
        overrides: { 'demolition/disposal': { quantity: 2, note: 'Plaster: two loads' } },
      })
      .expect(200);
    const v = memberBudgetViewSchema.parse(saved.body);
    expect(line(v, 'demolition/disposal')).toMatchObject({
      quantity: 2,
      amountCents: 2 * priceOf('demolition/disposal'),
      override: { note: 'Plaster: two loads' },
    });
    expect(line(v, 'shoring/rental')?.quantity).toBeGreaterThan(0);
    expect(line(v, 'old-house/vent-stack')?.client).toBe('allowance');
    expect((await view(contractor)).totalCents).toBe(v.totalCents);
    await contractor.put(`/api/members/${memberId}/budget`).send({ choices: {} }).expect(403);

    const engineer = await signedUpAgent(server.app, { firmKind: 'engineering' });
    await engineer.agent.get(`/api/members/${memberId}/budget`).expect(403);
    await engineer.agent.get(`/api/jobs/${jobId}/budget`).expect(403);
    const other = await signedUpAgent(server.app);
    await other.agent.get(`/api/members/${memberId}/budget`).expect(404);
    await other.agent.put(`/api/members/${memberId}/budget`).send({ choices: {} }).expect(404);
  });

  it('refuses an override without a note, changing nothing', async () => {
    const before = databaseDump(server.db);
    const res = await owner
      .put(`/api/members/${memberId}/budget`)
      .send({ choices: {}, overrides: { member: { amountCents: 100, note: '  ' } } })
      .expect(400);
    expect(res.body.error.fields['overrides.member.note']).toEqual(['Say why the line changed']);
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('writes its lines as CSV', async () => {
    const v = await view();
    const csv = await owner
      .get(`/api/members/${memberId}/budget/lines.csv`)
      .expect(200)
      .expect('Content-Type', /text\/csv/);
    const rows = csv.text.trim().split('\r\n');
    expect(rows[0]).toBe('member,group,line,quantity,unit,unit_price,amount,basis,price_item,override_note');
    expect(rows).toHaveLength(v.lines.length + 1);
    expect(rows[1]).toMatch(/^Living room beam,member,/);
  });
});

describe('the job budget and a budget sent to a client', () => {
  it('sums the members, freezes what was sent, and dates it', async () => {
    const second = await owner
      .post(`/api/jobs/${jobId}/members`)
      .send({ ...beam, label: 'Den beam' })
      .expect(201);
    const job = jobBudgetSchema.parse((await owner.get(`/api/jobs/${jobId}/budget`).expect(200)).body);
    expect(job.members.map((m) => m.memberId)).toEqual([memberId, second.body.id]);
    expect(job.lowCents).toBe(job.members.reduce((s, m) => s + m.range.lowCents, 0));
    expect(job.highCents).toBe(job.members.reduce((s, m) => s + m.range.highCents, 0));

    const sent = sentBudgetSchema.parse(
      (await owner.post(`/api/jobs/${jobId}/budgets`).send({ clientName: 'R. Client' }).expect(201)).body,
    );
    expect([sent.snapshot.lowCents, sent.snapshot.highCents]).toEqual([job.lowCents, job.highCents]);
    expect(Date.now() - Date.parse(sent.sentAt)).toBeLessThan(60_000);

    const item = (await owner.get('/api/price-book').expect(200)).body.items.find(
      (i: { key: string }) => i.key === 'engineer/fee',
    );
    await owner
      .patch(`/api/price-book/items/${item.id}`)
      .send({ amount: item.amount * 2 })
      .expect(200);
    const later = jobBudgetSchema.parse((await owner.get(`/api/jobs/${jobId}/budget`).expect(200)).body);
    expect(later.highCents).toBeGreaterThan(job.highCents);
    const frozen = sentBudgetSchema.parse((await owner.get(`/api/budgets/${sent.id}`).expect(200)).body);
    expect(frozen).toEqual(sent);
    expect(later.sent).toEqual([
      {
        id: sent.id,
        clientName: 'R. Client',
        sentAt: sent.sentAt,
        lowCents: job.lowCents,
        highCents: job.highCents,
      },
    ]);
  });

  it('refuses to send while a line misses its price', async () => {
    const item = (await owner.get('/api/price-book').expect(200)).body.items.find(
      (i: { key: string }) => i.key === 'hanger/joist',
    );
    await owner.delete(`/api/price-book/items/${item.id}`).expect(204);
    const res = await owner.post(`/api/jobs/${jobId}/budgets`).send({ clientName: 'R. Client' }).expect(409);
    expect(res.body.error.message).toMatch(/Living room beam/);
  });

  it('gives the client a PDF summary: scope, allowances, exclusions, the range and the caution, no internal figure', async () => {
    await owner
      .put(`/api/members/${memberId}/budget`)
      .send({ choices: { allowances: ['wiring'], oldHouse: ['asbestos-test'] } })
      .expect(200);
    const v = await view();
    const sent = sentBudgetSchema.parse(
      (
        await owner
          .post(`/api/jobs/${jobId}/budgets`)
          .send({ clientName: 'R. Client', exclusions: ['Painting the whole room'] })
          .expect(201)
      ).body,
    );
    const pdf = await owner
      .get(`/api/budgets/${sent.id}/summary.pdf`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200)
      .expect('Content-Type', 'application/pdf');
    const parser = new PDFParse({ data: new Uint8Array(pdf.body as Buffer) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();

    expect(text).toContain('Budget ranch');
    expect(text).toContain('Prepared for R. Client');
    expect(text).toContain(
      `${formatDollars(sent.snapshot.lowCents)} to ${formatDollars(sent.snapshot.highCents)}`,
    );
    expect(text).toContain('Move wiring in the wall');
    expect(text).toContain('Asbestos test');
    expect(text).toContain('Painting the whole room');
    expect(text).toContain(CAUTION_TEXT);
    expect(text).toMatch(/preliminary until a licensed engineer designs it/);
    // No unit cost, no line amount, no overhead or profit reaches the client.
    expect(text).not.toMatch(/overhead|profit|per lf|ply-lf/i);
    for (const l of v.lines) {
      if (l.unitCents !== null && l.unitCents >= 100)
        expect(text, l.id).not.toContain(formatDollars(l.unitCents, true));
      if (l.amountCents >= 100) expect(text, l.id).not.toContain(formatDollars(l.amountCents, true));
    }
    for (const id of ['markup/overhead', 'markup/profit'])
      expect(text).not.toContain(formatDollars(line(v, id)!.amountCents));
  });
});
