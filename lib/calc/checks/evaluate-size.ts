import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import { combineStates, stateMaxEiDeflection, stateMaxMoment } from '@/lib/calc/analysis/span-state';
import { beamStabilityFactor, type BeamStability } from '@/lib/calc/factors';
import { CalcInputError, LOAD_TYPES } from '@/lib/calc/types';
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
  /** Bearing length needed at the more heavily loaded end, in. */
  requiredLengthIn: number;
  governedBy: 'member' | 'plate';
}

/** A size's result in numbers only (the shortlist keeps these; the member check describes them). */
export interface SizeEvaluation {
  selfWeightPlf: number;
  eiLbIn2: number;
  bending: BendingNumbers;
  shear: CheckNumbers & { shearLb: number; CD: number };
  deflectionLive: CheckNumbers & { limitIn: number };
  deflectionTotal: CheckNumbers & { limitIn: number; capGoverns: boolean };
  bearing: BearingNumbers;
  governing: CheckNumbers;
  pass: boolean;
}

/** Largest moment (lb·ft per plf) and E·I·deflection (lb·ft³ per plf) of a 1 plf full-span load: wl²/8, 5wl⁴/384. */
function unitUniformMaxima(spanFt: number): { momentLbFt: number; eiDeflection: number } {
  const l2 = spanFt * spanFt;
  return { momentLbFt: l2 / 8, eiDeflection: (5 * l2 * l2) / 384 };
}

/**
 * Checks one size against a prepared member, per ASD combination: bending f_b = M/S against
 * F'_b (C_D and C_L per combination), shear f_v = 3V/2A against F'_v (at d from the supports when asked),
 * live deflection (the variable part of each combination) and total deflection with creep
 * (K_cr·Δ_sustained + Δ_short, NDS 3.5.2) against the use's limits and any absolute cap, and bearing on the
 * member and on the plate under the jacks (no C_D: F_c⊥ never takes it). Self-weight is added to every
 * combination by superposition; nothing is re-analysed. A combination is solved exactly for bending or
 * total deflection only when its upper bound (base maximum + self-weight maximum, AWC Design Aid No. 6
 * case 1) could beat the worst exact value so far, so results are exact and cheap.
 *
 * @param prepared from prepareMember
 * @param section from sectionFactors (in, psi)
 * @param selfWeightPlf the size's self-weight, plf (ignored when the input turns self-weight off)
 * @param support bearing support (in, psi)
 * @returns demand/capacity numbers per check and the governing one
 * @example evaluateSize(prepared, section, 3.2, { kind: 'jacks', widthIn: 3.5, plateFcPerpPsi: 425 }).governing.ratio;
 * Reference: NDS 2018 §3.3 (bending), §3.4 (shear), §3.5 (deflection), §3.10 (bearing), Table 2.3.2 (C_D).
 */
