import { simpleSpanBreakpoints, simpleSpanState } from '@/lib/calc/analysis/simple-span-state';
import type { Extremum } from '@/lib/calc/analysis/span-model';
import {
  combineStates,
  emptySpanState,
  stateMaxEiDeflection,
  stateMaxMoment,
  type SpanState,
} from '@/lib/calc/analysis/span-state';
import type { BeamStability, BeamStabilityCase } from '@/lib/calc/factors';
import { asdCombinations, buildMemberLoads, type TakedownLine } from '@/lib/calc/loads';
import { roofSnowLoad, type RoofSnow } from '@/lib/calc/snow';
import { LOAD_TYPES, type BeamLoad, type LoadCombination, type LoadType } from '@/lib/calc/types';
import type { LoadSource } from '@/shared/schemas/calc/loads';
import type { MemberLoadingInput } from '@/shared/schemas/calc/member';
import { creepFactor } from './creep';
import { endShearsAtD } from './end-shears';

const IN_PER_FT = 12;
/** Two jack studs under each end (common practice), in. */
export const DEFAULT_BEARING_IN = 3;

/** The spans of a member, each named for what it is (ft) and the bearing lengths (in). */
export interface MemberSpans {
  clearSpanFt: number;
  /** Clear span + half the bearing at each end: support centre to support centre. */
  designSpanFt: number;
  /** Clear span + the full bearing at both ends. */
  lengthToBuyFt: number;
  bearingLeftIn: number;
  bearingRightIn: number;
}

/** One ASD combination prepared on the member's load groups (self-weight apart). */
export interface PreparedCombination {
  combination: LoadCombination;
  /**
   * True when a variable load type the combination names carries no load (another combination with the same
   * loads and a C_D no larger always governs it), or for "D" alone when there is no dead load.
   */
  skipped: boolean;
  /** Σ factor · state of each load type, self-weight excluded. */
  state: SpanState;
  /** Largest E·I·deflection of the variable part (all but dead), lb·ft³: the live-load deflection. */
  eiVariableDeflection: Extremum;
  /** Part of the occupancy live load taken as sustained in this combination (its factor at most). */
  sustainedLiveFactor: number;
  /** |largest moment| of `state`, lb·ft (self-weight excluded). */
  maxMomentLbFt: number;
  /** |largest E·I·deflection| with creep, lb·ft³: state + (K_cr − 1)(dead + sustained live), self-weight excluded. */
  eiTotalDeflection: number;
}

/**
 * Everything about a member's loads that does not depend on its size: spans, takedown, load groups as span
 * states by type plus a unit (1 plf) self-weight state, and each combination's state. A size is then checked
 * by weighted sums of these states (see evaluateSize), so the shortlist never repeats the analysis.
 */
export interface PreparedMember {
  input: MemberLoadingInput;
  spans: MemberSpans;
  takedown: TakedownLine[];
  warnings: string[];
  sources: string[];
  roofSnowPsf: number;
  /** The roof snow worked out from the member's snow inputs (p_f, p_s, p_m, factors), null without snow. */
  snow: RoofSnow | null;
  loadsByType: Record<LoadType, BeamLoad[]>;
  /** Unfactored [left, right] reactions by load type, lb (dead without self-weight). */
  reactionsByType: Record<LoadType, [number, number]>;
  /**
   * NDS Table 3.3.3 case for C_L: uniform over the whole span, a single centre point load alone, or any other
   * loading (point loads with uniform load, partial uniform loads).
   */
  stabilityCase: BeamStabilityCase;
  /** A unit self-weight, 1 plf over the design span, on the same breakpoints. */
  unitSelfWeight: SpanState;
  /** Dead (without self-weight) and occupancy live states, unfactored, for the sustained part in creep. */
  deadState: SpanState;
  liveState: SpanState;
  selfWeight: boolean;
  creepKcr: number;
  combinations: PreparedCombination[];
  /** Scratch state reused by evaluateSize (no allocation per size). */
  scratch: SpanState;
  /** Per-combination work arrays reused by evaluateSize (no allocation per size). */
  work: {
    FbPrime: number[];
    stabilities: (BeamStability | null)[];
    bendBound: number[];
    totalBound: number[];
  };
  /** End shears per load type and for the unit self-weight, by depth (see endShearsFor). */
  shearCache: Map<number, EndShears>;
}

/** End shears at d, lb: [left, right] per load type and for the unit self-weight. */
export interface EndShears {
  byType: Record<LoadType, [number, number]>;
  unitSelfWeight: [number, number];
}

function shift(source: LoadSource, offsetFt: number): LoadSource {
  if (source.kind === 'point') return { ...source, atFt: source.atFt + offsetFt };
  if (source.startFt === undefined && source.endFt === undefined) return source;
  return {
    ...source,
    startFt: source.startFt === undefined ? undefined : source.startFt + offsetFt,
    endFt: source.endFt === undefined ? undefined : source.endFt + offsetFt,
  };
}

