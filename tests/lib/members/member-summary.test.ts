import { describe, expect, it } from 'vitest';
import { checkMember, prescriptiveVerdict } from '@/lib/calc';
import { memberSummary, memberState } from '@/lib/members/member-summary';
import { deviceMemberFields } from '@/lib/ui/member/device-member';
import { evaluateMember, memberToEvaluate } from '@/server/api/members/member-evaluation';
import { memberCheckInputSchema, type MemberCheckInput } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';

/** Invented demo job and header: 2-ply 2x10 Douglas Fir-Larch No.2 under 13 ft of roof and 6 ft of ceiling. */
const job = { buildingWidthFt: 28, groundSnowPsf: 25 } as Job;
const header = (clearSpanFt: number, kind: 'header' | 'beam' = 'header'): MemberCheckInput =>
  memberCheckInputSchema.parse({
    kind,
    edition: 'ASCE 7-22',
    clearSpanFt,
    sources: [
      { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
      { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
    ],
    materialId: 'sawn-douglas-fir-larch-no2',
    sizeId: '2-ply-2x10',
  });

/** What the member editor hands to the device's save: the same engine, run in the browser. */
function onDevice(input: MemberCheckInput) {
  const result = checkMember(input, { diagrams: true });
  const facts = { member: input, buildingWidthFt: job.buildingWidthFt, groundSnowPsf: job.groundSnowPsf };
  const prescriptive = input.kind === 'header' ? prescriptiveVerdict(facts) : null;
  return deviceMemberFields(job, 'Doorway', { ok: true, input, result, prescriptive });
}

describe('a member summary, one rule on the device and the server', () => {
  it.each([
    ['a short header', header(4)],
    ['a long header that fails', header(20)],
    ['a beam', header(6, 'beam')],
  ])('the device shows for %s the summary the server stores', (_name, input) => {
    const server = evaluateMember(memberToEvaluate(job, 'Doorway', 'Kitchen', input));
    expect(onDevice(input).summary).toEqual(server.summary);
  });

  it('says "fails" before "needs an engineer", and a beam always needs one, with its reasons', () => {
    expect(memberState(false, true)).toBe('fails');
    expect(memberState(true, true)).toBe('engineer-needed');
    expect(memberState(true, false)).toBe('passes');
    const beam = header(6, 'beam');
    const facts = { member: beam, buildingWidthFt: 28, groundSnowPsf: 25 };
    const summary = memberSummary(facts, checkMember(beam), null);
    if (summary.pass) {
      expect(summary.state).toBe('engineer-needed');
      expect(summary.engineerReasons.length).toBeGreaterThan(0);
    } else expect(summary.state).toBe('fails');
    expect(memberSummary(facts, checkMember(header(20, 'beam')), null).state).toBe('fails');
  });
});
