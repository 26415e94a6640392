import type { LoadStandard } from '@/shared/schemas/jobs';
import type { RoofThermalCondition } from '@/shared/schemas/calc/loads';

/** The thermal condition taken when none is given: a ventilated attic over an insulated ceiling. */
export const DEFAULT_ROOF_THERMAL_CONDITION: RoofThermalCondition = 'vented-attic-insulated-ceiling';

/** One condition's C_t in one edition and where the value comes from. */
interface ThermalRow {
  ct: number;
  source: string;
}

/** What each condition is called in the result. */
export const ROOF_THERMAL_LABELS: Readonly<Record<RoofThermalCondition, string>> = {
  'heated-unvented': 'heated, roof not ventilated',
  'vented-attic-insulated-ceiling': 'ventilated attic over an insulated ceiling (over R-25)',
  'vented-attic-little-insulation': 'ventilated attic over a ceiling with R-25 or less',
  unheated: 'unheated structure',
};

/**
 * C_t by edition and condition. ASCE 7-16 Table 7.3-2: 1.0 for "all structures except as indicated", 1.1 for
 * cold ventilated roofs with R > 25 between the ventilated space and the heated space (REFERENCES.md), 1.2 for
 * unheated structures (from memory). ASCE 7-22 Table 7.3-2 gives ventilated roofs 1.2 (secondary sources,
 * REFERENCES.md; confirm); its unheated value is taken as 1.3 (from memory, the higher reading; confirm).
 */
const THERMAL_FACTORS: Readonly<Record<LoadStandard, Record<RoofThermalCondition, ThermalRow>>> = {
  'ASCE 7-16': {
    'heated-unvented': { ct: 1.0, source: 'ASCE 7-16 Table 7.3-2, all structures except as indicated' },
    'vented-attic-insulated-ceiling': {
      ct: 1.1,
      source: 'ASCE 7-16 Table 7.3-2, cold ventilated roof with R > 25 above the heated space',
    },
    'vented-attic-little-insulation': {
      ct: 1.0,
      source: 'ASCE 7-16 Table 7.3-2, all structures except as indicated (R-25 or less)',
    },
    unheated: { ct: 1.2, source: 'ASCE 7-16 Table 7.3-2, unheated structure (from memory; confirm)' },
  },
  'ASCE 7-22': {
    'heated-unvented': {
      ct: 1.0,
      source: 'ASCE 7-22 Table 7.3-2, unventilated warm roof (from memory; confirm)',
    },
    'vented-attic-insulated-ceiling': {
      ct: 1.2,
      source: 'ASCE 7-22 Table 7.3-2, ventilated roof (secondary source; confirm)',
    },
    'vented-attic-little-insulation': {
      ct: 1.2,
      source: 'ASCE 7-22 Table 7.3-2, ventilated roof (secondary source; confirm)',
    },
    unheated: {
      ct: 1.3,
      source: 'ASCE 7-22 Table 7.3-2, unheated structure (from memory, the higher reading; confirm)',
    },
  },
};

/** The thermal factor used for a roof, and why. */
export interface ThermalFactor {
  condition: RoofThermalCondition;
  /** C_t, dimensionless. */
  ct: number;
  /** True when C_t was given outright (thermalCt) rather than taken from the condition. */
  given: boolean;
  /** True for a ventilated attic (the warm-roof insulation limit for the slippery curve differs). */
  ventilated: boolean;
  note: string;
}

/**
 * C_t for a roof: from its thermal condition in the job's edition (default a ventilated attic over an
 * insulated ceiling), unless a value is given outright.
 *
 * @param edition the job's load standard
 * @param condition the roof's thermal condition; undefined = DEFAULT_ROOF_THERMAL_CONDITION
 * @param givenCt C_t given outright (overrides the condition's value), dimensionless
 * @returns C_t with the condition, whether it was given, and a note naming the source
 * @example thermalFactor('ASCE 7-16', undefined, undefined).ct; // 1.1
 * Reference: ASCE 7-16 Table 7.3-2; ASCE 7-22 Table 7.3-2 (secondary sources for the 1.2; confirm).
 */
export function thermalFactor(
  edition: LoadStandard,
  condition: RoofThermalCondition | undefined,
  givenCt: number | undefined,
): ThermalFactor {
  const used = condition ?? DEFAULT_ROOF_THERMAL_CONDITION;
  const row = THERMAL_FACTORS[edition][used];
  const ventilated = used.startsWith('vented-');
  if (givenCt !== undefined) {
    return {
      condition: used,
      ct: givenCt,
      given: true,
      ventilated,
      note: `thermal factor given (the ${ROOF_THERMAL_LABELS[used]} would take ${row.ct}, ${row.source})`,
    };
  }
  return {
    condition: used,
    ct: row.ct,
    given: false,
    ventilated,
    note: `thermal factor, ${ROOF_THERMAL_LABELS[used]}: ${row.source}`,
  };
}
