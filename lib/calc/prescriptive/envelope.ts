import { getMaterial, getSize, thicknessClass } from '@/lib/calc/materials';
import type { PrescriptiveInput } from '@/shared/schemas/calc/member';

/** Widest building the exterior header tables list, ft (IRC R602.7(1) range; from memory: 12, 24, 36 ft columns). */
export const MAX_TABLE_BUILDING_WIDTH_FT = 36;
/** Highest ground snow the tables list, psf (IRC R602.7(1); from memory: 30, 50, 70 psf columns). */
export const MAX_TABLE_GROUND_SNOW_PSF = 70;
/** Longest header span the tables reach, ft (from memory: the largest 2x12 built-up headers list about 16 ft). */
export const MAX_TABLE_SPAN_FT = 16;

/**
 * Every reason a header sits outside what code header tables cover: the tables are for sawn 2x headers of a
 * listed grade in a dry bearing wall carrying uniform roof, ceiling and at most one floor load, no point or
 * partial loads and nothing else, within a building width, ground snow and span range. An empty list means
 * the case is likely inside the tables' envelope.
 *
 * @param input member input, building width (ft) and ground snow (psf)
 * @returns reasons, in words a contractor can act on
 * @example envelopeReasons({ member, buildingWidthFt: 28, groundSnowPsf: 30 }); // []
 * Reference: IRC 2021 R602.7, Tables R602.7(1) and R602.7(2) (scope only; the product never reproduces the tables).
 */
export function envelopeReasons(input: PrescriptiveInput): string[] {
  const { member } = input;
  const reasons: string[] = [];
  if (member.kind !== 'header') reasons.push('it is a beam replacing a wall, not a header over an opening');
  const material = getMaterial(member.materialId);
  if (material.family !== 'sawn')
    reasons.push(`${material.label} is not sawn lumber (the tables cover sawn 2x headers)`);
  else if (thicknessClass(getSize(member.materialId, member.sizeId)) !== 'two-three') {
    reasons.push('the member is not built from 2x lumber');
  }
  if (member.gradeUnknown) reasons.push('the grade is unknown (the tables assume a listed grade)');
  if (member.measuredPly) reasons.push('the lumber is old stock checked by measured size');
  const kinds = member.sources.map((s) => s.kind);
  if (kinds.includes('point')) reasons.push('it carries point loads (girder truss, post, strut or similar)');
  if (kinds.includes('wall-above')) reasons.push('it carries a wall above as a line load');
  if (kinds.filter((k) => k === 'floor').length > 1) reasons.push('it carries more than one floor');
  if (member.sources.some((s) => s.kind !== 'point' && (s.startFt !== undefined || s.endFt !== undefined))) {
    reasons.push('a load covers only part of the span');
  }
  if (!kinds.includes('roof'))
    reasons.push('no roof load is given (exterior header tables assume roof and ceiling)');
  if (input.buildingWidthFt === null) reasons.push('the building width is not known');
  else if (input.buildingWidthFt > MAX_TABLE_BUILDING_WIDTH_FT) {
    reasons.push(
      `the building is ${input.buildingWidthFt} ft wide, over the tables' ${MAX_TABLE_BUILDING_WIDTH_FT} ft`,
    );
  }
  if (input.groundSnowPsf > MAX_TABLE_GROUND_SNOW_PSF) {
    reasons.push(
      `ground snow ${input.groundSnowPsf} psf is over the tables' ${MAX_TABLE_GROUND_SNOW_PSF} psf`,
    );
  }
  if (member.clearSpanFt > MAX_TABLE_SPAN_FT) {
    reasons.push(
      `the ${member.clearSpanFt} ft span is longer than header tables reach (about ${MAX_TABLE_SPAN_FT} ft)`,
    );
  }
  if (member.mount === 'flush')
    reasons.push('it is flush with the joists (hangers), not a header in the wall');
  if (member.overhangLeftFt !== undefined || member.overhangRightFt !== undefined)
    reasons.push('it overhangs a support: header tables are for simple spans');
  if (member.secondClearSpanFt !== undefined)
    reasons.push('it is continuous over a centre post: header tables are for simple spans');
  if (member.mount === 'raised')
    reasons.push(
      'it is raised into the attic with the ceiling joists hung from it, not a header in the wall',
    );
  if (member.wetService) reasons.push('it is in wet service');
  if ((member.temperatureF ?? 70) > 100) reasons.push('it is in sustained heat over 100 °F');
  return reasons;
}
