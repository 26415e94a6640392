import { describe, expect, it } from 'vitest';
import { ageDefaults, whatsAboveSources, PLASTER_CEILING_PSF } from '@/lib/calc/loads';
import { loadSourceSchema } from '@/shared/schemas/calc/loads';
import { expectApprox } from '@/tests/helpers/approx';

describe('whatsAboveSources', () => {
  it('a floor above takes half of each joist span and the HUD / ASCE 7 dwelling values', () => {
    const { sources, notes } = whatsAboveSources({
      floor: { use: 'living', finish: 'wood', spans: { leftFt: 12, rightFt: 14 }, continuousOver: false },
    });
    const floor = loadSourceSchema.parse(sources[0]);
    expect(floor.kind).toBe('floor');
    if (floor.kind !== 'floor') return;
    expectApprox(floor.tributaryFt, 13, { abs: 1e-12 }); // (12 + 14) / 2, common practice
    expect(floor.deadPsf).toBe(12); // HUD RSDG (2000) Table 3.2, floor with wood flooring
    expect(floor.livePsf).toBe(40); // ASCE 7-16 Table 4.3-1 / IRC R301.5, dwelling rooms
    expect(floor.flag).toBe('default');
    expect(notes[0]).toMatch(/HUD/);
  });

  it('bedrooms above carry 30 psf live (ASCE 7-16 Table 4.3-1 sleeping rooms)', () => {
    const { sources } = whatsAboveSources({
      floor: { use: 'sleeping', finish: 'wood', spans: { leftFt: 10, rightFt: 0 }, continuousOver: true },
    });
    expect(sources[0]).toMatchObject({ livePsf: 30, tributaryFt: 5, continuousOver: true });
  });

  it('a roof swaps the shingle weight for its covering and adds layers, solar and the overhang', () => {
    const base = whatsAboveSources({
      roof: {
        covering: 'asphalt',
        extraShingleLayers: 0,
        solar: false,
        spans: { leftFt: 14, rightFt: 0 },
        overhangFt: 1.5,
      },
    }).sources[0];
    // HUD RSDG (2000) Table 3.2: light-frame roof with asphalt shingles 15 psf.
    expect(base).toMatchObject({ kind: 'roof', deadPsf: 15, roofLivePsf: 20, tributaryFt: 8.5 });
    const slate = whatsAboveSources({
      roof: {
        covering: 'slate',
        extraShingleLayers: 0,
        solar: true,
        spans: { leftFt: 14, rightFt: 0 },
        overhangFt: 0,
      },
    }).sources[0];
    // slate 10 psf for asphalt's 2 (ASCE 7-16 Table C3.1-1a, from memory) and 4 psf of solar (from memory).
    expect(slate).toMatchObject({ deadPsf: 15 - 2 + 10 + 4 });
  });

  it('a plaster ceiling is heavier than drywall, a storage attic carries 20 psf (ASCE 7-16 Table 4.3-1)', () => {
    const { sources } = whatsAboveSources({
      ceiling: {
        finish: 'plaster',
        storage: true,
        spans: { leftFt: 12, rightFt: 12 },
        continuousOver: false,
      },
    });
    expect(sources[0]).toMatchObject({ deadPsf: PLASTER_CEILING_PSF, livePsf: 20, tributaryFt: 12 });
  });

  it('a wall above and attic equipment become a line load and a point load that the schema accepts', () => {
    const { sources } = whatsAboveSources({
      wallAbove: { heightFt: 8, plaster: false },
      equipment: [{ kind: 'water-heater', atFt: 4 }],
    });
    expect(sources.map((s) => loadSourceSchema.parse(s).kind)).toEqual(['wall-above', 'point']);
    expect(sources[0]).toMatchObject({ heightFt: 8, deadPsf: 6 }); // HUD RSDG (2000) Table 3.2, 2x4 wall
  });
});

describe('ageDefaults (common practice)', () => {
  it('suggests plaster before 1950 and a second shingle layer before 1980', () => {
    expect(ageDefaults(1938)).toEqual({ plaster: true, extraShingleLayers: 1 });
    expect(ageDefaults(1965)).toEqual({ plaster: false, extraShingleLayers: 1 });
    expect(ageDefaults(2004)).toEqual({ plaster: false, extraShingleLayers: 0 });
    expect(ageDefaults(null)).toEqual({ plaster: false, extraShingleLayers: 0 });
  });
});
