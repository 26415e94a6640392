import { describe, expect, it } from 'vitest';
import { describeLoad } from '@/lib/requests/load-diff';
import { loadSourceSchema } from '@/shared/schemas/calc/loads';

// How an added or removed load reads in the engineer's change card (invented loads; the wording is tested).

describe('a load in one line', () => {
  it('says a yes/no in words, after the field it answers', () => {
    const roof = (deadAlongSlope: boolean) =>
      loadSourceSchema.parse({ kind: 'roof', tributaryFt: 12, deadPsf: 15, roofLivePsf: 20, deadAlongSlope });
    const line = describeLoad(roof(false));
    expect(line).toContain('dead load given along the slope: no');
    expect(line).not.toMatch(/slope (No|Yes)/);
    expect(describeLoad(roof(true))).toContain('dead load given along the slope: yes');
  });

  it('gives numbers after their field, and the flag last', () => {
    const floor = loadSourceSchema.parse({ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 });
    const line = describeLoad(floor);
    expect(line).toMatch(/^tributary width .+, dead load 10 psf, live load 40 psf/);
    expect(line).toMatch(/\((measured|assumed|default)\)$/);
  });
});
