import { sawnSizeFactors } from '@/lib/calc/factors/size-factor';
import { getMaterial, listMaterials, listSizes, referenceValues, weakestGrade } from '@/lib/calc/materials';
import type { Material } from '@/lib/calc/materials';

/**
 * The grade an unreadable grade stamp is checked as, for one size: of the species' grades offered in that
 * size, the one with the lowest bending value F_b·C_F, ties broken by the lower E, then the lower F_c⊥.
 * Comparing at the member's own size matters: Stud is graded to 6 in wide only and takes its own size
 * factors (a Douglas Fir-Larch Stud 2x4 is weaker in bending than No.3 at 2x4, No.3 is weaker at 2x6), and
 * timbers are tabulated for Select Structural to No.2 only. When no grade of the species offers the size,
 * the species' weakest grade is returned (the size lookup then names the size as not offered).
 *
 * @param materialId a sawn material of the species (its grade is ignored)
 * @param sizeId the member's size id ("2-ply-2x10", "6x12")
 * @returns the weakest sawn material of that species offering the size
 * @example unknownGradeMaterial('sawn-douglas-fir-larch-no2', '2x4').grade; // 'Stud'
 * Reference: NDS Supplement 2018 Tables 4A, 4B, 4D and their size factors; DESIGN.md §5 (unknown grade →
 * weakest grade of the species).
 */
export function unknownGradeMaterial(materialId: string, sizeId: string): Material {
  const species = getMaterial(materialId).species;
  let weakest: Material | null = null;
  let key: [number, number, number] = [Infinity, Infinity, Infinity];
  for (const material of listMaterials('sawn')) {
    if (material.species !== species) continue;
    const size = listSizes(material.id).find((s) => s.id === sizeId);
    if (!size) continue;
    const values = referenceValues(material.id, size);
    const candidate: [number, number, number] = [
      values.FbPsi * sawnSizeFactors(material.id, size).fb,
      values.EPsi,
      values.FcPerpPsi,
    ];
    if (
      candidate[0] < key[0] ||
      (candidate[0] === key[0] &&
        (candidate[1] < key[1] || (candidate[1] === key[1] && candidate[2] < key[2])))
    ) {
      weakest = material;
      key = candidate;
    }
  }
  return weakest ?? weakestGrade(species);
}
