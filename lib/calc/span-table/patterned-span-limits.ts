import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import {
  blankStateLike,
  combineStates,
  stateMaxEiDeflectionBetween,
  stateMaxMoment,
  stateShearLb,
  type SpanState,
} from '@/lib/calc/analysis/span-state';
import { supportedBeamState, type SupportedBeam } from '@/lib/calc/analysis/supported-beam-state';
import { liveLoadPatterns, patternedName, patternFactor } from '@/lib/calc/loads';
import type { MemberSize } from '@/lib/calc/materials';
import { LOAD_TYPES, type LoadCombination } from '@/lib/calc/types';
import type { SpanTableLayout } from '@/shared/schemas/calc/span-table';
import type { SectionFactors } from '@/lib/calc/checks/section-factors';
import { spanLimitSolver } from './span-limit-solver';
import type { UniformSpanCase, UniformSpanLimits } from './uniform-span-limits';

const IN_PER_FT = 12;

/** One region of the unit member (span length 1): where it is and the length its deflection limit divides. */
interface UnitRegion {
  name: string;
  from: number;
  to: number;
  /** Limit length per unit span: 1 for a span, twice the overhang for a cantilevered end. */
  limitLength: number;
}

/** A combination and live-load pattern, as factors per region on the unit states. */
interface UnitCombination {
  combination: LoadCombination;
  /** Per region: 1 where the variable loads are placed, the off-pattern factor elsewhere, per load type. */
  loaded: boolean[] | null;
}

/**
 * What a layout's span table shares across sizes and widths: unit states (member of span 1 ft, loads of
 * 1 plf) for the whole member and for each region, the support sides, the regions, and the combinations with
 * their patterns.
 */
export interface PatternedLayout {
  layout: Exclude<SpanTableLayout, 'simple'>;
  whole: SpanState;
  byRegion: SpanState[];
  regions: UnitRegion[];
  supportsFt: readonly number[];
  combinations: UnitCombination[];
  scratch: SpanState;
  variableScratch: SpanState;
}

/**
 * The unit member of a layout: two equal spans continuous over a centre post, or one span with an overhang
 * of `overhangFraction` of it past the right support; combinations of the edition with live loads placed
 * span by span (every non-empty set of regions; snow at half off the pattern).
 *
 * @param layout 'two-span' or 'overhang'; overhangFraction overhang / span, dimensionless
 * @param combinations the edition's combinations that carry load
 * @returns the unit states and combinations (ft, lb, per plf)
 * @example patternedLayout('two-span', 0.25, active).combinations.length;
 * Reference: AWC Design Aid No. 6 (2007) continuous and overhanging beams; ASCE 7-16 §4.3.3, §7.5.
 */
export function patternedLayout(
  layout: Exclude<SpanTableLayout, 'simple'>,
  overhangFraction: number,
  combinations: readonly LoadCombination[],
): PatternedLayout {
  const beam: SupportedBeam =
    layout === 'two-span'
      ? { lengthFt: 2, supportsFt: [0, 1, 2] }
      : { lengthFt: 1 + overhangFraction, supportsFt: [0, 1] };
  const bounds =
    layout === 'two-span'
      ? [
          { name: 'left span', startFt: 0, endFt: 1, limitLength: 1 },
          { name: 'right span', startFt: 1, endFt: 2, limitLength: 1 },
        ]
      : [
          { name: 'span', startFt: 0, endFt: 1, limitLength: 1 },
          { name: 'overhang', startFt: 1, endFt: 1 + overhangFraction, limitLength: 2 * overhangFraction },
        ];
  const xs = [...new Set([0, ...beam.supportsFt, beam.lengthFt])].sort((a, b) => a - b);
  const whole = supportedBeamState(beam, [{ kind: 'uniform', wPlf: 1 }], xs);
  const byRegion = bounds.map((r) =>
    supportedBeamState(beam, [{ kind: 'uniform', wPlf: 1, startFt: r.startFt, endFt: r.endFt }], xs),
  );
  const regions = bounds.map((r) => ({
    name: r.name,
    from: xs.indexOf(r.startFt),
    to: xs.indexOf(r.endFt),
    limitLength: r.limitLength,
  }));
  const patterns = liveLoadPatterns(bounds.map(() => true));
  const out: UnitCombination[] = [];
  for (const combination of combinations) {
    out.push({ combination, loaded: null });
    const variable = LOAD_TYPES.some((t) => t !== 'D' && combination.factors[t] !== undefined);
    if (!variable) continue;
    for (const pattern of patterns.slice(1)) {
      const names = pattern.map((r) => bounds[r].name);
      out.push({
        combination: { ...combination, name: patternedName(combination, names) },
        loaded: bounds.map((_, r) => pattern.includes(r)),
      });
    }
  }
  return {
    layout,
    whole,
    byRegion,
    regions,
    supportsFt: beam.supportsFt,
    combinations: out,
    scratch: blankStateLike(whole),
    variableScratch: blankStateLike(whole),
  };
}

/** Largest span with coefficient · l⁴ · 1728/EI ≤ limitLength · l · 12/ratio (and ≤ cap in), ft. */
function deflectionSpan(
  eiLbIn2: number,
  eiUnit: number,
  limitLength: number,
  ratio: number,
  capIn: number | null,
): number {
  if (eiUnit <= 0) return Infinity;
  const byRatio = Math.cbrt((IN_PER_FT * limitLength * eiLbIn2) / (ratio * IN3_PER_FT3 * eiUnit));
  if (capIn === null) return byRatio;
  return Math.min(byRatio, Math.pow((capIn * eiLbIn2) / (IN3_PER_FT3 * eiUnit), 0.25));
}

