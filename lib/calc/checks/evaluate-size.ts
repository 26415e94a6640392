import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import { combineStates, stateMaxEiDeflectionBetween, stateMaxMoment } from '@/lib/calc/analysis/span-state';
import { beamStabilityFactor, type BeamStability } from '@/lib/calc/factors';
import { CalcInputError } from '@/lib/calc/types';
import type { CheckId } from '@/shared/schemas/calc/member';
import { DEFLECTION_PRESETS } from './deflection-presets';
import { endShearsFor, type PreparedMember } from './prepare-member';
import type { SectionFactors } from './section-factors';

const IN_PER_FT = 12;

/** Support geometry and strength for the bearing check. */
export interface SupportSpec {
  kind: 'jacks' | 'post';
  /** Support width across the member, in. */
  widthIn: number;
  /** F'_c⊥ of the plate under the jacks, psi (jacks only). */
  plateFcPerpPsi: number | null;
}

/** One check's numbers for one size: demand and capacity in `unit`, ratio, the governing combination. */
export interface CheckNumbers {
  id: CheckId;
  demand: number;
  capacity: number;
  ratio: number;
  /** Index into prepared.combinations. */
  combinationIndex: number;
}

/** Bending numbers: moment lb·ft, C_D and the beam stability result of the governing combination (NDS 2018 §3.3). */
export interface BendingNumbers extends CheckNumbers {
  momentLbFt: number;
  CD: number;
  stability: BeamStability;
  /** C_L or C_V actually used (glulam, and LVL with C_V ≤ 1.0, take the lesser). */
  volumeOrStability: 'C_L' | 'C_V';
}

/** Bearing numbers: largest reactions lb, required bearing length in, and what governs (NDS 2018 §3.10). */
export interface BearingNumbers extends CheckNumbers {
  leftLb: number;
  rightLb: number;
  /** Largest reaction at each support, lb, left to right (a centre post between the ends). */
  reactionsLb: number[];
  /** Bearing length needed at each support, in. */
  requiredLengthsIn: number[];
  /** Bearing length needed at the more heavily loaded end, in (the jack studs' count). */
  requiredLengthIn: number;
  /** The support whose bearing governs (index into reactionsLb). */
  supportIndex: number;
  governedBy: 'member' | 'plate';
}

/** A deflection check's numbers: the limit of the span or overhang that governs, and which one it is. */
export interface DeflectionNumbers extends CheckNumbers {
  limitIn: number;
  /** Index into prepared.geometry.regions. */
  regionIndex: number;
}

/** A size's result in numbers only (the shortlist keeps these; the member check describes them). */
export interface SizeEvaluation {
  selfWeightPlf: number;
  eiLbIn2: number;
  bending: BendingNumbers;
  /** Shear: the design shear (lb) and the support it is next to. */
  shear: CheckNumbers & { shearLb: number; CD: number; supportIndex: number };
  deflectionLive: DeflectionNumbers;
  deflectionTotal: DeflectionNumbers & { capGoverns: boolean };
  bearing: BearingNumbers;
  governing: CheckNumbers;
  pass: boolean;
}

/**
 * Checks one size against a prepared member, per ASD combination (and live-load pattern): bending
 * f_b = M/S against F'_b (C_D and C_L per combination), shear f_v = 3V/2A against F'_v (at d from the
 * supports when asked), live deflection (the variable part of each combination) and total deflection with
 * creep (K_cr·Δ_sustained + Δ_short, NDS 3.5.2) against the use's limits and any absolute cap — span by span,
 * an overhang against twice its length — and bearing at every support on the member and on the plate under
 * the jacks (no C_D: F_c⊥ never takes it). Self-weight is added to every combination by superposition;
 * nothing is re-analysed. A combination is solved exactly for bending or total deflection only when its
 * upper bound (base maximum + self-weight maximum) could beat the worst exact value so far, so results are
 * exact and cheap.
 *
 * @param prepared from prepareMember
 * @param section from sectionFactors (in, psi)
 * @param selfWeightPlf the size's self-weight, plf (ignored when the input turns self-weight off)
 * @param support bearing support (in, psi)
 * @returns demand/capacity numbers per check and the governing one
 * @example evaluateSize(prepared, section, 3.2, { kind: 'jacks', widthIn: 3.5, plateFcPerpPsi: 425 }).governing.ratio;
 * Reference: NDS 2018 §3.3 (bending), §3.4 (shear), §3.5 (deflection), §3.10 (bearing), Table 2.3.2 (C_D);
 * IBC 2018 Table 1604.3 footnote (cantilevers: twice the length, from memory).
 */
