import { describe, expect, it } from 'vitest';
import { asdCombinations } from '@/lib/calc/loads';
import { roofSlopeFactor, roofSnowLoad } from '@/lib/calc/snow';
import { snowInputSchema } from '@/shared/schemas/calc/loads';
import { expectApprox } from '@/tests/helpers/approx';

const snow = (input: Record<string, unknown>) =>
  roofSnowLoad(snowInputSchema.parse({ edition: 'ASCE 7-16', roofPitchIn12: 6, ...input }));

describe('ASCE 7-16 vs 7-22 on the same job', () => {
  // Job: ground snow 40 psf, C_e 1.0, C_t 1.0, risk category III, 6 in 12 gable.
  const job = { groundSnowPsf: 40, riskCategory: 'III', roofPitchIn12: 6 };

  it('puts I_s in p_f under 7-16 and leaves it out under 7-22', () => {
    // ASCE 7-16 eq. 7.3-1: p_f = 0.7·C_e·C_t·I_s·p_g; I_s = 1.1 for risk category III (ASCE 7-16 Table 1.5-2).
    expectApprox(snow({ ...job, edition: 'ASCE 7-16' }).pfPsf, 0.7 * 1.1 * 40, { rel: 1e-12 });
    // ASCE 7-22 eq. 7.3-1: p_f = 0.7·C_e·C_t·p_g (STRUCTURE magazine, "ASCE 7-22 Flat Roof Snow Load versus
    // Minimum Snow Load").
    expectApprox(snow({ ...job, edition: 'ASCE 7-22' }).pfPsf, 0.7 * 40, { rel: 1e-12 });
  });

  it('carries the ASD 0.7 on S only in the 7-22 combinations', () => {
    // ASCE 7-16 §2.4.1 eq. 3: D + S; ASCE 7-22 §2.4.1 eq. 3a: D + 0.7S (STRUCTURE magazine, same article).
    const snowInCombo = (edition: 'ASCE 7-16' | 'ASCE 7-22') => {
      const result = snow({ ...job, edition });
      const combo = asdCombinations(edition).find(
        (c) => c.factors.S !== undefined && c.factors.L === undefined,
      );
      return result.designPsf * (combo?.factors.S ?? Number.NaN);
    };
    expectApprox(snowInCombo('ASCE 7-16'), 0.7 * 1.1 * 40, { rel: 1e-12 });
    expectApprox(snowInCombo('ASCE 7-22'), 0.7 * 0.7 * 40, { rel: 1e-12 });
  });

  it('lists the factors used, with I_s marked unused under 7-22', () => {
    const factors = snow({ ...job, edition: 'ASCE 7-22' }).factors;
    expect(factors.map((f) => f.symbol)).toEqual(['C_e', 'C_t', 'I_s', 'C_s']);
    expect(factors[2].note).toContain('not used in ASCE 7-22');
  });
});

describe('slope factor C_s', () => {
  // ASCE 7-16 Fig. 7.4-1 (breakpoints from memory): warm roof, other surfaces 1.0 to 30°, 0 at 70°;
  // unobstructed slippery 1.0 to 5°; C_t = 1.1 curves 37.5° / 10°; C_t = 1.2 curves 45° / 15°.
  it('is 1.0 up to 30° and (70 − θ)/40 beyond on a warm roof with other surfaces', () => {
    expectApprox(roofSlopeFactor(30, 1.0, false), 1, { abs: 0 });
    expectApprox(roofSlopeFactor(45, 1.0, false), 25 / 40, { rel: 1e-12 });
    expectApprox(roofSlopeFactor(70, 1.0, false), 0, { abs: 0 });
    expectApprox(roofSlopeFactor(80, 1.0, false), 0, { abs: 0 });
  });

  it('falls from 5° on an unobstructed slippery warm roof', () => {
    expectApprox(roofSlopeFactor(5, 1.0, true), 1, { abs: 0 });
    expectApprox(roofSlopeFactor(45, 1.0, true), 25 / 65, { rel: 1e-12 });
  });

  it('uses the cold-roof curves for C_t 1.1 and 1.2', () => {
    expectApprox(roofSlopeFactor(45, 1.1, false), 25 / 32.5, { rel: 1e-12 });
    expectApprox(roofSlopeFactor(45, 1.2, false), 1, { abs: 0 });
    expectApprox(roofSlopeFactor(40, 1.2, true), 30 / 55, { rel: 1e-12 });
  });

  it('applies to p_s = C_s·p_f at 12 in 12 (45°)', () => {
    const result = snow({ groundSnowPsf: 40, roofPitchIn12: 12 });
    expectApprox(result.psPsf, 0.625 * 28, { rel: 1e-12 });
    expectApprox(result.slopeDeg, 45, { rel: 1e-12 });
  });
});

