import { formatNumber } from '@/lib/format';
import type { FactorUse } from '@/lib/calc/types';
import type { CheckResult } from '@/shared/schemas/calc/member';
import { DEFLECTION_PRESETS } from './deflection-presets';
import type { SizeEvaluation } from './evaluate-size';
import type { PreparedMember } from './prepare-member';
import type { SectionFactors } from './section-factors';

const CD_NOTE = 'load duration, NDS 2018 Table 2.3.2';

/** Name of combination i (a module function: a closure in describeChecks would be made on every check). */
function comboName(combinations: PreparedMember['combinations'], i: number): string {
  return combinations[i].combination.name;
}

/**
 * Turns a size's numbers into the result's check table: label, demand, capacity, unit, ratio, pass, the
 * governing combination, every factor used with its value, and the formula. C_D appears in the bending and
 * shear lists only; F_c⊥ and E never take it.
 *
 * @param prepared prepared member; section the size's factors; evaluation from evaluateSize
 * @returns one CheckResult per check: bending, shear, live deflection, total deflection, bearing
 * @example describeChecks(prepared, section, evaluation).map((c) => c.id); // ['bending', 'shear', ...]
 * Reference: NDS 2018 Table 4.3.1, Table 5.3.1, Table 8.3.1; §3.3, §3.4, §3.5, §3.10.
 */
