import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEMO_PRICES } from '@/db/demo-prices';
import { amountText, catalogueItem, type PriceUnit } from '@/lib/budget';
import { toCsv } from '@/lib/format/csv';
import { jobBudgetSchema, memberBudgetViewSchema, type MemberBudgetView } from '@/shared/schemas/budgets';
import { jobDesignsSchema } from '@/shared/schemas/requests/member-design';
import { requestWorld, sampleReply } from '@/tests/helpers/design-requests';
import { createTestServer, signedUpAgent, type TestServer } from '@/tests/helpers/server';

/**
 * Issues 10 and 11: once a request is Designed, the member's budget rebuilds from the engineer's member, the
 * preliminary size is marked superseded, and a change order rises when the engineer's member differs from
 * the budgeted one. The world's member is a 2-ply 2x10 Douglas Fir-Larch No.2 header (tests/helpers); every
 * price is the demo firm's invented one.
 */

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;

const demoCsv = toCsv([
  ['key', 'value'],
  ...DEMO_PRICES.map(([key, amount]) => [key, amountText(amount, catalogueItem(key)!.unit as PriceUnit)]),
]);

beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
  await world.firm.agent.post('/api/price-book/import').send({ csv: demoCsv }).expect(200);
});
afterEach(() => server.close());

const budget = async (): Promise<MemberBudgetView> =>
  memberBudgetViewSchema.parse(
    (await world.firm.agent.get(`/api/members/${world.memberId}/budget`).expect(200)).body,
  );
const designs = async () =>
  jobDesignsSchema.parse((await world.firm.agent.get(`/api/jobs/${world.jobId}/designs`).expect(200)).body)
    .designs;
const memberLine = (view: MemberBudgetView) => view.lines.find((l) => l.id === 'member')!;
const designedAs = async (member: Record<string, unknown>) => {
  const id = await world.sent('in-review');
  await world.designed(id, {
    ...sampleReply(world.memberId),
    members: [{ memberId: world.memberId, ...member }],
  });
  return id;
};

describe('a Designed request supersedes the preliminary size', () => {
  it('the designs list names the engineer’s member only once Designed, and not while reopened', async () => {
    const id = await world.sent('in-review');
    await world.reply(id);
    expect(await designs()).toEqual([]);
    await world.designed(id);
    expect(await designs()).toMatchObject([
      {
        memberId: world.memberId,
        requestId: id,
        requestNumber: 1,
        version: 1,
        material: 'lvl',
        designation: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
        preliminaryLabel: '2-ply 2x10 Douglas Fir-Larch No.2',
      },
    ]);
    await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ question: 'Could it be flush?' })
      .expect(201);
    expect(await designs()).toEqual([]);
    expect((await budget()).design).toBeNull();
  });

  it('only the firm reads the designs: the engineer 403, another firm 404', async () => {
    await world.engineer.agent.get(`/api/jobs/${world.jobId}/designs`).expect(403);
    const other = await signedUpAgent(server.app);
    await other.agent.get(`/api/jobs/${world.jobId}/designs`).expect(404);
  });
});

