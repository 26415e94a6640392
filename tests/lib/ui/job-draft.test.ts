import { describe, expect, it } from 'vitest';
import { draftToJobFields, emptyJobDraft, jobToDraft } from '@/lib/ui/job-draft';
import type { Job } from '@/shared/schemas/jobs';

describe('draftToJobFields', () => {
  it('turns typed text into job fields, blanks into "not known"', () => {
    const result = draftToJobFields({ ...emptyJobDraft(), name: ' Alder hallway ', roofPitchIn12: '7 1/2' });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.name).toBe('Alder hallway');
    expect(result.value.roofPitchIn12).toBe(7.5);
    expect(result.value.yearBuilt).toBeNull();
    expect(result.value.buildingWidthFt).toBeNull();
    expect(result.value.stories).toBe(1);
  });

  it('puts a message under each field that does not read or does not pass the shared schema', () => {
    const result = draftToJobFields({
      ...emptyJobDraft(),
      name: '',
      yearBuilt: 'old',
      stories: '9',
      groundSnowPsf: '-5',
    });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.fields.name).toEqual(['Give the job a name']);
    expect(result.fields.yearBuilt).toEqual(['Enter a year, like 1962']);
    expect(result.fields.stories).toEqual(['At most 4 stories']);
    expect(result.fields.groundSnowPsf).toEqual(['Ground snow cannot be negative']);
  });

  it('round-trips a saved job through the form', () => {
    const job: Job = {
      id: 'j1',
      orgId: 'o1',
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-01T00:00:00.000Z',
      archivedAt: null,
      version: 1,
      name: 'Ortiz living room',
      address: '12 Elm St',
      yearBuilt: 1958,
      stories: 2,
      roofType: 'hip',
      roofPitchIn12: 5,
      buildingWidthFt: 28,
      adoptedCode: 'IRC 2018',
      loadStandard: 'ASCE 7-16',
      groundSnowPsf: 30,
      groundSnowSource: 'County design criteria',
      foundation: 'basement',
      notes: '',
    };
    const result = draftToJobFields(jobToDraft(job));
    expect(result).toEqual({
      ok: true,
      value: {
        name: job.name,
        address: job.address,
        yearBuilt: 1958,
        stories: 2,
        roofType: 'hip',
        roofPitchIn12: 5,
        buildingWidthFt: 28,
        adoptedCode: 'IRC 2018',
        loadStandard: 'ASCE 7-16',
        groundSnowPsf: 30,
        groundSnowSource: job.groundSnowSource,
        foundation: 'basement',
        notes: '',
      },
    });
  });
});
