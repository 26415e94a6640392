import { z } from 'zod';
import { boundedRecord } from '@/shared/schemas/bounded-record';
import { loadStandardSchema } from '@/shared/schemas/jobs';
import {
  inputFlagSchema,
  loadSourceSchema,
  loadTypeSchema,
  snowInputSchema,
} from '@/shared/schemas/calc/loads';

/**
 * Input and result of a member check (DESIGN.md §5 "Checks"). Lengths along the member in ft; section sizes,
 * bearing lengths and heights in in; loads in psf, plf and lb; stresses in psi.
 *
 * Spans, and which is which:
 * - clear span: the opening between the faces of the supports (what is measured on site);
 * - design span = clear span + half the bearing length at each end (support centre to support centre);
 * - length to buy = clear span + the full bearing length at both ends.
 * Load source positions (point loads, extents of partial loads) are measured from the face of the left
 * support, along the clear span.
 *
 * Optional fields take the default named beside them; the result echoes each input with the flag
 * `measured`, `assumed` or `default` (a field absent from the input is `default`; a field present is the flag
 * given in `flags`, else `assumed`).
 */

export const memberKinds = ['header', 'beam'] as const;
export const deflectionUses = [
  'floor',
  'floor-tile',
  'plaster-ceiling',
  'gypsum-ceiling',
  'roof',
  'roof-no-ceiling',
] as const;
export const deflectionUseSchema = z.enum(deflectionUses);
export type DeflectionUse = z.infer<typeof deflectionUseSchema>;
export const mountKinds = ['dropped', 'flush'] as const;
export const supportKinds = ['jacks', 'post'] as const;

const positive = (label: string) =>
  z
    .number({ message: `Enter ${label}` })
    .finite()
    .positive({ message: `${label} must be above 0` });

/** Snow inputs of the roof above the member; edition and pitch come from the member input. */
export const memberSnowSchema = snowInputSchema.omit({ edition: true, roofPitchIn12: true });

/** Posts under the member's ends (a beam on posts): checked with the reactions, each on a footing pad. */
export const memberPostsSchema = z.object({
  materialId: z.string().min(1, { message: 'Choose a post material' }),
  sizeId: z.string().min(1, { message: 'Choose a post size' }),
  heightFt: positive('the post height').max(40, { message: 'At most 40 ft' }),
  weakAxisBraced: z.boolean().optional(),
  /** Allowable soil bearing, psf; default 1,500 (IRC R401.4.1 presumptive value). */
  soilBearingPsf: positive('the soil bearing').max(12_000).optional(),
  /** Footing pad thickness, in; default 12 (common practice). */
  padThicknessIn: positive('the pad thickness').max(48).optional(),
});

