import { fieldErrors } from '@/shared/errors';
import {
  jobInputSchema,
  type AdoptedCode,
  type foundationTypes,
  type Job,
  type LoadStandard,
  type roofTypes,
} from '@/shared/schemas/jobs';
import type { z } from 'zod';
import { parseNumberText } from './number-text';

export type RoofType = (typeof roofTypes)[number];
export type FoundationType = (typeof foundationTypes)[number];
export type JobFields = z.output<typeof jobInputSchema>;

/** A job form as typed: numbers stay text until the form is sent. */
export type JobDraft = {
  name: string;
  address: string;
  yearBuilt: string;
  stories: string;
  roofType: RoofType;
  roofPitchIn12: string;
  buildingWidthFt: string;
  adoptedCode: AdoptedCode | null;
  loadStandard: LoadStandard;
  groundSnowPsf: string;
  groundSnowSource: string;
  foundation: FoundationType;
  notes: string;
};

type NumberField = 'yearBuilt' | 'stories' | 'roofPitchIn12' | 'buildingWidthFt' | 'groundSnowPsf';

/** Fields that may be left empty and then mean "not known" (null) rather than the schema default. */
const nullableFields: ReadonlySet<NumberField> = new Set(['yearBuilt', 'buildingWidthFt']);
const numberFields: readonly NumberField[] = [
  'yearBuilt',
  'stories',
  'roofPitchIn12',
  'buildingWidthFt',
  'groundSnowPsf',
];

export function emptyJobDraft(): JobDraft {
  return {
    name: '',
    address: '',
    yearBuilt: '',
    stories: '1',
    roofType: 'gable',
    roofPitchIn12: '6',
    buildingWidthFt: '',
    adoptedCode: null,
    loadStandard: 'ASCE 7-22',
    groundSnowPsf: '0',
    groundSnowSource: '',
    foundation: 'unknown',
    notes: '',
  };
}

export function jobToDraft(job: Job): JobDraft {
  const text = (value: number | null) => (value === null ? '' : String(value));
  return {
    name: job.name,
    address: job.address,
    yearBuilt: text(job.yearBuilt),
    stories: text(job.stories),
    roofType: job.roofType,
    roofPitchIn12: text(job.roofPitchIn12),
    buildingWidthFt: text(job.buildingWidthFt),
    adoptedCode: job.adoptedCode,
    loadStandard: job.loadStandard,
    groundSnowPsf: text(job.groundSnowPsf),
    groundSnowSource: job.groundSnowSource,
    foundation: job.foundation,
    notes: job.notes,
  };
}

export type DraftResult = { ok: true; value: JobFields } | { ok: false; fields: Record<string, string[]> };

/** Turns a draft into job fields checked by the shared schema, or field-level messages. */
export function draftToJobFields(draft: JobDraft): DraftResult {
  const fields: Record<string, string[]> = {};
  const candidate: Record<string, unknown> = { ...draft };
  for (const name of numberFields) {
    const parsed = parseNumberText(draft[name]);
    if (parsed.kind === 'invalid') {
      fields[name] = [name === 'yearBuilt' ? 'Enter a year, like 1962' : 'Enter a number, like 6 or 6 1/2'];
      candidate[name] = undefined;
    } else if (parsed.kind === 'empty') {
      candidate[name] = nullableFields.has(name) ? null : undefined;
    } else {
      candidate[name] = parsed.value;
    }
  }
  const result = jobInputSchema.safeParse(candidate);
  if (!result.success) {
    for (const [key, messages] of Object.entries(fieldErrors(result.error))) fields[key] ??= messages;
  }
  if (Object.keys(fields).length > 0 || !result.success) return { ok: false, fields };
  return { ok: true, value: result.data };
}
