import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { dressedLumberRowSchema } from '@/shared/schemas/calc/materials';
import { ASSUMED_SAWN_DENSITY_PCF, dressedLumber } from '@/tables/sections/dressed-lumber';

function section(nominal: string) {
  const found = dressedLumber.find((r) => r.nominal === nominal);
  if (!found) throw new Error(`missing ${nominal}`);
  return found;
}

describe('NDS Supplement 2018 Table 1B section properties', () => {
  it('every row passes the row schema', () => {
    for (const r of dressedLumber) expect(dressedLumberRowSchema.safeParse(r).success, r.nominal).toBe(true);
  });

  it('printed A, S, I and weight agree with b·d, b·d²/6, b·d³/12 and A/144 × 35 pcf to their rounding', () => {
    for (const r of dressedLumber) {
      const { bIn: b, dIn: d } = r;
      expectApprox(r.areaIn2, b * d, { rel: 0.001 });
      expectApprox(r.sxIn3, (b * d * d) / 6, { rel: 0.001 });
      expectApprox(r.ixIn4, (b * d * d * d) / 12, { rel: 0.001 });
      expectApprox(r.weightPlf, ((b * d) / 144) * ASSUMED_SAWN_DENSITY_PCF, { rel: 0.001 });
    }
  });

  // NDS Supplement 2018 Table 1B: 2x10 is 1-1/2 × 9-1/4 in, A 13.88 in², S_x 21.39 in³, I_x 98.93 in⁴;
  // 2x12 is 1-1/2 × 11-1/4, A 16.88, S_x 31.64, I_x 178.0; 4x16 is 3-1/2 × 15-1/4 (AWC E1.2a member).
  it.each([
    ['2x10', 1.5, 9.25, 13.88, 21.39, 98.93],
    ['2x12', 1.5, 11.25, 16.88, 31.64, 178.0],
    ['4x4', 3.5, 3.5, 12.25, 7.146, 12.51],
    ['4x16', 3.5, 15.25, 53.38, 135.7, 1034],
    ['6x6', 5.5, 5.5, 30.25, 27.73, 76.26],
  ] as const)('%s: b %f, d %f, A %f, S %f, I %f', (nominal, b, d, area, sx, ix) => {
    const r = section(nominal);
    expect([r.bIn, r.dIn]).toEqual([b, d]);
    expectApprox(r.areaIn2, area, { abs: 0.005 });
    expectApprox(r.sxIn3, sx, { abs: 0.05 });
    expectApprox(r.ixIn4, ix, { abs: 0.5 });
  });

  it('dressed sizes follow REFERENCES.md: 1.5, 3.5, 5.5, 7.25, 9.25, 11.25 in; timbers nominal − 1/2 in', () => {
    expect(dressedLumber.filter((r) => r.nominalThicknessIn === 2).map((r) => r.dIn)).toEqual([
      3.5, 5.5, 7.25, 9.25, 11.25,
    ]);
    for (const r of dressedLumber.filter((t) => t.nominalThicknessIn >= 5)) {
      expect([r.bIn, r.dIn]).toEqual([r.nominalThicknessIn - 0.5, r.nominalWidthIn - 0.5]);
    }
  });
});
