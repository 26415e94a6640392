import { describe, expect, it } from 'vitest';
import { SHORING_SEQUENCE, rentedShores, studWallTakeoff } from '@/lib/calc';
import { expectApprox } from '@/tests/helpers/approx';

// Common practice: studs at every spacing along the wall plus one at the end; one bottom and one top plate;
// studs cut to the height less two 1-1/2 in plates (NDS Supplement 2018 Table 1B dressed 2x thickness).
describe('studWallTakeoff', () => {
  it('counts studs at 16 in over 14 ft: floor(168 / 16) + 1 = 11, cut to 96 − 3 = 93 in', () => {
    const t = studWallTakeoff(14, 16, 8);
    expect(t.studCount).toBe(11);
    expectApprox(t.studLengthIn, 93, { abs: 1e-9 });
    expect(t.plates).toBe(2);
    expect(t.plateStock).toMatchObject({ label: '14 ft', count: 2 });
    // 93 in is longer than a 92-5/8 in precut: the next precut (104-5/8 in) is cut down.
    expect(t.studStock.label).toBe('104-5/8 in precut stud');
  });

  it('puts a stud at both ends of even a short wall', () => {
    expect(studWallTakeoff(1, 24, 8).studCount).toBe(2);
  });

  it('splices plates longer than a 20 ft stock length', () => {
    expect(studWallTakeoff(26, 16, 8).plateStock).toMatchObject({ label: '20 ft', count: 4 });
  });
});

// Common practice: shores under a continuous beam carry w × s each, so s ≤ rated capacity ÷ w.
describe('rentedShores', () => {
  it('spaces 3,000 lb shores under 600 plf at 5 ft or less: 4 shores over 12 ft at 4 ft', () => {
    const layout = rentedShores(600, 3000, 12);
    expectApprox(layout.maxSpacingFt, 5, { abs: 1e-9 });
    expect(layout.count).toBe(4);
    expectApprox(layout.spacingFt, 4, { abs: 1e-9 });
    expectApprox(layout.loadPerShoreLb, 2400, { abs: 1e-6 });
    expect(layout.pass).toBe(true);
    expect(layout.warnings.join(' ')).toMatch(/extended/);
  });

  it('an exact fit uses the full spacing', () => {
    const layout = rentedShores(500, 2500, 10);
    expect(layout.count).toBe(3);
    expectApprox(layout.loadPerShoreLb, 2500, { abs: 1e-6 });
  });

  it('refuses a capacity of zero', () => {
    expect(() => rentedShores(500, 0, 10)).toThrow(/Rated capacity/);
  });
});

describe('SHORING_SEQUENCE (common practice)', () => {
  it('says snug, not jacked; vertical load only; shoring stays until posts, footing and hangers are in', () => {
    const text = SHORING_SEQUENCE.join(' ');
    expect(text).toMatch(/do not jack/);
    expect(text).toMatch(/never take the place of ceiling joists that tie the rafters/);
    expect(text).toMatch(/posts, the footing \(poured, cured and inspected\) and every hanger/);
  });
});
