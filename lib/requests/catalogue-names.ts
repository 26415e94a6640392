import { getMaterial, getSize } from '@/lib/calc/materials';
import { idText } from './diff-fields';

/**
 * A material's name as the catalogue prints it ("Spruce-Pine-Fir No.1/No.2"); an id the catalogue does not
 * hold (an older engine's) reads as its words rather than failing the comparison.
 */
export function materialName(id: string | null | undefined): string | null {
  if (!id) return null;
  try {
    return getMaterial(id).label;
  } catch {
    return idText(id);
  }
}

/** A size's name in its material ("2-ply 2x10", "6x6"); an unknown pair reads as the id's words. */
export function sizeName(materialId: string, sizeId: string | null | undefined): string | null {
  if (!sizeId) return null;
  try {
    return getSize(materialId, sizeId).label;
  } catch {
    return idText(sizeId);
  }
}
