import { materialSpec, nominalWidthForDepth, thicknessClass, type MemberSize } from '@/lib/calc/materials';
import { CalcInputError } from '@/lib/calc/types';
import {
  southernPineSizeFactorNotes,
  structuralGradeSizeFactors,
  studGradeSizeFactors,
  type SizeFactorRow,
} from '@/tables/lumber/size-factors';

/** Size factors C_F on F_b, F_t and F_c for one sawn member. */
export interface SawnSizeFactors {
  fb: number;
  ft: number;
  fc: number;
}

/** Timbers: C_F = (12/d)^(1/9) where d > 12 in (NDS 2018 §4.3.6.2). */
const TIMBER_REFERENCE_DEPTH_IN = 12;
const TIMBER_EXPONENT = 1 / 9;
const SOUTHERN_PINE_WIDEST_ROW_IN = 12;
const SOUTHERN_PINE_THICK_BONUS_MIN_WIDTH_IN = 8;

const UNITY: SawnSizeFactors = Object.freeze({ fb: 1, ft: 1, fc: 1 });
const cache = new WeakMap<MemberSize, SawnSizeFactors>();

function tableRow(rows: readonly SizeFactorRow[], widthIn: number): SizeFactorRow | undefined {
  return rows.find((row) => widthIn <= row.maxNominalWidthIn);
}

function compute(materialId: string, size: MemberSize): SawnSizeFactors {
  const spec = materialSpec(materialId);
  if (spec.family !== 'sawn') {
    throw new CalcInputError('materialId', 'The size factor C_F applies to sawn lumber only');
  }
  const thickness = thicknessClass(size);
  const widthIn = nominalWidthForDepth(size.dIn);
  if (thickness === 'timber') {
    if (size.dIn <= TIMBER_REFERENCE_DEPTH_IN) return UNITY;
    return Object.freeze({ fb: (TIMBER_REFERENCE_DEPTH_IN / size.dIn) ** TIMBER_EXPONENT, ft: 1, fc: 1 });
  }
  if (spec.table === '4B') {
    if (widthIn > SOUTHERN_PINE_WIDEST_ROW_IN) {
      const f = southernPineSizeFactorNotes.widerThanTwelveIn;
      return Object.freeze({ fb: f, ft: f, fc: f });
    }
    if (thickness === 'four' && widthIn >= SOUTHERN_PINE_THICK_BONUS_MIN_WIDTH_IN) {
      return Object.freeze({ fb: southernPineSizeFactorNotes.fbFourInThickEightInAndWider, ft: 1, fc: 1 });
    }
    return UNITY;
  }
  const row = tableRow(spec.gradeId === 'stud' ? studGradeSizeFactors : structuralGradeSizeFactors, widthIn);
  if (!row)
    throw new CalcInputError('sizeId', `Stud grade is not graded ${widthIn} in wide; use No.3 values`);
  return Object.freeze({ fb: thickness === 'four' ? row.fbThick : row.fbThin, ft: row.ft, fc: row.fc });
}

/**
 * Size factors C_F of a sawn member, by nominal width and thickness of one ply (built-up members of 2x
 * plies take the 2 in and 3 in thick column). Table 4A species: the Table 4A size factors (Stud grade its
 * own rows). Southern Pine (Table 4B, size-specific values): 1.0 to 12 in wide; F_b × 1.1 for 4 in thick
 * members 8 in and wider; 0.9 on F_b, F_t, F_c wider than 12 in (only the 0.9 is taken when both could
 * apply, conservatively). Timbers (Table 4D): (12/d)^(1/9) on F_b where d > 12 in. Cached per catalogue size.
 * @param materialId a sawn material id
 * @param size the member size (bIn, dIn in in; plies)
 * @returns { fb, ft, fc } dimensionless
 * @throws CalcInputError('materialId') for glulam or LVL; CalcInputError('sizeId') for Stud wider than 6 in
 * @example sawnSizeFactors('sawn-spruce-pine-fir-no1-no2', getSize('sawn-spruce-pine-fir-no1-no2', '4x4')).fc // 1.15
 * Reference: NDS 2018 §4.3.6; NDS Supplement 2018 Table 4A, Table 4B and Table 4D adjustment factors.
 */
export function sawnSizeFactors(materialId: string, size: MemberSize): SawnSizeFactors {
  const cached = cache.get(size);
  if (cached && size.materialId === materialId) return cached;
  const factors = compute(materialId, size);
  if (size.materialId === materialId) cache.set(size, factors);
  return factors;
}
