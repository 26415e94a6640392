import type { LoadStandard } from '@/shared/schemas/jobs';
import type { SnowInput } from '@/shared/schemas/calc/loads';

/** Slopes below this (degrees) take the minimum snow load for low-slope roofs. */
export const LOW_SLOPE_LIMIT_DEG = 15;

/**
 * Upper limit p_m,max of the ASCE 7-22 minimum snow load by risk category, psf: II 30, III 35, IV 40 from a
 * secondary source, I 25 by the same 5 psf steps. The higher of two readings (the other, from memory, was
 * 5 psf lower in each category); confirm in ASCE 7-22 §7.3.3.
 */
export const ASCE_7_22_PM_MAX_PSF: Readonly<Record<SnowInput['riskCategory'], number>> = Object.freeze({
  I: 25,
  II: 30,
  III: 35,
  IV: 40,
});

/**
 * Minimum snow load p_m for low-slope roofs (θ < 15°), psf; 0 for steeper roofs. It is a separate uniform
 * load case: the design roof snow is the larger of p_s and p_m.
 * ASCE 7-16 §7.3.4: p_m = I_s·p_g when p_g ≤ 20 psf, else 20·I_s.
 * ASCE 7-22 §7.3.3: p_m = the lesser of p_g and p_m,max for the risk category (caps from a secondary
 * source; confirm).
 *
 * @param edition the job's load standard
 * @param groundSnowPsf p_g, psf
 * @param slopeDeg roof slope θ, degrees
 * @param importanceIs I_s (ASCE 7-16); riskCategory (ASCE 7-22)
 * @returns p_m, psf
 * @example minimumSnowPsf('ASCE 7-16', 30, 10, 1.0, 'II') // 20
 * Reference: ASCE 7-16 §7.3.4; ASCE 7-22 §7.3.3 (caps by risk category from a secondary source; confirm).
 */
export function minimumSnowPsf(
  edition: LoadStandard,
  groundSnowPsf: number,
  slopeDeg: number,
  importanceIs: number,
  riskCategory: SnowInput['riskCategory'],
): number {
  if (slopeDeg >= LOW_SLOPE_LIMIT_DEG) return 0;
  if (edition === 'ASCE 7-16') return importanceIs * Math.min(groundSnowPsf, 20);
  return Math.min(groundSnowPsf, ASCE_7_22_PM_MAX_PSF[riskCategory]);
}
