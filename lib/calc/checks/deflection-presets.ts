import type { DeflectionUse } from '@/shared/schemas/calc/member';

/**
 * Deflection limits by use, as span divided by a number (L/360 → 360). `liveRatio` applies to the variable load
 * (occupancy live, roof live or snow); `totalRatio` to dead + variable with creep on the sustained part.
 */
export interface DeflectionPreset {
  label: string;
  liveRatio: number;
  totalRatio: number;
  /** Where the numbers come from, for the result's sources list. */
  source: string;
}

/**
 * The live-load limits are those of IRC Table R301.7 (floors L/360; ceilings with plaster L/360, with gypsum
 * L/240; roofs without a ceiling L/180). IRC R301.7 gives no total-load limit; the total limits here are those
 * IBC Table 1604.3 pairs with the same live limits (L/240 with L/360, L/180 with L/240, L/120 with L/180 —
 * from memory, confirm in the IBC). Floors under ceramic or porcelain tile: the TCNA Handbook's minimum is
 * L/360; the preset's L/480 live is stricter (common practice), its L/360 total common practice. Floors
 * under natural stone: L/720 live (Natural Stone Institute guideline); its L/480 total is common practice.
 *
 * @example
 * DEFLECTION_PRESETS.floor; // { label: 'Floor', liveRatio: 360, totalRatio: 240, ... }
 *
 * Reference: IRC 2021 Table R301.7; IBC 2018 Table 1604.3 (from memory); TCNA Handbook (tile); Natural Stone
 * Institute (stone).
 */
export const DEFLECTION_PRESETS: Readonly<Record<DeflectionUse, DeflectionPreset>> = {
  floor: {
    label: 'Floor',
    liveRatio: 360,
    totalRatio: 240,
    source: 'IRC 2021 Table R301.7 (L/360 live); IBC 2018 Table 1604.3 (L/240 total, from memory)',
  },
  'floor-tile': {
    label: 'Floor under ceramic or porcelain tile',
    liveRatio: 480,
    totalRatio: 360,
    source:
      'TCNA Handbook minimum L/360 for ceramic and porcelain tile; the preset takes the stricter L/480 live and L/360 total (common practice)',
  },
  'floor-stone': {
    label: 'Floor under natural stone',
    liveRatio: 720,
    totalRatio: 480,
    source: 'Natural Stone Institute guideline (L/720 live); L/480 total (common practice)',
  },
  'plaster-ceiling': {
    label: 'Under a plaster ceiling',
    liveRatio: 360,
    totalRatio: 240,
    source:
      'IRC 2021 Table R301.7 (L/360 live, plaster ceiling); IBC 2018 Table 1604.3 (L/240 total, from memory)',
  },
  'gypsum-ceiling': {
    label: 'Under a gypsum ceiling',
    liveRatio: 240,
    totalRatio: 180,
    source:
      'IRC 2021 Table R301.7 (L/240 live, gypsum ceiling); IBC 2018 Table 1604.3 (L/180 total, from memory)',
  },
  roof: {
    label: 'Roof with a ceiling',
    liveRatio: 240,
    totalRatio: 180,
    source:
      'IRC 2021 Table R301.7 (L/240 live, all other members); IBC 2018 Table 1604.3 (L/180 total, from memory)',
  },
  'roof-no-ceiling': {
    label: 'Roof, no ceiling',
    liveRatio: 180,
    totalRatio: 120,
    source:
      'IRC 2021 Table R301.7 (L/180 live, rafters sloped over 3:12 with no finished ceiling attached; flatter roofs take L/240); IBC 2018 Table 1604.3 (L/120 total, from memory)',
  },
};
