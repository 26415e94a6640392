import { z } from 'zod';
import { baseVersionSchema, versionSchema } from './sync';

/**
 * The job checklist (DESIGN.md §6 "Job checklist"): the same items on every job, each to do, done or not
 * needed, with who set it, when, and a note. An item nobody has touched yet shows its starting state.
 */

/** Houses built before this year may have lead-based paint: EPA Renovation, Repair and Painting rule, 40 CFR 745. */
export const LEAD_SAFE_BEFORE_YEAR = 1978;

export const checklistItems = [
  {
    key: 'utilities-electrical',
    title: 'Electrical in the wall',
    detail: 'Find every cable, box and switch leg in the wall; shut off and reroute before cutting.',
  },
  {
    key: 'utilities-plumbing',
    title: 'Plumbing in the wall',
    detail: 'Supply, drain and vent lines in the wall or its plates; plan the reroute.',
  },
  {
    key: 'utilities-ducts',
    title: 'Ducts in the wall',
    detail: 'Supply or return ducts in the stud bays or through the plates.',
  },
  {
    key: 'utilities-gas',
    title: 'Gas in the wall',
    detail: 'Gas piping in or through the wall: shut off and have it moved by someone licensed for gas.',
  },
  {
    key: 'lead-safe',
    title: 'Lead-safe work practices',
    detail:
      'Houses built before 1978: renovate lead-safe (EPA Renovation, Repair and Painting rule, 40 CFR 745) — certified firm, containment, cleaning and verification.',
  },
  {
    key: 'asbestos',
    title: 'Possible asbestos',
    detail:
      'Older materials (joint compound, textured ceilings, plaster, duct wrap, flooring) may hold asbestos: test before disturbing them.',
  },
  { key: 'permit', title: 'Permit', detail: 'The building permit for the work, posted on site.' },
  {
    key: 'engineer-design',
    title: 'Engineer’s design',
    detail: 'The licensed engineer’s design or letter for the member, its posts and footing.',
  },
  {
    key: 'shoring',
    title: 'Shoring in place',
    detail: 'Temporary walls built, braced and snugged before any bearing element comes out.',
  },
  {
    key: 'footing-inspection',
    title: 'Footing inspection',
    detail: 'The footing hole and its steel inspected before the pour.',
  },
  {
    key: 'framing-inspection',
    title: 'Framing inspection',
    detail: 'Beam, posts, hangers and fastening inspected before the walls and ceiling are closed.',
  },
  {
    key: 'final-inspection',
    title: 'Final inspection',
    detail: 'The permit’s final inspection, signed off.',
  },
] as const;

export type ChecklistItemKey = (typeof checklistItems)[number]['key'];
export const checklistItemKeys = checklistItems.map((item) => item.key) as [
  ChecklistItemKey,
  ...ChecklistItemKey[],
];
export const checklistItemKeySchema = z.enum(checklistItemKeys, { message: 'No such checklist item' });

export const checklistStates = ['to-do', 'done', 'not-needed'] as const;
export const checklistStateSchema = z.enum(checklistStates);
export type ChecklistState = z.infer<typeof checklistStateSchema>;

/** `PATCH /api/jobs/:jobId/checklist/:itemKey`: a new state, a note, or both. */
export const checklistItemPatchSchema = z
  .object({
    state: checklistStateSchema.optional(),
    note: z.string().trim().max(500, { message: 'At most 500 characters' }).optional(),
    baseVersion: baseVersionSchema.optional(),
  })
  .refine((patch) => patch.state !== undefined || patch.note !== undefined, {
    message: 'Change the state or the note',
  });
export type ChecklistItemPatch = z.infer<typeof checklistItemPatchSchema>;

export const checklistItemSchema = z.object({
  key: checklistItemKeySchema,
  title: z.string(),
  detail: z.string(),
  state: checklistStateSchema,
  note: z.string(),
  /** Raised by the job itself: lead-safe by the year built, the engineer's design by a screen. */
  raised: z.boolean(),
  /** Why the item starts where it does (the year built, the screens), in words; empty for plain items. */
  because: z.string(),
  /** Who set it and when; null while nobody has. */
  updatedBy: z.string().nullable(),
  updatedByName: z.string().nullable(),
  updatedAt: z.string().nullable(),
  /** 0 while nobody has set it, then +1 on every change. */
  version: versionSchema,
});
export type ChecklistItem = z.infer<typeof checklistItemSchema>;

export const checklistProgressSchema = z.object({
  done: z.number().int(),
  notNeeded: z.number().int(),
  toDo: z.number().int(),
  total: z.number().int(),
});
export type ChecklistProgress = z.infer<typeof checklistProgressSchema>;

/** `GET /api/jobs/:jobId/checklist`. */
export const checklistSchema = z.object({
  jobId: z.string(),
  items: z.array(checklistItemSchema),
  progress: checklistProgressSchema,
});
export type Checklist = z.infer<typeof checklistSchema>;

/** `GET /api/job-progress`: every open job's checklist progress and whether it is marked engineer needed. */
export const jobProgressListSchema = z.object({
  jobs: z.array(
    z.object({ jobId: z.string(), progress: checklistProgressSchema, engineerNeeded: z.boolean() }),
  ),
});
export type JobProgressList = z.infer<typeof jobProgressListSchema>;