/**
 * The largest span a braced member carries in a two-span or overhanging layout under uniform loads, for each
 * check, per combination and live-load pattern. Responses of a layout scale with its span l at fixed line
 * loads — moment as l², shear and reactions as l, deflection as l⁴ — so each limit is solved in closed form
 * from the unit member's numbers: bending √(S·F'_b/M₁) (glulam with C_V over the span), shear at d
 * (F'_v·A/1.5 + w·d)/V₁ at every support side, bearing at every support, live and total (creep) deflection
 * span by span and on the overhang against twice its length. Shear at d here is the shear of the fully
 * loaded member at d from each support (w·d less than at the support); the member check instead analyses
 * the member with the load within d left out (NDS 3.4.3.1 read literally), which can differ slightly next to
 * a centre post — at the support (shearAtD false) the two agree exactly.
 *
 * @param materialId material; size member size (in); section its factors (in, psi)
 * @param spanCase loads (plf), limits and support, as for uniformSpanLimits
 * @param unit the layout from patternedLayout
 * @returns largest span per check (ft, the span between supports), the governing check and combination
 * @example patternedSpanLimits(id, size, section, spanCase, patternedLayout('two-span', 0.25, active)).spanFt;
 * Reference: AWC Design Aid No. 6 (2007) two equal spans, beam overhanging one support; NDS 2018 §3.3,
 * §3.4.3.1, §3.5.2, §3.10; ASCE 7-16 §4.3.3, §7.5; IBC 2018 Table 1604.3 footnote (cantilevers, from memory).
 */
export function patternedSpanLimits(
  materialId: string,
  size: MemberSize,
  section: SectionFactors,
  spanCase: UniformSpanCase,
  unit: PatternedLayout,
): UniformSpanLimits {
  const { wPlfByType: w, selfWeightPlf: sw, preset } = spanCase;
  const solver = spanLimitSolver(materialId, size, section, spanCase);
  const { eiLbIn2: ei, dFt, bearingLbPerIn: perInLb, take } = solver;
  const regionCount = unit.regions.length;
  const states = [unit.whole, ...unit.byRegion];
  const coeffs = states.map(() => 0);
  const variableCoeffs = states.map(() => 0);
  const creepCoeffs = states.map(() => 0);
  const extra = spanCase.creepKcr - 1;
  for (const { combination: c, loaded } of unit.combinations) {
    const dead = (c.factors.D ?? 0) * (w.D + sw);
    coeffs[0] = dead;
    variableCoeffs[0] = 0;
    creepCoeffs[0] = dead + extra * (w.D + sw);
    const sustainedLive = Math.min(spanCase.sustainedLiveFraction, c.factors.L ?? 0) * w.L;
    for (let r = 0; r < regionCount; r++) {
      const on = loaded === null || loaded[r];
      let a = 0;
      for (const t of LOAD_TYPES) if (t !== 'D') a += (c.factors[t] ?? 0) * w[t] * patternFactor(t, on);
      coeffs[r + 1] = a;
      variableCoeffs[r + 1] = a;
      creepCoeffs[r + 1] = a + (on ? extra * sustainedLive : 0);
    }
    const state = combineStates(unit.scratch, states, coeffs);
    const momentUnit = Math.abs(stateMaxMoment(state).value);
    if (momentUnit <= 0) continue;
    solver.takeBending(c, (FbPsi) => Math.sqrt((section.sxIn3 * FbPsi) / (IN_PER_FT * momentUnit)));
    const vAllowLb = (section.FvBasePsi * c.CD * section.areaIn2) / 1.5;
    unit.supportsFt.forEach((s, i) => {
      for (const side of ['before', 'after'] as const) {
        if ((side === 'before' && s <= 0) || (side === 'after' && s >= state.spanFt)) continue;
        const vUnit = Math.abs(stateShearLb(state, s, side));
        if (vUnit <= 0) continue;
        const segment = state.xs.indexOf(s) - (side === 'before' ? 1 : 0);
        take('shear', (vAllowLb + state.wPlf[segment] * dFt) / vUnit, c.name);
      }
      const reactionUnit = state.reactionsLb[i];
      if (reactionUnit > 0) take('bearing', (perInLb * spanCase.bearingIn) / reactionUnit, c.name);
    });
    const variable = combineStates(unit.variableScratch, states, variableCoeffs);
    for (let r = 0; r < regionCount; r++) {
      const { from, to, limitLength } = unit.regions[r];
      const eiLive = Math.abs(stateMaxEiDeflectionBetween(variable, from, to).value);
      take('deflection-live', deflectionSpan(ei, eiLive, limitLength, preset.liveRatio, null), c.name);
    }
    const creep = combineStates(unit.variableScratch, states, creepCoeffs);
    for (let r = 0; r < regionCount; r++) {
      const { from, to, limitLength } = unit.regions[r];
      const eiTotal = Math.abs(stateMaxEiDeflectionBetween(creep, from, to).value);
      take(
        'deflection-total',
        deflectionSpan(ei, eiTotal, limitLength, preset.totalRatio, spanCase.deflectionCapIn),
        c.name,
      );
    }
  }
  return solver.result();
}
