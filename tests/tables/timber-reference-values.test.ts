import { describe, expect, it } from 'vitest';
import { timberReferenceRowSchema } from '@/shared/schemas/calc/materials';
import { timberReferenceValues } from '@/tables/lumber/timber-reference-values';

describe('NDS Supplement 2018 Table 4D rows (from memory)', () => {
  it('every row passes the row schema and is marked from memory', () => {
    for (const r of timberReferenceValues) {
      expect(timberReferenceRowSchema.safeParse(r).success, JSON.stringify(r)).toBe(true);
      expect(r.provenance).toBe('from memory');
    }
  });

  it('each species and grade has both a Beams and Stringers and a Posts and Timbers row', () => {
    const keys = new Set(timberReferenceValues.map((r) => `${r.species}|${r.grade}|${r.use}`));
    expect(keys.size).toBe(timberReferenceValues.length);
    for (const r of timberReferenceValues) {
      const other = r.use === 'beams-and-stringers' ? 'posts-and-timbers' : 'beams-and-stringers';
      expect(keys.has(`${r.species}|${r.grade}|${other}`)).toBe(true);
    }
  });

  it('Douglas Fir-Larch timber F_c⊥ equals the dimension lumber value (625 psi, REFERENCES.md Table 4A)', () => {
    for (const r of timberReferenceValues.filter((t) => t.species === 'douglas-fir-larch'))
      expect(r.FcPerpPsi).toBe(625);
  });
});
