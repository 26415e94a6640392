import type { FactorUse } from '@/lib/calc/types';
import { roofAngleDeg } from '@/lib/calc/loads/roof-slope';
import { flatRoofSnowPsf } from '@/lib/calc/snow/flat-roof';
import { LOW_SLOPE_LIMIT_DEG, minimumSnowPsf } from '@/lib/calc/snow/minimum';
import { slipperyCurve } from '@/lib/calc/snow/slippery-curve';
import { roofSlopeFactor } from '@/lib/calc/snow/slope-factor';
import { thermalFactor } from '@/lib/calc/snow/thermal-factor';
import type { RoofThermalCondition, SnowInput } from '@/shared/schemas/calc/loads';

/** Snow importance factor I_s by risk category (ASCE 7-16 Table 1.5-2: I 0.8, II 1.0, III 1.1, IV 1.2). */
const IMPORTANCE_BY_RISK: Record<SnowInput['riskCategory'], number> = { I: 0.8, II: 1.0, III: 1.1, IV: 1.2 };

/**
 * Unbalanced snow applies to hip and gable roofs from 1/2 on 12 up to 7 on 12: §7.6.1 waives it only below
 * 1/2 on 12 (2.38°) and above 7 on 12 (from memory).
 */
const UNBALANCED_MIN_PITCH_IN_12 = 0.5;
const UNBALANCED_MAX_PITCH_IN_12 = 7;

/** Result of roofSnowLoad: loads in psf of horizontal projection. */
export interface RoofSnow {
  /** Flat roof snow p_f, psf. */
  pfPsf: number;
  /** Sloped roof (balanced) snow p_s = C_s·p_f, psf. */
  psPsf: number;
  /** Minimum snow for low-slope roofs p_m, psf (0 when the roof is 15° or steeper). */
  pmPsf: number;
  /** Which value is the design roof snow: the sloped-roof load or the low-slope minimum. */
  governing: 'sloped' | 'minimum';
  /** The design roof snow, the larger of p_s and p_m, psf: the roofSnowPsf of buildMemberLoads. */
  designPsf: number;
  slopeDeg: number;
  /** The roof's thermal condition used (given or the default) and whether C_t was given outright. */
  thermalCondition: RoofThermalCondition;
  thermalCtGiven: boolean;
  /** C_t used, dimensionless. */
  thermalCt: number;
  /** True when the slippery-surface C_s curve was used. */
  slipperyCurveUsed: boolean;
  factors: FactorUse[];
  warnings: string[];
  notes: string[];
  reference: string;
}

/**
 * Roof snow load for one roof and the job's edition: p_f from ground snow with C_e, C_t (and I_s under
 * ASCE 7-16), p_s = C_s·p_f, the low-slope minimum p_m, the governing design value, the factors used, and
 * warnings for unbalanced snow on ridge lines and drift where the roof steps down (neither is included).
 * Under ASCE 7-22 the result is strength-level: the ASD combinations apply 0.7S to it.
 *
 * Defaults (editable): C_e 1.0 (partially exposed); C_t from the roof's thermal condition, by default a
 * ventilated attic over an insulated ceiling (ASCE 7-16 1.1, ASCE 7-22 1.2; see thermalFactor), or as given;
 * I_s from the risk category (II → 1.0), risk category II (dwellings). The C_s curve follows C_t; the
 * slippery-surface curve needs a cold roof, or a warm roof insulated as §7.4.1 asks (see slipperyCurve).
 *
 * @param input parsed snowInputSchema: ground snow psf, roof pitch in 12, factors
 * @returns loads in psf on horizontal projection, factors, warnings, notes, reference
 * @example
 * roofSnowLoad(snowInputSchema.parse({ edition: 'ASCE 7-16', groundSnowPsf: 30, roofPitchIn12: 6 })).designPsf
 * // 23.1 (p_f = 0.7 × 1.1 × 30, vented attic over an insulated ceiling; C_s = 1.0 at 26.6°; no p_m at 15° or steeper)
 * Reference: ASCE 7-16 §§7.3–7.4, 7.6, 7.7; ASCE 7-22 §§7.3–7.4, 7.6, 7.7.
 */
