import type { DbOrTx } from './client';
import { newId } from './new-id';
import { members } from './schema';
import type { MemberCheckInput, MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';

/** What the server's save computes for a member (the engine's result, summary and verdict), passed in. */
export type EvaluateMember = (
  job: Job,
  label: string,
  wall: string,
  input: MemberCheckInput,
) => Omit<
  typeof members.$inferInsert,
  'id' | 'jobId' | 'orgId' | 'createdBy' | 'updatedBy' | 'createdAt' | 'updatedAt'
>;

interface DemoMember {
  label: string;
  wall: string;
  /** The member's own input; the job's edition, snow, roof type and slope are filled in as the editor does. */
  input: Omit<MemberCheckInputBody, 'edition' | 'snow' | 'roofPitchIn12' | 'label'>;
}

const DFL2 = 'sawn-douglas-fir-larch-no2';
const LVL = 'lvl-2.0e';

/**
 * Demo members by job name. An invented scenario: the openings, spans, loads and sizes are made up for the
 * demo (psf values are the editor's typical assemblies). Some pass, one fails, the beams need an engineer.
 */
export const DEMO_MEMBERS: Record<string, DemoMember[]> = {
  'Ranch dining-room opening': [
    {
      label: 'Kitchen pass-through header',
      wall: 'Kitchen / dining',
      input: {
        kind: 'header',
        clearSpanFt: 4,
        sources: [
          { kind: 'roof', flag: 'assumed', tributaryFt: 15, deadPsf: 15, roofLivePsf: 20 },
          { kind: 'ceiling', flag: 'assumed', tributaryFt: 7, deadPsf: 8, livePsf: 10 },
        ],
        materialId: DFL2,
        sizeId: '2-ply-2x8',
        deflectionUse: 'gypsum-ceiling',
        flags: { clearSpanFt: 'measured', bearingLeftIn: 'measured', bearingRightIn: 'measured' },
      },
    },
    {
      label: 'Dining-room beam',
      wall: 'Dining / living',
      input: {
        kind: 'beam',
        clearSpanFt: 14,
        bearingLeftIn: 4.5,
        bearingRightIn: 4.5,
        sources: [
          { kind: 'roof', flag: 'assumed', tributaryFt: 15, deadPsf: 15, roofLivePsf: 20 },
          {
            kind: 'ceiling',
            flag: 'measured',
            tributaryFt: 7,
            deadPsf: 8,
            livePsf: 10,
            continuousOver: true,
          },
        ],
        materialId: LVL,
        sizeId: '3-ply-1.75x11.875',
        deflectionUse: 'gypsum-ceiling',
        flags: { clearSpanFt: 'measured', materialId: 'assumed' },
      },
    },
  ],
  'Bungalow hall doorway': [
    {
      label: 'Hall doorway header',
      wall: 'Hall / front bedroom',
      input: {
        kind: 'header',
        clearSpanFt: 5,
        sources: [
          { kind: 'roof', flag: 'assumed', tributaryFt: 13, deadPsf: 17, roofLivePsf: 20 },
          { kind: 'ceiling', flag: 'assumed', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
        ],
        materialId: DFL2,
        sizeId: '2-ply-2x10',
        deflectionUse: 'plaster-ceiling',
        flags: { clearSpanFt: 'measured' },
      },
    },
    {
      label: 'Linen closet header',
      wall: 'Hall / bath',
      input: {
        kind: 'header',
        clearSpanFt: 6.5,
        sources: [
          { kind: 'roof', flag: 'assumed', tributaryFt: 13, deadPsf: 17, roofLivePsf: 20 },
          { kind: 'ceiling', flag: 'assumed', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
        ],
        materialId: DFL2,
        sizeId: '2-ply-2x6',
        deflectionUse: 'plaster-ceiling',
        flags: { clearSpanFt: 'measured' },
      },
    },
  ],
  'Split-level family room wall': [
    {
      label: 'Family room beam',
      wall: 'Family room / den',
      input: {
        kind: 'beam',
        clearSpanFt: 15.5,
        bearingLeftIn: 4.5,
        bearingRightIn: 4.5,
        sources: [
          { kind: 'floor', flag: 'assumed', tributaryFt: 12, deadPsf: 12, livePsf: 40 },
          { kind: 'wall-above', flag: 'assumed', heightFt: 8, deadPsf: 6, startFt: 0, endFt: 9 },
          {
            kind: 'point',
            flag: 'assumed',
            label: 'Post from the roof above',
            pointKind: 'post-above',
            atFt: 9,
            deadLb: 900,
            liveLb: 0,
            roofLiveLb: 700,
            snowLb: 600,
          },
        ],
        materialId: LVL,
        sizeId: '3-ply-1.75x14',
        deflectionUse: 'floor',
        supportKind: 'post',
        flags: { clearSpanFt: 'measured' },
      },
    },
  ],
};

/** A demo member's input with the job's load context, parsed as a save would parse it. */
export function demoMemberInput(job: Job, member: DemoMember): MemberCheckInput {
  return memberCheckInputSchema.parse({
    ...member.input,
    label: member.label,
    edition: job.loadStandard,
    roofPitchIn12: job.roofPitchIn12,
    snow: job.groundSnowPsf > 0 ? { groundSnowPsf: job.groundSnowPsf, roofType: job.roofType } : undefined,
  });
}

/** Adds a demo job's members, each checked by `evaluate` as a save would check it. */
export function insertDemoMembers(tx: DbOrTx, job: Job, userId: string, evaluate: EvaluateMember): void {
  for (const member of DEMO_MEMBERS[job.name] ?? []) {
    const fields = evaluate(job, member.label, member.wall, demoMemberInput(job, member));
    tx.insert(members)
      .values({
        id: newId(),
        jobId: job.id,
        orgId: job.orgId,
        ...fields,
        createdBy: userId,
        updatedBy: userId,
        createdAt: job.createdAt,
        updatedAt: job.createdAt,
      })
      .run();
  }
}