export function evaluateSize(
  prepared: PreparedMember,
  section: SectionFactors,
  selfWeightPlf: number,
  support: SupportSpec,
): SizeEvaluation {
  const { input, geometry, combinations, scratch, unitSelfWeight, regionRanges } = prepared;
  const s = prepared.selfWeight ? selfWeightPlf : 0;
  const regions = geometry.regions;
  const regionCount = regions.length;
  const unitMoment = prepared.unitSelfWeightMaxima.momentLbFt;
  const unitEi = prepared.unitSelfWeightMaxima.eiByRegion;
  const eiLbIn2 = section.EPrimePsi * section.ixIn4;
  const unbracedIn = input.unbracedLengthFt === undefined ? null : input.unbracedLengthFt * IN_PER_FT;
  const dFt = (input.shearAtD ?? true) ? section.dIn / IN_PER_FT : 0;
  const shears = endShearsFor(prepared, dFt);
  const groupShears = shears.byGroup;
  const sideCount = shears.unitSelfWeight.length;
  const preset = DEFLECTION_PRESETS[input.deflectionUse ?? 'floor'];
  const capIn = input.deflectionCapIn ?? Infinity;
  const liveLimits = regions.map((r) => (r.limitLengthFt * IN_PER_FT) / preset.liveRatio);
  const ratioLimits = regions.map((r) => (r.limitLengthFt * IN_PER_FT) / preset.totalRatio);
  const totalLimits = ratioLimits.map((limit) => Math.min(limit, capIn));
  const toIn = IN3_PER_FT3 / eiLbIn2;
  const lesser = section.volumeLesserOfCL;
  const Kcr = prepared.creepKcr;
  const n = combinations.length;
  const supportCount = geometry.supportsFt.length;
  const { FbPrime, stabilities, bendBound, totalBound } = prepared.work;
  bendBound.fill(-1);
  totalBound.fill(-1);

  let shear: SizeEvaluation['shear'] | null = null;
  const live: SizeEvaluation['deflectionLive'] = {
    id: 'deflection-live',
    demand: 0,
    capacity: liveLimits[0],
    ratio: 0,
    combinationIndex: 0,
    limitIn: liveLimits[0],
    regionIndex: 0,
  };
  const reactionsLb = geometry.supportsFt.map(() => 0);
  let largestReactionLb = 0;
  let reactionIndex = 0;

  for (let c = 0; c < n; c++) {
    const prep = combinations[c];
    if (prep.skipped) continue;
    const { CD, factors } = prep.combination;
    const swPlf = s * (factors.D ?? 0);
    const stability = beamStabilityFactor({
      bIn: section.bIn,
      dIn: section.dIn,
      unbracedLengthIn: unbracedIn,
      loadCase: prepared.stabilityCase,
      EminAdjPsi: section.EminPrimePsi,
      FbStarPsi: section.FbStarBasePsi * CD,
    });
    stabilities[c] = stability;
    FbPrime[c] =
      section.FbBasePsi * CD * (lesser ? Math.min(stability.CL, section.sizeFactor.value) : stability.CL);
    bendBound[c] = ((prep.maxMomentLbFt + swPlf * unitMoment) * IN_PER_FT) / section.sxIn3 / FbPrime[c];
    let worstTotal = 0;
    for (let r = 0; r < regionCount; r++) {
      const bound = ((prep.eiTotalByRegion[r] + Kcr * swPlf * unitEi[r]) * toIn) / totalLimits[r];
      if (bound > worstTotal) worstTotal = bound;
    }
    totalBound[c] = worstTotal;

    let shearLb = 0;
    let shearSide = 0;
    for (let i = 0; i < sideCount; i++) {
      let v = shears.unitSelfWeight[i] * swPlf;
      for (let g = 0; g < groupShears.length; g++) v += prep.coeffs[g] * groupShears[g][i];
      if (Math.abs(v) > shearLb) {
        shearLb = Math.abs(v);
        shearSide = i;
      }
    }
    const fv = (1.5 * shearLb) / section.areaIn2;
    const FvPrime = section.FvBasePsi * CD;
    if (!shear || fv / FvPrime > shear.ratio) {
      shear = {
        id: 'shear',
        demand: fv,
        capacity: FvPrime,
        ratio: fv / FvPrime,
        combinationIndex: c,
        shearLb,
        CD,
        supportIndex: shears.sideSupport[shearSide],
      };
    }

    let largestHere = 0;
    for (let i = 0; i < supportCount; i++) {
      const reaction = prep.state.reactionsLb[i] + swPlf * unitSelfWeight.reactionsLb[i];
      if (reaction > largestHere) largestHere = reaction;
      if (reaction > reactionsLb[i]) reactionsLb[i] = reaction;
    }
    if (largestHere > largestReactionLb) {
      largestReactionLb = largestHere;
      reactionIndex = c;
    }

    for (let r = 0; r < regionCount; r++) {
      const liveIn = prep.eiVariableByRegion[r] * toIn;
      const ratio = liveIn / liveLimits[r];
      if (ratio > live.ratio) {
        live.demand = liveIn;
        live.capacity = liveLimits[r];
        live.limitIn = liveLimits[r];
        live.ratio = ratio;
        live.combinationIndex = c;
        live.regionIndex = r;
      }
    }
  }
  if (!shear) throw new CalcInputError('sources', 'No load combination carries load: add a load source');

  let bending: BendingNumbers | null = null;
  const firstBend = largestIndex(bendBound);
  for (let k = -1; k < n; k++) {
    const c = k < 0 ? firstBend : k;
    if ((k >= 0 && c === firstBend) || bendBound[c] < 0 || (bending && bendBound[c] <= bending.ratio))
      continue;
    const prep = combinations[c];
    combineStates(scratch, [prep.state, unitSelfWeight], [1, s * (prep.combination.factors.D ?? 0)]);
    const momentLbFt = Math.abs(stateMaxMoment(scratch).value);
    const fb = (momentLbFt * IN_PER_FT) / section.sxIn3;
    const stability = stabilities[c] as BeamStability;
    if (!bending || fb / FbPrime[c] > bending.ratio) {
      bending = {
        id: 'bending',
        demand: fb,
        capacity: FbPrime[c],
        ratio: fb / FbPrime[c],
        combinationIndex: c,
        momentLbFt,
        CD: prep.combination.CD,
        stability,
        volumeOrStability: lesser && section.sizeFactor.value < stability.CL ? 'C_V' : 'C_L',
      };
    }
  }

  let total: SizeEvaluation['deflectionTotal'] | null = null;
  const firstTotal = largestIndex(totalBound);
  for (let k = -1; k < n; k++) {
    const c = k < 0 ? firstTotal : k;
    if ((k >= 0 && c === firstTotal) || totalBound[c] < 0 || (total && totalBound[c] <= total.ratio))
      continue;
    const prep = combinations[c];
    const coeffs = prep.creepCoeffs;
    coeffs[coeffs.length - 1] = s * (prep.combination.factors.D ?? 0) * Kcr;
    combineStates(scratch, prepared.groupAndUnitStates, coeffs);
    for (let r = 0; r < regionCount; r++) {
      const range = regionRanges[r];
      const totalIn = Math.abs(stateMaxEiDeflectionBetween(scratch, range[0], range[1]).value) * toIn;
      const ratio = totalIn / totalLimits[r];
      if (!total || ratio > total.ratio) {
        total = {
          id: 'deflection-total',
          demand: totalIn,
          capacity: totalLimits[r],
          ratio,
          combinationIndex: c,
          limitIn: totalLimits[r],
          regionIndex: r,
          capGoverns: capIn < ratioLimits[r],
        };
      }
    }
  }
  if (!bending || !total)
    throw new CalcInputError('sources', 'No load combination carries load: add a load source');

  const bearing = bearingNumbers(section, support, reactionsLb, geometry.bearingsIn);
  bearing.combinationIndex = reactionIndex;
  const checks: CheckNumbers[] = [bending, shear, live, total, bearing];
  let governing = checks[0];
  for (const check of checks) {
    if (!Number.isFinite(check.ratio)) {
      throw new CalcInputError(
        'sources',
        'These loads give numbers past what the checks can compare: enter loads within the stated limits',
      );
    }
    if (check.ratio > governing.ratio) governing = check;
  }
  return {
    selfWeightPlf: s,
    eiLbIn2,
    bending,
    shear,
    deflectionLive: live,
    deflectionTotal: total,
    bearing,
    governing,
    pass: checks.every((check) => check.ratio <= 1) && bending.stability.withinSlendernessLimit,
  };
}

