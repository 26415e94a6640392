/**
 * The materials catalogue: materials, member sizes and reference design values.
 * Reference: NDS Supplement 2018 Tables 1B, 4A, 4B, 4D, 5A; generic LVL values.
 */
export type { DesignValues, Material, MaterialFamily, MemberSize } from './types';
export { getMaterial, listMaterials, materialSpec, type MaterialSpec } from './catalog';
export { getSize, listSizes } from './sizes';
export { referenceValues } from './reference-values';
export { weakestGrade } from './weakest-grade';
export { sizeIdentity, type SizeIdentity } from './size-identity';
export { nominalWidthForDepth, thicknessClass, type ThicknessClass } from './size-geometry';
export { inchFraction } from './inch-fractions';
