import { z } from 'zod';
import {
  checkIdSchema,
  memberCheckInputSchema,
  memberCheckResultSchema,
  memberKinds,
  prescriptiveResultSchema,
} from '@/shared/schemas/calc/member';
import { baseVersionSchema, changesAField, clientIdSchema, versionSchema } from './sync';
import { visibleTextSchema } from './visible-text';

/**
 * A member saved on a job (DESIGN.md §3 "Member"): its check input (validated by the engine's own schema, with
 * every input's measured / assumed / default flag inside it), the wall it belongs to, and the result the
 * server computed when it was saved. The client's own live result is never stored.
 */

const label = visibleTextSchema('Give the member a label', 80);
const wall = z.string().trim().max(80, { message: 'At most 80 characters' });

/** `POST /api/jobs/:jobId/members`. The kind and label inside `input` follow the member's own. */
export const memberCreateSchema = z.object({
  label,
  wall: wall.default(''),
  input: memberCheckInputSchema,
  /** The id the device chose when it made the member offline. */
  id: clientIdSchema.optional(),
});
export type MemberCreate = z.infer<typeof memberCreateSchema>;
export type MemberCreateBody = z.input<typeof memberCreateSchema>;

/** `PATCH /api/members/:memberId`: only the fields sent change; a new input is recomputed. */
export const memberPatchSchema = z
  .object({
    label: label.optional(),
    wall: wall.optional(),
    input: memberCheckInputSchema.optional(),
    baseVersion: baseVersionSchema.optional(),
  })
  .refine(changesAField, {
    message: 'Change at least one field',
  });
export type MemberPatch = z.infer<typeof memberPatchSchema>;
export type MemberPatchBody = z.input<typeof memberPatchSchema>;

/** The member's own check: fails it; passes it but sits outside what code tables cover; passes. */
export const memberCheckStates = ['passes', 'fails', 'engineer-needed'] as const;
/**
 * The member's state in words: its own check, or "load path open" for a member that does not fail while its
 * ends do not yet reach the ground through checked framing (DESIGN.md §6 "Load path": never "passes" then).
 */
export const memberStates = [...memberCheckStates, 'load-path-open'] as const;
export const memberStateSchema = z.enum(memberStates);
export type MemberState = z.infer<typeof memberStateSchema>;
export type MemberCheckState = (typeof memberCheckStates)[number];

/** The member's place on the job's load path, as the last change to the job's framing left it. */
export const memberLoadPathSchema = z.object({
  /** Every end reaches a confirmed footing or foundation wall through framing that passes. */
  closed: z.boolean(),
  /** Why not, each in words, naming the step. */
  openReasons: z.array(z.string()),
});

/** What the job page lists without loading every result. */
export const memberSummarySchema = z.object({
  state: memberStateSchema,
  /** The member's own check, whatever its load path (absent in summaries saved before the load path). */
  checkState: z.enum(memberCheckStates).optional(),
  loadPath: memberLoadPathSchema.optional(),
  pass: z.boolean(),
  governingCheck: checkIdSchema,
  governingRatio: z.number(),
  warningsCount: z.number().int(),
  /** The chosen size and material as the engine names them ("2-ply 2x10", "Douglas Fir-Larch No.2"). */
  sizeLabel: z.string(),
  materialLabel: z.string(),
  /** Reasons an engineer is needed (the prescriptive path's), empty when the state is not engineer-needed. */
  engineerReasons: z.array(z.string()),
});
export type MemberSummary = z.infer<typeof memberSummarySchema>;

export const memberSchema = z.object({
  id: z.string(),
  jobId: z.string(),
  kind: z.enum(memberKinds),
  label: z.string(),
  wall: z.string(),
  /** The chosen material and size (copied from the input). */
  materialId: z.string(),
  sizeId: z.string(),
  input: memberCheckInputSchema,
  summary: memberSummarySchema,
  /** The server's result at the last save, with diagram samples. */
  result: memberCheckResultSchema,
  /** Headers only: the prescriptive-path verdict for the saved input. */
  prescriptive: prescriptiveResultSchema.nullable(),
  /** lib/calc ENGINE_VERSION that computed `result`. */
  engineVersion: z.string(),
  createdBy: z.string(),
  updatedBy: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** 1 on create, +1 on every change (a recompute after a job change included). */
  version: versionSchema,
});
export type Member = z.infer<typeof memberSchema>;

/** A row of the job's member list: everything but the full result and input. */
export const memberListItemSchema = memberSchema.omit({ input: true, result: true, prescriptive: true });
export type MemberListItem = z.infer<typeof memberListItemSchema>;

export const memberListSchema = z.object({ members: z.array(memberListItemSchema) });
