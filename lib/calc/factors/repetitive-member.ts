import type { MaterialFamily } from '@/lib/calc/materials';

/**
 * Repetitive member factor C_r on F_b, for three or more members at no more than 24 in on centre joined by
 * a load-distributing element (sheathing, subfloor): 1.15 for sawn dimension lumber 2 in to 4 in thick,
 * 1.04 for structural composite lumber (LVL), none for glulam.
 * @param family material family
 * @param repetitive whether the repetitive-member conditions are met
 * @returns C_r (dimensionless)
 * @example repetitiveMemberFactor('lvl', true) // 1.04
 * Reference: NDS 2018 §4.3.9 (sawn), §8.3.7 (SCL).
 */
export function repetitiveMemberFactor(family: MaterialFamily, repetitive: boolean): number {
  if (!repetitive) return 1;
  if (family === 'sawn') return 1.15;
  if (family === 'lvl') return 1.04;
  return 1;
}
