import { materialSpec, referenceValues, thicknessClass, type MemberSize } from '@/lib/calc/materials';
import { CalcInputError } from '@/lib/calc/types';
import { glulamWetServiceFactors } from '@/tables/glulam/stress-classes';
import { sawnWetServiceFactors } from '@/tables/lumber/wet-service-factors';
import { sawnSizeFactors } from './size-factor';
import { UNIT_STRESS_FACTORS, type StressFactors } from './stress-factors';

/**
 * Wet service factors C_M. Dry service (sawn ≤ 19 %, glulam < 16 % moisture content in service): all 1.0.
 * Wet dimension lumber: F_b 0.85 (1.0 when F_b·C_F ≤ 1150 psi), F_t 1.0, F_v 0.97, F_c⊥ 0.67, F_c 0.8
 * (1.0 when F_c·C_F ≤ 750 psi), E and E_min 0.9; Southern Pine compares F_b and F_c without C_F (its values
 * are size-specific). Timbers and glulam take their tables' factors.
 * @param materialId material id; size the member size; wet true for wet service
 * @returns factors per design value (dimensionless)
 * @throws CalcInputError('wetService') for LVL in wet service (use the manufacturer's values)
 * @example wetServiceFactors('sawn-hem-fir-no2', getSize('sawn-hem-fir-no2', '2x12'), true).fb // 1 (850 × 1.0 ≤ 1150)
 * Reference: NDS Supplement 2018 Tables 4A, 4B, 4D and 5A adjustment factors; NDS 2018 §4.3.3, §5.3.3.
 */
export function wetServiceFactors(materialId: string, size: MemberSize, wet: boolean): StressFactors {
  if (!wet) return UNIT_STRESS_FACTORS;
  const spec = materialSpec(materialId);
  if (spec.family === 'lvl') {
    throw new CalcInputError(
      'wetService',
      "Generic LVL is for dry service only; use the manufacturer's wet-use values",
    );
  }
  if (spec.family === 'glulam') return glulamWetServiceFactors;
  if (thicknessClass(size) === 'timber') return sawnWetServiceFactors.timber;
  const table = sawnWetServiceFactors.dimension;
  const values = referenceValues(materialId, size);
  const cf = spec.table === '4A' ? sawnSizeFactors(materialId, size) : { fb: 1, fc: 1 };
  return {
    fb: values.FbPsi * cf.fb <= table.fbThresholdPsi ? 1 : table.fb,
    ft: table.ft,
    fv: table.fv,
    fcPerp: table.fcPerp,
    fc: values.FcPsi * cf.fc <= table.fcThresholdPsi ? 1 : table.fc,
    e: table.e,
  };
}
