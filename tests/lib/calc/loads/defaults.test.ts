import { describe, expect, it } from 'vitest';
import { LOAD_DEFAULTS } from '@/lib/calc/loads';

describe('LOAD_DEFAULTS spot-checked against the printed sources', () => {
  it('dead loads match HUD Residential Structural Design Guide (2000) Table 3.2', () => {
    // HUD RSDG Table 3.2 (as listed in REFERENCES.md): roof with asphalt shingles 15 psf, floor with wood
    // flooring 12 psf, 2x4 wall 6 psf, interior partition 6 psf.
    expect(LOAD_DEFAULTS.roofDead.psf).toBe(15);
    expect(LOAD_DEFAULTS.floorDead.psf).toBe(12);
    expect(LOAD_DEFAULTS.wallDead.psf).toBe(6);
    expect(LOAD_DEFAULTS.partitionDead.psf).toBe(6);
  });

  it('live loads match ASCE 7 Table 4.3-1 and IRC R301.5', () => {
    // ASCE 7 Table 4.3-1 (REFERENCES.md): dwellings 40 psf general, 30 sleeping, attics 10/20, ordinary roofs 20.
    expect(LOAD_DEFAULTS.floorLive.psf).toBe(40);
    expect(LOAD_DEFAULTS.sleepingLive.psf).toBe(30);
    expect(LOAD_DEFAULTS.atticLiveNoStorage.psf).toBe(10);
    expect(LOAD_DEFAULTS.atticLiveLimitedStorage.psf).toBe(20);
    expect(LOAD_DEFAULTS.roofLive.psf).toBe(20);
  });

  it('names a source for every default', () => {
    for (const value of Object.values(LOAD_DEFAULTS)) expect(value.source).toMatch(/HUD RSDG|ASCE 7/);
  });
});
