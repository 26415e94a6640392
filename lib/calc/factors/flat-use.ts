import { materialSpec, nominalWidthForDepth, thicknessClass, type MemberSize } from '@/lib/calc/materials';
import { CalcInputError } from '@/lib/calc/types';
import { flatUseFactors } from '@/tables/lumber/size-factors';

/**
 * Flat use factor C_fu on F_b for sawn dimension lumber bent about its weak axis (load on the wide face,
 * e.g. a flat 2x4 header in a nonbearing wall). The size is named as usual (b = thickness, d = width).
 * @param materialId a sawn material id
 * @param size member size as named (bIn thickness, dIn width, in)
 * @returns C_fu (dimensionless)
 * @throws CalcInputError('materialId') for glulam, LVL or timbers (their flat-use values are not held here)
 * @example flatUseFactor('sawn-spruce-pine-fir-no1-no2', getSize('sawn-spruce-pine-fir-no1-no2', '2x4')) // 1.1
 * Reference: NDS 2018 §4.3.7; NDS Supplement 2018 Table 4A and 4B adjustment factors (C_fu).
 */
export function flatUseFactor(materialId: string, size: MemberSize): number {
  const spec = materialSpec(materialId);
  const thickness = thicknessClass(size);
  if (spec.family !== 'sawn' || thickness === 'timber') {
    throw new CalcInputError('materialId', 'Flat use factors are held for sawn dimension lumber only');
  }
  const widthIn = nominalWidthForDepth(size.dIn);
  const row =
    flatUseFactors.find((r) => widthIn <= r.maxNominalWidthIn) ?? flatUseFactors[flatUseFactors.length - 1];
  return thickness === 'four' ? row.thick : row.thin;
}
