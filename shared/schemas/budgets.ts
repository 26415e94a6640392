import { z } from 'zod';
import { boundedRecord } from '@/shared/schemas/bounded-record';
import { visibleTextSchema } from './visible-text';

/**
 * Budgets (DESIGN.md §3 "Budget"): the estimator's choices and line overrides for a member, the budget the
 * server computes from the firm's price book (whole cents), the job budget, and a budget sent to a client
 * (frozen and dated). Lengths in ft.
 */

export const budgetAllowances = ['wiring', 'plumbing', 'duct', 'gas'] as const;
export const budgetOldHouse = ['knob-and-tube', 'vent-stack', 'asbestos-test'] as const;
export const budgetMaterials = ['wood', 'steel', 'flitch'] as const;

const uniqueList = <T extends readonly [string, ...string[]]>(values: T) =>
  z
    .array(z.enum(values))
    .max(values.length)
    .refine((list) => new Set(list).size === list.length, { message: 'Each at most once' });

/** The estimator's choices; every field optional, the default beside it. */
export const budgetChoicesSchema = z.object({
  /** Default: a header is an opening in a wall that stays, a beam replaces a wall taken out. */
  work: z.enum(['opening', 'wall-removed']).optional(),
  /** Floor to ceiling, ft; default 8. */
  wallHeightFt: z
    .number()
    .finite()
    .min(6, { message: 'At least 6 ft' })
    .max(20, { message: 'At most 20 ft' })
    .optional(),
  /** Default: temporary walls built. */
  shoring: z.enum(['built', 'rented']).optional(),
  /** Default 'auto': a boom truck when a ply is heavier than two people carry. */
  delivery: z.enum(['auto', 'standard', 'boom', 'crane']).optional(),
  allowances: uniqueList(budgetAllowances).default([]),
  oldHouse: uniqueList(budgetOldHouse).default([]),
  engineerSiteVisit: z.boolean().default(false),
  /** Default 'wood' (the member checked). */
  material: z.enum(budgetMaterials).optional(),
  /** Posts' footings dug through a slab; default: when the job's foundation is a slab. */
  footingThroughSlab: z.boolean().optional(),
  ceilingStripFt: z.number().finite().min(0).max(10, { message: 'At most 10 ft' }).optional(),
  openingHeightFt: z.number().finite().min(1).max(12, { message: 'At most 12 ft' }).optional(),
});
export type BudgetChoicesInput = z.infer<typeof budgetChoicesSchema>;

export const MAX_LINE_CENTS = 1_000_000_000;

/** One line's override: a quantity, a unit price or an amount, always with a note saying why. */
export const lineOverrideSchema = z
  .object({
    quantity: z.number().finite().min(0).max(1_000_000, { message: 'At most 1,000,000' }).optional(),
    unitCents: z.number().int({ message: 'Whole cents' }).min(0).max(MAX_LINE_CENTS).optional(),
    amountCents: z
      .number()
      .int({ message: 'Whole cents' })
      .min(-MAX_LINE_CENTS)
      .max(MAX_LINE_CENTS)
      .optional(),
    note: visibleTextSchema('Say why the line changed', 200),
  })
  .refine((o) => o.quantity !== undefined || o.unitCents !== undefined || o.amountCents !== undefined, {
    message: 'Change the quantity, the unit price or the amount',
  });
export type LineOverrideInput = z.infer<typeof lineOverrideSchema>;

export const budgetOverridesSchema = boundedRecord(lineOverrideSchema, {
  maxEntries: 200,
  maxKeyLength: 80,
  message: 'At most 200 overrides',
});
export type BudgetOverrides = z.infer<typeof budgetOverridesSchema>;

/** `PUT /api/members/:memberId/budget`. */
export const memberBudgetSaveSchema = z.object({
  choices: budgetChoicesSchema,
  overrides: budgetOverridesSchema.default({}),
});
export type MemberBudgetSave = z.infer<typeof memberBudgetSaveSchema>;
export type MemberBudgetSaveBody = z.input<typeof memberBudgetSaveSchema>;

