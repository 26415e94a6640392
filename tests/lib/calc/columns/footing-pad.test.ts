import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { PRESUMPTIVE_SOIL_BEARING_PSF, sizeFootingPad } from '@/lib/calc/columns';

describe('footing pad under a post', () => {
  it('defaults to the IRC R401.4.1 presumptive 1,500 psf', () => {
    expect(PRESUMPTIVE_SOIL_BEARING_PSF).toBe(1500); // IRC 2021 R401.4.1 (REFERENCES.md)
  });

  // Hand arithmetic: 6,000 lb, 12 in pad at 150 pcf → pad 150 psf, net 1,350 psf, area 4.444 ft², side
  // √(4.444 × 144) = 25.30 in → 26 in; 26² / 144 = 4.694 ft², pad weight 704.2 lb, pressure 1,428 psf.
  it('sizes the pad with its own weight and rounds the side up to 2 in', () => {
    const pad = sizeFootingPad({ loadLb: 6000, padThicknessIn: 12 });
    expectApprox(pad.netBearingPsf, 1350, { rel: 1e-12 });
    expectApprox(pad.requiredAreaFt2, 4.4444, { abs: 0.0001 });
    expect(pad.sideIn).toBe(26);
    expectApprox(pad.padWeightLb, 704.2, { abs: 0.1 });
    expectApprox(pad.bearingPressurePsf, 1428.1, { abs: 0.1 });
    expect(pad.bearingPressurePsf).toBeLessThanOrEqual(1500);
    expect(pad.notes[0]).toContain('A slab is not a footing');
  });

  it('keeps an exact even side: 5,400 lb on 1,350 psf net is 4 ft², a 24 in pad', () => {
    expect(sizeFootingPad({ loadLb: 5400, padThicknessIn: 12 }).sideIn).toBe(24);
  });

  it('uses an edited soil bearing and warns under 6 in thick (IRC R403.1.1, from memory)', () => {
    const pad = sizeFootingPad({ loadLb: 6000, padThicknessIn: 4, soilBearingPsf: 2000 });
    expectApprox(pad.netBearingPsf, 2000 - 50, { rel: 1e-12 });
    expect(pad.notes.some((n) => n.includes('R403.1.1'))).toBe(true);
  });

  it('rejects a pad whose own weight uses up the bearing', () => {
    expect(() => sizeFootingPad({ loadLb: 1000, padThicknessIn: 24, soilBearingPsf: 250 })).toThrow(
      expect.objectContaining({ field: 'padThicknessIn' }),
    );
  });
});