export const memberCheckInputSchema = z.object({
  kind: z.enum(memberKinds),
  label: z.string().trim().max(80).optional(),
  /** The job's load standard edition: the ASD combinations and snow rules follow it. */
  edition: loadStandardSchema,
  clearSpanFt: positive('the clear span').max(40, { message: 'Clear span at most 40 ft' }),
  /** Bearing length at each end, in; default 3 (two jack studs, common practice). */
  bearingLeftIn: positive('the left bearing length').max(24).optional(),
  bearingRightIn: positive('the right bearing length').max(24).optional(),
  /** Roof slope, rise in 12; default 0. */
  roofPitchIn12: z.number().finite().min(0).max(24).optional(),
  /** Snow on the roof above; omitted = no snow on this member's roof sources. */
  snow: memberSnowSchema.optional(),
  sources: z.array(loadSourceSchema).max(40, { message: 'At most 40 load sources' }),
  /** Add the member's own weight as dead load; default true. */
  selfWeight: z.boolean().optional(),
  materialId: z.string().min(1, { message: 'Choose a material' }),
  /** A size of the material ("2-ply-2x10", "5.125x12", "2-ply-1.75x11.875"). */
  sizeId: z.string().min(1, { message: 'Choose a size' }),
  /** Number of plies; overrides the plies of sizeId (same ply size). */
  plies: z.number().int().min(1).max(4).optional(),
  /** The grade stamp cannot be read: the weakest grade of the species is used (sawn only). */
  gradeUnknown: z.boolean().optional(),
  /** Old lumber by measured size: one ply's width and the depth, in (replaces the catalogue dimensions). */
  measuredPly: z
    .object({ bIn: positive('the measured width').max(12), dIn: positive('the measured depth').max(24) })
    .optional(),
  /** Wet service (moisture content above 19 % in service); default false. */
  wetService: z.boolean().optional(),
  /** Sustained service temperature, °F; default 70 (normal). */
  temperatureF: z.number().finite().min(-40).max(150).optional(),
  /** Unbraced length of the compression (top) edge, ft; omitted = braced by framing along its length. */
  unbracedLengthFt: positive('the unbraced length').max(40).optional(),
  /** Repetitive member factor C_r; default false (built-up headers rarely meet NDS 4.3.9). */
  repetitive: z.boolean().optional(),
  /** Loaded on the wide face (a flat header); default false. */
  flatUse: z.boolean().optional(),
  /** Incised for preservative treatment; default false. */
  incised: z.boolean().optional(),
  /** Take shear at d from the supports (NDS 3.4.3.1); default true. */
  shearAtD: z.boolean().optional(),
  /** Deflection limits by use; default 'floor' (L/360 live, L/240 total). */
  deflectionUse: deflectionUseSchema.optional(),
  /** Absolute cap on total deflection, in (e.g. 0.375 for a flush beam); default none. */
  deflectionCapIn: positive('the deflection cap').max(4).optional(),
  /** Part of the occupancy live load that is sustained (for creep), 0–1; default 0. */
  sustainedLiveFraction: z.number().finite().min(0).max(1).optional(),
  /** What the member bears on: jack studs on a wall plate, or a post; default 'jacks'. */
  supportKind: z.enum(supportKinds).optional(),
  /** Width of the support across the member (wall stud depth or post face), in; default 3.5 (2x4 wall). */
  supportWidthIn: positive('the support width').max(12).optional(),
  /** Material of the plate under the jack studs (its F_c⊥ usually governs); default Spruce-Pine-Fir No.1/No.2. */
  plateMaterialId: z.string().min(1).optional(),
  /** Dropped below the joists or flush with them; default 'dropped'. */
  mount: z.enum(mountKinds).optional(),
  /** Joist depth, in: the most a flush member may be. */
  joistDepthIn: positive('the joist depth').max(24).optional(),
  /** Joist spacing, in; default 16. */
  joistSpacingIn: positive('the joist spacing').max(48).optional(),
  /** Joists frame in from both sides (flush); default true. */
  joistsBothSides: z.boolean().optional(),
  /** Height from the floor to the underside of the joists, in (dropped: headroom = this − member depth). */
  underJoistsHeightIn: positive('the height to the joists').max(240).optional(),
  /** Least clear height under a dropped member, in; default 80 (6 ft 8 in door height, common practice). */
  minHeadroomIn: positive('the headroom').max(200).optional(),
  posts: memberPostsSchema.optional(),
  /** How each input was obtained, by field name ("clearSpanFt": "measured"). */
  flags: boundedRecord(inputFlagSchema, {
    maxEntries: 100,
    maxKeyLength: 80,
    message: 'At most 100 input flags',
  }).optional(),
});
export type MemberCheckInput = z.infer<typeof memberCheckInputSchema>;
/** The loading, support and use of a member without its material and size (shared with the shortlist). */
export type MemberLoadingInput = Omit<
  MemberCheckInput,
  'materialId' | 'sizeId' | 'plies' | 'gradeUnknown' | 'measuredPly' | 'posts'
> &
  Partial<Pick<MemberCheckInput, 'posts'>>;
export type MemberCheckInputBody = z.input<typeof memberCheckInputSchema>;

/** Options of a member check that do not change its numbers. */
export const memberCheckOptionsSchema = z.object({
  /** Sample shear, moment and deflection of the governing combination for drawing. */
  diagrams: z.boolean().optional(),
  /** Stations for the diagrams (plus every load discontinuity); default 41. */
  diagramPoints: z.number().int().min(2).max(401).optional(),
});
export type MemberCheckOptions = z.infer<typeof memberCheckOptionsSchema>;

const factorUseSchema = z.object({ symbol: z.string(), value: z.number(), note: z.string().optional() });

export const checkIds = ['bending', 'shear', 'deflection-live', 'deflection-total', 'bearing'] as const;
export const checkIdSchema = z.enum(checkIds);
export type CheckId = z.infer<typeof checkIdSchema>;

export const checkResultSchema = z.object({
  id: checkIdSchema,
  label: z.string(),
  /** Demand and capacity in `unit` (psi for stresses, in for deflection and bearing length). */
  demand: z.number(),
  capacity: z.number(),
  unit: z.string(),
  /** demand / capacity. */
  ratio: z.number(),
  pass: z.boolean(),
  /** The load combination that governs this check. */
  combination: z.string(),
  factors: z.array(factorUseSchema),
  formula: z.string(),
  note: z.string().optional(),
});
export type CheckResult = z.infer<typeof checkResultSchema>;

export const echoedInputSchema = z.object({
  field: z.string(),
  label: z.string(),
  value: z.union([z.number(), z.string(), z.boolean()]),
  unit: z.string().optional(),
  flag: inputFlagSchema,
});
export type EchoedInput = z.infer<typeof echoedInputSchema>;

