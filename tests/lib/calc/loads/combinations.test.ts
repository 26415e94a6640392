import { describe, expect, it } from 'vitest';
import { asdCombinations } from '@/lib/calc/loads';
import { expectApprox } from '@/tests/helpers/approx';

const byName = (edition: 'ASCE 7-16' | 'ASCE 7-22', name: string) => {
  const found = asdCombinations(edition).find((c) => c.name === name);
  if (!found) throw new Error(`no combination ${name} in ${edition}`);
  return found;
};

describe('asdCombinations', () => {
  it('ASCE 7-16 §2.4.1 eqs. 1–4 with C_D from the shortest-duration load (NDS Table 2.3.2)', () => {
    const combos = asdCombinations('ASCE 7-16');
    expect(combos.map((c) => c.name)).toEqual([
      'D',
      'D + L',
      'D + Lr',
      'D + S',
      'D + 0.75L + 0.75Lr',
      'D + 0.75L + 0.75S',
    ]);
    // NDS 2018 Table 2.3.2: permanent 0.9, ten years (occupancy live) 1.0, seven days (roof live) 1.25,
    // two months (snow) 1.15.
    const expectedCD = [0.9, 1.0, 1.25, 1.15, 1.25, 1.15];
    combos.forEach((c, i) => expectApprox(c.CD, expectedCD[i], { abs: 0 }));
    expect(byName('ASCE 7-16', 'D + S').factors).toEqual({ D: 1, S: 1 });
    expect(byName('ASCE 7-16', 'D + 0.75L + 0.75S').factors).toEqual({ D: 1, L: 0.75, S: 0.75 });
  });

  it('ASCE 7-22 §2.4.1 eqs. 3a and 4a carry 0.7S (STRUCTURE magazine, "ASCE 7-22 Flat Roof Snow Load versus Minimum Snow Load")', () => {
    const snowAlone = byName('ASCE 7-22', 'D + 0.7S');
    expectApprox(snowAlone.factors.S ?? 0, 0.7, { abs: 1e-12 });
    expectApprox(snowAlone.CD, 1.15, { abs: 0 });
    const withLive = byName('ASCE 7-22', 'D + 0.75L + 0.75(0.7S)');
    expectApprox(withLive.factors.S ?? 0, 0.75 * 0.7, { abs: 1e-12 });
    expectApprox(withLive.factors.L ?? 0, 0.75, { abs: 0 });
    expectApprox(withLive.CD, 1.15, { abs: 0 });
  });

  it('never puts roof live and snow in the same combination (ASCE 7 §2.4.1 "Lr or S")', () => {
    for (const edition of ['ASCE 7-16', 'ASCE 7-22'] as const) {
      for (const combo of asdCombinations(edition)) {
        expect(combo.factors.Lr !== undefined && combo.factors.S !== undefined).toBe(false);
      }
    }
  });

  it('returns the same frozen list on every call', () => {
    const first = asdCombinations('ASCE 7-22');
    expect(asdCombinations('ASCE 7-22')).toBe(first);
    expect(Object.isFrozen(first)).toBe(true);
    expect(Object.isFrozen(first[0])).toBe(true);
  });
});
