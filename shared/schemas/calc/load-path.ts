import { z } from 'zod';
import { boundedRecord } from '@/shared/schemas/bounded-record';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import { inputFlagSchema, loadTypeSchema } from '@/shared/schemas/calc/loads';
import { memberCheckInputSchema, memberCheckResultSchema } from '@/shared/schemas/calc/member';
import { loadStandardSchema } from '@/shared/schemas/jobs';

/**
 * The load path of a job (DESIGN.md §6 "Load path"): every element a load passes through on its way to the
 * ground, and what each end of each element bears on. Lengths along a member in ft (positions on a beam as
 * its point sources: from the face of its left support), heights in ft, sizes in in, loads in lb, soil
 * bearing in psf.
 *
 * Elements:
 * - `member`: a new header or beam (a job member; its ends are left, right and, over a centre post, centre);
 * - `girder`, `joist`: existing framing checked as a beam from its measured size (old lumber by measured size,
 *   unknown grade → the weakest grade of the species), under its own loads plus what lands on it;
 * - `wall`: the jack studs of a stud wall carrying an end down one storey (checked as a built-up column);
 * - `post`: a wood post (checked as a column); `steel-column`: checked only against a rated capacity read
 *   off the column, otherwise an engineer is required;
 * - `pier`: concrete or block piers pass the load down; brick and rubble piers need an engineer;
 * - `footing` (existing of known or unknown size, or a new pad sized at the soil bearing), `foundation-wall`
 *   and `slab` are where a chain ends. A slab is not a footing.
 */

export const beamElementKinds = ['member', 'girder', 'joist'] as const;
export const verticalElementKinds = ['wall', 'post', 'steel-column', 'pier'] as const;
export const groundElementKinds = ['footing', 'foundation-wall', 'slab'] as const;
export const loadPathElementKinds = [
  ...beamElementKinds,
  ...verticalElementKinds,
  ...groundElementKinds,
] as const;
export const loadPathElementKindSchema = z.enum(loadPathElementKinds);
export type LoadPathElementKind = z.infer<typeof loadPathElementKindSchema>;

/** The existing framing kinds a user can add (everything but a job member). */
export const existingElementKinds = loadPathElementKinds.filter((k) => k !== 'member');

/** The ends of an element: a beam's supports, or the bottom of a wall, post, column or pier. */
export const loadPathEnds = ['left', 'centre', 'right', 'bottom'] as const;
export const loadPathEndSchema = z.enum(loadPathEnds);
export type LoadPathEnd = z.infer<typeof loadPathEndSchema>;

/**
 * How a load crosses floor framing on its way down: it bears straight on what is below (no floor between),
 * through squash blocks or solid blocking, or through framing with nothing under it (the chain stays open).
 */
export const throughKinds = ['direct', 'squash-blocks', 'solid-blocking', 'nothing'] as const;
/** Under a wall on a joist: the wall runs along the joist (parallel) or across the joists. */
export const joistRelations = ['parallel', 'across'] as const;

const id = z.string().min(1).max(100);
const heightFt = (what: string) =>
  z
    .number({ message: `Enter ${what}` })
    .finite()
    .positive({ message: `${what} must be above 0` })
    .max(40, { message: 'At most 40 ft' });
const soilBearingPsf = z
  .number({ message: 'Enter the soil bearing' })
  .finite()
  .positive({ message: 'Soil bearing must be above 0' })
  .max(12_000, { message: 'At most 12,000 psf' });
const flags = boundedRecord(inputFlagSchema, {
  maxEntries: CALC_BOUNDS.flags,
  maxKeyLength: 80,
  message: `At most ${CALC_BOUNDS.flags} input flags`,
}).optional();

/** What one end of an element bears on. */
export const loadPathBearingSchema = z.object({
  end: loadPathEndSchema,
  /** The element it bears on (a member's id or an existing element's id). */
  ontoId: id,
  /** On a beam, girder or joist: where the load lands, ft from the face of its left support. */
  atFt: z
    .number({ message: 'Enter where it lands' })
    .finite()
    .min(0, { message: 'The position cannot be negative' })
    .max(200, { message: 'At most 200 ft' })
    .optional(),
  /** A flush member hung from the one it bears on (a hanger), rather than sitting on top of it. */
  hanger: z.boolean().optional(),
  /** How it crosses floor framing; default 'direct'. */
  through: z.enum(throughKinds).optional(),
  /** A wall on a joist: along it or across the joists. */
  joistRelation: z.enum(joistRelations).optional(),
});
export type LoadPathBearing = z.infer<typeof loadPathBearingSchema>;

