import { getSize, materialSpec, type MemberSize } from '@/lib/calc/materials';
import { CalcInputError, type FactorUse } from '@/lib/calc/types';
import { axialCapacity, type ColumnAxis, type ColumnAxisResult } from './axial-capacity';
import { requireNonNegative, requirePositive } from './input-guards';

const IN_PER_FT = 12;
/** K_f for built-up columns: 0.6 nailed, 0.75 bolted (NDS 2018 §15.3.2.2). */
const BUILT_UP_KF = { nailed: 0.6, bolted: 0.75 } as const;
const MAX_BUILT_UP_PLIES = 5;

export interface ColumnInput {
  materialId: string;
  /** A catalogue size id ("4x4", "3-ply-2x6", "6x6"); or give `size`. */
  sizeId?: string;
  /** A measured size (old lumber), used when sizeId is absent. */
  size?: MemberSize;
  /** Unbraced height (ft), top and bottom held in place (K_e = 1.0). */
  heightFt: number;
  /** Axial load (lb). */
  loadLb: number;
  /** Load duration factor C_D of the governing combination. */
  CD: number;
  /**
   * Buckling across b (the weak axis of each ply, in the plane of the wall) is prevented along the full
   * height by the wall's sheathing or framing.
   */
  weakAxisBraced?: boolean;
  /** Unbraced length for buckling across b (ft) when blocking or bracing shortens it; default heightFt. */
  weakAxisUnbracedFt?: number;
  /** How the plies of a built-up post are fastened; default 'nailed'. */
  fastening?: 'nailed' | 'bolted';
  wet?: boolean;
}

export interface ColumnCheck {
  materialId: string;
  sizeLabel: string;
  areaIn2: number;
  loadLb: number;
  /** f_c = P / A (psi). */
  fcPsi: number;
  /** F'_c (psi). */
  FcPrimePsi: number;
  /** F'_c × A (lb). */
  capacityLb: number;
  /** f_c / F'_c. */
  ratio: number;
  pass: boolean;
  governingAxis: ColumnAxisResult;
  axes: ColumnAxisResult[];
  factors: FactorUse[];
  warnings: string[];
  sources: string[];
}

function resolveSize(input: ColumnInput): MemberSize {
  if (input.sizeId) return getSize(input.materialId, input.sizeId);
  if (input.size) return input.size;
  throw new CalcInputError('sizeId', 'Choose a post size');
}

/**
 * Checks a post in axial compression: f_c = P/A against F'_c = F_c·C_D·C_M·C_F·C_P (C_t = C_i = 1.0),
 * buckling across d and across b. Built-up posts (2 to 5 plies) buckling across b, i.e. across the plies
 * about the weak axis of each ply, take K_f = 0.6 nailed / 0.75 bolted on C_P; buckling across d, each ply
 * acts about its own strong axis (K_f = 1.0). The post is pinned at both ends (K_e = 1.0). l_e/d above 50
 * fails.
 * @param input see ColumnInput (heightFt in ft, loadLb in lb)
 * @returns stresses (psi), capacity (lb), ratio, pass/fail, factors, per-axis results, warnings
 * @throws CalcInputError for unknown material or size, or non-positive height or C_D, or a negative load
 * @example checkColumn({ materialId: 'sawn-spruce-pine-fir-no1-no2', sizeId: '4x4', heightFt: 7.3, loadLb: 4800, CD: 1 }).ratio // 0.677
 * Reference: NDS 2018 §3.6.3, §3.7.1, §15.3 (built-up columns); HUD Residential Structural Design Guide
 *   (2000) Example 5.6.
 */
export function checkColumn(input: ColumnInput): ColumnCheck {
  requirePositive('heightFt', input.heightFt, 'Post height');
  requireNonNegative('loadLb', input.loadLb, 'Post load');
  requirePositive('CD', input.CD, 'Load duration factor');
  if (input.weakAxisUnbracedFt !== undefined) {
    requirePositive('weakAxisUnbracedFt', input.weakAxisUnbracedFt, 'Weak-axis unbraced length');
  }
  const spec = materialSpec(input.materialId);
  const size = resolveSize(input);
  const warnings: string[] = [];
  const sources = ['NDS 2018 §3.7.1 column stability', `${spec.material.source} reference values`];
  const builtUp = size.plies > 1;
  if (builtUp && size.plies > MAX_BUILT_UP_PLIES) {
    throw new CalcInputError('sizeId', 'Built-up posts are covered for 2 to 5 plies (NDS 15.3.1)');
  }
  const fastening = input.fastening ?? 'nailed';
  const leIn = input.heightFt * IN_PER_FT;
  const axes: ColumnAxis[] = [{ axis: 'across-d', leIn, dIn: size.dIn, Kf: 1 }];
  if (!input.weakAxisBraced) {
    axes.push({
      axis: 'across-b',
      leIn: (input.weakAxisUnbracedFt ?? input.heightFt) * IN_PER_FT,
      dIn: size.bIn,
      Kf: builtUp ? BUILT_UP_KF[fastening] : 1,
    });
  }
  if (builtUp) {
    sources.push('NDS 2018 §15.3 built-up columns');
    warnings.push(
      `Built-up post: plies ${fastening} together as NDS 15.3.3 requires (fastener size, spacing and end distances); K_f = ${BUILT_UP_KF[fastening]} across the plies.`,
    );
    if (spec.family === 'lvl')
      warnings.push("Multi-ply LVL post: confirm with the manufacturer's published column values.");
  }
  if (spec.family === 'glulam') {
    warnings.push(
      'Glulam post checked with the bending stress class values; an axial combination (Table 5B) suits posts better.',
    );
  }
  if (spec.material.generic)
    warnings.push("Generic values: confirm with the manufacturer's published values.");
  if (input.weakAxisBraced) {
    warnings.push(
      'Buckling across the width (weak axis of the plies) taken as braced by the wall along the full height.',
    );
  }

  const capacity = axialCapacity({
    materialId: input.materialId,
    size,
    axes,
    CD: input.CD,
    wet: input.wet ?? false,
  });
  if (!capacity.withinSlendernessLimit) {
    warnings.push('Slenderness l_e/d exceeds 50 (NDS 3.7.1.4): brace the post or use a larger size.');
  }
  const fcPsi = input.loadLb / size.areaIn2;
  const ratio = fcPsi / capacity.FcPrimePsi;
  return {
    materialId: input.materialId,
    sizeLabel: size.label,
    areaIn2: size.areaIn2,
    loadLb: input.loadLb,
    fcPsi,
    FcPrimePsi: capacity.FcPrimePsi,
    capacityLb: capacity.capacityLb,
    ratio,
    pass: ratio <= 1 && capacity.withinSlendernessLimit,
    governingAxis: capacity.governing,
    axes: capacity.axes,
    factors: capacity.factors,
    warnings,
    sources,
  };
}
