import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import type { MemberSize } from '@/lib/calc/materials';
import { LOAD_TYPES, type LoadCombination, type LoadType } from '@/lib/calc/types';
import type { CheckId } from '@/shared/schemas/calc/member';
import type { DeflectionPreset } from '@/lib/calc/checks/deflection-presets';
import type { SupportSpec } from '@/lib/calc/checks/evaluate-size';
import type { SectionFactors } from '@/lib/calc/checks/section-factors';
import { spanLimitSolver } from './span-limit-solver';

const IN_PER_FT = 12;

/** What limits a uniformly loaded simple span, each check's largest design span (ft). */
export interface UniformSpanLimits {
  byCheck: Record<CheckId, number>;
  spanFt: number;
  governedBy: CheckId;
  combination: string;
}

/** The uniform full-span loads and the rules a span is solved under. */
export interface UniformSpanCase {
  /** Full-span line loads by type, plf (self-weight apart). */
  wPlfByType: Record<LoadType, number>;
  combinations: readonly LoadCombination[];
  selfWeightPlf: number;
  preset: DeflectionPreset;
  deflectionCapIn: number | null;
  creepKcr: number;
  sustainedLiveFraction: number;
  shearAtD: boolean;
  /** Bearing length at each end, in. */
  bearingIn: number;
  support: SupportSpec;
}

function lineLoad(c: LoadCombination, w: Record<LoadType, number>, sw: number, skipDead: boolean): number {
  let total = skipDead ? 0 : sw * (c.factors.D ?? 0);
  for (const t of LOAD_TYPES) if (!(skipDead && t === 'D')) total += (c.factors[t] ?? 0) * w[t];
  return total;
}

/**
 * The largest design span (ft) a braced member carries under uniform full-span loads, for each check, in
 * closed form from the simple-span formulas (M = wl²/8, V at d = w(l/2 − d), Δ = 5wl⁴/384EI, R = wl/2) per ASD
 * combination, glulam bending too (its volume factor C_V is a power of the span, so the limit stays a closed
 * form). The top edge is taken as braced (C_L = 1.0), as for joists and headers under framing.
 *
 * @param materialId material; size member size (in); section its factors (in, psi) from sectionFactors
 * @param spanCase loads (plf), combinations, limits and support
 * @returns largest design span per check (ft), the governing check and its combination
 * @example uniformSpanLimits(id, size, section, spanCase).spanFt; // e.g. 14.87 for HUD Example 5.1 bending
 * Reference: AWC Design Aid No. 6 (2007) case 1; NDS 2018 §3.3, §3.4.3.1, §3.5.2, §3.10; HUD RSDG (2000) Example 5.1.
 */
export function uniformSpanLimits(
  materialId: string,
  size: MemberSize,
  section: SectionFactors,
  spanCase: UniformSpanCase,
): UniformSpanLimits {
  const { wPlfByType: w, selfWeightPlf: sw, preset } = spanCase;
  const solver = spanLimitSolver(materialId, size, section, spanCase);
  const { eiLbIn2: ei, dFt, bearingLbPerIn: perInLb, take } = solver;
  for (const c of spanCase.combinations) {
    const wc = lineLoad(c, w, sw, false);
    if (wc <= 0) continue;
    solver.takeBending(c, (FbPsi) => Math.sqrt((8 * section.sxIn3 * FbPsi) / (IN_PER_FT * wc)));
    take('shear', 2 * ((section.FvBasePsi * c.CD * section.areaIn2) / (1.5 * wc) + dFt), c.name);
    take('bearing', (2 * perInLb * spanCase.bearingIn) / wc, c.name);
    const wVar = lineLoad(c, w, sw, true);
    if (wVar > 0) {
      take('deflection-live', deflectionSpan(ei, wVar, preset.liveRatio, null), c.name);
    }
    const sustained = w.D + sw + Math.min(spanCase.sustainedLiveFraction, c.factors.L ?? 0) * w.L;
    const wTotal = wc + (spanCase.creepKcr - 1) * sustained;
    take('deflection-total', deflectionSpan(ei, wTotal, preset.totalRatio, spanCase.deflectionCapIn), c.name);
  }
  return solver.result();
}

/** Largest span with 5wL⁴/384EI ≤ L/ratio (and ≤ cap in), ft; ei in lb·in², w in plf. */
function deflectionSpan(eiLbIn2: number, wPlf: number, ratio: number, capIn: number | null): number {
  const byRatio = Math.cbrt((IN_PER_FT * 384 * eiLbIn2) / (5 * IN3_PER_FT3 * ratio * wPlf));
  if (capIn === null) return byRatio;
  const byCap = Math.pow((capIn * 384 * eiLbIn2) / (5 * IN3_PER_FT3 * wPlf), 0.25);
  return Math.min(byRatio, byCap);
}
