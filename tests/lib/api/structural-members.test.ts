import { afterEach, describe, expect, it, vi } from 'vitest';
import { ENGINE_VERSION, checkMember, prescriptiveVerdict } from '@/lib/calc';
import { deleteMember, fetchJobMembers, fetchMember } from '@/lib/api/structural-members';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import type { Member } from '@/shared/schemas/members';

type Call = { url: string; init: RequestInit };

function answer(status: number, body: unknown): { calls: Call[] } {
  const calls: Call[] = [];
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    calls.push({ url, init });
    return new Response(body === undefined ? null : JSON.stringify(body), { status });
  });
  return { calls };
}

afterEach(() => vi.unstubAllGlobals());

/** Invented demo header: 2-ply 2x10 Douglas Fir-Larch No.2 over 6 ft under 12 ft of roof. */
const input = memberCheckInputSchema.parse({
  kind: 'header',
  label: 'Hall header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [{ kind: 'roof', tributaryFt: 12, deadPsf: 15, roofLivePsf: 20 }],
  materialId: 'sawn-douglas-fir-larch-no2',
  sizeId: '2-ply-2x10',
});
const result = checkMember(input, { diagrams: true });

/** A member as the server answers it, built from the real engine. */
const saved: Member = JSON.parse(
  JSON.stringify({
    id: 'm/1',
    jobId: 'j1',
    kind: 'header',
    label: 'Hall header',
    wall: '',
    materialId: input.materialId,
    sizeId: input.sizeId,
    input,
    summary: {
      state: 'passes',
      pass: result.pass,
      governingCheck: result.governing.check,
      governingRatio: result.governing.ratio,
      warningsCount: result.warnings.length,
      sizeLabel: result.member.sizeLabel,
      materialLabel: result.member.materialLabel,
      engineerReasons: [],
    },
    result,
    prescriptive: prescriptiveVerdict({ member: input, buildingWidthFt: 28, groundSnowPsf: 0 }),
    engineVersion: ENGINE_VERSION,
    version: 1,
    createdBy: 'u1',
    updatedBy: 'u1',
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
  }),
);
const { input: _input, result: _result, prescriptive: _prescriptive, ...listItem } = saved;

describe('structural members client', () => {
  it('lists a job’s members from GET /api/jobs/:jobId/members', async () => {
    const { calls } = answer(200, { members: [listItem] });
    expect(await fetchJobMembers('j 1')).toEqual([listItem]);
    expect([calls[0].url, calls[0].init.method]).toEqual(['/api/jobs/j%201/members', 'GET']);
  });

  // Creates and edits go through the device's queue (lib/offline, tests/lib/offline).
  it('reads and deletes at the member paths', async () => {
    const { calls } = answer(200, saved);
    expect(await fetchMember('m/1')).toEqual(saved);
    expect(calls.map((c) => [c.init.method, c.url])).toEqual([['GET', '/api/members/m%2F1']]);
    answer(204, undefined);
    await expect(deleteMember('m/1')).resolves.toBeUndefined();
  });

  it('a 400 carries the field messages', async () => {
    const fields = { 'input.clearSpanFt': ['Enter the clear span'] };
    answer(400, { error: { code: 'bad_request', message: 'Some fields need attention', fields } });
    await expect(fetchMember('m1')).rejects.toMatchObject({ status: 400, fields });
  });
});
