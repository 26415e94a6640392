import {
  bendingSizeFactor,
  flatUseFactor,
  incisingFactors,
  repetitiveMemberFactor,
  temperatureFactors,
  wetServiceFactors,
  type StressFactors,
} from '@/lib/calc/factors';
import {
  materialSpec,
  referenceValues,
  thicknessClass,
  type DesignValues,
  type MaterialFamily,
  type MemberSize,
} from '@/lib/calc/materials';
import { CalcInputError, type FactorUse } from '@/lib/calc/types';

/** Service conditions and uses shared by every size checked for one member. */
export interface ServiceConditions {
  wetService: boolean;
  temperatureF: number;
  incised: boolean;
  flatUse: boolean;
  repetitive: boolean;
}

/**
 * A size's section as loaded (flat use turns it on its side) and every adjustment factor that does not depend
 * on the load combination (C_D and C_L do; they are applied per combination).
 */
export interface SectionFactors {
  family: MaterialFamily;
  reference: DesignValues;
  /** Section as loaded: b and d in in, A in², S in³, I in⁴. */
  bIn: number;
  dIn: number;
  areaIn2: number;
  sxIn3: number;
  ixIn4: number;
  CM: StressFactors;
  Ct: StressFactors;
  Ci: StressFactors;
  /** C_F (sawn), C_V (glulam volume; lesser of it and C_L) or the LVL depth factor. */
  sizeFactor: FactorUse;
  /**
   * True when C_V and C_L are not applied together and the lesser governs: glulam always (NDS 2018 §5.3.6),
   * structural composite lumber when its C_V ≤ 1.0 (NDS 2018 §8.3.6). F_bBase then leaves C_V out.
   */
  volumeLesserOfCL: boolean;
  Cfu: number;
  Cr: number;
  /** F_b × every factor but C_D, C_L and C_V where volumeLesserOfCL, psi. */
  FbBasePsi: number;
  /** F_b* for C_L: F_b × all factors except C_D, C_fu, C_V and C_L (C_D is applied per combination), psi. */
  FbStarBasePsi: number;
  /** F'_v without C_D, psi. */
  FvBasePsi: number;
  /** F'_c⊥ = F_c⊥·C_M·C_t·C_i (C_b = 1.0 at the member's end; no C_D ever), psi. */
  FcPerpPrimePsi: number;
  /** E' and E'_min, psi (no C_D ever). */
  EPrimePsi: number;
  EminPrimePsi: number;
}

/**
 * The load-independent adjustment factors of one size in one material, for ASD:
 * sawn F'_b = F_b·C_D·C_M·C_t·C_L·C_F·C_fu·C_i·C_r; glulam F'_b = F_b·C_D·C_M·C_t·(lesser of C_L, C_V)·C_r
 * (C_r 1.0); LVL F'_b = F_b·C_D·C_M·C_t·(lesser of C_L, C_V when C_V ≤ 1.0, else C_L·C_V)·C_r;
 * F'_v = F_v·C_D·C_M·C_t·C_i; F'_c⊥ = F_c⊥·C_M·C_t·C_i·C_b;
 * E' = E·C_M·C_t·C_i. C_D and C_L are left to the combination.
 *
 * @param materialId material id; size the member size (in); designSpanFt for the glulam C_V (ft)
 * @param conditions wet service, temperature °F, incised, flat use, repetitive
 * @returns section (in) and factors (dimensionless), stresses in psi
 * @throws CalcInputError for flat use or incising of glulam or LVL, flat use of more than one ply
 * @example sectionFactors('sawn-hem-fir-no1', getSize('sawn-hem-fir-no1', '2x8'), 14, { wetService: false, temperatureF: 70, incised: false, flatUse: false, repetitive: true }).FbBasePsi; // 975 × 1.2 × 1.15 = 1345.5
 * Reference: NDS 2018 Table 4.3.1 (sawn), Table 5.3.1 and §5.3.6 (glulam), Table 8.3.1 and §8.3.6 (SCL).
 */