/** `POST /api/jobs/:jobId/budgets`: send the job budget to a client (frozen, dated). */
export const sendBudgetSchema = z.object({
  clientName: visibleTextSchema('Give the client’s name', 120),
  /** What the work is, in the client's words; default from the members. */
  scope: z.string().trim().max(2000, { message: 'At most 2,000 characters' }).default(''),
  exclusions: z
    .array(visibleTextSchema('Write the exclusion', 200))
    .max(20, { message: 'At most 20 exclusions' })
    .default([]),
});
export type SendBudget = z.infer<typeof sendBudgetSchema>;
export type SendBudgetBody = z.input<typeof sendBudgetSchema>;

export const budgetLineSchema = z.object({
  id: z.string(),
  group: z.string(),
  label: z.string(),
  quantity: z.number(),
  unit: z.string(),
  unitCents: z.number().int().nullable(),
  amountCents: z.number().int(),
  basis: z.string(),
  priceKey: z.string().nullable(),
  missingPrice: z.boolean(),
  /** The price is older than the firm's stale age. */
  stalePrice: z.boolean(),
  taxable: z.boolean(),
  lumber: z.boolean(),
  client: z.enum(['scope', 'allowance', 'internal']),
  override: z.object({ note: z.string(), computedCents: z.number().int() }).nullable(),
});
export type BudgetLineView = z.infer<typeof budgetLineSchema>;

const rangeSchema = z.object({
  lowCents: z.number().int(),
  highCents: z.number().int(),
  lowLabel: z.string(),
  highLabel: z.string(),
  basis: z.string(),
});

/** A member as a budget priced it, for comparing with the engineer's member (in). */
export const memberShapeSchema = z.object({
  label: z.string(),
  family: z.string(),
  plies: z.number().int().nullable(),
  bIn: z.number().nullable(),
  dIn: z.number().nullable(),
});

/**
 * The change order raised when the engineer's designed member differs from the budgeted one: both members,
 * how they differ, and the designed member's total less each end of the budgeted range (cents).
 */
export const changeOrderSchema = z.object({
  /** Which budget it compares with, in words: the one sent to the client when there is one. */
  against: z.string(),
  sentBudgetId: z.string().nullable(),
  budgetedLabel: z.string(),
  designedLabel: z.string(),
  differences: z.array(z.string()),
  designedCents: z.number().int(),
  fromHighCents: z.number().int(),
  fromLowCents: z.number().int(),
  outsideRange: z.boolean(),
});
export type ChangeOrder = z.infer<typeof changeOrderSchema>;

/** The engineer's member a budget is rebuilt from, and where it came from. */
export const budgetDesignSchema = z.object({
  requestId: z.string(),
  requestNumber: z.number().int(),
  version: z.number().int(),
  label: z.string(),
});

const scheduleSchema = z.object({
  framingDays: z.number(),
  returnTrips: z.number(),
  waiting: z.array(z.object({ label: z.string(), days: z.number() })),
  shoredDays: z.number(),
  totalDays: z.number(),
});

/** One shortlist size priced, for the comparison. */
export const pricedSizeSchema = z.object({
  id: z.string(),
  materialLabel: z.string(),
  sizeLabel: z.string(),
  passes: z.boolean(),
  utilization: z.number(),
  totalCents: z.number().int(),
  complete: z.boolean(),
  preliminary: z.boolean(),
  cheapest: z.boolean(),
  supply: z.string(),
});

export const scenarioSchema = z.object({
  id: z.string(),
  label: z.string(),
  totalCents: z.number().int(),
  deltaCents: z.number().int(),
  note: z.string(),
});

