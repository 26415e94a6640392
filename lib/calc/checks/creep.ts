/**
 * Creep factor K_cr for long-term deflection: 1.5 for seasoned lumber, glulam and structural composite lumber
 * in dry service; 2.0 in wet service (or for unseasoned lumber). Lumber in an existing house is seasoned.
 *
 * @param wetService wet service conditions
 * @returns K_cr (dimensionless)
 * @example creepFactor(false); // 1.5
 * Reference: NDS 2018 §3.5.2, equation 3.5-1: Δ_T = K_cr·Δ_LT + Δ_ST.
 */
export function creepFactor(wetService: boolean): number {
  return wetService ? 2.0 : 1.5;
}