const beamData = z.object({ input: memberCheckInputSchema });
/** Jack studs carrying the end down one storey of wall. */
const wallData = z.object({
  studMaterialId: z.string().min(1, { message: 'Choose the stud material' }),
  /** One stud's size id ("2x4", "2x6"). */
  studSizeId: z.string().min(1, { message: 'Choose the stud size' }),
  jackStuds: z.number().int().min(1, { message: 'At least 1 jack stud' }).max(4, { message: 'At most 4' }),
  heightFt: heightFt('the wall height'),
  gradeUnknown: z.boolean().optional(),
  flags,
});
const postData = z.object({
  materialId: z.string().min(1, { message: 'Choose a post material' }),
  sizeId: z.string().min(1, { message: 'Choose a post size' }),
  heightFt: heightFt('the post height'),
  weakAxisBraced: z.boolean().optional(),
  gradeUnknown: z.boolean().optional(),
  /** Old lumber by measured size, in (replaces the catalogue size's width and depth). */
  measured: z
    .object({
      bIn: z.number().finite().min(1, { message: 'At least 1 in' }).max(24),
      dIn: z.number().finite().min(1, { message: 'At least 1 in' }).max(24),
    })
    .optional(),
  flags,
});
const steelColumnData = z.object({
  heightFt: heightFt('the column height'),
  /** The capacity stamped on or published for the column, lb; omitted = not known (an engineer checks it). */
  ratedCapacityLb: z.number().finite().positive().max(200_000).optional(),
  flags,
});
const pierData = z.object({
  material: z.enum(['concrete', 'concrete-block', 'brick', 'rubble']),
  heightFt: heightFt('the pier height').optional(),
  flags,
});
const footingData = z.discriminatedUnion('footing', [
  z.object({
    footing: z.literal('existing'),
    /** Measured plan size, in; omitted = not known (an engineer decides what it carries). */
    widthIn: z.number().finite().min(6, { message: 'At least 6 in' }).max(240).optional(),
    lengthIn: z.number().finite().min(6, { message: 'At least 6 in' }).max(240).optional(),
    soilBearingPsf: soilBearingPsf.optional(),
    /** The user has seen the footing (dug down to it, or the plans show it). */
    confirmed: z.boolean(),
    flags,
  }),
  z.object({
    footing: z.literal('new-pad'),
    padThicknessIn: z.number().finite().min(4, { message: 'At least 4 in' }).max(48).optional(),
    soilBearingPsf: soilBearingPsf.optional(),
    /** The user will pour the pad as sized (and have it inspected). */
    confirmed: z.boolean(),
    flags,
  }),
]);
const foundationWallData = z.object({ confirmed: z.boolean(), flags });

/** The kind-specific data of an element, by kind. */
export const loadPathElementDataSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('member'), ...beamData.shape }),
  z.object({ kind: z.literal('girder'), ...beamData.shape }),
  z.object({ kind: z.literal('joist'), ...beamData.shape }),
  z.object({ kind: z.literal('wall'), ...wallData.shape }),
  z.object({ kind: z.literal('post'), ...postData.shape }),
  z.object({ kind: z.literal('steel-column'), ...steelColumnData.shape }),
  z.object({ kind: z.literal('pier'), ...pierData.shape }),
  z.object({ kind: z.literal('footing'), data: footingData }),
  z.object({ kind: z.literal('foundation-wall'), ...foundationWallData.shape }),
  z.object({ kind: z.literal('slab'), flags }),
]);
export type LoadPathElementData = z.infer<typeof loadPathElementDataSchema>;

