import { CalcInputError, type BeamLoad } from '@/lib/calc/types';
import type { Extremum, SpanModel } from './span-model';
import { simpleSpanState } from './simple-span-state';
import {
  stateEiY,
  stateMaxEiDeflection,
  stateMaxMoment,
  stateMaxShear,
  stateMomentLbFt,
  stateShearLb,
  type SpanState,
} from './span-state';

/** Inputs of a simple span: design span ft, loads from the left support, stiffness E·I in lb·in². */
export interface SimpleSpanInput {
  spanFt: number;
  loads: readonly BeamLoad[];
  /** Modulus of elasticity (psi) times moment of inertia (in⁴). */
  eiLbIn2: number;
}

/** in³ per ft³ (1 ft = 12 in exactly): deflection in in = 1728 · (E·I·y in lb·ft³) / (E·I in lb·in²). */
export const IN3_PER_FT3 = 12 * 12 * 12;

/**
 * A simple span (pinned left, roller right) under any mix of full uniform, partial uniform and point loads.
 * Closed forms per load superposed (see `simpleSpanState`); the largest moment is taken where the
 * piecewise-linear shear crosses zero (exact) or at a breakpoint; the largest deflection where the slope is
 * zero (bisection to 1e-12 of the span).
 *
 * @param input.spanFt design span, ft
 * @param input.loads loads in plf / lb positioned in ft from the left support
 * @param input.eiLbIn2 E (psi) × I (in⁴), lb·in²
 * @returns a SpanModel: shear lb, moment lb·ft, deflection in (downward positive)
 * @throws CalcInputError for a non-positive span or stiffness, or a load off the span
 * @example
 * const beam = createSimpleSpan({ spanFt: 10, eiLbIn2: 1.6e6 * 47.63, loads: [{ kind: 'point', pLb: 1000, atFt: 5 }] });
 * beam.maxMoment().value; // 2500 lb·ft = PL/4
 *
 * Reference: AWC Design Aid No. 6 (2007), simple beam cases 1, 4, 5, 7, 8, 9; AISC Manual Table 3-23.
 */
export function createSimpleSpan(input: SimpleSpanInput): SpanModel {
  return spanModelFromState(simpleSpanState(input.spanFt, input.loads), input.eiLbIn2);
}

/**
 * Wraps a span state (for instance one load combination built by `combineStates`) as a SpanModel: a simple
 * span, or a member with overhangs or continuous over a centre post (supportedBeamState).
 * @param state span state (ft, lb, lb·ft, lb·ft², lb·ft³)
 * @param eiLbIn2 E (psi) × I (in⁴), lb·in²
 * @returns a SpanModel: shear lb, moment lb·ft, deflection in (downward positive)
 * @throws CalcInputError for a non-positive stiffness
 * @example spanModelFromState(simpleSpanState(10, [{ kind: 'uniform', wPlf: 100 }]), 7.6e7).maxMoment().value; // 1250
 * Reference: AWC Design Aid No. 6 (2007).
 */
export function spanModelFromState(state: SpanState, eiLbIn2: number): SpanModel {
  if (!Number.isFinite(eiLbIn2) || eiLbIn2 <= 0) {
    throw new CalcInputError('eiLbIn2', 'The stiffness E·I must be above 0');
  }
  const toIn = IN3_PER_FT3 / eiLbIn2;
  let maxShear: Extremum | undefined;
  let maxMoment: Extremum | undefined;
  let maxDeflection: Extremum | undefined;
  return {
    spanFt: state.spanFt,
    reactions: () => state.supportsFt.map((atFt, i) => ({ atFt, reactionLb: state.reactionsLb[i] })),
    shearLb: (x, side) => stateShearLb(state, x, side),
    momentLbFt: (x) => stateMomentLbFt(state, x),
    deflectionIn: (x) => -stateEiY(state, x) * toIn,
    breakpointsFt: () => state.xs,
    maxShear: () => (maxShear ??= stateMaxShear(state)),
    maxMoment: () => (maxMoment ??= stateMaxMoment(state)),
    maxDeflection: () => {
      if (!maxDeflection) {
        const ei = stateMaxEiDeflection(state);
        maxDeflection = { value: ei.value * toIn, atFt: ei.atFt };
      }
      return maxDeflection;
    },
  };
}