export function roofSnowLoad(input: SnowInput): RoofSnow {
  const edition = input.edition;
  const slopeDeg = roofAngleDeg(input.roofPitchIn12);
  const importanceIs = input.importanceIs ?? IMPORTANCE_BY_RISK[input.riskCategory];
  const pg = input.groundSnowPsf;
  const thermal = thermalFactor(edition, input.thermalCondition, input.thermalCt);
  const slippery = slipperyCurve({
    slippery: input.slipperyUnobstructed,
    ct: thermal.ct,
    ventilated: thermal.ventilated,
    insulationR: input.roofInsulationR,
  });
  const pfPsf = flatRoofSnowPsf(edition, pg, input.exposureCe, thermal.ct, importanceIs);
  const slopeCs = roofSlopeFactor(slopeDeg, thermal.ct, slippery.used);
  const psPsf = slopeCs * pfPsf;
  const pmPsf = minimumSnowPsf(edition, pg, slopeDeg, importanceIs, input.riskCategory);
  const governing = pmPsf > psPsf ? 'minimum' : 'sloped';

  const factors: FactorUse[] = [
    { symbol: 'C_e', value: input.exposureCe, note: 'exposure factor, ASCE 7 Table 7.3-1' },
    { symbol: 'C_t', value: thermal.ct, note: thermal.note },
    edition === 'ASCE 7-16'
      ? {
          symbol: 'I_s',
          value: importanceIs,
          note: `snow importance factor, risk category ${input.riskCategory}`,
        }
      : {
          symbol: 'I_s',
          value: 1,
          note: 'not used in ASCE 7-22: the risk category is in the ground snow map',
        },
    {
      symbol: 'C_s',
      value: slopeCs,
      note: `slope factor at ${slopeDeg.toFixed(1)}°, ${thermal.ct > 1 ? `cold roof (C_t ${thermal.ct})` : 'warm roof'}, ${slippery.used ? 'unobstructed slippery' : 'other'} surface curve, ${edition} Fig. 7.4-1`,
    },
  ];

  const warnings: string[] = [];
  const notes: string[] = [];
  if (slippery.note) notes.push(slippery.note);
  if (pg > 0) {
    const ridged = input.roofType === 'gable' || input.roofType === 'hip';
    if (
      ridged &&
      input.roofPitchIn12 >= UNBALANCED_MIN_PITCH_IN_12 &&
      input.roofPitchIn12 <= UNBALANCED_MAX_PITCH_IN_12
    ) {
      warnings.push(
        `Unbalanced snow (${edition} §7.6.1): on a ${input.roofType} roof between 1/2 and 7 in 12, wind piles snow ` +
          'on one side of the ridge line. The balanced load used here does not include it: have an engineer check ' +
          'members that carry one side of the ridge.',
      );
    }
    if (input.roofStepsDown) {
      warnings.push(
        `Drift (${edition} §7.7): snow drifts onto a lower roof next to the step. The drift surcharge is not ` +
          'included: have an engineer check members near the step.',
      );
    }
    if (slopeDeg < LOW_SLOPE_LIMIT_DEG) {
      notes.push(
        `Low-slope roof (under ${LOW_SLOPE_LIMIT_DEG}°): the minimum snow load p_m is a separate load case; ` +
          `rain-on-snow (${edition} §7.10) may add to nearly flat roofs.`,
      );
    }
    if (edition === 'ASCE 7-22') {
      notes.push(
        'ASCE 7-22 ground snow is strength-level (risk-targeted map); a ground snow value from an older map ' +
          'is not interchangeable with it.',
      );
    }
  }

  return {
    pfPsf,
    psPsf,
    pmPsf,
    governing,
    designPsf: Math.max(psPsf, pmPsf),
    slopeDeg,
    thermalCondition: thermal.condition,
    thermalCtGiven: thermal.given,
    thermalCt: thermal.ct,
    slipperyCurveUsed: slippery.used,
    factors,
    warnings,
    notes,
    reference:
      edition === 'ASCE 7-16'
        ? 'ASCE 7-16 eq. 7.3-1 (p_f = 0.7·C_e·C_t·I_s·p_g), §7.4 (p_s = C_s·p_f), §7.3.4 (p_m)'
        : 'ASCE 7-22 eq. 7.3-1 (p_f = 0.7·C_e·C_t·p_g), §7.4 (p_s = C_s·p_f), §7.3.3 (p_m); ASD uses 0.7S',
  };
}
