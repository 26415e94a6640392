import { z } from 'zod';
import { shoringWallInputSchema } from '@/shared/schemas/calc/materials';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';

/**
 * Input of a shoring plan (lib/calc/columns planShoring): the member's loading (the same fields as the
 * member check, without its material and size), how many temporary walls stand under it, the studs, and
 * what the walls stand on. Lengths in ft, stud spacing and joist spacing in in, soil bearing in psf.
 */

/** One temporary wall, or one each side of the wall being removed (joists bearing from both sides). */
export const shoringLayouts = ['one-side', 'both-sides'] as const;

/**
 * What the temporary wall stands on: a slab on grade, floor framing with the plate across the joists or
 * along them, a basement slab, or bare ground.
 */
export const shoringSurfaces = [
  'slab-on-grade',
  'floor-framing-perpendicular',
  'floor-framing-parallel',
  'basement-slab',
  'ground',
] as const;
export const shoringSurfaceSchema = z.enum(shoringSurfaces);
export type ShoringSurface = z.infer<typeof shoringSurfaceSchema>;

/** Temporary walls stand 2 to 3 ft back from the wall being removed (common practice); the nearer value, ft. */
export const DEFAULT_SHORING_SETBACK_FT = 2;

const positive = (label: string) =>
  z
    .number({ message: `Enter ${label}` })
    .finite()
    .positive({ message: `${label} must be above 0` });

/** The member's loading as the member check takes it, without material and size. */
export const shoringMemberSchema = memberCheckInputSchema.omit({
  materialId: true,
  sizeId: true,
  plies: true,
  gradeUnknown: true,
  measuredPly: true,
  posts: true,
});

export const shoringPlanInputSchema = z
  .object({
    member: shoringMemberSchema,
    layout: z.enum(shoringLayouts),
    /** Joist span on side A (the one wall's side with layout 'one-side'), ft: gives the wall's share. */
    joistSpanAFt: positive('the joist span on side A').max(40, { message: 'At most 40 ft' }).optional(),
    /** Joist span on side B, ft. */
    joistSpanBFt: positive('the joist span on side B').max(40, { message: 'At most 40 ft' }).optional(),
    /** How far each temporary wall stands back from the wall being removed, ft; default 2 (common practice). */
    setbackFt: positive('the setback').max(10, { message: 'At most 10 ft' }).optional(),
    /** The temporary walls' studs (their load comes from the member). */
    studs: shoringWallInputSchema.omit({ loadPlf: true, CD: true }),
    standsOn: shoringSurfaceSchema,
    /** Spacing of the floor joists the wall stands on, in; default 16 (common practice). */
    floorJoistSpacingIn: positive('the floor joist spacing').max(48, { message: 'At most 48 in' }).optional(),
    /** Allowable soil bearing under a mud sill, psf; default 1,500 (IRC R401.4.1 presumptive value). */
    soilBearingPsf: positive('the soil bearing').max(12_000, { message: 'At most 12,000 psf' }).optional(),
  })
  .superRefine((input, ctx) => {
    if (
      input.layout === 'both-sides' &&
      (input.joistSpanAFt === undefined) !== (input.joistSpanBFt === undefined)
    ) {
      ctx.addIssue({
        code: 'custom',
        path: [input.joistSpanAFt === undefined ? 'joistSpanAFt' : 'joistSpanBFt'],
        message: 'Give the joist span on both sides, or on neither',
      });
    }
    const setbackFt = input.setbackFt ?? DEFAULT_SHORING_SETBACK_FT;
    for (const field of ['joistSpanAFt', 'joistSpanBFt'] as const) {
      const spanFt = input[field];
      if (spanFt !== undefined && setbackFt >= spanFt) {
        ctx.addIssue({
          code: 'custom',
          path: ['setbackFt'],
          message: 'The setback must be less than the joist span',
        });
      }
    }
  });
export type ShoringPlanInput = z.infer<typeof shoringPlanInputSchema>;
export type ShoringPlanInputBody = z.input<typeof shoringPlanInputSchema>;
