import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import { GLULAM_VOLUME_REFERENCE } from '@/lib/calc/factors';
import { materialSpec, type MemberSize } from '@/lib/calc/materials';
import { LOAD_TYPES, type LoadCombination, type LoadType } from '@/lib/calc/types';
import type { CheckId } from '@/shared/schemas/calc/member';
import type { DeflectionPreset } from '@/lib/calc/checks/deflection-presets';
import type { SupportSpec } from '@/lib/calc/checks/evaluate-size';
import type { SectionFactors } from '@/lib/calc/checks/section-factors';

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
  const { wPlfByType: w, selfWeightPlf: sw, preset, support } = spanCase;
  const ei = section.EPrimePsi * section.ixIn4;
  const dFt = spanCase.shearAtD ? section.dIn / IN_PER_FT : 0;
  const perInLb = Math.min(
    Math.min(section.bIn, support.widthIn) * section.FcPerpPrimePsi,
    support.plateFcPerpPsi === null ? Infinity : support.widthIn * support.plateFcPerpPsi,
  );
  const spec = materialSpec(materialId);
  const byCheck: Record<CheckId, number> = {
    bending: Infinity,
    shear: Infinity,
    'deflection-live': Infinity,
    'deflection-total': Infinity,
    bearing: Infinity,
  };
  const combos: Record<CheckId, string> = {
    bending: '',
    shear: '',
    'deflection-live': '',
    'deflection-total': '',
    bearing: '',
  };
  const take = (id: CheckId, spanFt: number, name: string) => {
    if (spanFt < byCheck[id]) {
      byCheck[id] = spanFt;
      combos[id] = name;
    }
  };
  for (const c of spanCase.combinations) {
    const wc = lineLoad(c, w, sw, false);
    if (wc <= 0) continue;
    const FbNoCv = section.FbBasePsi * c.CD;
    const bendingSpan = (FbPsi: number) => Math.sqrt((8 * section.sxIn3 * FbPsi) / (IN_PER_FT * wc));
    if (spec.family === 'glulam') {
      take(
        'bending',
        glulamBendingSpan(
          bendingSpan(FbNoCv),
          size,
          GLULAM_VOLUME_REFERENCE.exponent[spec.stressClass.speciesGroup],
        ),
        c.name,
      );
    } else {
      // C_L = 1.0 here, so where C_V and C_L are not combined (LVL with C_V ≤ 1.0) the lesser is C_V.
      take(
        'bending',
        bendingSpan(FbNoCv * (section.volumeLesserOfCL ? section.sizeFactor.value : 1)),
        c.name,
      );
    }
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
  let governedBy: CheckId = 'bending';
  for (const id of Object.keys(byCheck) as CheckId[]) if (byCheck[id] < byCheck[governedBy]) governedBy = id;
  return { byCheck, spanFt: byCheck[governedBy], governedBy, combination: combos[governedBy] };
}

/** Largest span with 5wL⁴/384EI ≤ L/ratio (and ≤ cap in), ft; ei in lb·in², w in plf. */
function deflectionSpan(eiLbIn2: number, wPlf: number, ratio: number, capIn: number | null): number {
  const byRatio = Math.cbrt((IN_PER_FT * 384 * eiLbIn2) / (5 * IN3_PER_FT3 * ratio * wPlf));
  if (capIn === null) return byRatio;
  const byCap = Math.pow((capIn * 384 * eiLbIn2) / (5 * IN3_PER_FT3 * wPlf), 0.25);
  return Math.min(byRatio, byCap);
}

/**
 * Largest glulam bending span, ft, in closed form (any layout whose moment grows as the span squared). With C_V = (A/L)^e ≤ 1, A = 21 ft·(12/d)(5.125/b),
 * e = 1/10 western or 1/20 Southern Pine (NDS 2018 eq. 5.3-1): the span without C_V is L₀ = √(8·S·F_b/w);
 * if L₀ ≤ A then C_V = 1 there and L₀ is the span, else w·L²/(8S) = F_b·(A/L)^e gives
 * L = (L₀²·A^e)^(1/(2 + e)).
 * @param spanWithoutCvFt the bending span with C_V = 1, ft; size the glulam size (in); exponent e
 * @example glulamBendingSpan(30, getSize('glulam-24f-v4-df', '5.125x12'), 0.1); // < 30
 * Reference: NDS 2018 §5.3.6, equation 5.3-1.
 */
export function glulamBendingSpan(spanWithoutCvFt: number, size: MemberSize, exponent: number): number {
  const ref = GLULAM_VOLUME_REFERENCE;
  const bIn = Math.min(size.bIn, ref.maxWidthIn);
  const aFt = ref.lengthFt * (ref.depthIn / size.dIn) * (ref.widthIn / bIn);
  if (spanWithoutCvFt <= aFt) return spanWithoutCvFt;
  return Math.pow(spanWithoutCvFt * spanWithoutCvFt * Math.pow(aFt, exponent), 1 / (2 + exponent));
}
