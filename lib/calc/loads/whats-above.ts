import type { LoadSourceInput } from '@/shared/schemas/calc/loads';
import { LOAD_DEFAULTS } from './defaults';

/** Roof coverings a contractor can name, with their weight in psf of roof surface. */
export const ROOF_COVERINGS = Object.freeze({
  asphalt: {
    label: 'Asphalt shingles',
    psf: 2,
    source: 'ASCE 7-16 Table C3.1-1a: asphalt shingles 2 psf (from memory; confirm)',
  },
  'wood-shingle': {
    label: 'Wood shingles or shakes',
    psf: 3,
    source: 'ASCE 7-16 Table C3.1-1a: wood shingles 3 psf (from memory; confirm)',
  },
  metal: {
    label: 'Metal roofing',
    psf: 2,
    source: 'Light-gauge metal roofing about 1–2 psf (from memory; confirm with the product)',
  },
  slate: {
    label: 'Slate (1/4 in)',
    psf: 10,
    source: 'ASCE 7-16 Table C3.1-1a: slate 1/4 in 10 psf (from memory; confirm)',
  },
  'clay-tile': {
    label: 'Clay tile',
    psf: 12,
    source: 'ASCE 7-16 Table C3.1-1a: clay tile 9–14 psf, 12 used (from memory; confirm)',
  },
  'concrete-tile': {
    label: 'Concrete tile',
    psf: 10,
    source: 'Concrete roof tile about 9–11 psf (from memory; confirm with the product)',
  },
} as const);
export type RoofCovering = keyof typeof ROOF_COVERINGS;

/** Each extra layer of asphalt shingles left under the top one, psf (same weight as one layer). */
const EXTRA_LAYER_PSF = ROOF_COVERINGS.asphalt.psf;
/** Solar panels with racking, psf (from memory: about 3–4 psf; confirm with the installer). */
export const SOLAR_PSF = 4;
/** Ceiling framing, insulation and 1/2 in drywall, psf (common practice). */
export const DRYWALL_CEILING_PSF = 10;
/** The same with plaster on wood lath instead of drywall, psf (common practice: plaster and lath weigh about
 * 8–10 psf against drywall's 2–3). */
export const PLASTER_CEILING_PSF = 16;
/** Floor framing, subfloor and thin-set tile on backer, psf (from memory: ASCE 7-16 Table C3.1-1a; confirm). */
export const TILE_FLOOR_PSF = 20;
/** 2x4 wall with plaster on lath both sides, psf of wall face (from memory: about 16–20 psf; confirm). */
export const PLASTER_WALL_PSF = 16;
/** Typical weights of equipment set in an attic, lb (from memory; use the nameplate weight where known). */
export const ATTIC_EQUIPMENT = Object.freeze({
  'air-handler': { label: 'Air handler or furnace', lb: 150 },
  'water-heater': { label: 'Water heater, 50 gal, full', lb: 550 },
} as const);
export type AtticEquipment = keyof typeof ATTIC_EQUIPMENT;

/** Houses older than this year often carry plaster ceilings and walls (common practice). */
export const PLASTER_BEFORE_YEAR = 1950;
/** Roofs of houses older than this often carry a second layer of shingles (common practice). */
export const SECOND_LAYER_BEFORE_YEAR = 1980;

/** Spans of the joists or rafters landing on the member from each side, ft (horizontal). */
export type SpansEachSide = { leftFt: number; rightFt: number };

/** What sits over the wall, as a contractor sees it from the attic and the floor above. */
export interface WhatsAbove {
  roof?: {
    covering: RoofCovering;
    extraShingleLayers: number;
    solar: boolean;
    /** Rafter spans (horizontal) each side that bear on this line; a side with none is 0. */
    spans: SpansEachSide;
    /** Eave overhang beyond an exterior wall, ft (0 for an interior line). */
    overhangFt: number;
  };
  ceiling?: {
    finish: 'drywall' | 'plaster';
    storage: boolean;
    spans: SpansEachSide;
    continuousOver: boolean;
  };
  floor?: {
    use: 'living' | 'sleeping';
    finish: 'wood' | 'tile';
    spans: SpansEachSide;
    continuousOver: boolean;
  };
  wallAbove?: { heightFt: number; plaster: boolean };
  equipment?: { kind: AtticEquipment; atFt: number }[];
}

export interface AboveSources {
  sources: LoadSourceInput[];
  /** One line per source: what each value is and where it comes from. */
  notes: string[];
}

const half = (spans: SpansEachSide) => spans.leftFt / 2 + spans.rightFt / 2;

/**
 * Load sources built from what sits over the wall: tributary widths from the spans each side (half of each
 * span lands here), dead loads from the named assemblies, live loads from the code minimums. Every value is
 * flagged "default" and its source is in `notes`; the person can edit any of them afterwards.
 *
 * @param above roof, ceiling, floor, wall above and attic equipment (ft, counts)
 * @returns sources for the member input and their notes
 * @example whatsAboveSources({ floor: { use: 'living', finish: 'wood', spans: { leftFt: 12, rightFt: 14 }, continuousOver: false } }).sources[0]
 * // { kind: 'floor', tributaryFt: 13, deadPsf: 12, livePsf: 40, ... }
 * Reference: HUD Residential Structural Design Guide (2000) Table 3.2; ASCE 7-16 Table 4.3-1 and Table
 * C3.1-1a; IRC 2021 R301.5; common practice as marked.
 */
