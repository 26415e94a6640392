/** A default load with the published source it comes from, for prefilling a load source (flag 'default'). */
export interface LoadDefault {
  psf: number;
  source: string;
}

/**
 * Default area loads offered when the user has not measured or chosen a value. Dead loads are assembly
 * weights; live loads are the code minimums for one- and two-family dwellings.
 *
 * @example LOAD_DEFAULTS.floorLive.psf // 40
 * Reference: HUD Residential Structural Design Guide (2000) Table 3.2; ASCE 7-16 Table 4.3-1; IRC 2021 R301.5.
 */
export const LOAD_DEFAULTS = Object.freeze({
  roofDead: { psf: 15, source: 'HUD RSDG (2000) Table 3.2: light-frame roof with asphalt shingles' },
  floorDead: { psf: 12, source: 'HUD RSDG (2000) Table 3.2: light-frame floor with wood flooring' },
  wallDead: { psf: 6, source: 'HUD RSDG (2000) Table 3.2: light-frame 2x4 wall' },
  partitionDead: { psf: 6, source: 'HUD RSDG (2000) Table 3.2: interior partition' },
  roofLive: { psf: 20, source: 'ASCE 7-16 Table 4.3-1: ordinary flat, pitched and curved roofs; IRC R301.6' },
  floorLive: { psf: 40, source: 'ASCE 7-16 Table 4.3-1 / IRC R301.5: dwelling rooms other than sleeping' },
  sleepingLive: { psf: 30, source: 'ASCE 7-16 Table 4.3-1 / IRC R301.5: sleeping rooms' },
  atticLiveNoStorage: {
    psf: 10,
    source: 'ASCE 7-16 Table 4.3-1 / IRC R301.5: uninhabitable attic without storage',
  },
  atticLiveLimitedStorage: {
    psf: 20,
    source: 'ASCE 7-16 Table 4.3-1 / IRC R301.5: uninhabitable attic with limited storage',
  },
} satisfies Record<string, LoadDefault>);
