import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { priceItems } from '@/db/schema';
import { priceBookSchema, type PriceBook } from '@/shared/schemas/price-book';
import { databaseDump } from '@/tests/helpers/db-dump';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let owner: Agent;
let ownerName: string;

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
  const signedUp = await signedUpAgent(server.app);
  owner = signedUp.agent;
  ownerName = signedUp.body.name;
});
afterEach(() => server.close());

const book = async (agent: Agent) =>
  priceBookSchema.parse((await agent.get('/api/price-book').expect(200)).body);
const find = (b: PriceBook, key: string) => b.items.find((i) => i.key === key);

describe('who may read and change the price book', () => {
  it('the owner and the estimator set prices, dated and signed; the contractor reads; the engineer never', async () => {
    const estimator = await join('estimator');
    const contractor = await join('contractor');
    const set = await owner
      .post('/api/price-book/items')
      .send({ key: 'rate/carpenter', amount: 7200 })
      .expect(201);
    expect(set.body).toMatchObject({
      key: 'rate/carpenter',
      amount: 7200,
      unit: 'hour',
      setBy: { name: ownerName },
      stale: false,
    });
    expect(Date.now() - Date.parse(set.body.setAt)).toBeLessThan(60_000);
    const changed = await estimator
      .patch(`/api/price-book/items/${set.body.id}`)
      .send({ amount: 7500, note: 'New crew rate' })
      .expect(200);
    expect(changed.body.setBy.name).toBe('The estimator');
    expect(find(await book(contractor), 'rate/carpenter')?.amount).toBe(7500);
    await contractor.post('/api/price-book/items').send({ key: 'rate/carpenter', amount: 1 }).expect(403);
    await contractor
      .post('/api/price-book/import')
      .send({ csv: 'key,value\r\nrate/carpenter,1\r\n' })
      .expect(403);

    const engineer = await signedUpAgent(server.app, { firmKind: 'engineering' });
    await engineer.agent.get('/api/price-book').expect(403);
    await engineer.agent.get('/api/price-book/export.csv').expect(403);

    const other = await signedUpAgent(server.app);
    await other.agent.patch(`/api/price-book/items/${set.body.id}`).send({ amount: 1 }).expect(404);
    await other.agent.delete(`/api/price-book/items/${set.body.id}`).expect(404);
    expect((await book(other.agent)).items).toEqual([]);
  });

  it('lists every category of the issue’s price book, priced or still to price', async () => {
    const b = await book(owner);
    const categories = new Set(b.unpriced.map((i) => i.category));
    for (const category of [
      'posts-and-hardware',
      'hangers-and-connectors',
      'ply-fasteners',
      'footing',
      'shoring',
      'labour-rates',
      'demolition',
      'allowances',
      'protection',
      'lead-safe',
      'finishes',
      'permit-and-engineer',
      'delivery',
      'yard',
      'old-house',
      'markups',
    ])
      expect(categories, category).toContain(category);
    expect(b.staleAfterDays).toBe(90);
  });

  it('shows a price older than the firm’s chosen age as stale', async () => {
    const set = await owner
      .post('/api/price-book/items')
      .send({ key: 'permit/building', amount: 30000 })
      .expect(201);
    const old = new Date(Date.now() - 40 * 86_400_000).toISOString();
    server.db.update(priceItems).set({ setAt: old }).where(eq(priceItems.id, set.body.id)).run();
    expect(find(await book(owner), 'permit/building')?.stale).toBe(false);
    await owner.patch('/api/price-book/settings').send({ staleAfterDays: 30 }).expect(200);
    expect(find(await book(owner), 'permit/building')?.stale).toBe(true);
  });

  it('refuses a bad price at its field and changes nothing', async () => {
    const before = databaseDump(server.db);
    const unknown = await owner
      .post('/api/price-book/items')
      .send({ key: 'lvl/11.5', amount: 100 })
      .expect(400);
    expect(unknown.body.error.fields).toHaveProperty('key');
    const percent = await owner
      .post('/api/price-book/items')
      .send({ key: 'markup/tax', amount: 10_001 })
      .expect(400);
    expect(percent.body.error.fields.amount).toEqual(['A percentage is at most 100']);
    const fraction = await owner
      .post('/api/price-book/items')
      .send({ key: 'markup/tax', amount: 8.5 })
      .expect(400);
    expect(fraction.body.error.fields).toHaveProperty('amount');
    expect(databaseDump(server.db)).toEqual(before);
  });
});

