import { z } from 'zod';
import {
  existingElementKinds,
  loadPathBearingSchema,
  loadPathElementDataSchema,
  loadPathEndSchema,
  loadPathResultSchema,
} from '@/shared/schemas/calc/load-path';
import { visibleTextSchema } from './visible-text';

/**
 * A job's existing framing (girders, joists, walls of jack studs, posts, steel columns, piers, footings,
 * foundation walls, slabs) and what each end of each member or element bears on (DESIGN.md §6 "Load path").
 * The element data is the engine's own schema (shared/schemas/calc/load-path.ts).
 */

const label = visibleTextSchema('Give it a name', 80);

/** Any element data but a job member's (members are saved through the member routes). */
export const existingElementDataSchema = loadPathElementDataSchema.refine((e) => e.kind !== 'member', {
  message: 'A new member is added as a member, not as existing framing',
  path: ['kind'],
});
export type ExistingElementData = z.infer<typeof existingElementDataSchema>;
export const existingElementKindSchema = z.enum(existingElementKinds as [string, ...string[]]);

/** `POST /api/jobs/:jobId/elements`. */
export const elementCreateSchema = z.object({ label, element: existingElementDataSchema });
export type ElementCreate = z.infer<typeof elementCreateSchema>;
export type ElementCreateBody = z.input<typeof elementCreateSchema>;

/** `PATCH /api/elements/:elementId`: the kind stays; send the whole element data to change it. */
export const elementPatchSchema = z
  .object({ label: label.optional(), element: existingElementDataSchema.optional() })
  .refine((patch) => patch.label !== undefined || patch.element !== undefined, {
    message: 'Change at least one field',
  });
export type ElementPatch = z.infer<typeof elementPatchSchema>;

export const elementSchema = z.object({
  id: z.string(),
  jobId: z.string(),
  kind: z.string(),
  label: z.string(),
  element: loadPathElementDataSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Element = z.infer<typeof elementSchema>;

/**
 * `PUT /api/members/:memberId/ends/:end` and `/api/elements/:elementId/ends/:end`: what this end bears on,
 * either an element or member already in the job (`ontoId`) or a new element made with it (`onto`).
 */
export const bearingSetSchema = loadPathBearingSchema
  .omit({ end: true, ontoId: true })
  .extend({
    ontoId: z.string().min(1).max(100).optional(),
    onto: elementCreateSchema.optional(),
  })
  .refine((b) => (b.ontoId === undefined) !== (b.onto === undefined), {
    message: 'Choose what this end bears on',
    path: ['ontoId'],
  });
export type BearingSet = z.infer<typeof bearingSetSchema>;
export type BearingSetBody = z.input<typeof bearingSetSchema>;

export const endParamsSchema = z.object({ end: loadPathEndSchema });

export const bearingSchema = loadPathBearingSchema.extend({ id: z.string(), fromId: z.string() });
export type Bearing = z.infer<typeof bearingSchema>;

/** `GET /api/jobs/:jobId/load-path`: the elements, the bearings and the engine's evaluation of them. */
export const jobLoadPathSchema = z.object({
  members: z.array(z.object({ id: z.string(), label: z.string(), kind: z.string() })),
  elements: z.array(elementSchema),
  bearings: z.array(bearingSchema),
  result: loadPathResultSchema,
});
export type JobLoadPath = z.infer<typeof jobLoadPathSchema>;

/** What a change to the load path answers: what was written and the whole job's load path checked again. */
export const bearingSavedSchema = z.object({
  bearing: bearingSchema,
  created: elementSchema.nullable(),
  loadPath: jobLoadPathSchema,
});
export type BearingSaved = z.infer<typeof bearingSavedSchema>;