/** Index of the largest bound (the combination most likely to govern, solved first so the rest can be skipped). */
function largestIndex(bounds: readonly number[]): number {
  let best = 0;
  for (let i = 1; i < bounds.length; i++) if (bounds[i] > bounds[best]) best = i;
  return best;
}

function bearingNumbers(
  section: SectionFactors,
  support: SupportSpec,
  reactionsLb: number[],
  bearingsIn: readonly number[],
): BearingNumbers {
  const memberPerInLb = Math.min(section.bIn, support.widthIn) * section.FcPerpPrimePsi;
  const platePerInLb = support.plateFcPerpPsi === null ? Infinity : support.widthIn * support.plateFcPerpPsi;
  const perInLb = Math.min(memberPerInLb, platePerInLb);
  const requiredLengthsIn = reactionsLb.map((r) => r / perInLb);
  let worst = 0;
  for (let i = 1; i < reactionsLb.length; i++) {
    if (requiredLengthsIn[i] / bearingsIn[i] > requiredLengthsIn[worst] / bearingsIn[worst]) worst = i;
  }
  const last = reactionsLb.length - 1;
  return {
    id: 'bearing',
    demand: requiredLengthsIn[worst],
    capacity: bearingsIn[worst],
    ratio: requiredLengthsIn[worst] / bearingsIn[worst],
    combinationIndex: 0,
    leftLb: reactionsLb[0],
    rightLb: reactionsLb[last],
    reactionsLb,
    requiredLengthsIn,
    requiredLengthIn: Math.max(requiredLengthsIn[0], requiredLengthsIn[last]),
    supportIndex: worst,
    governedBy: platePerInLb < memberPerInLb ? 'plate' : 'member',
  };
}
