import type { LoadStandard } from '@/shared/schemas/jobs';

/**
 * Flat roof snow load. ASCE 7-16: p_f = 0.7·C_e·C_t·I_s·p_g (p_g a 50-year value). ASCE 7-22:
 * p_f = 0.7·C_e·C_t·p_g (p_g strength-level and risk-targeted, so no I_s; the ASD combinations carry 0.7S).
 *
 * @param edition the job's load standard
 * @param groundSnowPsf p_g, psf
 * @param exposureCe C_e; thermalCt C_t; importanceIs I_s (used by ASCE 7-16 only)
 * @returns p_f, psf
 * @example flatRoofSnowPsf('ASCE 7-16', 30, 1, 1, 1.1) // 23.1
 * Reference: ASCE 7-16 eq. 7.3-1; ASCE 7-22 eq. 7.3-1 (STRUCTURE magazine, "ASCE 7-22 Flat Roof Snow Load
 * versus Minimum Snow Load").
 */
export function flatRoofSnowPsf(
  edition: LoadStandard,
  groundSnowPsf: number,
  exposureCe: number,
  thermalCt: number,
  importanceIs: number,
): number {
  const importance = edition === 'ASCE 7-16' ? importanceIs : 1;
  return 0.7 * exposureCe * thermalCt * importance * groundSnowPsf;
}
