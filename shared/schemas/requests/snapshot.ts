import { z } from 'zod';
import {
  elementCheckSchema,
  loadPathElementKindSchema,
  loadPathEndSchema,
  loadPathStateSchema,
  typedLoadSchema,
} from '@/shared/schemas/calc/load-path';
import {
  memberCheckInputSchema,
  memberCheckResultSchema,
  prescriptiveResultSchema,
} from '@/shared/schemas/calc/member';
import { jobInputSchema } from '@/shared/schemas/jobs';
import { memberKinds } from '@/shared/schemas/calc/member';
import { memberSummarySchema } from '@/shared/schemas/members';
import { requestComposeSchema } from './compose';

/** Where a photo was taken (DESIGN.md §7). */
export const photoPlaces = [
  'attic-over-wall',
  'ridge',
  'joist-laps',
  'below-wall',
  'roofline',
  'grade-stamp',
  'other',
] as const;
export const photoPlaceSchema = z.enum(photoPlaces);
export type PhotoPlace = z.infer<typeof photoPlaceSchema>;

export const PHOTO_PLACE_LABELS: Record<PhotoPlace, string> = {
  'attic-over-wall': 'Attic over the wall',
  ridge: 'Ridge',
  'joist-laps': 'Joist laps',
  'below-wall': 'Below the wall',
  roofline: 'Roofline',
  'grade-stamp': 'Grade stamp',
  other: 'Other',
};

/** A file of the request as the snapshot lists it (the bytes stay in storage, found by id). */
export const snapshotFileSchema = z.object({
  id: z.string(),
  place: photoPlaceSchema,
  caption: z.string(),
  fileName: z.string(),
  mimeType: z.string(),
  sizeBytes: z.number().int(),
  sha256: z.string(),
});
export type SnapshotFile = z.infer<typeof snapshotFileSchema>;

/**
 * One step of a member's load path to the ground as it was at send (DESIGN.md §6 "Load path"): the element,
 * what lands on it, its check, where each end goes, and every reason and assumption. Loads in lb by type.
 */
export const snapshotLoadPathStepSchema = z.object({
  id: z.string(),
  label: z.string(),
  kind: loadPathElementKindSchema,
  /** 0 for the member, one more per step down. */
  depth: z.number().int(),
  state: loadPathStateSchema,
  closed: z.boolean(),
  incoming: z.array(z.object({ fromLabel: z.string(), atFt: z.number().optional(), load: typedLoadSchema })),
  /** A beam's governing check (the member engine's); posts, walls and footings list theirs in `checks`. */
  governing: z.object({ check: z.string(), ratio: z.number(), combination: z.string() }).nullable(),
  checks: z.array(elementCheckSchema),
  ends: z.array(
    z.object({
      end: loadPathEndSchema,
      /** The step this end bears on, by its id (absent in packages sent before it was kept). */
      ontoId: z.string().nullable().optional(),
      ontoLabel: z.string().nullable(),
      load: typedLoadSchema,
      governingLb: z.number(),
      governingCombination: z.string(),
    }),
  ),
  pad: z.object({ sideIn: z.number(), soilBearingPsf: z.number(), loadLb: z.number() }).optional(),
  openReasons: z.array(z.string()),
  engineerReasons: z.array(z.string()),
  assumptions: z.array(z.string()),
  warnings: z.array(z.string()),
});
export type SnapshotLoadPathStep = z.infer<typeof snapshotLoadPathStepSchema>;

/** A member as it was when the version was sent: its inputs with their flags and the server's result. */
export const snapshotMemberSchema = z.object({
  id: z.string(),
  kind: z.enum(memberKinds),
  label: z.string(),
  wall: z.string(),
  input: memberCheckInputSchema,
  summary: memberSummarySchema,
  result: memberCheckResultSchema,
  prescriptive: prescriptiveResultSchema.nullable(),
  engineVersion: z.string(),
  /** The chain from the member down to the ground, from the top (absent in versions sent before format 2). */
  loadPath: z.array(snapshotLoadPathStepSchema).optional(),
});
export type SnapshotMember = z.infer<typeof snapshotMemberSchema>;

const compose = requestComposeSchema.shape;

/**
 * One sent version of a request, frozen when it was sent and never changed after: the job, the members
 * with their inputs, flags and results, what the contractor composed, and the file list.
 */
export const requestSnapshotSchema = z.object({
  number: z.number().int().min(1),
  version: z.number().int().min(1),
  sentAt: z.string(),
  firm: z.object({ name: z.string() }),
  contractor: z.object({ name: z.string(), email: z.string() }),
  engineerEmail: z.string(),
  job: jobInputSchema.extend({ id: z.string() }),
  jurisdiction: compose.jurisdiction.unwrap(),
  conditions: compose.conditions.unwrap(),
  constraints: compose.constraints.unwrap(),
  phoneBack: compose.phoneBack.unwrap(),
  questions: z.string(),
  members: z.array(snapshotMemberSchema).min(1),
  /** lib/calc ENGINE_VERSION of the server that froze the snapshot. */
  engineVersion: z.string(),
  files: z.array(snapshotFileSchema),
});
export type RequestSnapshot = z.infer<typeof requestSnapshotSchema>;

/**
 * One line of what changed between two versions, in the words of lib/requests/version-diff: the group (the
 * request's own parts or a member by its label), the section, the field, and the values before and after as
 * the app shows them (units and flags in the text; null when only one version has it).
 */
export const changeLineSchema = z.object({
  group: z.string(),
  section: z.string(),
  field: z.string(),
  before: z.string().nullable(),
  after: z.string().nullable(),
  kind: z.enum(['changed', 'added', 'removed']),
});
export type ChangeLine = z.infer<typeof changeLineSchema>;
