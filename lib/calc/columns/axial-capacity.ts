import {
  columnBucklingCoefficient,
  columnStabilityFactor,
  sawnSizeFactors,
  wetServiceFactors,
  type ColumnStability,
} from '@/lib/calc/factors';
import { materialSpec, referenceValues, type MemberSize } from '@/lib/calc/materials';
import type { FactorUse } from '@/lib/calc/types';

/** Column buckling about one axis. */
export interface ColumnAxis {
  /**
   * 'across-d': buckling across the depth d (out of the plane of a wall for a stud or post);
   * 'across-b': buckling across the width b (the weak axis of each ply; in the plane of a wall; across the
   * plies of a built-up post).
   */
  axis: 'across-d' | 'across-b';
  /** Effective length l_e (in). */
  leIn: number;
  /** Cross-section dimension perpendicular to the buckling axis (in). */
  dIn: number;
  /** Built-up column factor K_f on C_P (1.0 for solid members and for the axis along the plies). */
  Kf: number;
}

export interface ColumnAxisResult extends ColumnAxis, ColumnStability {
  /** C_P including K_f. */
  CPUsed: number;
}

export interface AxialCapacity {
  /** F'_c = F_c × C_D × C_M × C_F × C_P (× C_t × C_i = 1.0, normal temperature, not incised) (psi). */
  FcPrimePsi: number;
  /** F'_c × A (lb). */
  capacityLb: number;
  /** The axis with the smaller C_P (K_f included). */
  governing: ColumnAxisResult;
  axes: ColumnAxisResult[];
  factors: FactorUse[];
  withinSlendernessLimit: boolean;
}

/**
 * Axial compression capacity of a rectangular column (solid or built-up of plies), the lesser over the
 * axes given. Temperature ≤ 100 °F and not incised (C_t = C_i = 1.0) are assumed and listed.
 * @param input.materialId material id; input.size member size (in)
 * @param input.axes buckling axes to check, each with l_e (in), d (in) and K_f
 * @param input.CD load duration factor C_D
 * @param input.wet wet service (C_M)
 * @param input.duringConstruction temporary construction use: l_e/d limit 75 instead of 50
 * @returns F'_c (psi), capacity (lb), per-axis results and the factors used
 * @example axialCapacity({ materialId: 'sawn-spruce-pine-fir-no1-no2', size: getSize('sawn-spruce-pine-fir-no1-no2', '4x4'), axes: [{ axis: 'across-d', leIn: 87.6, dIn: 3.5, Kf: 1 }], CD: 1, wet: false }).FcPrimePsi // 579.0
 * Reference: NDS 2018 §3.6.3, §3.7.1, §15.3; Table 4.3.1.
 */
export function axialCapacity(input: {
  materialId: string;
  size: MemberSize;
  axes: readonly ColumnAxis[];
  CD: number;
  wet: boolean;
  duringConstruction?: boolean;
}): AxialCapacity {
  const { materialId, size, CD } = input;
  const spec = materialSpec(materialId);
  const values = referenceValues(materialId, size);
  const CM = wetServiceFactors(materialId, size, input.wet);
  const CF = spec.family === 'sawn' ? sawnSizeFactors(materialId, size).fc : 1;
  const FcStarPsi = values.FcPsi * CD * CM.fc * CF;
  const EminAdjPsi = values.EminPsi * CM.e;
  const c = columnBucklingCoefficient(spec.family);

  const axes: ColumnAxisResult[] = input.axes.map((axis) => {
    const stability = columnStabilityFactor({
      leIn: axis.leIn,
      dIn: axis.dIn,
      FcStarPsi,
      EminAdjPsi,
      c,
      duringConstruction: input.duringConstruction,
    });
    return { ...axis, ...stability, CPUsed: axis.Kf * stability.CP };
  });
  const governing = axes.reduce((worst, axis) => (axis.CPUsed < worst.CPUsed ? axis : worst));
  const FcPrimePsi = FcStarPsi * governing.CPUsed;

  const factors: FactorUse[] = [
    { symbol: 'C_D', value: CD, note: 'load duration, NDS Table 2.3.2' },
    { symbol: 'C_M', value: CM.fc, note: input.wet ? 'wet service' : 'dry service' },
    { symbol: 'C_t', value: 1, note: 'temperature ≤ 100 °F assumed, NDS Table 2.3.3' },
    { symbol: 'C_i', value: 1, note: 'not incised (assumed)' },
  ];
  if (spec.family === 'sawn')
    factors.push({ symbol: 'C_F', value: CF, note: `size factor on F_c, ${spec.material.source}` });
  if (governing.Kf !== 1) {
    factors.push({ symbol: 'K_f', value: governing.Kf, note: 'built-up column, NDS 15.3.2' });
  }
  factors.push({
    symbol: 'C_P',
    value: governing.CP,
    note: `column stability, buckling ${governing.axis}, l_e/d = ${governing.slenderness.toFixed(1)}, c = ${c}, NDS 3.7.1`,
  });

  return {
    FcPrimePsi,
    capacityLb: FcPrimePsi * size.areaIn2,
    governing,
    axes,
    factors,
    withinSlendernessLimit: axes.every((axis) => axis.withinSlendernessLimit),
  };
}