describe('minimum snow load for low-slope roofs', () => {
  it('ASCE 7-16 §7.3.4: p_m = I_s·p_g for p_g ≤ 20 psf, governing over p_s at 2 in 12', () => {
    const result = snow({ groundSnowPsf: 15, roofPitchIn12: 2 });
    expectApprox(result.pmPsf, 15, { abs: 1e-12 });
    expectApprox(result.psPsf, 0.7 * 15, { rel: 1e-12 });
    expect(result.governing).toBe('minimum');
    expectApprox(result.designPsf, 15, { abs: 1e-12 });
  });

  it('ASCE 7-16 §7.3.4: p_m = 20·I_s for p_g > 20 psf', () => {
    expectApprox(snow({ groundSnowPsf: 40, roofPitchIn12: 2, riskCategory: 'III' }).pmPsf, 20 * 1.1, {
      rel: 1e-12,
    });
  });

  it('does not apply at 15° or steeper (ASCE 7-16 §7.3.4)', () => {
    const result = snow({ groundSnowPsf: 15, roofPitchIn12: 4 });
    expectApprox(result.pmPsf, 0, { abs: 0 });
    expect(result.governing).toBe('sloped');
  });

  it('ASCE 7-22 §7.3.3 (from memory): the lesser of p_g and p_m,max (risk category II: 25 psf)', () => {
    expectApprox(snow({ edition: 'ASCE 7-22', groundSnowPsf: 15, roofPitchIn12: 0 }).pmPsf, 15, {
      abs: 1e-12,
    });
    expectApprox(snow({ edition: 'ASCE 7-22', groundSnowPsf: 60, roofPitchIn12: 0 }).pmPsf, 25, {
      abs: 1e-12,
    });
  });
});

describe('warnings', () => {
  it('warns of unbalanced snow on a gable between 1/2 and 7 in 12 (ASCE 7-16 §7.6.1, from memory)', () => {
    expect(snow({ groundSnowPsf: 30, roofPitchIn12: 6 }).warnings.join(' ')).toContain('Unbalanced snow');
    expect(snow({ groundSnowPsf: 30, roofPitchIn12: 8 }).warnings).toEqual([]);
    // §7.6.1 waives unbalanced snow only for slopes less than 1/2 on 12 and more than 7 on 12: both ends count.
    expect(snow({ groundSnowPsf: 30, roofPitchIn12: 0.5 }).warnings.join(' ')).toContain('Unbalanced snow');
    expect(snow({ groundSnowPsf: 30, roofPitchIn12: 7 }).warnings.join(' ')).toContain('Unbalanced snow');
    expect(snow({ groundSnowPsf: 30, roofPitchIn12: 0.25 }).warnings.join(' ')).not.toContain('Unbalanced');
    expect(snow({ groundSnowPsf: 30, roofPitchIn12: 6, roofType: 'shed' }).warnings).toEqual([]);
  });

  it('warns of drift where the roof steps down (ASCE 7-16 §7.7)', () => {
    const result = snow({ groundSnowPsf: 30, roofPitchIn12: 9, roofStepsDown: true });
    expect(result.warnings).toHaveLength(1);
    expect(result.warnings[0]).toContain('Drift');
  });

  it('gives zero loads and no warnings without ground snow', () => {
    const result = snow({ groundSnowPsf: 0, roofStepsDown: true });
    for (const psf of [result.pfPsf, result.psPsf, result.pmPsf, result.designPsf])
      expectApprox(psf, 0, { abs: 0 });
    expect(result.warnings).toEqual([]);
  });
});
