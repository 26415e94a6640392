import { getMaterial, getSize, listSizes, type Material, type MemberSize } from '@/lib/calc/materials';
import { CalcInputError } from '@/lib/calc/types';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import { unknownGradeMaterial } from './unknown-grade';

/** The material and size a member check uses, after unknown grade, ply count and measured size. */
export interface ResolvedMember {
  material: Material;
  size: MemberSize;
  warnings: string[];
}

/**
 * Resolves the member's material and size: an unknown grade becomes the weakest grade of the species offered
 * in that size (unknownGradeMaterial, with a warning), `plies` picks the same ply size with that many plies, and a measured ply (old lumber)
 * replaces the catalogue dimensions with section properties of the measured rectangle.
 *
 * @param input member input (materialId, sizeId, plies, gradeUnknown, measuredPly in in)
 * @returns material, size (in, in², in³, in⁴, plf) and warnings
 * @throws CalcInputError naming materialId, sizeId, plies or gradeUnknown
 * @example resolveMember({ ...input, materialId: 'sawn-hem-fir-no1', gradeUnknown: true }).material.grade; // 'No.3'
 * Reference: DESIGN.md §5 (unknown grade → weakest grade; old lumber by measured size); NDS Supplement 2018 Table 1B.
 */
export function resolveMember(
  input: Pick<MemberCheckInput, 'materialId' | 'sizeId' | 'plies' | 'gradeUnknown' | 'measuredPly'>,
): ResolvedMember {
  const warnings: string[] = [];
  let material = getMaterial(input.materialId);
  if (input.gradeUnknown) {
    if (material.family !== 'sawn') {
      throw new CalcInputError('gradeUnknown', 'An unknown grade can only be assumed for sawn lumber');
    }
    material = unknownGradeMaterial(material.id, input.sizeId);
    warnings.push(
      `Grade unknown: checked as ${material.label}, the weakest grade of the species offered in this size. A readable grade stamp may allow a larger value.`,
    );
  }
  let size = getSize(material.id, input.sizeId);
  if (input.plies !== undefined && input.plies !== size.plies) {
    const match = listSizes(material.id, { plies: [input.plies] }).find((s) => s.nominal === size.nominal);
    if (!match) throw new CalcInputError('plies', `${size.nominal} is not offered with ${input.plies} plies`);
    size = match;
  }
  if (input.measuredPly) {
    const { bIn: plyBIn, dIn } = input.measuredPly;
    const bIn = plyBIn * size.plies;
    const areaIn2 = bIn * dIn;
    size = {
      ...size,
      id: `${size.id}-measured`,
      label: `${size.label} (measured ${plyBIn} × ${dIn} in)`,
      bIn,
      dIn,
      areaIn2,
      sxIn3: (bIn * dIn * dIn) / 6,
      ixIn4: (bIn * dIn * dIn * dIn) / 12,
      selfWeightPlf: (size.selfWeightPlf * areaIn2) / size.areaIn2,
    };
    warnings.push(
      'Section from the measured size (old lumber): design values are those of the grade as listed today.',
    );
  }
  return { material, size, warnings };
}