/** `GET /api/members/:memberId/budget`. */
export const memberBudgetViewSchema = z.object({
  memberId: z.string(),
  jobId: z.string(),
  memberLabel: z.string(),
  sizeLabel: z.string(),
  caution: z.string(),
  choices: budgetChoicesSchema,
  overrides: z.record(z.string(), z.object({ note: z.string() }).passthrough()),
  lines: z.array(budgetLineSchema),
  subtotalCents: z.number().int(),
  totalCents: z.number().int(),
  range: rangeSchema,
  /** The member the lines are priced at: the engineer's once designed, else the preliminary size. */
  pricedShape: memberShapeSchema,
  /** Once the engineer has designed the member: the lines, total and range are the engineer's member's. */
  design: budgetDesignSchema.nullable(),
  /** The range at the preliminary size, kept beside the engineer's member once it is designed. */
  preliminaryRange: rangeSchema.nullable(),
  changeOrder: changeOrderSchema.nullable(),
  schedule: scheduleSchema,
  supply: z.object({
    buyFt: z.number(),
    supply: z.string(),
    leadTimeDays: z.number(),
    note: z.string().nullable(),
    available: z.boolean(),
  }),
  comparison: z.array(pricedSizeSchema),
  scenarios: z.array(scenarioSchema),
  missingPrices: z.array(z.string()),
  stalePrices: z.array(z.string()),
  unusedOverrides: z.array(z.string()),
  notes: z.array(z.string()),
  updatedAt: z.string().nullable(),
});
export type MemberBudgetView = z.infer<typeof memberBudgetViewSchema>;

export const jobBudgetMemberSchema = z.object({
  memberId: z.string(),
  label: z.string(),
  sizeLabel: z.string(),
  totalCents: z.number().int(),
  range: rangeSchema,
  missingPrices: z.number().int(),
  design: budgetDesignSchema.nullable(),
  changeOrder: changeOrderSchema.nullable(),
});

export const sentBudgetSummarySchema = z.object({
  id: z.string(),
  clientName: z.string(),
  sentAt: z.string(),
  lowCents: z.number().int(),
  highCents: z.number().int(),
});
export type SentBudgetSummary = z.infer<typeof sentBudgetSummarySchema>;

/** `GET /api/jobs/:jobId/budget`: every member of the job summed. */
export const jobBudgetSchema = z.object({
  jobId: z.string(),
  jobName: z.string(),
  caution: z.string(),
  members: z.array(jobBudgetMemberSchema),
  lowCents: z.number().int(),
  highCents: z.number().int(),
  /** Members whose engineer's member differs from the budgeted one. */
  changeOrders: z.number().int(),
  sent: z.array(sentBudgetSummarySchema),
});
export type JobBudget = z.infer<typeof jobBudgetSchema>;

/** What a sent budget keeps: the client's side and the office's lines, as they were on the day. */
export const sentBudgetSnapshotSchema = z.object({
  jobName: z.string(),
  jobAddress: z.string(),
  clientName: z.string(),
  scope: z.string(),
  exclusions: z.array(z.string()),
  allowances: z.array(z.string()),
  caution: z.string(),
  lowCents: z.number().int(),
  highCents: z.number().int(),
  members: z.array(
    z.object({
      /** Kept since change orders compare with the sent budget; a budget sent before has neither. */
      memberId: z.string().optional(),
      shape: memberShapeSchema.optional(),
      label: z.string(),
      lowLabel: z.string(),
      highLabel: z.string(),
      lowCents: z.number().int(),
      highCents: z.number().int(),
      lines: z.array(budgetLineSchema),
    }),
  ),
});
export type SentBudgetSnapshot = z.infer<typeof sentBudgetSnapshotSchema>;

export const sentBudgetSchema = z.object({
  id: z.string(),
  jobId: z.string(),
  clientName: z.string(),
  sentAt: z.string(),
  sentBy: z.string(),
  snapshot: sentBudgetSnapshotSchema,
});
export type SentBudget = z.infer<typeof sentBudgetSchema>;
