import { simpleSpanBreakpoints, simpleSpanState } from '@/lib/calc/analysis/simple-span-state';
import type { Extremum } from '@/lib/calc/analysis/span-model';
import {
  blankStateLike,
  combineStates,
  stateMaxEiDeflection,
  stateMaxEiDeflectionBetween,
  stateMaxMoment,
  type SpanState,
} from '@/lib/calc/analysis/span-state';
import {
  supportedBeamBreakpoints,
  supportedBeamState,
  type SupportedBeam,
} from '@/lib/calc/analysis/supported-beam-state';
import type { BeamStability, BeamStabilityCase } from '@/lib/calc/factors';
import { asdCombinations, buildMemberLoads, type TakedownLine } from '@/lib/calc/loads';
import { liveLoadPatterns, patternedName, patternFactor } from '@/lib/calc/loads/live-patterns';
import { roofSnowLoad, type RoofSnow } from '@/lib/calc/snow';
import { LOAD_TYPES, type BeamLoad, type LoadCombination, type LoadType } from '@/lib/calc/types';
import type { MemberLoadingInput } from '@/shared/schemas/calc/member';
import { creepFactor } from './creep';
import { endShearsAtD, supportSideShears } from './end-shears';
import { DEFAULT_BEARING_IN, memberGeometry, type MemberGeometry } from './member-geometry';

const IN_PER_FT = 12;
export { DEFAULT_BEARING_IN };

/** The spans of a member, each named for what it is (ft) and the bearing lengths (in). */
export interface MemberSpans {
  clearSpanFt: number;
  /** Clear span + half the bearing at each end: support centre to support centre (the first span's). */
  designSpanFt: number;
  /** Clear spans + overhangs + the full bearing at every support. */
  lengthToBuyFt: number;
  bearingLeftIn: number;
  bearingRightIn: number;
  secondClearSpanFt?: number;
  secondDesignSpanFt?: number;
  centreBearingIn?: number;
  overhangLeftFt?: number;
  overhangRightFt?: number;
  /** Left end to right end, ft, when the member overhangs or runs over two spans. */
  memberLengthFt?: number;
}

/** The loads of one type on one region (or on the whole member), as a span state. */
export interface LoadGroup {
  type: LoadType;
  /** Region index (patterned variable loads), or null for the whole member. */
  region: number | null;
  loads: BeamLoad[];
  state: SpanState;
}

/** One ASD combination (for one live-load pattern) prepared on the member's load groups (self-weight apart). */
export interface PreparedCombination {
  /** The edition's combination; its name says the pattern when it is one. */
  combination: LoadCombination;
  /** Names of the regions carrying the variable loads in this pattern, null when every loaded one does. */
  loadedRegions: string[] | null;
  /**
   * True when a variable load type the combination names carries no load (another combination with the same
   * loads and a C_D no larger always governs it), or for "D" alone when there is no dead load.
   */
  skipped: boolean;
  /** Factor on each load group (prepared.groups order). */
  coeffs: number[];
  /** Σ coeffs · group states, self-weight excluded. */
  state: SpanState;
  /**
   * Factors on each load group for the total with creep, state + (K_cr − 1) · (dead + the sustained part of
   * live) (NDS 3.5.2), with one more slot at the end for the unit self-weight (set by whoever combines, with
   * prepared.groupAndUnitStates).
   */
  creepCoeffs: number[];
  /** Largest E·I·deflection of the variable part (all but dead), lb·ft³, anywhere on the member. */
  eiVariableDeflection: Extremum;
  /** |largest E·I·deflection| of the variable part in each region, lb·ft³. */
  eiVariableByRegion: number[];
  /** Part of the occupancy live load taken as sustained in this combination (its factor at most). */
  sustainedLiveFactor: number;
  /** |largest moment| of `state`, lb·ft (self-weight excluded). */
  maxMomentLbFt: number;
  /** |largest E·I·deflection| of the total with creep in each region, lb·ft³ (self-weight excluded). */
  eiTotalByRegion: number[];
}

/**
 * Everything about a member's loads that does not depend on its size: geometry, spans, takedown, load groups
 * as span states (by type, and by region where loads are placed span by span) plus a unit (1 plf)
 * self-weight state, and each combination's states. A size is then checked by weighted sums of these states
 * (see evaluateSize), so the shortlist never repeats the analysis.
 */
