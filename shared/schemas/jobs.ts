import { z } from 'zod';
import { baseVersionSchema, changesAField, clientIdSchema, versionSchema } from './sync';
import { visibleTextSchema } from './visible-text';

export const loadStandardEditions = ['ASCE 7-16', 'ASCE 7-22'] as const;
export const loadStandardSchema = z.enum(loadStandardEditions);
export type LoadStandard = z.infer<typeof loadStandardSchema>;

/** IRC editions a town may have adopted; the load standard follows from it (see asceEditionForCode). */
export const adoptedCodes = ['IRC 2015', 'IRC 2018', 'IRC 2021', 'IRC 2024'] as const;
export const adoptedCodeSchema = z.enum(adoptedCodes);
export type AdoptedCode = z.infer<typeof adoptedCodeSchema>;

/**
 * The ASCE 7 edition the engine uses for a job in a town that adopted `code`: the edition the IRC edition
 * references where the engine supports it, else the engine's nearest supported edition.
 *
 * From memory; confirm: IRC 2024 references ASCE 7-22 and IRC 2021 references ASCE 7-16. IRC 2018 and
 * IRC 2015 reference older editions (ASCE 7-10, from memory), which the engine does not carry, so they map to ASCE 7-16,
 * the nearest edition it supports. The mapping must be confirmed against the adopted code's referenced
 * standards (IRC chapter 44) and the building department's amendments; the user can override the edition.
 *
 * @param code the adopted IRC edition
 * @returns the load standard edition to check the job's members with
 * @example asceEditionForCode('IRC 2024'); // 'ASCE 7-22'
 * Reference: IRC 2015, 2018, 2021 and 2024, chapter 44 "Referenced Standards" (from memory; confirm).
 */
export function asceEditionForCode(code: AdoptedCode): LoadStandard {
  return code === 'IRC 2024' ? 'ASCE 7-22' : 'ASCE 7-16';
}

export const roofTypes = ['gable', 'hip', 'shed', 'flat', 'gambrel', 'other'] as const;
export const foundationTypes = ['slab', 'crawlspace', 'basement', 'pier', 'unknown'] as const;

const currentYear = new Date().getFullYear();

/** Fields a person enters for a job. Lengths in ft, slope as rise per 12 in of run, ground snow in psf. */
export const jobInputSchema = z.object({
  name: visibleTextSchema('Give the job a name', 160),
  address: z.string().trim().max(300).default(''),
  yearBuilt: z
    .number()
    .int({ message: 'Enter a whole year' })
    .min(1600, { message: 'Enter a year after 1600' })
    .max(currentYear + 1, { message: 'Year built cannot be in the future' })
    .nullable()
    .default(null),
  stories: z
    .number()
    .int()
    .min(1, { message: 'At least 1 story' })
    .max(4, { message: 'At most 4 stories' })
    .default(1),
  roofType: z.enum(roofTypes).default('gable'),
  roofPitchIn12: z
    .number()
    .min(0, { message: 'Slope cannot be negative' })
    .max(24, { message: 'At most 24 in 12' })
    .default(6),
  buildingWidthFt: z
    .number()
    .positive({ message: 'Enter a width above 0' })
    .max(80, { message: 'At most 80 ft' })
    .nullable()
    .default(null),
  /** The IRC edition the town has adopted; null when not known. */
  adoptedCode: adoptedCodeSchema.nullable().default(null),
  loadStandard: loadStandardSchema.default('ASCE 7-22'),
  groundSnowPsf: z
    .number()
    .min(0, { message: 'Ground snow cannot be negative' })
    .max(300, { message: 'At most 300 psf' })
    .default(0),
  groundSnowSource: z.string().trim().max(300).default(''),
  foundation: z.enum(foundationTypes).default('unknown'),
  notes: z.string().max(5000).default(''),
});
export type JobInput = z.input<typeof jobInputSchema>;

/** `POST /api/jobs`: the fields, and the id the device chose when it made the job offline. */
export const jobCreateSchema = jobInputSchema.extend({ id: clientIdSchema.optional() });
export type JobCreate = z.output<typeof jobCreateSchema>;

export const jobUpdateSchema = jobInputSchema.partial();

export const jobSchema = jobInputSchema.extend({
  id: z.string(),
  orgId: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  archivedAt: z.string().nullable(),
  /** 1 on create, +1 on every change (docs/sync-protocol.md). */
  version: versionSchema,
});
export type Job = z.infer<typeof jobSchema>;

/** How many of a job's members are in each state (shared/schemas/members.ts `memberStates`). */
export const memberStateCountsSchema = z.object({
  passes: z.number().int(),
  fails: z.number().int(),
  'engineer-needed': z.number().int(),
  'load-path-open': z.number().int(),
});
export type MemberStateCounts = z.infer<typeof memberStateCountsSchema>;

/** A row of `GET /api/jobs`: the job and its members counted by state. */
export const jobListItemSchema = jobSchema.extend({ memberStates: memberStateCountsSchema });
export type JobListItem = z.infer<typeof jobListItemSchema>;

export const jobListSchema = z.object({ jobs: z.array(jobListItemSchema) });

const jobField = jobInputSchema.shape;

/**
 * `PATCH /api/jobs/:jobId`: only the fields sent change. (`jobUpdateSchema` above keeps zod's defaults, so
 * parsing `{ name }` with it fills every other field with its default; a patch must not do that.)
 */
export const jobPatchSchema = z
  .object({
    name: jobField.name.optional(),
    address: jobField.address.unwrap().optional(),
    yearBuilt: jobField.yearBuilt.unwrap().optional(),
    stories: jobField.stories.unwrap().optional(),
    roofType: jobField.roofType.unwrap().optional(),
    roofPitchIn12: jobField.roofPitchIn12.unwrap().optional(),
    buildingWidthFt: jobField.buildingWidthFt.unwrap().optional(),
    adoptedCode: jobField.adoptedCode.unwrap().optional(),
    loadStandard: jobField.loadStandard.unwrap().optional(),
    groundSnowPsf: jobField.groundSnowPsf.unwrap().optional(),
    groundSnowSource: jobField.groundSnowSource.unwrap().optional(),
    foundation: jobField.foundation.unwrap().optional(),
    notes: jobField.notes.unwrap().optional(),
    baseVersion: baseVersionSchema.optional(),
  })
  .refine(changesAField, {
    message: 'Change at least one field',
  });
export type JobPatch = z.infer<typeof jobPatchSchema>;