export function evaluateSize(
  prepared: PreparedMember,
  section: SectionFactors,
  selfWeightPlf: number,
  support: SupportSpec,
): SizeEvaluation {
  const { input, spans, combinations, scratch, unitSelfWeight } = prepared;
  const s = prepared.selfWeight ? selfWeightPlf : 0;
  const L = spans.designSpanFt;
  const unit = unitUniformMaxima(L);
  const eiLbIn2 = section.EPrimePsi * section.ixIn4;
  const unbracedIn = input.unbracedLengthFt === undefined ? null : input.unbracedLengthFt * IN_PER_FT;
  const dFt = (input.shearAtD ?? true) ? section.dIn / IN_PER_FT : 0;
  const shears = endShearsFor(prepared, dFt);
  const preset = DEFLECTION_PRESETS[input.deflectionUse ?? 'floor'];
  const liveLimitIn = (L * IN_PER_FT) / preset.liveRatio;
  const ratioLimitIn = (L * IN_PER_FT) / preset.totalRatio;
  const capIn = input.deflectionCapIn ?? Infinity;
  const totalLimitIn = Math.min(ratioLimitIn, capIn);
  const toIn = IN3_PER_FT3 / eiLbIn2;
  const lesser = section.volumeLesserOfCL;
  const Kcr = prepared.creepKcr;
  const n = combinations.length;
  const { FbPrime, stabilities, bendBound, totalBound } = prepared.work;
  bendBound.fill(-1);
  totalBound.fill(-1);

  let shear: SizeEvaluation['shear'] | null = null;
  const live: SizeEvaluation['deflectionLive'] = {
    id: 'deflection-live',
    demand: 0,
    capacity: liveLimitIn,
    ratio: 0,
    combinationIndex: 0,
    limitIn: liveLimitIn,
  };
  let leftLb = 0;
  let rightLb = 0;
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
    bendBound[c] = ((prep.maxMomentLbFt + swPlf * unit.momentLbFt) * IN_PER_FT) / section.sxIn3 / FbPrime[c];
    totalBound[c] = (prep.eiTotalDeflection + Kcr * swPlf * unit.eiDeflection) * toIn;

    let vLeft = shears.unitSelfWeight[0] * swPlf;
    let vRight = shears.unitSelfWeight[1] * swPlf;
    for (const t of LOAD_TYPES) {
      const f = factors[t] ?? 0;
      vLeft += f * shears.byType[t][0];
      vRight += f * shears.byType[t][1];
    }
    const shearLb = Math.max(vLeft, vRight);
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
      };
    }

    const rL = prep.state.reactionsLb[0] + (swPlf * L) / 2;
    const rR = prep.state.reactionsLb[1] + (swPlf * L) / 2;
    if (Math.max(rL, rR) > Math.max(leftLb, rightLb)) reactionIndex = c;
    leftLb = Math.max(leftLb, rL);
    rightLb = Math.max(rightLb, rR);

    const liveIn = Math.abs(prep.eiVariableDeflection.value) * toIn;
    if (liveIn > live.demand) {
      live.demand = liveIn;
      live.ratio = liveIn / liveLimitIn;
      live.combinationIndex = c;
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
  const extra = Kcr - 1;
  const firstTotal = largestIndex(totalBound);
  for (let k = -1; k < n; k++) {
    const c = k < 0 ? firstTotal : k;
    if ((k >= 0 && c === firstTotal) || totalBound[c] < 0 || (total && totalBound[c] <= total.demand))
      continue;
    const prep = combinations[c];
    combineStates(
      scratch,
      [prep.state, prepared.deadState, prepared.liveState, unitSelfWeight],
      [1, extra, extra * prep.sustainedLiveFactor, s * (prep.combination.factors.D ?? 0) * Kcr],
    );
    const totalIn = Math.abs(stateMaxEiDeflection(scratch).value) * toIn;
    if (!total || totalIn > total.demand) {
      total = {
        id: 'deflection-total',
        demand: totalIn,
        capacity: totalLimitIn,
        ratio: totalIn / totalLimitIn,
        combinationIndex: c,
        limitIn: totalLimitIn,
        capGoverns: capIn < ratioLimitIn,
      };
    }
  }
  if (!bending || !total)
    throw new CalcInputError('sources', 'No load combination carries load: add a load source');

  const bearing = bearingNumbers(
    section,
    support,
    leftLb,
    rightLb,
    spans.bearingLeftIn,
    spans.bearingRightIn,
  );
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
  leftLb: number,
  rightLb: number,
  bearingLeftIn: number,
  bearingRightIn: number,
): BearingNumbers {
  const memberPerInLb = Math.min(section.bIn, support.widthIn) * section.FcPerpPrimePsi;
  const platePerInLb = support.plateFcPerpPsi === null ? Infinity : support.widthIn * support.plateFcPerpPsi;
  const perInLb = Math.min(memberPerInLb, platePerInLb);
  const leftRequiredIn = leftLb / perInLb;
  const rightRequiredIn = rightLb / perInLb;
  const leftWorse = leftRequiredIn / bearingLeftIn >= rightRequiredIn / bearingRightIn;
  const demand = leftWorse ? leftRequiredIn : rightRequiredIn;
  const capacity = leftWorse ? bearingLeftIn : bearingRightIn;
  return {
    id: 'bearing',
    demand,
    capacity,
    ratio: demand / capacity,
    combinationIndex: 0,
    leftLb,
    rightLb,
    requiredLengthIn: Math.max(leftRequiredIn, rightRequiredIn),
    governedBy: platePerInLb < memberPerInLb ? 'plate' : 'member',
  };
}
