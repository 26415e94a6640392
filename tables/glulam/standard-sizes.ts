/**
 * Standard glulam widths and depths (finished sizes).
 *
 * Source: common practice, as stocked and as laid up from standard laminations: western species in
 * 1-1/2 in laminations, Southern Pine in 1-3/8 in laminations (the lamination thicknesses the glulam
 * industry uses for these species groups; AITC / APA practice, from memory). Framing widths 3-1/2 in and
 * 5-1/2 in match 2x4 and 2x6 walls. Units: in. Weight at an assumed 35 lb/ft³ (common practice for
 * Douglas Fir and Southern Pine glulam at service moisture).
 */
import type { GlulamSpeciesGroup } from './stress-classes';

export const ASSUMED_GLULAM_DENSITY_PCF = 35;

export interface GlulamSizeSet {
  speciesGroup: GlulamSpeciesGroup;
  laminationIn: number;
  widthsIn: readonly number[];
  /** Depths, each a whole number of laminations. */
  depthsIn: readonly number[];
}

export const glulamSizeSets = [
  {
    speciesGroup: 'western',
    laminationIn: 1.5,
    widthsIn: [3.125, 3.5, 5.125, 5.5, 6.75],
    depthsIn: [6, 7.5, 9, 10.5, 12, 13.5, 15, 16.5, 18, 19.5, 21, 22.5, 24],
  },
  {
    speciesGroup: 'southern-pine',
    laminationIn: 1.375,
    widthsIn: [3, 3.5, 5, 5.5, 6.75],
    depthsIn: [5.5, 6.875, 8.25, 9.625, 11, 12.375, 13.75, 15.125, 16.5, 17.875, 19.25, 20.625, 22, 23.375],
  },
] as const satisfies readonly GlulamSizeSet[];
