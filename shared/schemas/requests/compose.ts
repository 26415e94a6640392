import { z } from 'zod';
import { emailSchema } from '@/shared/schemas/auth';
import { inputFlagSchema } from '@/shared/schemas/calc/loads';

/**
 * What a contractor composes for a design request (DESIGN.md §7): the members, the existing conditions,
 * the constraints, the questions and everything an engineer would otherwise phone back for. The load
 * standard edition and the ground snow source come from the job itself and go into the snapshot with it.
 * Lengths in ft unless the name says in, weights in lb.
 */

const note = (max = 2000) =>
  z
    .string()
    .trim()
    .max(max, { message: `At most ${max} characters` });
const shortNote = note(300);
const idSchema = z.string().min(1).max(100);

export const MAX_REQUEST_MEMBERS = 20;

/** Two-letter postal codes of the states and the District of Columbia: the engineer's licence is by state. */
// prettier-ignore
export const usStates = [
  'AL', 'AK', 'AZ', 'AR', 'CA', 'CO', 'CT', 'DE', 'DC', 'FL', 'GA', 'HI', 'ID', 'IL', 'IN', 'IA', 'KS',
  'KY', 'LA', 'ME', 'MD', 'MA', 'MI', 'MN', 'MS', 'MO', 'MT', 'NE', 'NV', 'NH', 'NJ', 'NM', 'NY', 'NC',
  'ND', 'OH', 'OK', 'OR', 'PA', 'RI', 'SC', 'SD', 'TN', 'TX', 'UT', 'VT', 'VA', 'WA', 'WV', 'WI', 'WY',
] as const;
export const usStateSchema = z.enum(usStates, { message: 'Pick the state the house is in' });

export const mountChoices = ['flush', 'dropped', 'either'] as const;
export const heavyItems = ['solar', 'air-handler', 'water-heater', 'cast-iron-tub', 'other'] as const;

const optionalLength = (max: number, unit: string) =>
  z
    .number()
    .positive({ message: 'Enter a value above 0' })
    .max(max, { message: `At most ${max} ${unit}` })
    .nullable()
    .default(null);

/** Framing direction, bearing points, the foundation and what is above the wall, in the contractor's words. */
export const existingConditionsSchema = z.object({
  framingDirection: note().default(''),
  bearingPoints: note().default(''),
  foundation: note().default(''),
  whatIsAbove: note().default(''),
});

/** What limits the engineer's choice: flush or dropped, depth, post places, what can be carried in. */
export const constraintsSchema = z.object({
  mount: z.enum(mountChoices).default('either'),
  maxDepthIn: optionalLength(48, 'in'),
  postsMayGo: note().default(''),
  longestPieceFt: optionalLength(60, 'ft'),
  heaviestPieceLb: optionalLength(5000, 'lb'),
});

/** The existing joists or rafters over the wall; `tapeInPhoto` says a photo shows them with a tape. */
export const existingJoistsSchema = z.object({
  size: shortNote.default(''),
  spacingIn: optionalLength(48, 'in'),
  species: shortNote.default(''),
  tapeInPhoto: z.boolean().default(false),
  flag: inputFlagSchema.default('assumed'),
});

/** Sag over the wall measured with a string line, in; null when nobody measured it. */
export const sagSchema = z.object({
  sagIn: z.number().min(0).max(24, { message: 'At most 24 in' }).nullable().default(null),
  stringLine: z.boolean().default(false),
  flag: inputFlagSchema.default('assumed'),
});

export const framingDamageSchema = z.object({
  sistered: z.boolean().default(false),
  notched: z.boolean().default(false),
  bored: z.boolean().default(false),
  rot: z.boolean().default(false),
  note: note().default(''),
});

/** The girder, columns and footings below the wall, as seen in the basement or crawlspace. */
export const belowSchema = z.object({
  girder: note().default(''),
  columns: note().default(''),
  footings: note().default(''),
});

/** Engineered lumber the local yard stocks: product and E grade (e.g. "1-3/4 in LVL", "2.0E"). */
export const yardStockSchema = z.object({ product: shortNote, eGrade: shortNote.default('') });

/** The items engineers otherwise phone back for (issue list, in the same order). */
export const phoneBackSchema = z.object({
  joists: existingJoistsSchema.prefault({}),
  roofingLayers: z.number().int().min(0).max(10, { message: 'At most 10 layers' }).nullable().default(null),
  heavyAbove: z.array(z.enum(heavyItems)).max(heavyItems.length).default([]),
  heavyAboveNote: note().default(''),
  sag: sagSchema.prefault({}),
  damage: framingDamageSchema.prefault({}),
  below: belowSchema.prefault({}),
  yardStock: z.array(yardStockSchema).max(10, { message: 'At most 10 products' }).default([]),
  ductsOrPipes: note().default(''),
});

/** Where the job is: the engineer's licence depends on the state. */
export const jurisdictionSchema = z.object({
  place: shortNote.default(''),
  state: usStateSchema.nullable().default(null),
});

/** `POST /api/jobs/:jobId/requests`: a Draft; every part may still be empty. */
export const requestComposeSchema = z.object({
  memberIds: z
    .array(idSchema)
    .max(MAX_REQUEST_MEMBERS, { message: `At most ${MAX_REQUEST_MEMBERS} members` })
    .default([]),
  engineerEmail: emailSchema.nullable().default(null),
  jurisdiction: jurisdictionSchema.prefault({}),
  conditions: existingConditionsSchema.prefault({}),
  constraints: constraintsSchema.prefault({}),
  phoneBack: phoneBackSchema.prefault({}),
  questions: note(5000).default(''),
});
export type RequestCompose = z.output<typeof requestComposeSchema>;
export type RequestComposeBody = z.input<typeof requestComposeSchema>;

/**
 * `PATCH /api/requests/:requestId`: the working copy a next send or revision freezes; whole parts are
 * replaced, only the parts sent change.
 */
export const requestPatchSchema = z
  .object({
    memberIds: requestComposeSchema.shape.memberIds.unwrap().optional(),
    engineerEmail: emailSchema.optional(),
    jurisdiction: jurisdictionSchema.optional(),
    conditions: existingConditionsSchema.optional(),
    constraints: constraintsSchema.optional(),
    phoneBack: phoneBackSchema.optional(),
    questions: note(5000).optional(),
  })
  .refine((patch) => Object.values(patch).some((value) => value !== undefined), {
    message: 'Change at least one field',
  });
export type RequestPatch = z.output<typeof requestPatchSchema>;
