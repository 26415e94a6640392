import { materialSpec, type MemberSize } from '@/lib/calc/materials';
import type { FactorUse } from '@/lib/calc/types';
import { sawnSizeFactors } from './size-factor';
import { glulamVolumeFactor } from './volume-factor';
import { lvlDepthFactor } from './lvl-depth-factor';

/**
 * The size-type factor on F_b for any material family: sawn C_F, glulam volume factor C_V, LVL depth factor
 * (C_V of structural composite lumber). For glulam the caller uses the lesser of C_V and C_L, not both.
 * @param materialId material id
 * @param size member size (in)
 * @param spanFt length between points of zero moment (ft), used by glulam C_V only
 * @returns the factor with its NDS symbol and a note naming the rule
 * @example bendingSizeFactor('glulam-24f-v4-df', getSize('glulam-24f-v4-df', '6.75x13.5'), 18).value // 0.976
 * Reference: NDS 2018 §4.3.6 (C_F), §5.3.6 (glulam C_V), §8.3.6 (SCL C_V).
 */
export function bendingSizeFactor(materialId: string, size: MemberSize, spanFt: number): FactorUse {
  const spec = materialSpec(materialId);
  if (spec.family === 'sawn') {
    return {
      symbol: 'C_F',
      value: sawnSizeFactors(materialId, size).fb,
      note: `size factor, ${spec.material.source}`,
    };
  }
  if (spec.family === 'glulam') {
    const value = glulamVolumeFactor({
      spanFt,
      dIn: size.dIn,
      bIn: size.bIn,
      speciesGroup: spec.stressClass.speciesGroup,
    });
    return { symbol: 'C_V', value, note: 'glulam volume factor, NDS 5.3.6 (lesser of C_V and C_L governs)' };
  }
  return {
    symbol: 'C_V',
    value: lvlDepthFactor(size.dIn, spec.grade.depthExponent),
    note: `LVL depth factor (12/d)^${spec.grade.depthExponent}, generic: confirm with the manufacturer`,
  };
}