export function whatsAboveSources(above: WhatsAbove): AboveSources {
  const sources: LoadSourceInput[] = [];
  const notes: string[] = [];
  if (above.roof) {
    const { covering, extraShingleLayers, solar, spans, overhangFt } = above.roof;
    const cover = ROOF_COVERINGS[covering];
    const deadPsf =
      LOAD_DEFAULTS.roofDead.psf -
      ROOF_COVERINGS.asphalt.psf +
      cover.psf +
      extraShingleLayers * EXTRA_LAYER_PSF +
      (solar ? SOLAR_PSF : 0);
    sources.push({
      kind: 'roof',
      label: `Roof, ${cover.label.toLowerCase()}${solar ? ' and solar' : ''}`,
      flag: 'default',
      tributaryFt: half(spans) + overhangFt,
      deadPsf,
      roofLivePsf: LOAD_DEFAULTS.roofLive.psf,
    });
    notes.push(
      `Roof: ${LOAD_DEFAULTS.roofDead.source}, with ${cover.source}` +
        (extraShingleLayers
          ? `; ${extraShingleLayers} extra shingle layer(s) at ${EXTRA_LAYER_PSF} psf`
          : '') +
        (solar ? `; solar ${SOLAR_PSF} psf (from memory; confirm)` : '') +
        `; ${LOAD_DEFAULTS.roofLive.source}`,
    );
  }
  if (above.ceiling) {
    const { finish, storage, spans, continuousOver } = above.ceiling;
    const live = storage ? LOAD_DEFAULTS.atticLiveLimitedStorage : LOAD_DEFAULTS.atticLiveNoStorage;
    sources.push({
      kind: 'ceiling',
      label: finish === 'plaster' ? 'Ceiling, plaster and lath' : 'Ceiling, drywall',
      flag: 'default',
      tributaryFt: half(spans),
      deadPsf: finish === 'plaster' ? PLASTER_CEILING_PSF : DRYWALL_CEILING_PSF,
      livePsf: live.psf,
      continuousOver,
    });
    notes.push(
      `Ceiling: ${finish === 'plaster' ? `${PLASTER_CEILING_PSF} psf with plaster and lath` : `${DRYWALL_CEILING_PSF} psf with drywall`} (common practice); ${live.source}`,
    );
  }
  if (above.floor) {
    const { use, finish, spans, continuousOver } = above.floor;
    const live = use === 'sleeping' ? LOAD_DEFAULTS.sleepingLive : LOAD_DEFAULTS.floorLive;
    sources.push({
      kind: 'floor',
      label: `Floor above, ${use === 'sleeping' ? 'bedrooms' : 'living areas'}`,
      flag: 'default',
      tributaryFt: half(spans),
      deadPsf: finish === 'tile' ? TILE_FLOOR_PSF : LOAD_DEFAULTS.floorDead.psf,
      livePsf: live.psf,
      continuousOver,
    });
    notes.push(
      `Floor: ${finish === 'tile' ? `${TILE_FLOOR_PSF} psf with tile (from memory; confirm)` : LOAD_DEFAULTS.floorDead.source}; ${live.source}`,
    );
  }
  if (above.wallAbove) {
    const { heightFt, plaster } = above.wallAbove;
    sources.push({
      kind: 'wall-above',
      label: plaster ? 'Wall above, plastered' : 'Wall above',
      flag: 'default',
      heightFt,
      deadPsf: plaster ? PLASTER_WALL_PSF : LOAD_DEFAULTS.wallDead.psf,
    });
    notes.push(
      `Wall above: ${plaster ? `${PLASTER_WALL_PSF} psf plastered (from memory; confirm)` : LOAD_DEFAULTS.wallDead.source}`,
    );
  }
  for (const item of above.equipment ?? []) {
    const equipment = ATTIC_EQUIPMENT[item.kind];
    sources.push({
      kind: 'point',
      label: equipment.label,
      flag: 'default',
      pointKind: 'heavy-fixture',
      atFt: item.atFt,
      deadLb: equipment.lb,
    });
    notes.push(`${equipment.label}: ${equipment.lb} lb (from memory; use the nameplate weight)`);
  }
  return { sources, notes };
}

/**
 * What a house's age suggests before anyone looks: plaster ceilings and walls before 1950, a second layer of
 * shingles before 1980 (common practice; each is only a starting point and is flagged "default").
 * @example ageDefaults(1938) // { plaster: true, extraShingleLayers: 1 }
 */
export function ageDefaults(yearBuilt: number | null): { plaster: boolean; extraShingleLayers: number } {
  if (yearBuilt === null) return { plaster: false, extraShingleLayers: 0 };
  return {
    plaster: yearBuilt < PLASTER_BEFORE_YEAR,
    extraShingleLayers: yearBuilt < SECOND_LAYER_BEFORE_YEAR ? 1 : 0,
  };
}
