import { z } from 'zod';
import { designedMaterialSchema } from './reply';

/**
 * A member the engineer has designed: the engineer's member from the structured reply of a request that is
 * Designed (or Closed after it), which supersedes the member's preliminary size. A reopened request's
 * member is under question again and supersedes nothing until the request is Designed once more.
 */
export const memberDesignSchema = z.object({
  memberId: z.string(),
  requestId: z.string(),
  requestNumber: z.number().int(),
  version: z.number().int(),
  designedAt: z.string(),
  material: designedMaterialSchema,
  designation: z.string(),
  plies: z.number().int().nullable(),
  widthIn: z.number().nullable(),
  depthIn: z.number().nullable(),
  grade: z.string(),
  plyFastening: z.string(),
  hangers: z.string(),
  bearingLeftIn: z.number().nullable(),
  bearingRightIn: z.number().nullable(),
  posts: z.string(),
  footing: z.string(),
  connections: z.string(),
  /** The preliminary size it supersedes, as the member names it ("2-ply 2x10 Douglas Fir-Larch No.2"). */
  preliminaryLabel: z.string(),
});
export type MemberDesign = z.infer<typeof memberDesignSchema>;

/** `GET /api/jobs/:jobId/designs`: each designed member of the job once, from its latest Designed request. */
export const jobDesignsSchema = z.object({ designs: z.array(memberDesignSchema) });
export type JobDesigns = z.infer<typeof jobDesignsSchema>;