describe('CSV import and export (papaparse)', () => {
  it('round-trips: an exported file imports back with nothing changed', async () => {
    await owner
      .post('/api/price-book/items')
      .send({ key: 'lvl/11.875', amount: 1356, note: 'Quote, with "quotes", and commas' })
      .expect(201);
    await owner.post('/api/price-book/items').send({ key: 'hours/joist-hung', amount: 300 }).expect(201);
    const csv = await owner
      .get('/api/price-book/export.csv')
      .expect(200)
      .expect('Content-Type', /text\/csv/);
    expect(csv.text.split('\r\n')[0]).toBe('key,category,item,unit,value,note,set_at,set_by');
    expect(csv.text).toContain(
      'lvl/11.875,engineered-lumber,"LVL 1-3/4 in ply, 11.875 in deep, per lf",ply-lf,13.56,"Quote, with ""quotes"", and commas"',
    );
    expect(csv.text).toContain('hours/joist-hung,production,Hang one joist,hours-each,0.3,');
    const again = await owner.post('/api/price-book/import').send({ csv: csv.text }).expect(200);
    expect(again.body).toEqual({ imported: 2, changed: 0 });
  });

  it('imports a good file in one go, each price set by the importer', async () => {
    const estimator = await join('estimator');
    const res = await estimator
      .post('/api/price-book/import')
      .send({
        csv: 'key,value,note\n"rate/carpenter",$72.50,crew\nmarkup/tax,8.25%,\n\nhours/shoring,0.35,\n',
      })
      .expect(200);
    expect(res.body).toEqual({ imported: 3, changed: 3 });
    const b = await book(owner);
    expect([
      find(b, 'rate/carpenter')?.amount,
      find(b, 'markup/tax')?.amount,
      find(b, 'hours/shoring')?.amount,
    ]).toEqual([7250, 825, 350]);
    expect(find(b, 'markup/tax')?.setBy.name).toBe('The estimator');
  });

  it('rejects each bad row by its line number and reason, and keeps nothing of the file', async () => {
    await owner.post('/api/price-book/items').send({ key: 'rate/carpenter', amount: 7000 }).expect(201);
    const before = databaseDump(server.db);
    const csv = [
      'key,unit,value,note',
      'rate/carpenter,hour,80.00,would change',
      'lvl/11.875,ply-lf,12.505,too many decimals',
      'rate/painter,hour,58,"a note',
      'over two lines"',
      'no/such/item,each,1,',
      'markup/tax,percent,101,',
      'rate/carpenter,hour,81,twice',
      'hanger/joist,lf,4.50,wrong unit',
      'footing/dig,cf,-3,',
    ].join('\r\n');
    const res = await owner.post('/api/price-book/import').send({ csv }).expect(400);
    expect(res.body.error.message).toBe('Nothing was imported: lines 3, 6, 7, 8, 9, 10 have problems');
    expect(res.body.error.fields).toEqual({
      'csv.line 3': ['Value "12.505": At most 2 decimals'],
      'csv.line 6': ['"no/such/item" is not a price book item'],
      'csv.line 7': ['A percentage is at most 100'],
      'csv.line 8': ['rate/carpenter is already on line 2'],
      'csv.line 9': ['The unit of hanger/joist is each, not lf'],
      'csv.line 10': ['Value "-3": Not a number (write it like 12.50)'],
    });
    expect(databaseDump(server.db)).toEqual(before);
  });

  it('refuses a file without the key and value columns', async () => {
    const res = await owner
      .post('/api/price-book/import')
      .send({ csv: 'item,price\nrate/carpenter,70\n' })
      .expect(400);
    expect(res.body.error.fields['csv.line 1']).toEqual([
      'The header row has no "key" column',
      'The header row has no "value" column',
    ]);
  });
});
