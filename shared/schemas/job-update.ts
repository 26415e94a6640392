import { z } from 'zod';
import { memberKinds } from '@/shared/schemas/calc/member';
import { jobSchema } from '@/shared/schemas/jobs';
import { memberStateSchema } from '@/shared/schemas/members';

/**
 * The job's values its members take: the load standard edition, ground snow, roof type and slope feed each
 * member's input; the building width and ground snow feed a header's prescriptive-path verdict.
 */
export const jobLoadContextFields = [
  'loadStandard',
  'groundSnowPsf',
  'roofType',
  'roofPitchIn12',
  'buildingWidthFt',
] as const;
export const jobLoadContextFieldSchema = z.enum(jobLoadContextFields);
export type JobLoadContextField = z.infer<typeof jobLoadContextFieldSchema>;

/** A member the server checked again because a value it takes from the job changed. */
export const memberRecomputeSchema = z.object({
  memberId: z.string(),
  label: z.string(),
  kind: z.enum(memberKinds),
  /** The job's changed values this member takes. */
  fields: z.array(jobLoadContextFieldSchema),
  before: memberStateSchema,
  after: memberStateSchema,
});
export type MemberRecompute = z.infer<typeof memberRecomputeSchema>;

/** `PATCH /api/jobs/:jobId`: the job as saved and every member checked again with it. */
export const jobUpdateResultSchema = jobSchema.extend({ recomputed: z.array(memberRecomputeSchema) });
export type JobUpdateResult = z.infer<typeof jobUpdateResultSchema>;
