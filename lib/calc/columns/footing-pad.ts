import { CalcInputError } from '@/lib/calc/types';
import { requirePositive } from './input-guards';

/** Presumptive load-bearing value where the soil is not known (IRC R401.4.1, Table R401.4.1), psf. */
export const PRESUMPTIVE_SOIL_BEARING_PSF = 1500;
/** Normal-weight concrete, 150 lb/ft³ (common practice). */
export const NORMAL_WEIGHT_CONCRETE_PCF = 150;
/** IRC R403.1.1: footings at least 6 in thick (from memory). */
const MIN_FOOTING_THICKNESS_IN = 6;
const SIDE_STEP_IN = 2;
const IN_PER_FT = 12;
const IN2_PER_FT2 = 144;
/** Guards the round-up against binary noise (e.g. 24.000000000004 in must stay 24 in). */
const ROUNDING_SLACK_IN = 1e-9;

export interface FootingPadInput {
  /** Post load on the pad (lb). */
  loadLb: number;
  /** Allowable soil bearing (psf); default 1,500 psf (IRC R401.4.1 presumptive value), editable. */
  soilBearingPsf?: number;
  /** Pad thickness (in). */
  padThicknessIn: number;
  /** Concrete unit weight (pcf); default 150. */
  concreteDensityPcf?: number;
}

export interface FootingPad {
  soilBearingPsf: number;
  /** Bearing left for the post load after the pad's own weight: q − γ t (psf). */
  netBearingPsf: number;
  /** P / q_net (ft²). */
  requiredAreaFt2: number;
  /** Side of a square pad, rounded up to the next 2 in (in). */
  sideIn: number;
  providedAreaFt2: number;
  padWeightLb: number;
  /** (P + pad weight) / provided area (psf). */
  bearingPressurePsf: number;
  notes: string[];
  sources: string[];
}

/**
 * Sizes a square concrete pad under a post: the soil carries the post load plus the pad's own weight,
 * so the area needed is P / (q − γ·t); the side is rounded up to the next 2 in.
 * @param input see FootingPadInput (loadLb in lb, soilBearingPsf in psf, padThicknessIn in in, pcf)
 * @returns required area (ft²), side (in), pad weight (lb), bearing pressure (psf) and notes
 * @throws CalcInputError for non-positive inputs, or a pad so thick its own weight uses up the bearing
 * @example sizeFootingPad({ loadLb: 6000, padThicknessIn: 12 }).sideIn // 26
 * Reference: IRC 2021 R401.4.1 and Table R401.4.1 (presumptive soil bearing 1,500 psf), R403.1.1.
 */
export function sizeFootingPad(input: FootingPadInput): FootingPad {
  const soilBearingPsf = input.soilBearingPsf ?? PRESUMPTIVE_SOIL_BEARING_PSF;
  const densityPcf = input.concreteDensityPcf ?? NORMAL_WEIGHT_CONCRETE_PCF;
  requirePositive('loadLb', input.loadLb, 'Post load');
  requirePositive('soilBearingPsf', soilBearingPsf, 'Soil bearing');
  requirePositive('padThicknessIn', input.padThicknessIn, 'Pad thickness');
  requirePositive('concreteDensityPcf', densityPcf, 'Concrete density');
  const padPsf = (densityPcf * input.padThicknessIn) / IN_PER_FT;
  const netBearingPsf = soilBearingPsf - padPsf;
  if (netBearingPsf <= 0) {
    throw new CalcInputError(
      'padThicknessIn',
      'The pad’s own weight uses up the soil bearing: check the inputs',
    );
  }
  const requiredAreaFt2 = input.loadLb / netBearingPsf;
  const exactSideIn = Math.sqrt(requiredAreaFt2 * IN2_PER_FT2);
  const sideIn = Math.ceil(exactSideIn / SIDE_STEP_IN - ROUNDING_SLACK_IN) * SIDE_STEP_IN;
  const providedAreaFt2 = (sideIn * sideIn) / IN2_PER_FT2;
  const padWeightLb = providedAreaFt2 * padPsf;

  const notes = [
    'A slab is not a footing: cut out the slab and pour a pad, or thicken it, under the post.',
    `Soil bearing ${soilBearingPsf} psf${input.soilBearingPsf === undefined ? ' is the IRC presumptive value for unknown soil' : ''}; the building official may require more.`,
    'Have the footing inspected before the pour.',
  ];
  if (input.padThicknessIn < MIN_FOOTING_THICKNESS_IN) {
    notes.push('IRC R403.1.1 asks for footings at least 6 in thick.');
  }
  return {
    soilBearingPsf,
    netBearingPsf,
    requiredAreaFt2,
    sideIn,
    providedAreaFt2,
    padWeightLb,
    bearingPressurePsf: (input.loadLb + padWeightLb) / providedAreaFt2,
    notes,
    sources: ['IRC 2021 R401.4.1 presumptive load-bearing values', 'IRC 2021 R403.1.1 footing thickness'],
  };
}