export interface PreparedMember {
  input: MemberLoadingInput;
  geometry: MemberGeometry;
  spans: MemberSpans;
  takedown: TakedownLine[];
  warnings: string[];
  sources: string[];
  roofSnowPsf: number;
  /** The roof snow worked out from the member's snow inputs (p_f, p_s, p_m, factors), null without snow. */
  snow: RoofSnow | null;
  groups: LoadGroup[];
  /** Unfactored reactions by load type, lb, one per support (dead without self-weight). */
  reactionsByType: Record<LoadType, number[]>;
  /**
   * NDS Table 3.3.3 case for C_L: uniform over the whole span, a single centre point load alone, or any other
   * loading (point loads with uniform load, partial uniform loads, overhangs, continuous members).
   */
  stabilityCase: BeamStabilityCase;
  /** A unit self-weight, 1 plf over the whole member, on the same breakpoints. */
  unitSelfWeight: SpanState;
  /** The group states followed by the unit self-weight (for combining with creepCoeffs). */
  groupAndUnitStates: SpanState[];
  /** |largest moment| (lb·ft) and |largest E·I·deflection| per region (lb·ft³) of the unit self-weight. */
  unitSelfWeightMaxima: { momentLbFt: number; eiByRegion: number[] };
  /** Breakpoint index of each region's start and end. */
  regionRanges: [number, number][];
  selfWeight: boolean;
  creepKcr: number;
  combinations: PreparedCombination[];
  /** True for an overhang or a continuous member: negative moment there puts its bottom edge in compression. */
  hogging: boolean;
  /** Scratch state reused by evaluateSize (no allocation per size). */
  scratch: SpanState;
  /** Per-combination work arrays reused by evaluateSize (no allocation per size). */
  work: {
    FbPrime: number[];
    stabilities: (BeamStability | null)[];
    bendBound: number[];
    totalBound: number[];
  };
  /** Design shears next to the supports per load group and for the unit self-weight, by depth. */
  shearCache: Map<number, EndShears>;
}

/**
 * Design shears at d next to the supports, lb: one value per support side (a simple span: [left, right]
 * magnitudes; otherwise signed values just outside d on each side of each support), per load group and for
 * the unit self-weight, and the support each side belongs to.
 */
export interface EndShears {
  byGroup: number[][];
  unitSelfWeight: number[];
  sideSupport: number[];
}

/** The member's spans for the result, from its geometry and input. */
function memberSpans(input: MemberLoadingInput, geometry: MemberGeometry): MemberSpans {
  const { bearingsIn, supportsFt } = geometry;
  const bearingLeftIn = bearingsIn[0];
  const bearingRightIn = bearingsIn[bearingsIn.length - 1];
  const bearingTotalIn = bearingsIn.reduce((sum, b) => sum + b, 0);
  const overhangLeftFt = input.overhangLeftFt ?? 0;
  const overhangRightFt = input.overhangRightFt ?? 0;
  const second = input.secondClearSpanFt;
  const spans: MemberSpans = {
    clearSpanFt: input.clearSpanFt,
    designSpanFt: supportsFt[1] - supportsFt[0],
    lengthToBuyFt:
      input.clearSpanFt + (second ?? 0) + overhangLeftFt + overhangRightFt + bearingTotalIn / IN_PER_FT,
    bearingLeftIn,
    bearingRightIn,
  };
  if (geometry.simple) return spans;
  if (second !== undefined) {
    spans.secondClearSpanFt = second;
    spans.secondDesignSpanFt = supportsFt[2] - supportsFt[1];
    spans.centreBearingIn = bearingsIn[1];
  }
  if (overhangLeftFt > 0) spans.overhangLeftFt = overhangLeftFt;
  if (overhangRightFt > 0) spans.overhangRightFt = overhangRightFt;
  spans.memberLengthFt = geometry.lengthFt;
  return spans;
}

/** A load's part on one region (clipped uniform, or a point inside it), null when none of it is there. */
function partOn(
  load: BeamLoad,
  startFt: number,
  endFt: number,
  last: boolean,
  lengthFt: number,
): BeamLoad | null {
  if (load.kind === 'point') {
    return load.atFt >= startFt && (load.atFt < endFt || (last && load.atFt <= endFt)) ? load : null;
  }
  const a = Math.max(load.startFt ?? 0, startFt);
  const b = Math.min(load.endFt ?? lengthFt, endFt);
  return b > a ? { kind: 'uniform', wPlf: load.wPlf, startFt: a, endFt: b } : null;
}

