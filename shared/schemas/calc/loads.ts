import { z } from 'zod';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { loadStandardSchema, roofTypes } from '@/shared/schemas/jobs';

/**
 * Load sources on a member (DESIGN.md §5 "Loads"). Lengths along the member and tributary widths in ft,
 * area loads in psf, line loads in plf, point loads in lb. Roof area loads are per horizontal projection
 * unless `deadAlongSlope` says the dead load was given along the slope.
 */

export const inputFlags = ['measured', 'assumed', 'default'] as const;
export const inputFlagSchema = z.enum(inputFlags);

export const loadTypeSchema = z.enum(['D', 'L', 'Lr', 'S']);

/** Largest area load accepted, psf (heavy storage is 250 psf in ASCE 7 Table 4.3-1; twice that is room enough). */
export const MAX_AREA_LOAD_PSF = 500;
/** Largest line load accepted, plf. */
export const MAX_LINE_LOAD_PLF = 20_000;
/** Largest point load accepted, lb. */
export const MAX_POINT_LOAD_LB = 200_000;

/**
 * A load or position that cannot be negative and has a stated ceiling: loads past it are refused at the
 * field (numbers like 1e300 psf would overflow the checks' ratios to Infinity).
 */
const nonNegative = (what: string, max: number, unit: string) =>
  z
    .number({ message: `Enter ${what}` })
    .finite()
    .min(0, { message: `${what} cannot be negative` })
    .max(max, { message: `${what} is at most ${max.toLocaleString('en-US')} ${unit}` });
const psf = (what: string) => nonNegative(what, MAX_AREA_LOAD_PSF, 'psf');
const pounds = (what: string) => nonNegative(what, MAX_POINT_LOAD_LB, 'lb');
const position = (what: string) => nonNegative(what, 200, 'ft');

const tributaryFt = z
  .number({ message: 'Enter the tributary width' })
  .finite()
  .positive({ message: 'Tributary width must be above 0' })
  .max(60, { message: 'Tributary width at most 60 ft' });

/** Shared by every source: a label the user gives it, how the numbers were obtained, and an optional extent. */
const sourceBase = {
  label: z.string().trim().max(80).optional(),
  flag: inputFlagSchema.default('assumed'),
};

/** A uniform source may cover only part of the span: from startFt to endFt, measured from the left support. */
const extent = {
  startFt: position('a start position').optional(),
  endFt: position('an end position').optional(),
};

export const roofSourceSchema = z.object({
  kind: z.literal('roof'),
  ...sourceBase,
  ...extent,
  tributaryFt,
  deadPsf: psf('the roof dead load'),
  /** True when deadPsf is per sloped roof area; the engine divides by cos θ to get horizontal projection. */
  deadAlongSlope: z.boolean().default(false),
  roofLivePsf: psf('the roof live load'),
  /** Sloped-roof snow (horizontal projection) for this source; omitted = the member input's roofSnowPsf. */
  snowPsf: psf('the snow load').optional(),
});

export const ceilingSourceSchema = z.object({
  kind: z.literal('ceiling'),
  ...sourceBase,
  ...extent,
  tributaryFt,
  deadPsf: psf('the ceiling dead load'),
  livePsf: psf('the attic live load'),
  /** Ceiling joists run continuous over the member (not lapped or spliced over it): 1.25 × the half-span load. */
  continuousOver: z.boolean().default(false),
});

export const floorSourceSchema = z.object({
  kind: z.literal('floor'),
  ...sourceBase,
  ...extent,
  tributaryFt,
  deadPsf: psf('the floor dead load'),
  livePsf: psf('the floor live load'),
  /** Joists run continuous over the member (not lapped or spliced over it): 1.25 × the half-span load. */
  continuousOver: z.boolean().default(false),
});

/** Wall above: either a line load (wPlf) or a height (ft) × wall dead load (psf of wall face). */
export const wallAboveSourceSchema = z
  .object({
    kind: z.literal('wall-above'),
    ...sourceBase,
    ...extent,
    wPlf: nonNegative('the wall load', MAX_LINE_LOAD_PLF, 'plf').optional(),
    heightFt: z.number().finite().positive({ message: 'Wall height must be above 0' }).max(40).optional(),
    deadPsf: psf('the wall dead load').optional(),
  })
  .refine((s) => (s.wPlf !== undefined) !== (s.heightFt !== undefined && s.deadPsf !== undefined), {
    message: 'Give the wall above either a load in plf or a height and a psf, not both',
    path: ['wPlf'],
  });

export const pointLoadKinds = [
  'girder-truss',
  'hip-valley-end',
  'purlin-strut',
  'post-above',
  'heavy-fixture',
] as const;
export const pointLoadKindSchema = z.enum(pointLoadKinds);

export const pointSourceSchema = z.object({
  kind: z.literal('point'),
  ...sourceBase,
  pointKind: pointLoadKindSchema,
  /** Position from the left support, ft. */
  atFt: position('the position'),
  deadLb: pounds('the dead load').default(0),
  liveLb: pounds('the live load').default(0),
  roofLiveLb: pounds('the roof live load').default(0),
  snowLb: pounds('the snow load').default(0),
});

