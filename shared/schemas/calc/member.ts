import { z } from 'zod';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { boundedRecord } from '@/shared/schemas/bounded-record';
import { loadStandardSchema } from '@/shared/schemas/jobs';
import {
  inputFlagSchema,
  loadSourceSchema,
  loadTypeSchema,
  roofThermalConditionSchema,
  snowInputSchema,
} from '@/shared/schemas/calc/loads';

/**
 * Input and result of a member check (DESIGN.md §5 "Checks"). Lengths along the member in ft; section sizes,
 * bearing lengths and heights in in; loads in psf, plf and lb; stresses in psi.
 *
 * Spans, and which is which:
 * - clear span: the opening between the faces of the supports (what is measured on site);
 * - design span = clear span + half the bearing length at each end (support centre to support centre);
 * - length to buy = clear span + the full bearing length at both ends (plus any overhang and second span).
 * Load source positions (point loads, extents of partial loads) are measured from the face of the left
 * support, along the member (or from the tip of the left overhang when there is one); a uniform source with
 * no extent covers the whole member. Positions in the result (demands, diagrams) are ft from the member's
 * left end: the left support's centre, or the tip of the left overhang.
 *
 * A member may overhang one or both supports (overhangLeftFt, overhangRightFt) and may run continuous over
 * a centre post into a second span (secondClearSpanFt): live, roof live and snow loads are then also placed
 * span by span (ASCE 7 §4.3.3 partial loading; snow at half on the unloaded spans, ASCE 7 §7.5), and a
 * support that can lift is reported.
 *
 * Optional fields take the default named beside them; the result echoes each input with the flag
 * `measured`, `assumed` or `default` (a field absent from the input is `default`; a field present is the flag
 * given in `flags`, else `assumed`).
 */

export const memberKinds = ['header', 'beam'] as const;
export const deflectionUses = [
  'floor',
  'floor-tile',
  'floor-stone',
  'plaster-ceiling',
  'gypsum-ceiling',
  'roof',
  'roof-no-ceiling',
] as const;
export const deflectionUseSchema = z.enum(deflectionUses);
export type DeflectionUse = z.infer<typeof deflectionUseSchema>;
/**
 * How the member sits: dropped below the joists, flush with them (joists hung in hangers), or raised into the
 * attic above the ceiling with the ceiling joists hung from it by hangers or straps (a common fix in
 * single-storey houses).
 */
export const mountKinds = ['dropped', 'flush', 'raised'] as const;
export const supportKinds = ['jacks', 'post'] as const;

const positive = (label: string) =>
  z
    .number({ message: `Enter ${label}` })
    .finite()
    .positive({ message: `${label} must be above 0` });

/** A length with a least value: below it the checks divide by next to nothing (ratios run to Infinity). */
const atLeast = (label: string, min: number, unit: string) =>
  z
    .number({ message: `Enter ${label}` })
    .finite()
    .min(min, { message: `${label} must be at least ${min} ${unit}` });