/** What every combination of one member shares; the coefficient arrays are scratch, one entry per load type. */
interface CombinationContext {
  L: number;
  xs: readonly number[];
  typeStates: readonly SpanState[];
  scratch: SpanState;
  deadLoaded: boolean;
  /** True for each load type (LOAD_TYPES order) that carries no load. */
  emptyTypes: readonly boolean[];
  sustainedLive: number;
  creepKcr: number;
  variableCoeffs: number[];
  totalCoeffs: number[];
}

/**
 * One combination's state and the size-independent maxima evaluateSize bounds with. Plain loops over
 * LOAD_TYPES and shared coefficient arrays: this runs for every combination of every member check.
 */
function prepareCombination(combination: LoadCombination, context: CombinationContext): PreparedCombination {
  const { L, xs, typeStates, scratch, creepKcr, variableCoeffs, totalCoeffs } = context;
  const factors = combination.factors;
  const coeffs: number[] = [];
  let deadOnly = true;
  let anyVariableEmpty = false;
  for (let i = 0; i < LOAD_TYPES.length; i++) {
    const t = LOAD_TYPES[i];
    const factor = factors[t];
    coeffs.push(factor ?? 0);
    if (factor === undefined) continue;
    if (t !== 'D') {
      deadOnly = false;
      if (context.emptyTypes[i]) anyVariableEmpty = true;
    }
  }
  const skipped = deadOnly && factors.D !== undefined ? !context.deadLoaded : anyVariableEmpty;
  const state = combineStates(emptySpanState(L, xs), typeStates, coeffs);
  if (skipped) {
    return {
      combination,
      skipped,
      state,
      eiVariableDeflection: { value: 0, atFt: L / 2 },
      sustainedLiveFactor: 0,
      maxMomentLbFt: 0,
      eiTotalDeflection: 0,
    };
  }
  const sustainedLiveFactor = Math.min(context.sustainedLive, factors.L ?? 0);
  let anyVariable = false;
  for (let i = 0; i < LOAD_TYPES.length; i++) {
    const t = LOAD_TYPES[i];
    const c = coeffs[i];
    variableCoeffs[i] = t === 'D' ? 0 : c;
    if (variableCoeffs[i] !== 0) anyVariable = true;
    totalCoeffs[i] = c + (creepKcr - 1) * (t === 'D' ? 1 : t === 'L' ? sustainedLiveFactor : 0);
  }
  const eiVariableDeflection = anyVariable
    ? stateMaxEiDeflection(combineStates(scratch, typeStates, variableCoeffs))
    : { value: 0, atFt: L / 2 };
  return {
    combination,
    skipped,
    state,
    eiVariableDeflection,
    sustainedLiveFactor,
    maxMomentLbFt: Math.abs(stateMaxMoment(state).value),
    eiTotalDeflection: Math.abs(stateMaxEiDeflection(combineStates(scratch, typeStates, totalCoeffs)).value),
  };
}

/**
 * Prepares a member's loads for checking: design span from the clear span and bearings, roof snow from the
 * job's edition, the takedown (self-weight apart), load groups by type as span states, and the ASD
 * combinations of the edition with their states. Source positions are moved from the clear span (measured
 * from the face of the left support) onto the design span.
 *
 * @param input parsed member input (ft, in, psf, plf, lb)
 * @returns the prepared member (lb, ft, plf; states in lb·ft units)
 * @throws CalcInputError for positions off the span or invalid snow inputs
 * @example prepareMember(input).spans.designSpanFt; // clear span + (3 + 3)/2/12 ft with default bearings
 *
 * Reference: ASCE 7-16 / 7-22 §2.4.1 ASD combinations; NDS 2018 §3.5.2 (creep); AWC Design Aid No. 6 (2007).
 */
