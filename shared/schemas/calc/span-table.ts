import { z } from 'zod';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { loadStandardSchema } from '@/shared/schemas/jobs';
import { checkIdSchema, deflectionUseSchema, supportKinds } from '@/shared/schemas/calc/member';

/**
 * Input and result of a span table (DESIGN.md §5 "Span table"): for the user's area loads (psf) at each
 * tributary width (ft), the largest span (ft) each size carries, solved from the checks, printed in ft-in.
 * The printed span is the clear span by default (between the faces of the supports: the design span less
 * the bearing, half at each end — what is measured on site), or the design span (support centre to support
 * centre) on request; the result says which. Every cell carries both.
 */

/**
 * How the member is supported: one simple span (default); two equal spans continuous over a centre post
 * (the span printed is each span); or one span with a cantilevered end of overhangFraction of the span past
 * the right support (the span printed is the back span). Live loads are placed span by span in the last two.
 */
export const spanTableLayouts = ['simple', 'two-span', 'overhang'] as const;
export const spanTableLayoutSchema = z.enum(spanTableLayouts);
export type SpanTableLayout = z.infer<typeof spanTableLayoutSchema>;

/** Which span a span table prints: the clear span (default) or the design span. */
export const spanBases = ['clear', 'design'] as const;
export const spanBasisSchema = z.enum(spanBases);
export type SpanBasis = z.infer<typeof spanBasisSchema>;

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
    .max(CALC_BOUNDS.tributaryWidths, { message: `At most ${CALC_BOUNDS.tributaryWidths} tributary widths` }),
  /** Materials to tabulate; a material named twice is tabulated once. */
  materialIds: z
    .array(z.string().min(1).max(80))
    .min(1, { message: 'Choose at least one material' })
    .max(CALC_BOUNDS.materialIds, { message: `At most ${CALC_BOUNDS.materialIds} materials` }),
  plies: z
    .array(z.number().int().min(1).max(4))
    .min(1)
    .max(CALC_BOUNDS.plies, { message: `At most ${CALC_BOUNDS.plies} ply counts` })
    .optional(),
  selfWeight: z.boolean().optional(),
  repetitive: z.boolean().optional(),
  wetService: z.boolean().optional(),
  temperatureF: z.number().finite().min(-40).max(150).optional(),
  incised: z.boolean().optional(),
  shearAtD: z.boolean().optional(),
  deflectionUse: deflectionUseSchema.optional(),
  deflectionCapIn: z
    .number()
    .finite()
    .min(0.05, { message: 'The deflection cap must be at least 0.05 in' })
    .max(4)
    .optional(),
  sustainedLiveFraction: z.number().finite().min(0).max(1).optional(),
  /** Bearing length at each end, in; default 3. */
  bearingIn: z.number().finite().positive().max(24).optional(),
  /** Print clear spans (default) or design spans. */
  spanBasis: spanBasisSchema.optional(),
  /** Simple span (default), two equal continuous spans, or a span with an overhang. */
  layout: spanTableLayoutSchema.optional(),
  /** Overhang / back span for layout 'overhang'; default 0.25 (a quarter of the back span, common practice). */
  overhangFraction: z
    .number()
    .finite()
    .min(0.05, { message: 'Overhang at least 0.05 of the span' })
    .max(0.5, { message: 'Overhang at most half the span' })
    .optional(),
  supportKind: z.enum(supportKinds).optional(),
  supportWidthIn: z.number().finite().positive().max(12).optional(),
  plateMaterialId: z.string().min(1).optional(),
});
export type SpanTableInput = z.infer<typeof spanTableInputSchema>;
export type SpanTableInputBody = z.input<typeof spanTableInputSchema>;

export const spanTableCellSchema = z.object({
  tributaryFt: z.number(),
  /** Largest design span, ft (support centre to support centre). */
  spanFt: z.number(),
  /** The span as printed, on the table's spanBasis: ft-in, rounded down to the inch. */
  spanText: z.string(),
  /** The largest span as a clear span (design span less the bearing) and as a design span, ft. */
  clearSpanFt: z.number().optional(),
  designSpanFt: z.number().optional(),
  governedBy: checkIdSchema,
  combination: z.string(),
});

export const spanTableRowSchema = z.object({
  materialId: z.string(),
  materialLabel: z.string(),
  sizeId: z.string(),
  sizeLabel: z.string(),
  cells: z.array(spanTableCellSchema).max(CALC_BOUNDS.tributaryWidths),
});

export const spanTableResultSchema = z.object({
  caution: z.string(),
  /** Which span spanText prints, and the heading that says so. */
  spanBasis: spanBasisSchema.optional(),
  layout: spanTableLayoutSchema.optional(),
  spanHeading: z.string().optional(),
  tributaryWidthsFt: z.array(z.number()).max(CALC_BOUNDS.tributaryWidths),
  rows: z.array(spanTableRowSchema).max(CALC_BOUNDS.catalogueSizes),
  notes: z.array(z.string()).max(CALC_BOUNDS.messages),
  warnings: z.array(z.string()).max(CALC_BOUNDS.catalogueSizes),
  sources: z.array(z.string()).max(CALC_BOUNDS.messages),
});
export type SpanTableResult = z.infer<typeof spanTableResultSchema>;