/** A list of at most `max` items, with the message naming the limit. */
const listOf = <T extends z.ZodType>(item: T, max: number, what: string) =>
  z.array(item).max(max, { message: `At most ${max} ${what}` });

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
  bearingLeftIn: atLeast('the left bearing length', 0.5, 'in').max(24).optional(),
  bearingRightIn: atLeast('the right bearing length', 0.5, 'in').max(24).optional(),
  /**
   * The member runs on past its left support by this much, ft, from the face of the support to the tip (a
   * cantilevered end). With a left overhang, load positions are measured from its tip. Omitted = none.
   */
  overhangLeftFt: positive('the left overhang').max(20, { message: 'Overhang at most 20 ft' }).optional(),
  /** The member runs on past its right support by this much, ft, from the face of the support to the tip. */
  overhangRightFt: positive('the right overhang').max(20, { message: 'Overhang at most 20 ft' }).optional(),
  /**
   * The member is continuous over a centre post into a second span of this clear span, ft (two spans, equal
   * or not): clearSpanFt is then the left span, bearingRightIn the far end's bearing. Omitted = one span.
   */
  secondClearSpanFt: positive('the second clear span')
    .max(40, { message: 'Clear span at most 40 ft' })
    .optional(),
  /** Bearing length on the centre post of a continuous member, in; default 3.5 (a 4x4 post's face). */
  centreBearingIn: atLeast('the centre bearing length', 0.5, 'in').max(24).optional(),
  /** Roof slope, rise in 12; default 0. */
  roofPitchIn12: z.number().finite().min(0).max(24).optional(),
  /** Snow on the roof above; omitted = no snow on this member's roof sources. */
  snow: memberSnowSchema.optional(),
  sources: listOf(loadSourceSchema, CALC_BOUNDS.sources, 'load sources'),
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
    .object({
      bIn: atLeast('the measured width', 0.5, 'in').max(12),
      dIn: atLeast('the measured depth', 1, 'in').max(24),
    })
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
  deflectionCapIn: atLeast('the deflection cap', 0.05, 'in').max(4).optional(),
  /** Part of the occupancy live load that is sustained (for creep), 0–1; default 0. */
  sustainedLiveFraction: z.number().finite().min(0).max(1).optional(),
  /** What the member bears on: jack studs on a wall plate, or a post; default 'jacks'. */
  supportKind: z.enum(supportKinds).optional(),
  /** Width of the support across the member (wall stud depth or post face), in; default 3.5 (2x4 wall). */
  supportWidthIn: atLeast('the support width', 1.5, 'in').max(12).optional(),
  /** Material of the plate under the jack studs (its F_c⊥ usually governs); default Spruce-Pine-Fir No.1/No.2. */
  plateMaterialId: z.string().min(1).optional(),
  /** Dropped below the joists, flush with them, or raised into the attic; default 'dropped'. */
  mount: z.enum(mountKinds).optional(),
  /** Joist depth, in: the most a flush member may be; for a raised member, the ceiling joists' depth. */
  joistDepthIn: positive('the joist depth').max(24).optional(),
  /**
   * Raised: clear height in the attic where the member goes, from the ceiling line (underside of the ceiling
   * joists) up to the underside of the roof framing, in. The most a raised member may be.
   */
  atticClearanceIn: positive('the attic clearance').max(240).optional(),
  /** Joist spacing, in; default 16. */
  joistSpacingIn: atLeast('the joist spacing', 4, 'in').max(48).optional(),
  /** Joists frame in from both sides (flush); default true. */
  joistsBothSides: z.boolean().optional(),
  /** Height from the floor to the underside of the joists, in (dropped: headroom = this − member depth). */
  underJoistsHeightIn: positive('the height to the joists').max(240).optional(),
  /** Least clear height under a dropped member, in; default 80 (6 ft 8 in door height, common practice). */
  minHeadroomIn: positive('the headroom').max(200).optional(),
  posts: memberPostsSchema.optional(),
  /** How each input was obtained, by field name ("clearSpanFt": "measured"). */
  flags: boundedRecord(inputFlagSchema, {
    maxEntries: CALC_BOUNDS.flags,
    maxKeyLength: 80,
    message: `At most ${CALC_BOUNDS.flags} input flags`,
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
  factors: listOf(factorUseSchema, CALC_BOUNDS.factors, 'factors'),
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

/** The supports of a member, left to right: two ends, and a centre post under a two-span continuous beam. */
export const supportNames = ['left', 'centre', 'right'] as const;
export const supportNameSchema = z.enum(supportNames);
export type SupportName = z.infer<typeof supportNameSchema>;

/** A deflection (in, downward positive) and where its largest value is (ft along the design span). */
const deflectionAtSchema = z.object({ in: z.number(), atFt: z.number() });

/**
 * What one load combination asks of the member (self-weight included): support reactions of that
 * combination (lb, upward positive), the largest moment (lb·ft, sagging positive) and shear (lb) with their
 * positions, the design shear the shear check uses (at d from the supports when asked) and the support it is
 * next to, and the variable-load, plain elastic total and creep-adjusted total deflections with the position
 * of each largest value. Positions are ft along the design span from the left support's centre.
 */
export const combinationDemandsSchema = z.object({
  combination: z.string(),
  CD: z.number(),
  reactions: z
    .array(z.object({ support: supportNameSchema, atFt: z.number(), lb: z.number() }))
    .max(supportNames.length),
  maxMoment: z.object({ lbFt: z.number(), atFt: z.number() }),
  maxShear: z.object({ lb: z.number(), atFt: z.number() }),
  designShear: z.object({ lb: z.number(), support: supportNameSchema, atD: z.boolean() }),
  deflectionLive: deflectionAtSchema,
  deflectionTotalElastic: deflectionAtSchema,
  deflectionTotal: deflectionAtSchema,
});
export type CombinationDemands = z.infer<typeof combinationDemandsSchema>;

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
    /** Design span of the (first) span between supports, ft. */
    designSpanFt: z.number(),
    lengthToBuyFt: z.number(),
    bearingLeftIn: z.number(),
    bearingRightIn: z.number(),
    /** Continuous: the second span's clear and design spans (ft) and the centre bearing (in). */
    secondClearSpanFt: z.number().optional(),
    secondDesignSpanFt: z.number().optional(),
    centreBearingIn: z.number().optional(),
    /** Overhangs as entered (support face to tip), ft. */
    overhangLeftFt: z.number().optional(),
    overhangRightFt: z.number().optional(),
    /** Length analysed, left end to right end (support centres or overhang tips), ft; with overhangs or two spans. */
    memberLengthFt: z.number().optional(),
  }),
  inputs: listOf(echoedInputSchema, CALC_BOUNDS.echoedInputs, 'echoed inputs'),
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
      /** The roof's thermal condition used (given or the default), the C_t used and whether it was given. */
      thermalCondition: roofThermalConditionSchema.optional(),
      thermalCt: z.number().optional(),
      thermalCtGiven: z.boolean().optional(),
      /** True when the slippery-surface C_s curve was used (a cold roof, or a warm roof insulated enough). */
      slipperyCurveUsed: z.boolean().optional(),
      factors: listOf(factorUseSchema, CALC_BOUNDS.factors, 'factors'),
      notes: listOf(z.string(), CALC_BOUNDS.messages, 'notes'),
      reference: z.string(),
    })
    .optional(),
  takedown: listOf(takedownLineSchema, CALC_BOUNDS.takedownLines, 'takedown lines'),
  combinations: listOf(
    z.object({ name: z.string(), CD: z.number(), skipped: z.boolean() }),
    CALC_BOUNDS.combinations,
    'combinations',
  ),
  checks: listOf(checkResultSchema, CALC_BOUNDS.checks, 'checks'),
  governing: z.object({ check: checkIdSchema, combination: z.string(), ratio: z.number() }),
  reactions: z.object({
    /** Largest reaction of any combination at each end, lb. */
    leftLb: z.number(),
    rightLb: z.number(),
    combination: z.string(),
    /** Reaction at each end by load type (unfactored), lb. */
    byType: z.record(
      loadTypeSchema,
      z.object({ leftLb: z.number(), rightLb: z.number(), centreLb: z.number().optional() }),
    ),
    /**
     * Per support: the largest reaction of any combination and that combination, and the least (a negative
     * least is uplift: the member must be held down there) with its combination, lb.
     */
    bySupport: z
      .array(
        z.object({
          support: supportNameSchema,
          atFt: z.number(),
          largestLb: z.number(),
          largestCombination: z.string(),
          leastLb: z.number(),
          leastCombination: z.string(),
        }),
      )
      .max(supportNames.length)
      .optional(),
  }),
  bearing: z.object({
    requiredLengthIn: z.number(),
    providedLengthIn: z.number(),
    jackStuds: z.number().int(),
    jackStudsNote: z.string(),
    /** Jack studs the bearing length needs, and how many more the common-practice minimum adds. */
    jackStudsForBearing: z.number().int().optional(),
    jackStudsAddedByPractice: z.number().int().optional(),
    governedBy: z.enum(['member', 'plate']),
  }),
  mount: z.object({
    kind: z.enum(mountKinds),
    depthFits: z.boolean().nullable(),
    /** Flush: hangers, one per joist framing in; raised: a hanger or strap per ceiling joist hung from it. */
    hangers: z.number().int().nullable(),
    headroomIn: z.number().nullable(),
    /** Raised: how far the member rises above the ceiling line (its bottom on the ceiling line), in. */
    depthAboveCeilingIn: z.number().nullable().optional(),
    /** Raised: how far it rises above the tops of the ceiling joists, in (null without their depth). */
    depthAboveJoistsIn: z.number().nullable().optional(),
    /** Raised: bearing length each end needs on its post or jack studs, in (from the bearing check). */
    endBearingRequiredIn: z.number().optional(),
    requirements: listOf(z.string(), CALC_BOUNDS.messages, 'requirements'),
  }),
  posts: z
    .array(
      z.object({
        /** Which support the post is under (a continuous member's centre post is checked too). */
        end: supportNameSchema,
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
  warnings: listOf(z.string(), CALC_BOUNDS.messages, 'warnings'),
  sources: listOf(z.string(), CALC_BOUNDS.messages, 'sources'),
  diagram: z
    .object({
      combination: z.string(),
      samples: listOf(diagramSampleSchema, CALC_BOUNDS.diagramSamples, 'samples'),
    })
    .optional(),
  /** Demands of the governing combination (that of the governing check) and of every combination checked. */
  demands: z
    .object({
      governing: combinationDemandsSchema,
      byCombination: listOf(combinationDemandsSchema, CALC_BOUNDS.combinations, 'combinations'),
    })
    .optional(),
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
  reasons: listOf(z.string(), CALC_BOUNDS.messages, 'reasons'),
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
  notes: listOf(z.string(), CALC_BOUNDS.messages, 'notes'),
});
export type PrescriptiveResult = z.infer<typeof prescriptiveResultSchema>;