/** Load groups: by type over the whole member, or, where the member has several regions, variable loads by region. */
function loadGroups(
  geometry: MemberGeometry,
  loadsByType: Record<LoadType, BeamLoad[]>,
): { groups: Omit<LoadGroup, 'state'>[]; loadedRegions: boolean[] } {
  const regions = geometry.regions;
  const loadedRegions = regions.map(() => false);
  if (geometry.simple) {
    for (const t of LOAD_TYPES) if (t !== 'D' && loadsByType[t].length > 0) loadedRegions[0] = true;
    return {
      groups: LOAD_TYPES.map((type) => ({ type, region: null, loads: loadsByType[type] })),
      loadedRegions,
    };
  }
  const groups: Omit<LoadGroup, 'state'>[] = [{ type: 'D', region: null, loads: loadsByType.D }];
  for (const type of LOAD_TYPES) {
    if (type === 'D') continue;
    regions.forEach((region, r) => {
      const last = r === regions.length - 1;
      const loads: BeamLoad[] = [];
      for (const load of loadsByType[type]) {
        const part = partOn(load, region.startFt, region.endFt, last, geometry.lengthFt);
        if (part) loads.push(part);
      }
      if (loads.length === 0) return;
      loadedRegions[r] = true;
      groups.push({ type, region: r, loads });
    });
  }
  return { groups, loadedRegions };
}

/** What every combination of one member shares. */
interface CombinationContext {
  groups: readonly LoadGroup[];
  groupStates: readonly SpanState[];
  regionRanges: readonly [number, number][];
  scratch: SpanState;
  deadLoaded: boolean;
  /** Load types that carry load anywhere. */
  loadedTypes: ReadonlySet<LoadType>;
  sustainedLive: number;
  creepKcr: number;
}

function regionMaxima(state: SpanState, ranges: readonly [number, number][]): number[] {
  const out: number[] = [];
  for (let r = 0; r < ranges.length; r++) {
    out.push(Math.abs(stateMaxEiDeflectionBetween(state, ranges[r][0], ranges[r][1]).value));
  }
  return out;
}

/**
 * One combination's states for one pattern and the size-independent maxima evaluateSize bounds with.
 * Plain loops over the groups: this runs for every combination of every member check.
 */
function prepareCombination(
  basis: LoadCombination,
  pattern: number[] | null,
  names: string[] | null,
  context: CombinationContext,
): PreparedCombination {
  const { groups, groupStates, scratch, creepKcr, regionRanges } = context;
  const factors = basis.factors;
  let deadOnly = true;
  let anyVariableEmpty = false;
  for (const t of LOAD_TYPES) {
    if (t === 'D' || factors[t] === undefined) continue;
    deadOnly = false;
    if (!context.loadedTypes.has(t)) anyVariableEmpty = true;
  }
  const skipped = deadOnly && factors.D !== undefined ? !context.deadLoaded : anyVariableEmpty;
  const sustainedLiveFactor = Math.min(context.sustainedLive, factors.L ?? 0);
  const coeffs: number[] = [];
  const variableCoeffs: number[] = [];
  const creepCoeffs: number[] = [];
  const extra = creepKcr - 1;
  let anyVariable = false;
  for (let i = 0; i < groups.length; i++) {
    const g = groups[i];
    const f = factors[g.type] ?? 0;
    const c =
      pattern === null || g.region === null ? f : f * patternFactor(g.type, pattern.includes(g.region));
    coeffs.push(c);
    variableCoeffs.push(g.type === 'D' ? 0 : c);
    if (g.type !== 'D' && c !== 0) anyVariable = true;
    const sustained = g.type === 'D' ? 1 : g.type === 'L' && c > 0 ? sustainedLiveFactor : 0;
    creepCoeffs.push(c + extra * sustained);
  }
  // The last slot is the unit self-weight's, set by whoever combines with groupAndUnitStates.
  const creepWithUnit = creepCoeffs.slice();
  creepWithUnit.push(0);
  const combination =
    names === null ? basis : Object.freeze({ name: patternedName(basis, names), factors, CD: basis.CD });
  const state = combineStates(blankStateLike(scratch), groupStates, coeffs);
  const zeros: number[] = [];
  for (let r = 0; r < regionRanges.length; r++) zeros.push(0);
  if (skipped) {
    return {
      combination,
      loadedRegions: names,
      skipped,
      coeffs,
      state,
      creepCoeffs: creepWithUnit,
      eiVariableDeflection: { value: 0, atFt: scratch.spanFt / 2 },
      eiVariableByRegion: zeros,
      sustainedLiveFactor: 0,
      maxMomentLbFt: 0,
      eiTotalByRegion: zeros,
    };
  }
  let eiVariableDeflection: Extremum = { value: 0, atFt: scratch.spanFt / 2 };
  let eiVariableByRegion = zeros;
  if (anyVariable) {
    combineStates(scratch, groupStates, variableCoeffs);
    eiVariableDeflection = stateMaxEiDeflection(scratch);
    eiVariableByRegion =
      regionRanges.length === 1
        ? [Math.abs(eiVariableDeflection.value)]
        : regionMaxima(scratch, regionRanges);
  }
  const maxMomentLbFt = Math.abs(stateMaxMoment(state).value);
  const eiTotalByRegion = regionMaxima(combineStates(scratch, groupStates, creepCoeffs), regionRanges);
  return {
    combination,
    loadedRegions: names,
    skipped,
    coeffs,
    state,
    creepCoeffs: creepWithUnit,
    eiVariableDeflection,
    eiVariableByRegion,
    sustainedLiveFactor,
    maxMomentLbFt,
    eiTotalByRegion,
  };
}