export const loadPathNodeSchema = z.object({
  id,
  label: z.string().max(80),
  element: loadPathElementDataSchema,
  bearings: z.array(loadPathBearingSchema).max(3),
});
export type LoadPathNode = z.infer<typeof loadPathNodeSchema>;

/** Largest number of elements in one job's load path. */
export const MAX_LOAD_PATH_NODES = 200;

export const loadPathInputSchema = z.object({
  /** The job's load standard edition: posts, walls and footings combine their loads by it. */
  edition: loadStandardSchema,
  nodes: z.array(loadPathNodeSchema).max(MAX_LOAD_PATH_NODES),
});
export type LoadPathInput = z.infer<typeof loadPathInputSchema>;

/** Unfactored load by type, lb. */
export const typedLoadSchema = z.record(loadTypeSchema, z.number());
export type TypedLoad = z.infer<typeof typedLoadSchema>;

/** Own check of an element: passes, fails, or cannot be checked here (an engineer is required). */
export const elementCheckStates = ['passes', 'fails', 'engineer-required'] as const;
/** An element's state on the load path: its own check, or "load path open" when its chain is not closed. */
export const loadPathStates = [...elementCheckStates, 'load-path-open'] as const;
export const loadPathStateSchema = z.enum(loadPathStates);
export type LoadPathState = z.infer<typeof loadPathStateSchema>;

/** One check of a post, wall, column or footing: demand against capacity in `unit`. */
export const elementCheckSchema = z.object({
  label: z.string(),
  demand: z.number(),
  capacity: z.number(),
  unit: z.string(),
  ratio: z.number(),
  pass: z.boolean(),
  combination: z.string(),
  formula: z.string(),
});
export type ElementCheck = z.infer<typeof elementCheckSchema>;

/** A load that lands on an element from an end above it. */
export const incomingLoadSchema = z.object({
  fromId: z.string(),
  fromLabel: z.string(),
  fromEnd: loadPathEndSchema,
  atFt: z.number().optional(),
  load: typedLoadSchema,
});

/** What an end passes down: unfactored by type, and the largest combination with its name. */
export const endResultSchema = z.object({
  end: loadPathEndSchema,
  ontoId: z.string().nullable(),
  load: typedLoadSchema,
  governingLb: z.number(),
  governingCombination: z.string(),
  closed: z.boolean(),
});

export const loadPathElementResultSchema = z.object({
  id: z.string(),
  label: z.string(),
  kind: loadPathElementKindSchema,
  /** Height of the element in the chain: 0 for the top, counting down to the ground. */
  level: z.number().int(),
  checkState: z.enum(elementCheckStates),
  state: loadPathStateSchema,
  /** True when every end's chain ends on a confirmed footing or foundation wall through framing that passes. */
  closed: z.boolean(),
  incoming: z.array(incomingLoadSchema),
  ends: z.array(endResultSchema),
  checks: z.array(elementCheckSchema),
  /** Beams: the engine's member check with the loads from above as point sources. */
  memberResult: memberCheckResultSchema.optional(),
  /** New pad: the side of the square pad, in, and its soil bearing, psf. */
  pad: z.object({ sideIn: z.number(), soilBearingPsf: z.number(), loadLb: z.number() }).optional(),
  /** Why the chain below is not closed (each in words). */
  openReasons: z.array(z.string()),
  /** Why an engineer is required here. */
  engineerReasons: z.array(z.string()),
  /** Assumptions made (unknown grades, measured or assumed sizes, defaults). */
  assumptions: z.array(z.string()),
  warnings: z.array(z.string()),
});
export type LoadPathElementResult = z.infer<typeof loadPathElementResultSchema>;

export const loadPathResultSchema = z.object({
  caution: z.string(),
  /** How loads cross from one element to the next (per load type, combined at each element). */
  transfer: z.string(),
  elements: z.array(loadPathElementResultSchema),
  /** Everything applied (own loads and self-weights) and everything arriving at the ground, by type, lb. */
  applied: typedLoadSchema,
  atGround: typedLoadSchema,
  /** Load at ends that do not yet say what they bear on, by type, lb. */
  unresolved: typedLoadSchema,
  sources: z.array(z.string()),
});
export type LoadPathResult = z.infer<typeof loadPathResultSchema>;
