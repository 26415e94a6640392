import { z } from 'zod';
import { screenAnswersSchema } from './bearing-screen-answers';
import { bearingScreenOutcomeSchema } from './calc/framing';
import { baseVersionSchema, changesAField, clientIdSchema, versionSchema } from './sync';
import { visibleTextSchema } from './visible-text';

/**
 * A bearing screen saved on a job (DESIGN.md §3): one wall's answers and the outcome the server computed
 * from them with lib/calc screenWall. Every save keeps the earlier version in the screen's history.
 */

const wallLabel = visibleTextSchema('Name the wall (e.g. "Kitchen / dining")', 80);

/** `POST /api/jobs/:jobId/screens`. */
export const screenCreateSchema = z.object({
  wallLabel,
  answers: screenAnswersSchema,
  /** The id the device chose when it made the screen offline. */
  id: clientIdSchema.optional(),
});
export type ScreenCreate = z.infer<typeof screenCreateSchema>;
export type ScreenCreateBody = z.input<typeof screenCreateSchema>;

/** `PATCH /api/screens/:screenId`: only the fields sent change; new answers are screened again. */
export const screenPatchSchema = z
  .object({
    wallLabel: wallLabel.optional(),
    answers: screenAnswersSchema.optional(),
    baseVersion: baseVersionSchema.optional(),
  })
  .refine(changesAField, {
    message: 'Change at least one field',
  });
export type ScreenPatch = z.infer<typeof screenPatchSchema>;

const topic = z.string();
const lookAtSchema = z.object({ topic, why: z.string(), where: z.string() });

/** What lib/calc screenWall returns, as stored and sent. */
export const screenResultSchema = z.object({
  outcome: bearingScreenOutcomeSchema,
  headline: z.string(),
  reasons: z.array(
    z.object({
      topic,
      kind: z.enum(['engineer', 'bearing', 'clear', 'unknown']),
      text: z.string(),
      basis: z.enum(['seen', 'assumed']).nullable(),
      source: z.string(),
    }),
  ),
  lookAt: z.array(lookAtSchema),
  toConfirm: z.array(lookAtSchema),
  engineerReasons: z.array(z.string()),
  applies: z.array(topic),
  caution: z.string(),
  sources: z.array(z.string()),
});
export type StoredScreenResult = z.infer<typeof screenResultSchema>;

/** One saved version of a screen: what it was before a later save changed it. */
export const screenVersionSchema = z.object({
  version: z.number().int(),
  wallLabel: z.string(),
  answers: screenAnswersSchema,
  outcome: bearingScreenOutcomeSchema,
  savedBy: z.string(),
  savedByName: z.string(),
  savedAt: z.string(),
});
export type ScreenVersion = z.infer<typeof screenVersionSchema>;

export const screenSchema = z.object({
  id: z.string(),
  jobId: z.string(),
  wallLabel: z.string(),
  answers: screenAnswersSchema,
  outcome: bearingScreenOutcomeSchema,
  result: screenResultSchema,
  version: versionSchema,
  engineVersion: z.string(),
  createdBy: z.string(),
  updatedBy: z.string(),
  updatedByName: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Screen = z.infer<typeof screenSchema>;

/** `GET /api/screens/:screenId`: the screen and its earlier versions, newest first. */
export const screenWithHistorySchema = screenSchema.extend({ history: z.array(screenVersionSchema) });
export type ScreenWithHistory = z.infer<typeof screenWithHistorySchema>;

/** The job is marked "engineer needed" while any of its screens says engineer required, with every reason. */
export const engineerNeededSchema = z.object({
  needed: z.boolean(),
  reasons: z.array(z.object({ screenId: z.string(), wallLabel: z.string(), reason: z.string() })),
});
export type EngineerNeeded = z.infer<typeof engineerNeededSchema>;

/** `GET /api/jobs/:jobId/screens`. */
export const screenListSchema = z.object({
  screens: z.array(screenSchema),
  engineerNeeded: engineerNeededSchema,
});
export type ScreenList = z.infer<typeof screenListSchema>;