export const loadSourceSchema = z.discriminatedUnion('kind', [
  roofSourceSchema,
  ceilingSourceSchema,
  floorSourceSchema,
  wallAboveSourceSchema,
  pointSourceSchema,
]);
export type LoadSource = z.infer<typeof loadSourceSchema>;
export type LoadSourceInput = z.input<typeof loadSourceSchema>;

export const memberLoadsInputSchema = z.object({
  /** Length analysed, ft (the design span of a simple span): positions and extents are checked against it. */
  spanFt: z
    .number()
    .finite()
    .positive({ message: 'Span must be above 0' })
    .max(60, { message: 'Span at most 60 ft' }),
  /** Roof slope, rise in 12 (the job's roofPitchIn12). */
  roofPitchIn12: z.number().finite().min(0).max(24).default(0),
  /** Sloped-roof snow p_s from the snow module, psf of horizontal projection (0 where there is no snow). */
  roofSnowPsf: psf('the roof snow load').default(0),
  /** Member self-weight, plf (the caller knows the member). */
  selfWeightPlf: nonNegative('the self-weight', MAX_LINE_LOAD_PLF, 'plf').default(0),
  sources: z
    .array(loadSourceSchema)
    .max(CALC_BOUNDS.sources, { message: `At most ${CALC_BOUNDS.sources} load sources` }),
  /**
   * Where the sources' positions are measured from, ft along the analysed length: an entered position plus
   * this is its place on the member (half the left bearing when positions are entered from the face of the
   * left support and the analysis starts at its centre). The takedown's text and messages keep the entered
   * positions; its loads and lines carry the member's. Default 0.
   */
  positionOffsetFt: z.number().finite().min(0).max(60).default(0),
});
export type MemberLoadsInput = z.infer<typeof memberLoadsInputSchema>;

export const riskCategorySchema = z.enum(['I', 'II', 'III', 'IV']);

/**
 * The roof's thermal condition (ASCE 7 Table 7.3-2), from which the engine takes the thermal factor C_t and
 * the slope-factor curve of the job's edition:
 * - 'heated-unvented': a heated building whose roof is not ventilated (cathedral ceiling, insulation at the
 *   roof deck);
 * - 'vented-attic-insulated-ceiling': a ventilated attic over a heated space with more than R-25 in the
 *   ceiling between them (the usual house);
 * - 'vented-attic-little-insulation': a ventilated attic over a heated space with R-25 or less in the ceiling;
 * - 'unheated': an unheated structure (detached garage, shed, open porch roof).
 */
export const roofThermalConditions = [
  'heated-unvented',
  'vented-attic-insulated-ceiling',
  'vented-attic-little-insulation',
  'unheated',
] as const;
export const roofThermalConditionSchema = z.enum(roofThermalConditions);
export type RoofThermalCondition = z.infer<typeof roofThermalConditionSchema>;

/**
 * Snow inputs for one roof (ASCE 7 chapter 7). Ground snow in psf as the job's edition defines it
 * (ASCE 7-16: 50-year map value; ASCE 7-22: strength-level, risk-targeted). Factors default to the values
 * stated in the snow module; importanceIs (ASCE 7-16 only) defaults from the risk category.
 */
export const snowInputSchema = z.object({
  edition: loadStandardSchema,
  groundSnowPsf: nonNegative('the ground snow load', 300, 'psf'),
  roofPitchIn12: z.number().finite().min(0).max(24),
  roofType: z.enum(roofTypes).default('gable'),
  riskCategory: riskCategorySchema.default('II'),
  exposureCe: z.number().finite().min(0.7).max(1.3).default(1.0),
  /** The roof's thermal condition; omitted = 'vented-attic-insulated-ceiling' (the usual house). */
  thermalCondition: roofThermalConditionSchema.optional(),
  /** C_t given outright, overriding the value the thermal condition gives (the condition still says vented or not). */
  thermalCt: z.number().finite().min(0.85).max(1.3).optional(),
  importanceIs: z.number().finite().min(0.8).max(1.2).optional(),
  /**
   * Thermal resistance of the roof's insulation, R in ft²·h·°F/Btu: a warm roof (C_t ≤ 1.0) takes the
   * slippery-surface curve only with enough of it (ASCE 7-16 §7.4.1). Omitted = not known.
   */
  roofInsulationR: z.number().finite().min(0).max(100).optional(),
  /**
   * Unobstructed slippery surface (metal, glass, smooth membrane) that lets snow slide off the eaves. Its
   * lower curve is used on a cold roof, and on a warm roof only when roofInsulationR meets §7.4.1.
   */
  slipperyUnobstructed: z.boolean().default(false),
  /** The roof steps down to a lower roof next to this member (drift). */
  roofStepsDown: z.boolean().default(false),
});
export type SnowInput = z.infer<typeof snowInputSchema>;