const takedownLineSchema = z.object({
  label: z.string(),
  type: loadTypeSchema,
  expression: z.string(),
  wPlf: z.number().optional(),
  pLb: z.number().optional(),
  startFt: z.number().optional(),
  endFt: z.number().optional(),
  atFt: z.number().optional(),
  flag: inputFlagSchema.optional(),
});

const diagramSampleSchema = z.object({
  xFt: z.number(),
  shearLb: z.number(),
  momentLbFt: z.number(),
  deflectionIn: z.number(),
});

/** Which size of which material a result is about (lib/calc sizeIdentity); b and d in in. */
export const sizeIdentitySchema = z.object({
  materialId: z.string(),
  materialLabel: z.string(),
  sizeId: z.string(),
  sizeLabel: z.string(),
  plies: z.number(),
  bIn: z.number(),
  dIn: z.number(),
});

export const memberCheckResultSchema = z.object({
  caution: z.string(),
  pass: z.boolean(),
  member: z.object({
    kind: z.enum(memberKinds),
    label: z.string().optional(),
    ...sizeIdentitySchema.shape,
    selfWeightPlf: z.number(),
  }),
  spans: z.object({
    clearSpanFt: z.number(),
    designSpanFt: z.number(),
    lengthToBuyFt: z.number(),
    bearingLeftIn: z.number(),
    bearingRightIn: z.number(),
  }),
  inputs: z.array(echoedInputSchema),
  /**
   * Roof snow from the member's snow inputs, psf of horizontal projection: flat roof p_f, sloped roof p_s,
   * low-slope minimum p_m, the design value used for roof sources (and which governs), with each factor.
   */
  snow: z
    .object({
      pfPsf: z.number(),
      psPsf: z.number(),
      pmPsf: z.number(),
      designPsf: z.number(),
      governing: z.enum(['sloped', 'minimum']),
      factors: z.array(factorUseSchema),
      notes: z.array(z.string()),
      reference: z.string(),
    })
    .optional(),
  takedown: z.array(takedownLineSchema),
  combinations: z.array(z.object({ name: z.string(), CD: z.number(), skipped: z.boolean() })),
  checks: z.array(checkResultSchema),
  governing: z.object({ check: checkIdSchema, combination: z.string(), ratio: z.number() }),
  reactions: z.object({
    /** Largest reaction of any combination at each end, lb. */
    leftLb: z.number(),
    rightLb: z.number(),
    combination: z.string(),
    /** Reaction at each end by load type (unfactored), lb. */
    byType: z.record(loadTypeSchema, z.object({ leftLb: z.number(), rightLb: z.number() })),
  }),
  bearing: z.object({
    requiredLengthIn: z.number(),
    providedLengthIn: z.number(),
    jackStuds: z.number().int(),
    jackStudsNote: z.string(),
    governedBy: z.enum(['member', 'plate']),
  }),
  mount: z.object({
    kind: z.enum(mountKinds),
    depthFits: z.boolean().nullable(),
    hangers: z.number().int().nullable(),
    headroomIn: z.number().nullable(),
    requirements: z.array(z.string()),
  }),
  posts: z
    .array(
      z.object({
        end: z.enum(['left', 'right']),
        loadLb: z.number(),
        ratio: z.number(),
        pass: z.boolean(),
        combination: z.string(),
        footingSideIn: z.number(),
        footingAreaFt2: z.number(),
        soilBearingPsf: z.number(),
      }),
    )
    .optional(),
  warnings: z.array(z.string()),
  sources: z.array(z.string()),
  diagram: z.object({ combination: z.string(), samples: z.array(diagramSampleSchema) }).optional(),
});
export type MemberCheckResult = z.infer<typeof memberCheckResultSchema>;

/** Input of the prescriptive-path verdict: a header's member input plus the job facts code tables key on. */
export const prescriptiveInputSchema = z.object({
  member: memberCheckInputSchema,
  /** Building width perpendicular to the ridge, ft (the job's); null when not known. */
  buildingWidthFt: z.number().finite().positive().max(80).nullable(),
  /** Ground snow, psf (the job's). */
  groundSnowPsf: z.number().finite().min(0).max(300),
});
export type PrescriptiveInput = z.infer<typeof prescriptiveInputSchema>;

export const prescriptiveResultSchema = z.object({
  caution: z.string(),
  verdict: z.enum(['likely-covered', 'engineer-needed']),
  message: z.string(),
  /** Every reason the case sits outside what header tables cover (empty when likely covered). */
  reasons: z.array(z.string()),
  /** Tributary's own smallest sawn 2x header for the same loads (when likely covered). */
  computed: z
    .object({
      materialId: z.string(),
      sizeId: z.string(),
      sizeLabel: z.string(),
      utilization: z.number(),
      governingCheck: z.string(),
    })
    .nullable(),
  notes: z.array(z.string()),
});
export type PrescriptiveResult = z.infer<typeof prescriptiveResultSchema>;
