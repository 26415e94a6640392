import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION_TEXT, checkMember, listMaterials, listSizes } from '@/lib/calc';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { apiErrorBodySchema } from '@/shared/errors';
import { memberCheckInputSchema, memberCheckResultSchema } from '@/shared/schemas/calc/member';
import type { MemberCheckRequestBody } from '@/shared/schemas/calc/requests';
import { shortlistResultSchema, type ShortlistInputBody } from '@/shared/schemas/calc/shortlist';
import { spanTableResultSchema, type SpanTableInputBody } from '@/shared/schemas/calc/span-table';
import { expectApprox } from '@/tests/helpers/approx';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let contractor: Agent;
let engineer: Agent;
beforeAll(async () => {
  server = await createTestServer();
  contractor = (await signedUpAgent(server.app)).agent;
  engineer = (await signedUpAgent(server.app, { firmKind: 'engineering' })).agent;
});
afterAll(() => server.close());

const DFL2 = 'sawn-douglas-fir-larch-no2';

/** Invented demo loads: a header under 13 ft of roof (15 psf dead, 20 psf roof live) and 6 ft of ceiling. */
const roofAndCeiling = [
  { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
  { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
] as const;

/** Invented demo header: 2-ply 2x10 Douglas Fir-Larch No.2 over a 6 ft clear span. */
const header: MemberCheckRequestBody = {
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [...roofAndCeiling],
  materialId: DFL2,
  sizeId: '2-ply-2x10',
};

const shortlistBody: ShortlistInputBody = {
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [...roofAndCeiling],
  materialIds: [DFL2, 'lvl-2.0e'],
};

const spanTableBody: SpanTableInputBody = {
  edition: 'ASCE 7-22',
  deadPsf: 12,
  livePsf: 40,
  tributaryWidthsFt: [4, 8, 12],
  materialIds: [DFL2],
  plies: [2],
};

const routes: [path: string, body: object][] = [
  ['/api/calc/check', header],
  ['/api/calc/shortlist', shortlistBody],
  ['/api/calc/span-table', spanTableBody],
];

describe('calculation routes need a signed-in user', () => {
  it.each(routes)('%s answers 401 when signed out', async (path, body) => {
    const res = await request(server.app).post(path).send(body).expect(401);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('unauthorized');
  });

  it.each(routes)('%s answers 200 for an engineering firm too (any role)', async (path, body) => {
    await engineer.post(path).send(body).expect(200);
  });
});

describe('POST /api/calc/check', () => {
  it('checks the header: caution, governing check, sources and a ratio per check', async () => {
    const res = await contractor.post('/api/calc/check').send(header).expect(200);
    const result = memberCheckResultSchema.parse(res.body);
    expect(result.caution).toBe(CAUTION_TEXT);
    expect(result.member).toMatchObject({ materialId: DFL2, sizeId: '2-ply-2x10', plies: 2 });
    expect(result.checks.map((c) => c.id)).toEqual([
      'bending',
      'shear',
      'deflection-live',
      'deflection-total',
      'bearing',
    ]);
    for (const check of result.checks) {
      expectApprox(check.ratio, check.demand / check.capacity, { rel: 1e-9 });
      expect(check.pass).toBe(check.ratio <= 1);
    }
    const worst = Math.max(...result.checks.map((c) => c.ratio));
    expectApprox(result.governing.ratio, worst, { rel: 1e-12 });
    expect(result.checks.find((c) => c.id === result.governing.check)?.ratio).toBe(result.governing.ratio);
    expect(result.sources.length).toBeGreaterThan(0);
    expect(result.sources.join('\n')).toContain('NDS');
    expect(result.diagram).toBeUndefined();
  });

  it('bending under D + Lr matches a hand calculation', async () => {
    const result = memberCheckResultSchema.parse(
      (await contractor.post('/api/calc/check').send(header).expect(200)).body,
    );
    const bending = result.checks.find((c) => c.id === 'bending');
    expect(bending?.combination).toBe('D + Lr');
    // Design span = 6 ft clear + 2 × 1.5 in (half of the default 3 in bearing) = 6.25 ft.
    const spanFt = 6.25;
    // w = roof 13 × (15 + 20) + ceiling dead 6 × 10 + self-weight (the result's own plf).
    const wPlf = 13 * (15 + 20) + 6 * 10 + result.member.selfWeightPlf;
    // M = wL²/8 (AWC Design Aid No. 6, simple beam, uniform load); S = 2 × 21.39 in³ (NDS Supplement 2018
    // Table 1B, 2x10 as printed, two plies).
    const fbPsi = (((wPlf * spanFt ** 2) / 8) * 12) / (2 * 21.39);
    expectApprox(bending?.demand ?? NaN, fbPsi, { rel: 1e-9 });
    // F'_b = 900 psi (NDS Supplement 2018 Table 4A, Douglas Fir-Larch No.2) × C_D 1.25 (NDS 2018 Table
    // 2.3.2, roof live) × C_F 1.1 (NDS Supplement 2018 Table 4A, 10 in wide).
    expectApprox(bending?.capacity ?? NaN, 900 * 1.25 * 1.1, { rel: 1e-9 });
  });

  it('equals checkMember called directly on the same input (same engine)', async () => {
    const res = await contractor.post('/api/calc/check').send(header).expect(200);
    const direct = checkMember(memberCheckInputSchema.parse(header));
    expect(res.body).toEqual(JSON.parse(JSON.stringify(direct)));
  });

  it('samples the governing combination for drawing when diagrams is true', async () => {
    const res = await contractor
      .post('/api/calc/check')
      .send({ ...header, diagrams: true })
      .expect(200);
    const result = memberCheckResultSchema.parse(res.body);
    const direct = checkMember(memberCheckInputSchema.parse(header), { diagrams: true });
    expect(result.diagram?.combination).toBe(result.governing.combination);
    expect(result.diagram?.samples.length).toBeGreaterThan(2);
    expect(res.body).toEqual(JSON.parse(JSON.stringify(direct)));
  });
});

describe('bad input answers 400 with field messages', () => {
  // The engine names an unknown id of `materialIds` by the field `materialId` (the one id it could not find).
  const cases: [label: string, path: string, body: unknown, field: string][] = [
    ['a negative span', '/api/calc/check', { ...header, clearSpanFt: -6 }, 'clearSpanFt'],
    ['a span given as text', '/api/calc/check', { ...header, clearSpanFt: '6' }, 'clearSpanFt'],
    [
      'a negative roof load',
      '/api/calc/check',
      { ...header, sources: [{ ...roofAndCeiling[0], deadPsf: -1 }] },
      'sources.0.deadPsf',
    ],
    ['diagrams as text', '/api/calc/check', { ...header, diagrams: 'yes' }, 'diagrams'],
    [
      'an unknown material id (engine)',
      '/api/calc/check',
      { ...header, materialId: 'sawn-balsa-no9' },
      'materialId',
    ],
    ['an unknown size (engine)', '/api/calc/check', { ...header, sizeId: '7-ply-2x3' }, 'sizeId'],
    ['garbage', '/api/calc/check', ['not', 'a', 'member'], '_'],
    ['no materials', '/api/calc/shortlist', { ...shortlistBody, materialIds: [] }, 'materialIds'],
    ['an unknown sort', '/api/calc/shortlist', { ...shortlistBody, sortBy: 'prettiest' }, 'sortBy'],
    [
      'an unknown material id (engine)',
      '/api/calc/shortlist',
      { ...shortlistBody, materialIds: ['nope'] },
      'materialId',
    ],
    ['a negative dead load', '/api/calc/span-table', { ...spanTableBody, deadPsf: -12 }, 'deadPsf'],
    [
      'no tributary widths',
      '/api/calc/span-table',
      { ...spanTableBody, tributaryWidthsFt: [] },
      'tributaryWidthsFt',
    ],
    [
      'an unknown material id (engine)',
      '/api/calc/span-table',
      { ...spanTableBody, materialIds: ['nope'] },
      'materialId',
    ],
    [
      'a roof dead load of 1e300 psf',
      '/api/calc/check',
      { ...header, sources: [{ ...roofAndCeiling[0], deadPsf: 1e300 }] },
      'sources.0.deadPsf',
    ],
    [
      'a point load of 1e300 lb',
      '/api/calc/check',
      {
        ...header,
        sources: [{ kind: 'point', pointKind: 'post-above', atFt: 3, liveLb: 1e300 }],
      },
      'sources.0.liveLb',
    ],
    [
      'a measured ply too thin to check',
      '/api/calc/check',
      { ...header, measuredPly: { bIn: 1e-300, dIn: 9.25 } },
      'measuredPly.bIn',
    ],
    ['five ply counts', '/api/calc/shortlist', { ...shortlistBody, plies: [1, 2, 3, 4, 4] }, 'plies'],
    ['five ply counts', '/api/calc/span-table', { ...spanTableBody, plies: [1, 2, 3, 4, 1] }, 'plies'],
    [
      'more work than one request may ask (engine)',
      '/api/calc/span-table',
      {
        ...spanTableBody,
        plies: undefined,
        roofLivePsf: 20,
        roofSnowPsf: 30,
        tributaryWidthsFt: [2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24],
        materialIds: listMaterials().map((m) => m.id),
      },
      'materialIds',
    ],
  ];

  it.each(cases)('%s on %s', async (_label, path, body, field) => {
    const res = await contractor
      .post(path)
      .send(body as object)
      .expect(400);
    const { error } = apiErrorBodySchema.parse(res.body);
    expect(error.code).toBe('bad_request');
    expect(Object.keys(error.fields ?? {})).toContain(field);
    expect(error.fields?.[field]?.[0]).toEqual(expect.any(String));
  });

  it('names every field of a body that is all wrong', async () => {
    const res = await contractor
      .post('/api/calc/check')
      .send({ kind: 'arch', edition: 'ASCE 7-99', clearSpanFt: 0, sources: 'lots' })
      .expect(400);
    const { error } = apiErrorBodySchema.parse(res.body);
    expect(Object.keys(error.fields ?? {})).toEqual(
      expect.arrayContaining(['kind', 'edition', 'clearSpanFt', 'sources', 'materialId', 'sizeId']),
    );
  });

  it('answers 400 for a body that is not JSON', async () => {
    const res = await contractor
      .post('/api/calc/check')
      .set('Content-Type', 'application/json')
      .send('{"kind": "header",')
      .expect(400);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('bad_request');
  });
});

describe('POST /api/calc/shortlist', () => {
  it.each(['shallowest', 'lightest'] as const)('returns passing sizes sorted %s first', async (sortBy) => {
    const res = await contractor
      .post('/api/calc/shortlist')
      .send({ ...shortlistBody, sortBy, limit: 500 })
      .expect(200);
    const result = shortlistResultSchema.parse(res.body);
    expect(result.caution).toBe(CAUTION_TEXT);
    expect(result.sortBy).toBe(sortBy);
    expect(result.passing.length).toBeGreaterThan(1);
    const key = sortBy === 'shallowest' ? 'dIn' : 'weightPlf';
    for (let i = 1; i < result.passing.length; i++) {
      expect(result.passing[i][key]).toBeGreaterThanOrEqual(result.passing[i - 1][key]);
    }
    for (const entry of result.passing) expect(entry.utilization).toBeLessThanOrEqual(1);
    expect(new Set(result.passing.map((e) => e.materialId))).toEqual(new Set([DFL2, 'lvl-2.0e']));
  });

  it('sorts cheapest first by the prices given', async () => {
    const res = await contractor
      .post('/api/calc/shortlist')
      .send({
        ...shortlistBody,
        materialIds: [DFL2],
        plies: [2],
        sortBy: 'cheapest',
        // Invented demo prices per linear foot of the whole member.
        pricePerFt: { '2-ply-2x8': 3, '2-ply-2x10': 2, '2-ply-2x12': 4 },
      })
      .expect(200);
    const result = shortlistResultSchema.parse(res.body);
    const priced = result.passing.filter((e) => e.cost !== null);
    expect(priced.map((e) => e.sizeId)).toEqual(['2-ply-2x10', '2-ply-2x8', '2-ply-2x12']);
    // Cost = price per ft × length to buy (6 ft clear + two 3 in bearings = 6.5 ft).
    expectApprox(priced[0].cost ?? NaN, 2 * 6.5, { rel: 1e-12 });
  });
});

describe('POST /api/calc/span-table', () => {
  it('returns one row per size, each with a span per tributary width', async () => {
    const res = await contractor.post('/api/calc/span-table').send(spanTableBody).expect(200);
    const result = spanTableResultSchema.parse(res.body);
    expect(result.caution).toBe(CAUTION_TEXT);
    expect(result.tributaryWidthsFt).toEqual([4, 8, 12]);
    expect(result.rows.map((r) => r.sizeId)).toEqual(listSizes(DFL2, { plies: [2] }).map((s) => s.id));
    for (const row of result.rows) {
      expect(row.cells.map((c) => c.tributaryFt)).toEqual([4, 8, 12]);
      for (let i = 1; i < row.cells.length; i++) {
        expect(row.cells[i].spanFt).toBeLessThan(row.cells[i - 1].spanFt);
      }
    }
  });
});

describe('bounded work (CALC_BOUNDS)', () => {
  it('tabulates a material named 40 times once, in a small answer', async () => {
    const res = await contractor
      .post('/api/calc/span-table')
      .send({
        ...spanTableBody,
        plies: undefined,
        tributaryWidthsFt: [2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24],
        materialIds: Array.from({ length: 40 }, () => DFL2),
      })
      .expect(200);
    const result = spanTableResultSchema.parse(res.body);
    expect(result.rows.map((r) => r.sizeId)).toEqual(listSizes(DFL2).map((s) => s.id));
    expect(JSON.stringify(res.body).length).toBeLessThan(200_000);
  });

  it('names the ceiling in the 400 for a span table past it', async () => {
    const res = await contractor
      .post('/api/calc/span-table')
      .send({
        ...spanTableBody,
        plies: undefined,
        roofLivePsf: 20,
        roofSnowPsf: 30,
        tributaryWidthsFt: [2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24],
        materialIds: listMaterials().map((m) => m.id),
      })
      .expect(400);
    const message = apiErrorBodySchema.parse(res.body).error.fields?.materialIds?.[0] ?? '';
    expect(message).toContain(CALC_BOUNDS.spanTableWork.toLocaleString('en-US'));
    expect(message).toContain('sizes × 12 tributary widths');
  });
});

describe('overhanging and continuous members through the API', () => {
  it('checks a beam continuous over a centre post with an overhang, with diagrams of the whole member', async () => {
    const res = await contractor
      .post('/api/calc/check')
      .send({
        ...header,
        kind: 'beam',
        materialId: 'lvl-2.0e',
        sizeId: '3-ply-1.75x11.875',
        clearSpanFt: 8,
        secondClearSpanFt: 10,
        overhangRightFt: 2,
        diagrams: true,
      })
      .expect(200);
    const result = memberCheckResultSchema.parse(res.body);
    expect(result.reactions.bySupport?.map((r) => r.support)).toEqual(['left', 'centre', 'right']);
    expect(result.posts).toBeUndefined();
    const samples = result.diagram?.samples ?? [];
    expectApprox(samples[samples.length - 1].xFt, result.spans.memberLengthFt ?? NaN, { rel: 1e-12 });
  });

  it('tabulates two continuous spans', async () => {
    const res = await contractor
      .post('/api/calc/span-table')
      .send({ ...spanTableBody, layout: 'two-span' })
      .expect(200);
    expect(spanTableResultSchema.parse(res.body).layout).toBe('two-span');
  });
});
