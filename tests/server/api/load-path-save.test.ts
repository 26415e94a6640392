import { describe, expect, it } from 'vitest';
import { findJobInAnyFirm } from '@/server/api/jobs/jobs.repository';
import { jobPathInput, pathInputWith, refreshLoadPath } from '@/server/api/load-path/load-path.service';
import { evaluateMember, memberToEvaluate } from '@/server/api/members/member-evaluation';
import { listMembersOnPath } from '@/server/api/members/members.repository';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { bearingSavedSchema, type ElementCreateBody } from '@/shared/schemas/load-path-elements';
import { memberSchema, type MemberSummary } from '@/shared/schemas/members';
import { databaseDump } from '@/tests/helpers/db-dump';
import { withOwnerJob } from '@/tests/helpers/owner-job';

const world = withOwnerJob('Garage opening');

const DFL2 = 'sawn-douglas-fir-larch-no2';

// Invented demo chain: a 6 ft garage-wall header under 12 ft of roof (15 psf dead, 20 psf roof live: ASCE 7
// Table 4.3-1 roof live load), both ends on a 12 ft 3-ply 2x10 girder, whose ends sit on 6x6 posts on
// confirmed new pads.
const headerInput: MemberCheckInputBody = {
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [{ kind: 'roof', tributaryFt: 12, deadPsf: 15, roofLivePsf: 20 }],
  materialId: DFL2,
  sizeId: '2-ply-2x10',
};
const girderInput: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-22',
  clearSpanFt: 12,
  sources: [{ kind: 'floor', tributaryFt: 2, deadPsf: 10, livePsf: 40 }],
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
};
const postOnPad = (label: string): ElementCreateBody => ({
  label,
  element: { kind: 'post', materialId: DFL2, sizeId: '6x6', heightFt: 8 },
});
const pad: ElementCreateBody = {
  label: 'New pad',
  element: { kind: 'footing', data: { footing: 'new-pad', confirmed: true } },
};

const setEnd = (path: string, body: object) => world.owner.put(`/api/${path}`).send(body).expect(200);
const addMember = async (label: string, input: MemberCheckInputBody) =>
  memberSchema.parse(
    (await world.owner.post(`/api/jobs/${world.jobId}/members`).send({ label, input }).expect(201)).body,
  );

/** Header on a girder on two posts on two pads, built through the API. */
async function buildChain() {
  const header = await addMember('Garage header', headerInput);
  const girder = await addMember('Girder', girderInput);
  await setEnd(`members/${header.id}/ends/left`, { ontoId: girder.id, atFt: 3 });
  await setEnd(`members/${header.id}/ends/right`, { ontoId: girder.id, atFt: 9 });
  for (const end of ['left', 'right']) {
    const post = bearingSavedSchema.parse(
      (await setEnd(`members/${girder.id}/ends/${end}`, { onto: postOnPad(`Post ${end}`) })).body,
    ).created?.id as string;
    await setEnd(`elements/${post}/ends/bottom`, { onto: pad });
  }
  return { header, girder };
}

function context() {
  const job = findJobInAnyFirm(world.server.db, world.jobId);
  if (!job) throw new Error('job not found');
  return { job, orgId: job.orgId };
}

const storedSummaries = (): Record<string, MemberSummary> => {
  const { orgId } = context();
  return Object.fromEntries(
    listMembersOnPath(world.server.db, orgId, world.jobId).map((m) => [m.id, m.summary]),
  );
};

/** Every member's summary from a full recompute of the job's load path on the main thread. */
function fullRecompute(): Record<string, MemberSummary> {
  const { job, orgId } = context();
  return world.server.db.transaction((tx) => {
    const { summaries } = refreshLoadPath(tx, orgId, job, () => 'input');
    return Object.fromEntries(summaries);
  });
}

describe('a member save evaluates the load path in the pool and stores what a full recompute stores', () => {
  it('editing the header of a closed chain stores the same states and summaries as a full recompute', async () => {
    const { header, girder } = await buildChain();
    const { job, orgId } = context();
    const heavier: MemberCheckInputBody = {
      ...headerInput,
      sources: [{ kind: 'roof', tributaryFt: 16, deadPsf: 15, roofLivePsf: 20 }],
    };
    // What the pool evaluates before the transaction: the job as it will be with the header saved.
    const parsed = memberCheckInputSchema.parse(heavier);
    const expected = pathInputWith(world.server.db, orgId, job, {
      ...evaluateMember(memberToEvaluate(job, header.label, header.wall, parsed)),
      id: header.id,
    });
    const before = storedSummaries();
    await world.owner.patch(`/api/members/${header.id}`).send({ input: heavier }).expect(200);
    // The transaction read exactly that, so the pool's evaluation was the one used.
    expect(JSON.stringify(jobPathInput(world.server.db, orgId, job))).toBe(JSON.stringify(expected));
    const stored = storedSummaries();
    expect(stored[girder.id]?.loadPath?.closed).toBe(true);
    expect(stored[header.id]?.loadPath?.closed).toBe(true);
    // The header's own check changed with its load.
    expect(stored[header.id]?.governingRatio).toBeGreaterThan(before[header.id]?.governingRatio ?? Infinity);
    const dump = databaseDump(world.server.db);
    expect(fullRecompute()).toEqual(stored);
    expect(databaseDump(world.server.db)).toEqual(dump);
  });

  it('a member added to a job with a chain stores what a full recompute stores, and changes no other', async () => {
    await buildChain();
    const before = storedSummaries();
    const added = await addMember('Porch beam', girderInput);
    const stored = storedSummaries();
    expect(stored[added.id]?.state).toBe('load-path-open');
    expect({ ...stored, [added.id]: undefined }).toEqual({ ...before, [added.id]: undefined });
    const dump = databaseDump(world.server.db);
    expect(fullRecompute()).toEqual(stored);
    expect(databaseDump(world.server.db)).toEqual(dump);
  });
});
