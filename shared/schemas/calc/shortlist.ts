import { z } from 'zod';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { boundedRecord } from '@/shared/schemas/bounded-record';
import { memberCheckInputSchema, sizeIdentitySchema } from '@/shared/schemas/calc/member';

/**
 * Input and result of a shortlist (DESIGN.md §5 "Shortlist"): every size of the chosen materials checked for
 * one member's loads, filtered by what fits, passing sizes sorted by the user's choice. Dimensions in in,
 * weights in lb and plf, lengths in ft, prices in the price book's currency.
 */

export const shortlistSorts = ['shallowest', 'lightest', 'fewest-plies', 'cheapest'] as const;

export const shortlistInputSchema = memberCheckInputSchema
  .omit({ materialId: true, sizeId: true, plies: true, gradeUnknown: true, measuredPly: true, posts: true })
  .extend({
    /** Materials to check; a material named twice is checked once. */
    materialIds: z
      .array(z.string().min(1).max(80))
      .min(1, { message: 'Choose at least one material' })
      .max(CALC_BOUNDS.materialIds, { message: `At most ${CALC_BOUNDS.materialIds} materials` }),
    /** Ply counts to consider; default 1 to 4. */
    plies: z
      .array(z.number().int().min(1).max(4))
      .min(1)
      .max(CALC_BOUNDS.plies, { message: `At most ${CALC_BOUNDS.plies} ply counts` })
      .optional(),
    /**
     * Deepest member that fits, in; default the joist depth (flush), the attic clearance (raised) or the
     * headroom limit (dropped).
     */
    maxDepthIn: z.number().finite().positive().max(48).optional(),
    /** Widest member that fits the wall, in (a 2x4 wall 3.5, a 2x6 wall 5.5). */
    maxWidthIn: z.number().finite().positive().max(24).optional(),
    /** Heaviest single piece (one ply) the crew can carry in, lb. */
    maxPieceWeightLb: z.number().finite().positive().max(5000).optional(),
    /** Longest piece that can be carried in, ft. */
    maxPieceLengthFt: z.number().finite().positive().max(80).optional(),
    sortBy: z.enum(shortlistSorts).optional(),
    /** Price per linear foot of the whole member, by "materialId/sizeId" or by sizeId alone. */
    pricePerFt: boundedRecord(z.number().finite().min(0).max(1_000_000), {
      maxEntries: CALC_BOUNDS.prices,
      maxKeyLength: 160,
      message: `At most ${CALC_BOUNDS.prices} prices`,
    }).optional(),
    /** Most passing sizes to return; default 25. */
    limit: z.number().int().min(1).max(500).optional(),
  });
export type ShortlistInput = z.infer<typeof shortlistInputSchema>;
export type ShortlistInputBody = z.input<typeof shortlistInputSchema>;

export const shortlistEntrySchema = z.object({
  ...sizeIdentitySchema.shape,
  weightPlf: z.number(),
  /** One ply (or the whole member when it is one piece), length to buy, lb. */
  pieceWeightLb: z.number(),
  /** Largest demand/capacity ratio of any check. */
  utilization: z.number(),
  governingCheck: z.string(),
  combination: z.string(),
  /** Price per ft × length to buy; null without a price. */
  cost: z.number().nullable(),
  /** For near misses (utilization 1.0 to 1.15): which checks fail and by how much. */
  failing: z.string().optional(),
});
export type ShortlistEntry = z.infer<typeof shortlistEntrySchema>;

export const shortlistResultSchema = z.object({
  caution: z.string(),
  sortBy: z.enum(shortlistSorts),
  spans: z.object({ clearSpanFt: z.number(), designSpanFt: z.number(), lengthToBuyFt: z.number() }),
  passing: z.array(shortlistEntrySchema).max(500),
  nearMisses: z.array(shortlistEntrySchema).max(CALC_BOUNDS.catalogueSizes),
  counts: z.object({ checked: z.number().int(), filteredOut: z.number().int(), passing: z.number().int() }),
  filters: z.array(z.string()).max(CALC_BOUNDS.messages),
  warnings: z.array(z.string()).max(CALC_BOUNDS.catalogueSizes),
  sources: z.array(z.string()).max(CALC_BOUNDS.messages),
});
export type ShortlistResult = z.infer<typeof shortlistResultSchema>;
