import { z } from 'zod';
import { shoringWallInputSchema } from './calc/materials';
import { shoringLayouts, shoringSurfaceSchema } from './calc/shoring';
import { baseVersionSchema, clientIdSchema, versionSchema } from './sync';

/**
 * A temporary shoring plan saved on a member (DESIGN.md §1 step 4): the member's own loads (its saved input)
 * with how the temporary walls are laid out, built and stood. The server runs lib/calc planShoring on it.
 * Lengths in ft, spacings in in, loads in lb, soil bearing in psf.
 */

const positive = (label: string, max: number, unit: string) =>
  z
    .number({ message: `Enter ${label}` })
    .finite()
    .positive({ message: `${label[0].toUpperCase()}${label.slice(1)} must be above 0` })
    .max(max, { message: `At most ${max.toLocaleString('en-US')} ${unit}` });

export const shoringMethods = ['stud-walls', 'rented-shores'] as const;

const shoringPlanFields = z.object({
  layout: z.enum(shoringLayouts),
  joistSpanAFt: positive('the joist span on side A', 40, 'ft').optional(),
  joistSpanBFt: positive('the joist span on side B', 40, 'ft').optional(),
  setbackFt: positive('the setback', 10, 'ft').optional(),
  /** Stud walls built on site, or rented adjustable shores under a beam. */
  method: z.enum(shoringMethods).default('stud-walls'),
  /** The temporary walls' studs (also checked when shores carry a beam: the plan compares both). */
  studs: shoringWallInputSchema.omit({ loadPlf: true, CD: true }),
  /** The capacity printed on the rented shore for the height it is extended to, lb. */
  shoreRatedCapacityLb: positive('the rated capacity', 50_000, 'lb').optional(),
  standsOn: shoringSurfaceSchema,
  floorJoistSpacingIn: positive('the floor joist spacing', 48, 'in').optional(),
  soilBearingPsf: positive('the soil bearing', 12_000, 'psf').optional(),
  /** Length of each temporary wall; default: the member's clear span plus 1 ft past each end. */
  wallLengthFt: positive('the wall length', 80, 'ft').optional(),
});

function shoresNeedTheirCapacity(
  body: { method: string; shoreRatedCapacityLb?: number },
  ctx: z.RefinementCtx,
): void {
  if (body.method === 'rented-shores' && body.shoreRatedCapacityLb === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['shoreRatedCapacityLb'],
      message: 'Enter the rated capacity printed on the shore',
    });
  }
}

/** The plan as saved and fed to the engine. */
export const shoringPlanBodySchema = shoringPlanFields.superRefine(shoresNeedTheirCapacity);

/**
 * `PUT /api/members/:memberId/shoring`: the plan, with the id the device chose when it made the plan offline
 * or the version an edit was made on.
 */
export const shoringPlanPutSchema = shoringPlanFields
  .extend({ id: clientIdSchema.optional(), baseVersion: baseVersionSchema.optional() })
  .superRefine(shoresNeedTheirCapacity);
export type ShoringPlanPut = z.infer<typeof shoringPlanPutSchema>;
export type ShoringPlanBody = z.infer<typeof shoringPlanBodySchema>;
export type ShoringPlanBodyInput = z.input<typeof shoringPlanBodySchema>;

const lookOfWall = z.object({
  side: z.enum(['A', 'B']),
  loadPlf: z.number(),
  check: z.object({
    loadPerStudLb: z.number(),
    capacityPerStudLb: z.number(),
    ratio: z.number(),
    pass: z.boolean(),
    layoutSpacingIn: z.number().nullable(),
  }),
  standing: z.object({
    verdict: z.enum(['spread-load', 'check-floor-below', 'not-acceptable']),
    summary: z.string(),
    actions: z.array(z.string()),
  }),
});

/**
 * What the server stored: the engine's plan, the takeoff or the shores per wall, and the sequence. The
 * stored JSON holds the engine's whole plan; a client reading it keeps the fields named here.
 */
export const shoringResultSchema = z.object({
  pass: z.boolean(),
  wallLengthFt: z.number(),
  plan: z.object({
    caution: z.string(),
    walls: z.array(lookOfWall),
    warnings: z.array(z.string()),
    notes: z.array(z.string()),
    cautions: z.array(z.string()),
    sources: z.array(z.string()),
  }),
  takeoff: z
    .array(
      z.object({
        side: z.enum(['A', 'B']),
        spacingIn: z.number(),
        studCount: z.number(),
        studLengthIn: z.number(),
        studStock: z.object({ label: z.string(), count: z.number() }),
        plates: z.number(),
        plateLengthIn: z.number(),
        plateStock: z.object({ label: z.string(), count: z.number() }),
      }),
    )
    .nullable(),
  shores: z
    .array(
      z.object({
        side: z.enum(['A', 'B']),
        count: z.number(),
        spacingFt: z.number(),
        pass: z.boolean(),
        summary: z.string(),
      }),
    )
    .nullable(),
  sequence: z.array(z.string()),
});
export type ShoringResult = z.infer<typeof shoringResultSchema>;

export const shoringRecordSchema = z.object({
  /** Null on plans saved before plans had an id. */
  id: z.string().nullable(),
  memberId: z.string(),
  jobId: z.string(),
  input: shoringPlanBodySchema,
  result: shoringResultSchema,
  engineVersion: z.string(),
  updatedBy: z.string(),
  updatedByName: z.string(),
  updatedAt: z.string(),
  version: versionSchema,
});
export type ShoringRecord = z.infer<typeof shoringRecordSchema>;

/** `GET /api/members/:memberId/shoring`: the saved plan, or null before one is saved. */
export const shoringAnswerSchema = z.object({ shoring: shoringRecordSchema.nullable() });
