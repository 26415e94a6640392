import { describe, expect, it } from 'vitest';
import { adoptedCodes, asceEditionForCode, jobInputSchema, jobPatchSchema } from '@/shared/schemas/jobs';

describe('asceEditionForCode', () => {
  // IRC chapter 44 "Referenced Standards", from memory; confirm: IRC 2024 names ASCE 7-22, IRC 2021 names
  // ASCE 7-16; IRC 2018 and IRC 2015 name an older edition the engine does not carry, so the nearest
  // supported edition (ASCE 7-16) is used.
  it.each([
    ['IRC 2024', 'ASCE 7-22'],
    ['IRC 2021', 'ASCE 7-16'],
    ['IRC 2018', 'ASCE 7-16'],
    ['IRC 2015', 'ASCE 7-16'],
  ] as const)('%s → %s', (code, edition) => {
    expect(asceEditionForCode(code)).toBe(edition);
  });

  it('answers for every adopted code a job may name', () => {
    expect(adoptedCodes.map(asceEditionForCode)).toEqual([
      'ASCE 7-16',
      'ASCE 7-16',
      'ASCE 7-16',
      'ASCE 7-22',
    ]);
  });
});

describe('adoptedCode on a job', () => {
  it('defaults to null (not known) and accepts only a listed edition', () => {
    expect(jobInputSchema.parse({ name: 'A job' }).adoptedCode).toBeNull();
    expect(jobInputSchema.parse({ name: 'A job', adoptedCode: 'IRC 2021' }).adoptedCode).toBe('IRC 2021');
    expect(jobInputSchema.safeParse({ name: 'A job', adoptedCode: 'IRC 2012' }).success).toBe(false);
  });

  it('a patch that leaves it out does not reset it', () => {
    expect(jobPatchSchema.parse({ name: 'Renamed' })).toEqual({ name: 'Renamed' });
    expect(jobPatchSchema.parse({ adoptedCode: null })).toEqual({ adoptedCode: null });
  });
});
