import { z } from 'zod';
import { loadStandardSchema } from '@/shared/schemas/jobs';
import { checkIdSchema, deflectionUseSchema, supportKinds } from '@/shared/schemas/calc/member';

/**
 * Input and result of a span table (DESIGN.md §5 "Span table"): for the user's area loads (psf) at each
 * tributary width (ft), the largest design span (ft) each size carries, solved from the checks, printed in
 * ft-in. Spans are design spans (support centre to support centre).
 */

const psf = (label: string) =>
  z
    .number({ message: `Enter ${label}` })
    .finite()
    .min(0, { message: `${label} cannot be negative` })
    .max(500);

export const spanTableInputSchema = z.object({
  edition: loadStandardSchema,
  deadPsf: psf('the dead load'),
  /** Occupancy (floor or attic) live load, psf. */
  livePsf: psf('the live load').optional(),
  roofLivePsf: psf('the roof live load').optional(),
  /** Design roof snow, psf of horizontal projection (from the snow check). */
  roofSnowPsf: psf('the roof snow load').optional(),
  tributaryWidthsFt: z
    .array(z.number().finite().positive().max(60))
    .min(1, { message: 'Give at least one tributary width' })
    .max(12, { message: 'At most 12 tributary widths' }),
  materialIds: z.array(z.string().min(1)).min(1, { message: 'Choose at least one material' }).max(40),
  plies: z
    .array(z.number().int().min(1).max(4))
    .min(1)
    .max(4, { message: 'At most 4 ply counts' })
    .optional(),
  selfWeight: z.boolean().optional(),
  repetitive: z.boolean().optional(),
  wetService: z.boolean().optional(),
  temperatureF: z.number().finite().min(-40).max(150).optional(),
  incised: z.boolean().optional(),
  shearAtD: z.boolean().optional(),
  deflectionUse: deflectionUseSchema.optional(),
  deflectionCapIn: z.number().finite().positive().max(4).optional(),
  sustainedLiveFraction: z.number().finite().min(0).max(1).optional(),
  /** Bearing length at each end, in; default 3. */
  bearingIn: z.number().finite().positive().max(24).optional(),
  supportKind: z.enum(supportKinds).optional(),
  supportWidthIn: z.number().finite().positive().max(12).optional(),
  plateMaterialId: z.string().min(1).optional(),
});
export type SpanTableInput = z.infer<typeof spanTableInputSchema>;
export type SpanTableInputBody = z.input<typeof spanTableInputSchema>;

export const spanTableCellSchema = z.object({
  tributaryFt: z.number(),
  /** Largest design span, ft. */
  spanFt: z.number(),
  /** The span as printed: ft-in, rounded down to the inch. */
  spanText: z.string(),
  governedBy: checkIdSchema,
  combination: z.string(),
});

export const spanTableRowSchema = z.object({
  materialId: z.string(),
  materialLabel: z.string(),
  sizeId: z.string(),
  sizeLabel: z.string(),
  cells: z.array(spanTableCellSchema),
});

export const spanTableResultSchema = z.object({
  caution: z.string(),
  tributaryWidthsFt: z.array(z.number()),
  rows: z.array(spanTableRowSchema),
  notes: z.array(z.string()),
  warnings: z.array(z.string()),
  sources: z.array(z.string()),
});
export type SpanTableResult = z.infer<typeof spanTableResultSchema>;