export function describeChecks(
  prepared: PreparedMember,
  section: SectionFactors,
  evaluation: SizeEvaluation,
): CheckResult[] {
  const combos = prepared.combinations;
  const { bending, shear, deflectionLive, deflectionTotal, bearing } = evaluation;
  const ref = section.reference;
  const glulam = section.family === 'glulam';
  const preset = DEFLECTION_PRESETS[prepared.input.deflectionUse ?? 'floor'];
  const stiffness: FactorUse[] = [
    { symbol: 'C_M', value: section.CM.e, note: 'wet service, on E' },
    { symbol: 'C_t', value: section.Ct.e, note: 'temperature, on E' },
    { symbol: 'C_i', value: section.Ci.e, note: 'incising, on E' },
  ];
  const stability = bending.stability;
  const clNote =
    stability.FbEPsi === null
      ? 'beam stability: compression edge braced (or d ≤ b)'
      : `beam stability: l_e ${formatNumber(stability.leIn, 1)} in, R_B ${formatNumber(stability.RB, 2)}, F_bE ${formatNumber(stability.FbEPsi, 0)} psi`;
  const bendingFactors: FactorUse[] = [
    { symbol: 'C_D', value: bending.CD, note: CD_NOTE },
    { symbol: 'C_M', value: section.CM.fb, note: 'wet service' },
    { symbol: 'C_t', value: section.Ct.fb, note: 'temperature' },
    {
      symbol: 'C_L',
      value: stability.CL,
      note: section.volumeLesserOfCL ? `${clNote}; lesser of C_L and C_V used` : clNote,
    },
    section.sizeFactor,
    { symbol: 'C_fu', value: section.Cfu, note: 'flat use' },
    { symbol: 'C_i', value: section.Ci.fb, note: 'incising' },
    { symbol: 'C_r', value: section.Cr, note: 'repetitive member' },
  ];
  const bendingFormula = glulam
    ? `f_b = M/S; F'_b = F_b·C_D·C_M·C_t·min(C_L, C_V)·C_r, F_b = ${ref.FbPsi} psi`
    : section.family === 'lvl'
      ? section.volumeLesserOfCL
        ? `f_b = M/S; F'_b = F_b·C_D·C_M·C_t·min(C_L, C_V)·C_r (C_V ≤ 1.0, NDS 8.3.6), F_b = ${ref.FbPsi} psi`
        : `f_b = M/S; F'_b = F_b·C_D·C_M·C_t·C_L·C_V·C_r (C_V > 1.0, NDS 8.3.6), F_b = ${ref.FbPsi} psi`
      : `f_b = M/S; F'_b = F_b·C_D·C_M·C_t·C_L·C_F·C_fu·C_i·C_r, F_b = ${ref.FbPsi} psi`;
  const dFt = (prepared.input.shearAtD ?? true) ? section.dIn / 12 : 0;
  return [
    {
      id: 'bending',
      label: 'Bending',
      demand: bending.demand,
      capacity: bending.capacity,
      unit: 'psi',
      ratio: bending.ratio,
      pass: bending.ratio <= 1 && stability.withinSlendernessLimit,
      combination: comboName(combos, bending.combinationIndex),
      factors: bendingFactors,
      formula: bendingFormula,
      note: stability.withinSlendernessLimit
        ? `M = ${formatNumber(bending.momentLbFt, 0)} lb·ft, S = ${formatNumber(section.sxIn3, 2)} in³`
        : 'Slenderness R_B exceeds 50 (NDS 3.3.3.7): brace the compression edge.',
    },
    {
      id: 'shear',
      label: dFt > 0 ? 'Shear (at d from the supports)' : 'Shear (at the supports)',
      demand: shear.demand,
      capacity: shear.capacity,
      unit: 'psi',
      ratio: shear.ratio,
      pass: shear.ratio <= 1,
      combination: comboName(combos, shear.combinationIndex),
      factors: [
        { symbol: 'C_D', value: shear.CD, note: CD_NOTE },
        { symbol: 'C_M', value: section.CM.fv, note: 'wet service' },
        { symbol: 'C_t', value: section.Ct.fv, note: 'temperature' },
        { symbol: 'C_i', value: section.Ci.fv, note: 'incising' },
      ],
      formula: `f_v = 3V/2A; F'_v = F_v·C_D·C_M·C_t·C_i, F_v = ${ref.FvPsi} psi`,
      note: `V = ${formatNumber(shear.shearLb, 0)} lb, A = ${formatNumber(section.areaIn2, 2)} in²`,
    },
    {
      id: 'deflection-live',
      label: `Deflection, variable load (L/${preset.liveRatio})`,
      demand: deflectionLive.demand,
      capacity: deflectionLive.capacity,
      unit: 'in',
      ratio: deflectionLive.ratio,
      pass: deflectionLive.ratio <= 1,
      combination: comboName(combos, deflectionLive.combinationIndex),
      factors: stiffness,
      formula: `Δ from the combination's live, roof live or snow part; E' = E·C_M·C_t·C_i, E = ${ref.EPsi} psi`,
      note: preset.label,
    },
    {
      id: 'deflection-total',
      label: deflectionTotal.capGoverns
        ? `Deflection, total with creep (cap ${formatNumber(deflectionTotal.limitIn, 3)} in)`
        : `Deflection, total with creep (L/${preset.totalRatio})`,
      demand: deflectionTotal.demand,
      capacity: deflectionTotal.capacity,
      unit: 'in',
      ratio: deflectionTotal.ratio,
      pass: deflectionTotal.ratio <= 1,
      combination: comboName(combos, deflectionTotal.combinationIndex),
      factors: [...stiffness, { symbol: 'K_cr', value: prepared.creepKcr, note: 'creep, NDS 2018 §3.5.2' }],
      formula: 'Δ_T = K_cr·Δ_LT + Δ_ST; sustained = dead + self-weight + the sustained part of live',
      note: `sustained live fraction ${formatNumber(prepared.input.sustainedLiveFraction ?? 0, 2)}`,
    },
    {
      id: 'bearing',
      label: `Bearing (${bearing.governedBy === 'plate' ? 'plate under the jacks governs' : 'member governs'})`,
      demand: bearing.demand,
      capacity: bearing.capacity,
      unit: 'in',
      ratio: bearing.ratio,
      pass: bearing.ratio <= 1,
      combination: comboName(combos, bearing.combinationIndex),
      factors: [
        { symbol: 'C_M', value: section.CM.fcPerp, note: 'wet service, on F_c⊥' },
        { symbol: 'C_t', value: section.Ct.fcPerp, note: 'temperature, on F_c⊥' },
        { symbol: 'C_i', value: section.Ci.fcPerp, note: 'incising, on F_c⊥' },
        { symbol: 'C_b', value: 1, note: 'bearing at the member end, NDS 2018 §3.10.4' },
      ],
      formula: `required bearing length = R / (width · F'_c⊥); F_c⊥ = ${ref.FcPerpPsi} psi (member)`,
      note: `R = ${formatNumber(Math.max(bearing.leftLb, bearing.rightLb), 0)} lb`,
    },
  ];
}
