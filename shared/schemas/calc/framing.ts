import { z } from 'zod';

const inches = (what: string, max: number) =>
  z
    .number({ message: `Enter the ${what}` })
    .finite()
    .positive({ message: `The ${what} must be above 0` })
    .max(max, { message: `The ${what} is at most ${max} in` });

const count = (what: string, min: number, max: number) =>
  z
    .number({ message: `Enter the number of ${what}` })
    .int({ message: `Enter a whole number of ${what}` })
    .min(min, { message: `At least ${min} ${what}` })
    .max(max, { message: `At most ${max} ${what}` });

/** The header or beam in the opening, as the framing list needs it. */
export const framingHeaderSchema = z.object({
  /** Size text shown in the list, e.g. "2x10" or "1-3/4 x 9-1/4 LVL". */
  label: z.string().trim().min(1).max(60),
  /** Actual depth of the member in the wall's height, in (a flat 2x4 is 1.5). */
  depthIn: inches('header depth', 30),
  plies: count('plies', 1, 4),
  /** Engineered lumber is ordered to length; sawn lumber comes in stock lengths. */
  engineered: z.boolean().default(false),
  /**
   * A single flat 2x4 in a nonbearing wall (IRC 2021 R602.7.4): the code requires no cripples above it; the
   * framing list still sets them at layout as nailing for the wall finish (common practice).
   */
  flat: z.boolean().default(false),
});

/**
 * Framing list input: rough opening (RO) in inches, sill height for windows (top of the rough sill above the
 * subfloor; 0 for a door), wall plate height (bottom of the bottom plate to the top of the top plates), plate
 * counts, stud size and spacing, jacks and kings per side.
 */
export const framingInputSchema = z.object({
  roughOpeningWidthIn: inches('rough opening width', 480),
  roughOpeningHeightIn: inches('rough opening height', 192),
  sillHeightIn: z.number().finite().min(0, { message: 'Sill height cannot be negative' }).max(120).default(0),
  wallHeightIn: inches('wall height', 240),
  bottomPlates: count('bottom plates', 1, 2).default(1),
  topPlates: count('top plates', 1, 3).default(2),
  sillPlies: count('sill plies', 1, 2).default(1),
  studSize: z.enum(['2x4', '2x6']).default('2x4'),
  studSpacingIn: inches('stud spacing', 24).default(16),
  jacksPerSide: count('jack studs per side', 0, 4).default(1),
  kingsPerSide: count('king studs per side', 1, 4).default(1),
  header: framingHeaderSchema,
});
export type FramingInput = z.infer<typeof framingInputSchema>;

/** Bearing screen outcomes (DESIGN.md §3 "Bearing screen"). */
export const bearingScreenOutcomes = [
  'likely-bearing',
  'likely-nonbearing',
  'engineer-required',
  'cant-tell',
] as const;
export const bearingScreenOutcomeSchema = z.enum(bearingScreenOutcomes);
export type BearingScreenOutcome = z.infer<typeof bearingScreenOutcomeSchema>;

/** Input of the nonbearing header rule: the screen's outcome, the opening width and the gap to nailing above. */
export const nonbearingHeaderInputSchema = z.object({
  screenOutcome: bearingScreenOutcomeSchema,
  roughOpeningWidthIn: inches('rough opening width', 480),
  /** Vertical distance from the top of the header to the parallel nailing surface above (top plates), in. */
  nailingSurfaceAboveIn: z.number().finite().min(0, { message: 'Distance cannot be negative' }).max(240),
});
export type NonbearingHeaderInput = z.infer<typeof nonbearingHeaderInputSchema>;