describe('the budget rebuilds from the engineer’s member, with a change order when it differs', () => {
  it('an LVL in place of the sawn header: the LVL is priced, the range closes, the change order shows the difference', async () => {
    const before = await budget();
    expect(before).toMatchObject({ design: null, preliminaryRange: null, changeOrder: null });
    expect(memberLine(before).priceKey).toMatch(/^sawn\/2x10\//);

    const id = await designedAs({
      material: 'lvl',
      designation: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
      plies: 2,
      widthIn: 3.5,
      depthIn: 9.25,
    });
    const after = await budget();
    expect(after.design).toEqual({
      requestId: id,
      requestNumber: 1,
      version: 1,
      label: '2-ply 1-3/4 x 9-1/4 LVL 2.0E (LVL)',
    });
    // LVL is priced per ply per lf at its depth (common practice): 2 plies of the stock length bought.
    expect(memberLine(after)).toMatchObject({ priceKey: 'lvl/9.25', unit: 'ply-lf', missingPrice: false });
    expect(memberLine(after).label).toContain('1-3/4 x 9-1/4');
    expect(memberLine(after).quantity).toBe(2 * after.supply.buyFt);
    expect(after.range).toMatchObject({ lowCents: after.totalCents, highCents: after.totalCents });
    expect(after.preliminaryRange).toEqual(before.range);
    expect(after.changeOrder).toEqual({
      against: 'the preliminary range',
      sentBudgetId: null,
      budgetedLabel: '2-ply 2x10 Douglas Fir-Larch No.2',
      designedLabel: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
      differences: ['material Sawn lumber → LVL', 'width 3" → 3-1/2"'],
      designedCents: after.totalCents,
      fromHighCents: after.totalCents - before.range.highCents,
      fromLowCents: after.totalCents - before.range.lowCents,
      outsideRange: after.totalCents > before.range.highCents || after.totalCents < before.range.lowCents,
    });

    const job = jobBudgetSchema.parse(
      (await world.firm.agent.get(`/api/jobs/${world.jobId}/budget`).expect(200)).body,
    );
    expect(job.changeOrders).toBe(1);
    expect(job.members[0].changeOrder).toEqual(after.changeOrder);
    expect(job.members[0].design?.requestNumber).toBe(1);
    expect([job.lowCents, job.highCents]).toEqual([after.totalCents, after.totalCents]);
  });

  it('the same member as budgeted: rebuilt from the design, no change order', async () => {
    await designedAs({
      material: 'sawn',
      designation: '(2) 2x10 DF-L No.2',
      plies: 2,
      widthIn: 3,
      depthIn: 9.25,
    });
    const after = await budget();
    expect(after.design).not.toBeNull();
    expect(after.changeOrder).toBeNull();
    expect(memberLine(after).priceKey).toMatch(/^sawn\/2x10\//);
  });

  it('a PSL the price book cannot price: a line to price by hand, then overridden with a note', async () => {
    await designedAs({
      material: 'psl',
      designation: '3-1/2 x 11-7/8 PSL 2.2E',
      plies: 1,
      widthIn: 3.5,
      depthIn: 11.875,
    });
    const after = await budget();
    expect(memberLine(after)).toMatchObject({
      priceKey: 'member/by-hand',
      missingPrice: true,
      amountCents: 0,
    });
    expect(after.missingPrices).toContain('member/by-hand');
    expect(after.changeOrder?.differences).toEqual([
      'material Sawn lumber → PSL',
      'plies 2 → 1',
      'width 3" → 3-1/2"',
      'depth 9-1/4" → 11-7/8"',
    ]);
    await world.firm.agent
      .put(`/api/members/${world.memberId}/budget`)
      .send({ choices: {}, overrides: { member: { amountCents: 310_00, note: 'Yard quote for the PSL' } } })
      .expect(200);
    const priced = await budget();
    expect(memberLine(priced)).toMatchObject({
      amountCents: 310_00,
      override: { note: 'Yard quote for the PSL' },
    });
    expect(priced.totalCents).toBeGreaterThan(after.totalCents);
  });

  it('a steel W shape: priced on the steel line, the change order names the material', async () => {
    await designedAs({ material: 'steel-w', designation: 'W8x18', plies: 1, depthIn: 8.14 });
    const after = await budget();
    expect(memberLine(after)).toMatchObject({ priceKey: 'alternate/steel', missingPrice: false });
    expect(memberLine(after).label).toContain('W8x18');
    expect(after.changeOrder?.differences[0]).toBe('material Sawn lumber → Steel W shape');
  });
});

describe('the change order compares with the budget sent to the client, when there is one', () => {
  const sendBudget = async (clientName: string) =>
    (await world.firm.agent.post(`/api/jobs/${world.jobId}/budgets`).send({ clientName }).expect(201)).body;
  const lvl = {
    material: 'lvl',
    designation: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
    plies: 2,
    widthIn: 3.5,
    depthIn: 9.25,
  };

  it('sent before the design: the difference is against the sent, dated range and says so', async () => {
    const sent = await sendBudget('Sample Homeowner');
    const [part] = sent.snapshot.members;
    expect(part).toMatchObject({ memberId: world.memberId, shape: { family: 'Sawn lumber', plies: 2 } });
    // The price book moves after sending: the preliminary range moves, the sent one does not.
    await world.firm.agent
      .put(`/api/members/${world.memberId}/budget`)
      .send({ choices: { engineerSiteVisit: true }, overrides: {} })
      .expect(200);
    await designedAs(lvl);
    const after = await budget();
    expect(after.preliminaryRange?.highCents).not.toBe(part.highCents);
    expect(after.changeOrder).toMatchObject({
      against: `the budget sent to Sample Homeowner on ${sent.sentAt.slice(0, 10)}`,
      sentBudgetId: sent.id,
      budgetedLabel: '2-ply 2x10 Douglas Fir-Larch No.2',
      differences: ['material Sawn lumber → LVL', 'width 3" → 3-1/2"'],
      fromHighCents: after.totalCents - part.highCents,
      fromLowCents: after.totalCents - part.lowCents,
    });
  });

  it('sent after the design with the engineer’s member: no change order against it', async () => {
    await designedAs(lvl);
    expect((await budget()).changeOrder?.against).toBe('the preliminary range');
    const sent = await sendBudget('Sample Homeowner');
    expect(sent.snapshot.members[0].shape).toMatchObject({ family: 'LVL', bIn: 3.5, dIn: 9.25 });
    expect((await budget()).changeOrder).toBeNull();
    const job = jobBudgetSchema.parse(
      (await world.firm.agent.get(`/api/jobs/${world.jobId}/budget`).expect(200)).body,
    );
    expect(job.changeOrders).toBe(0);
  });
});