export function sectionFactors(
  materialId: string,
  size: MemberSize,
  designSpanFt: number,
  conditions: ServiceConditions,
): SectionFactors {
  const spec = materialSpec(materialId);
  const family = spec.family;
  if (conditions.incised && family !== 'sawn') {
    throw new CalcInputError('incised', 'Incising factors apply to sawn lumber only');
  }
  if (conditions.flatUse && size.plies > 1) {
    throw new CalcInputError('flatUse', 'Flat use is checked for a single piece only');
  }
  const reference = referenceValues(materialId, size);
  const CM = wetServiceFactors(materialId, size, conditions.wetService);
  const Ct = temperatureFactors({ temperatureF: conditions.temperatureF, wet: conditions.wetService });
  const Ci = incisingFactors(conditions.incised && family === 'sawn');
  const sizeFactor = bendingSizeFactor(materialId, size, designSpanFt);
  const Cfu = conditions.flatUse ? flatUseFactor(materialId, size) : 1;
  // C_r is for dimension lumber 2 in to 4 in thick (NDS 2018 §4.3.9), never for timbers 5 in and thicker.
  const timber = family === 'sawn' && thicknessClass(size) === 'timber';
  const Cr = repetitiveMemberFactor(family, conditions.repetitive && !timber);
  const common = reference.FbPsi * CM.fb * Ct.fb * Ci.fb * Cr;
  const sawn = family === 'sawn';
  const flat = conditions.flatUse;
  const volumeLesserOfCL = family === 'glulam' || (family === 'lvl' && sizeFactor.value <= 1);
  const bIn = flat ? size.dIn : size.bIn;
  const dIn = flat ? size.bIn : size.dIn;
  return {
    family,
    reference,
    bIn,
    dIn,
    areaIn2: size.areaIn2,
    sxIn3: flat ? (bIn * dIn * dIn) / 6 : size.sxIn3,
    ixIn4: flat ? (bIn * dIn * dIn * dIn) / 12 : size.ixIn4,
    CM,
    Ct,
    Ci,
    sizeFactor,
    volumeLesserOfCL,
    Cfu,
    Cr,
    FbBasePsi: common * Cfu * (volumeLesserOfCL ? 1 : sizeFactor.value),
    FbStarBasePsi: common * (sawn ? sizeFactor.value : 1),
    FvBasePsi: reference.FvPsi * CM.fv * Ct.fv * Ci.fv,
    FcPerpPrimePsi: reference.FcPerpPsi * CM.fcPerp * Ct.fcPerp * Ci.fcPerp,
    EPrimePsi: reference.EPsi * CM.e * Ct.e * Ci.e,
    EminPrimePsi: reference.EminPsi * CM.e * Ct.e * Ci.e,
  };
}

/**
 * F'_c⊥ of the plate under the jack studs, psi: F_c⊥·C_M·C_t. No C_D (NDS Table 4.3.1) and C_b taken as 1.0
 * (the (l_b + 0.375)/l_b increase would apply to jacks bearing away from the plate's end; left out, on the
 * safe side).
 * @param materialId plate material; plateSize a plate size (its width row); conditions service conditions
 * @returns F'_c⊥, psi
 * @example supportFcPerpPsi('sawn-spruce-pine-fir-no1-no2', getSize('sawn-spruce-pine-fir-no1-no2', '2x4'), dry); // 425
 * Reference: NDS 2018 Table 4.3.1, §3.10.
 */
export function supportFcPerpPsi(
  materialId: string,
  plateSize: MemberSize,
  conditions: ServiceConditions,
): number {
  const reference = referenceValues(materialId, plateSize);
  const CM = wetServiceFactors(materialId, plateSize, conditions.wetService);
  const Ct = temperatureFactors({ temperatureF: conditions.temperatureF, wet: conditions.wetService });
  return reference.FcPerpPsi * CM.fcPerp * Ct.fcPerp;
}
