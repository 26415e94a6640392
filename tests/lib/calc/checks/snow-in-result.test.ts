import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

const header = (edition: 'ASCE 7-16' | 'ASCE 7-22') =>
  checkMember(
    memberCheckInputSchema.parse({
      kind: 'header',
      edition,
      clearSpanFt: 6,
      roofPitchIn12: 6,
      snow: { groundSnowPsf: 30, riskCategory: 'III', thermalCondition: 'heated-unvented' },
      sources: [{ kind: 'roof', tributaryFt: 14, deadPsf: 15, roofLivePsf: 20 }],
      materialId: 'sawn-douglas-fir-larch-no2',
      sizeId: '2-ply-2x10',
      flags: { snow: 'default', 'snow.groundSnowPsf': 'measured' },
    }),
  );

describe('roof snow shown in the member result with its factors and flags', () => {
  it('ASCE 7-16: p_f = 0.7·C_e·C_t·I_s·p_g with I_s 1.1 for risk category III', () => {
    const result = header('ASCE 7-16');
    // ASCE 7-16 eq. 7.3-1: 0.7 × 1.0 × 1.0 × 1.1 × 30 = 23.1 psf; Table 1.5-2: I_s = 1.1 (risk category III).
    expectApprox(result.snow?.pfPsf ?? NaN, 0.7 * 1.1 * 30, { rel: 1e-12 });
    // 6 in 12 = 26.6°, under the 30° bend of ASCE 7-16 Fig. 7.4-1 (warm roof, other surface): C_s = 1.0.
    expectApprox(result.snow?.psPsf ?? NaN, 0.7 * 1.1 * 30, { rel: 1e-12 });
    expect(result.snow?.factors.find((f) => f.symbol === 'I_s')?.value).toBe(1.1);
    const snowLine = result.takedown.find((l) => l.type === 'S');
    expectApprox(snowLine?.wPlf ?? NaN, 14 * 0.7 * 1.1 * 30, { rel: 1e-12 });
  });

  it('ASCE 7-22: p_f = 0.7·C_e·C_t·p_g, no I_s (the risk category is in the map)', () => {
    const result = header('ASCE 7-22');
    // ASCE 7-22 eq. 7.3-1 (STRUCTURE magazine, "ASCE 7-22 Flat Roof Snow Load versus Minimum Snow Load").
    expectApprox(result.snow?.pfPsf ?? NaN, 0.7 * 30, { rel: 1e-12 });
    expect(result.snow?.reference).toMatch(/ASCE 7-22/);
  });

  it('echoes the ground snow and the snow factors with their flags', () => {
    const inputs = header('ASCE 7-16').inputs;
    const groundSnow = inputs.find((i) => i.field === 'snow.groundSnowPsf');
    expect(groundSnow).toMatchObject({ value: 30, unit: 'psf', flag: 'measured' });
    expect(inputs.find((i) => i.field === 'snow.exposureCe')).toMatchObject({ value: 1, flag: 'default' });
    expect(inputs.find((i) => i.field === 'snow.riskCategory')).toMatchObject({ value: 'III' });
    expect(inputs.find((i) => i.field === 'snow.thermalCondition')).toMatchObject({
      value: 'heated-unvented',
      flag: 'default',
    });
    expect(inputs.find((i) => i.field === 'snow.thermalCt')).toMatchObject({ value: 1, flag: 'default' });
  });

  it('shows the thermal condition and the C_t it gave, default a vented attic (ASCE 7-22: 1.2)', () => {
    const result = checkMember(
      memberCheckInputSchema.parse({
        kind: 'header',
        edition: 'ASCE 7-22',
        clearSpanFt: 6,
        roofPitchIn12: 6,
        snow: { groundSnowPsf: 30 },
        sources: [{ kind: 'roof', tributaryFt: 14, deadPsf: 15, roofLivePsf: 20 }],
        materialId: 'sawn-douglas-fir-larch-no2',
        sizeId: '2-ply-2x10',
      }),
    );
    // ASCE 7-22 Table 7.3-2, ventilated roof: C_t 1.2 (secondary sources in REFERENCES.md; confirm).
    expect(result.snow?.thermalCondition).toBe('vented-attic-insulated-ceiling');
    expect(result.snow?.thermalCtGiven).toBe(false);
    expectApprox(result.snow?.thermalCt ?? NaN, 1.2, { abs: 1e-12 });
    expectApprox(result.snow?.factors.find((f) => f.symbol === 'C_t')?.value ?? NaN, 1.2, { abs: 1e-12 });
    expect(result.inputs.find((i) => i.field === 'snow.thermalCondition')?.flag).toBe('default');
  });

  it('has no snow block when the member has no snow inputs', () => {
    const result = checkMember(
      memberCheckInputSchema.parse({
        kind: 'header',
        edition: 'ASCE 7-16',
        clearSpanFt: 6,
        sources: [{ kind: 'floor', tributaryFt: 6, deadPsf: 10, livePsf: 40 }],
        materialId: 'sawn-douglas-fir-larch-no2',
        sizeId: '2-ply-2x10',
      }),
    );
    expect(result.snow).toBeUndefined();
    expect(result.inputs.some((i) => i.field.startsWith('snow.'))).toBe(false);
  });
});