export function prepareMember(input: MemberLoadingInput): PreparedMember {
  const bearingLeftIn = input.bearingLeftIn ?? DEFAULT_BEARING_IN;
  const bearingRightIn = input.bearingRightIn ?? DEFAULT_BEARING_IN;
  const spans: MemberSpans = {
    clearSpanFt: input.clearSpanFt,
    designSpanFt: input.clearSpanFt + (bearingLeftIn + bearingRightIn) / 2 / IN_PER_FT,
    lengthToBuyFt: input.clearSpanFt + (bearingLeftIn + bearingRightIn) / IN_PER_FT,
    bearingLeftIn,
    bearingRightIn,
  };
  const L = spans.designSpanFt;
  const warnings: string[] = [];
  const sources: string[] = [`${input.edition} §2.4.1 ASD load combinations`];
  const roofPitchIn12 = input.roofPitchIn12 ?? 0;
  let roofSnowPsf = 0;
  let snow: RoofSnow | null = null;
  if (input.snow) {
    // The member's snow inputs carry neither key (memberSnowSchema omits them). Keys written after a spread
    // send V8 off its fast clone path (about 1 µs here, measured), so the two added keys come first.
    snow = roofSnowLoad({ edition: input.edition, roofPitchIn12, ...input.snow });
    roofSnowPsf = snow.designPsf;
    warnings.push(...snow.warnings);
    sources.push(`${snow.reference} (roof snow)`);
  }
  const offsetFt = bearingLeftIn / 2 / IN_PER_FT;
  const built = buildMemberLoads({
    spanFt: L,
    roofPitchIn12,
    roofSnowPsf,
    selfWeightPlf: 0,
    sources: input.sources.map((s) => shift(s, offsetFt)),
  });
  warnings.push(...built.warnings);

  const loadsByType: Record<LoadType, BeamLoad[]> = { D: [], L: [], Lr: [], S: [] };
  const pointPositions = new Set<number>();
  for (const load of built.loads) {
    if (load.kind === 'point') {
      pointPositions.add(load.atFt);
      loadsByType[load.type].push({ kind: 'point', pLb: load.pLb, atFt: load.atFt });
    } else {
      loadsByType[load.type].push({
        kind: 'uniform',
        wPlf: load.wPlf,
        startFt: load.startFt,
        endFt: load.endFt,
      });
    }
  }
  const xs = simpleSpanBreakpoints(
    L,
    LOAD_TYPES.map((t) => loadsByType[t]),
  );
  const typeStates = LOAD_TYPES.map((t) => simpleSpanState(L, loadsByType[t], xs));
  const unitSelfWeight = simpleSpanState(L, [{ kind: 'uniform', wPlf: 1 }], xs);
  const selfWeight = input.selfWeight ?? true;
  const anyUniform = selfWeight || built.loads.some((l) => l.kind === 'uniform');
  const anyPartial = built.loads.some((l) => l.kind === 'uniform' && l.startFt !== undefined);
  const centred = pointPositions.size === 1 && Math.abs([...pointPositions][0] - L / 2) <= 1e-6 * L;
  // Table 3.3.3's "uniformly distributed load" row is for a load over the whole span; a partial uniform load
  // takes the "any other load" row (1.84 l_u when l_u/d > 14.3).
  const stabilityCase: BeamStabilityCase =
    pointPositions.size === 0 && !anyPartial ? 'uniform' : centred && !anyUniform ? 'point-center' : 'any';
  const creepKcr = creepFactor(input.wetService ?? false);
  const sustainedLive = input.sustainedLiveFraction ?? 0;

  const scratch = emptySpanState(L, xs);
  const context: CombinationContext = {
    L,
    xs,
    typeStates,
    scratch,
    deadLoaded: loadsByType.D.length > 0 || selfWeight,
    emptyTypes: LOAD_TYPES.map((t) => loadsByType[t].length === 0),
    sustainedLive,
    creepKcr,
    variableCoeffs: LOAD_TYPES.map(() => 0),
    totalCoeffs: LOAD_TYPES.map(() => 0),
  };
  const combinations: PreparedCombination[] = [];
  for (const combination of asdCombinations(input.edition)) {
    combinations.push(prepareCombination(combination, context));
  }

  const reactionsByType = {} as Record<LoadType, [number, number]>;
  for (let i = 0; i < LOAD_TYPES.length; i++) {
    reactionsByType[LOAD_TYPES[i]] = [typeStates[i].reactionsLb[0], typeStates[i].reactionsLb[1]];
  }
  return {
    input,
    spans,
    takedown: built.lines,
    warnings,
    sources,
    roofSnowPsf,
    snow,
    loadsByType,
    reactionsByType,
    stabilityCase,
    unitSelfWeight,
    deadState: typeStates[LOAD_TYPES.indexOf('D')],
    liveState: typeStates[LOAD_TYPES.indexOf('L')],
    selfWeight,
    creepKcr,
    combinations,
    scratch,
    work: {
      FbPrime: combinations.map(() => 0),
      stabilities: combinations.map(() => null),
      bendBound: combinations.map(() => -1),
      totalBound: combinations.map(() => -1),
    },
    shearCache: new Map(),
  };
}

/**
 * End shears at d for every load group of a prepared member, cached by depth.
 * @param prepared the prepared member
 * @param dFt depth for "shear at d", ft (0 = at the supports)
 * @returns [left, right] lb per load type and for the unit self-weight
 * @example endShearsFor(prepared, 9.25 / 12).byType.L;
 * Reference: NDS 2018 §3.4.3.1.
 */
export function endShearsFor(prepared: PreparedMember, dFt: number): EndShears {
  const cached = prepared.shearCache.get(dFt);
  if (cached) return cached;
  const L = prepared.spans.designSpanFt;
  const byType = {} as Record<LoadType, [number, number]>;
  for (const t of LOAD_TYPES) byType[t] = endShearsAtD(L, prepared.loadsByType[t], dFt);
  const result: EndShears = { byType, unitSelfWeight: endShearsAtD(L, [{ kind: 'uniform', wPlf: 1 }], dFt) };
  prepared.shearCache.set(dFt, result);
  return result;
}