/**
 * Prepares a member's loads for checking: its geometry (design spans from the clear spans and bearings,
 * overhangs, a centre post), roof snow from the job's edition, the takedown (self-weight apart), load groups
 * as span states, and the ASD combinations of the edition with their states. Where the member has more than
 * one span or overhang, every combination with a variable load is also tried with that load on some of them
 * only (ASCE 7 §4.3.3; snow at half elsewhere, §7.5). Source positions are moved from where they are entered
 * (the face of the left support, or the tip of a left overhang) onto the analysis's coordinates.
 *
 * @param input parsed member input (ft, in, psf, plf, lb)
 * @returns the prepared member (lb, ft, plf; states in lb·ft units)
 * @throws CalcInputError for positions off the member or invalid snow inputs
 * @example prepareMember(input).spans.designSpanFt; // clear span + (3 + 3)/2/12 ft with default bearings
 *
 * Reference: ASCE 7-16 / 7-22 §2.4.1 ASD combinations, §4.3.3, §7.5; NDS 2018 §3.5.2 (creep); AWC Design
 * Aid No. 6 (2007).
 */
export function prepareMember(input: MemberLoadingInput): PreparedMember {
  const geometry = memberGeometry(input);
  const spans = memberSpans(input, geometry);
  const L = geometry.lengthFt;
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
  const built = buildMemberLoads({
    spanFt: L,
    roofPitchIn12,
    roofSnowPsf,
    selfWeightPlf: 0,
    sources: input.sources,
    positionOffsetFt: geometry.positionOffsetFt,
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
  const { groups: groupLoads, loadedRegions } = loadGroups(geometry, loadsByType);
  const beam: SupportedBeam = { lengthFt: L, supportsFt: geometry.supportsFt };
  const loadSets = LOAD_TYPES.map((t) => loadsByType[t]);
  const xs = geometry.simple ? simpleSpanBreakpoints(L, loadSets) : supportedBeamBreakpoints(beam, loadSets);
  const analyse = (loads: readonly BeamLoad[]) =>
    geometry.simple ? simpleSpanState(L, loads, xs) : supportedBeamState(beam, loads, xs);
  const groups: LoadGroup[] = [];
  const groupStates: SpanState[] = [];
  for (const g of groupLoads) {
    const state = analyse(g.loads);
    groups.push({ type: g.type, region: g.region, loads: g.loads, state });
    groupStates.push(state);
  }
  const unitSelfWeight = analyse([{ kind: 'uniform', wPlf: 1 }]);
  const regionRanges = geometry.regions.map((r): [number, number] => [
    xs.indexOf(r.startFt),
    xs.indexOf(r.endFt),
  ]);
  const selfWeight = input.selfWeight ?? true;
  const anyUniform = selfWeight || built.loads.some((l) => l.kind === 'uniform');
  const anyPartial = built.loads.some((l) => l.kind === 'uniform' && l.startFt !== undefined);
  const centred = pointPositions.size === 1 && Math.abs([...pointPositions][0] - L / 2) <= 1e-6 * L;
  // Table 3.3.3's "uniformly distributed load" row is for a load over the whole span of a simple beam; a
  // partial uniform load, an overhang or a continuous member takes the "any other load" row.
  const stabilityCase: BeamStabilityCase = !geometry.simple
    ? 'any'
    : pointPositions.size === 0 && !anyPartial
      ? 'uniform'
      : centred && !anyUniform
        ? 'point-center'
        : 'any';
  const creepKcr = creepFactor(input.wetService ?? false);

  const scratch = blankStateLike(unitSelfWeight);
  const loadedTypes = new Set<LoadType>(LOAD_TYPES.filter((t) => loadsByType[t].length > 0));
  const context: CombinationContext = {
    groups,
    groupStates,
    regionRanges,
    scratch,
    deadLoaded: loadsByType.D.length > 0 || selfWeight,
    loadedTypes,
    sustainedLive: input.sustainedLiveFraction ?? 0,
    creepKcr,
  };
  const patterns = liveLoadPatterns(loadedRegions);
  const combinations: PreparedCombination[] = [];
  for (const combination of asdCombinations(input.edition)) {
    const variable = LOAD_TYPES.some((t) => t !== 'D' && combination.factors[t] !== undefined);
    const full = prepareCombination(combination, null, null, context);
    combinations.push(full);
    if (!variable || full.skipped || patterns.length === 1) continue;
    const seen = new Set<string>([full.coeffs.join(',')]);
    for (const pattern of patterns.slice(1)) {
      const names = pattern.map((r) => geometry.regions[r].name);
      const prep = prepareCombination(combination, pattern, names, context);
      const key = prep.coeffs.join(',');
      if (seen.has(key)) continue;
      seen.add(key);
      combinations.push(prep);
    }
  }

  const reactionsByType = {} as Record<LoadType, number[]>;
  for (const t of LOAD_TYPES) reactionsByType[t] = geometry.supportsFt.map(() => 0);
  for (const g of groups) {
    const r = reactionsByType[g.type];
    for (let i = 0; i < r.length; i++) r[i] += g.state.reactionsLb[i];
  }
  return {
    input,
    geometry,
    spans,
    takedown: built.lines,
    warnings,
    sources,
    roofSnowPsf,
    snow,
    groups,
    reactionsByType,
    stabilityCase,
    unitSelfWeight,
    groupAndUnitStates: [...groupStates, unitSelfWeight],
    unitSelfWeightMaxima: {
      momentLbFt: Math.abs(stateMaxMoment(unitSelfWeight).value),
      eiByRegion: regionMaxima(unitSelfWeight, regionRanges),
    },
    regionRanges,
    selfWeight,
    creepKcr,
    combinations,
    hogging: !geometry.simple,
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
 * Design shears at d next to the supports for every load group of a prepared member, cached by depth.
 * @param prepared the prepared member
 * @param dFt depth for "shear at d", ft (0 = at the supports)
 * @returns per group and for the unit self-weight, one value per support side (lb), and each side's support
 * @example endShearsFor(prepared, 9.25 / 12).byGroup[1];
 * Reference: NDS 2018 §3.4.3.1.
 */
export function endShearsFor(prepared: PreparedMember, dFt: number): EndShears {
  const cached = prepared.shearCache.get(dFt);
  if (cached) return cached;
  const { geometry } = prepared;
  const unit: BeamLoad[] = [{ kind: 'uniform', wPlf: 1 }];
  let result: EndShears;
  if (geometry.simple) {
    const L = geometry.lengthFt;
    result = {
      byGroup: prepared.groups.map((g) => endShearsAtD(L, g.loads, dFt)),
      unitSelfWeight: endShearsAtD(L, unit, dFt),
      sideSupport: [0, 1],
    };
  } else {
    const beam: SupportedBeam = { lengthFt: geometry.lengthFt, supportsFt: geometry.supportsFt };
    const sides = (loads: readonly BeamLoad[]) => supportSideShears(beam, loads, dFt);
    const unitSides = sides(unit);
    result = {
      byGroup: prepared.groups.map((g) => sides(g.loads).shearsLb),
      unitSelfWeight: unitSides.shearsLb,
      sideSupport: unitSides.sideSupport,
    };
  }
  prepared.shearCache.set(dFt, result);
  return result;
}
