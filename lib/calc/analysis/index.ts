/**
 * Beam analysis: span models (simple span today), span states for fast superposition, diagram sampling.
 * Reference: AWC Design Aid No. 6 (2007); AISC Manual Table 3-23;
 */
export type { DiagramSample, Extremum, ShearSide, SpanModel, SupportReaction } from './span-model';
export { createSimpleSpan, IN3_PER_FT3, spanModelFromState, type SimpleSpanInput } from './simple-span';
export { simpleSpanBreakpoints, simpleSpanState } from './simple-span-state';
export {
  combineStates,
  emptySpanState,
  stateEiSlope,
  stateEiY,
  stateMaxEiDeflection,
  stateMaxMoment,
  stateMaxShear,
  stateMomentLbFt,
  stateShearLb,
  type SpanState,
} from './span-state';
export { sampleDiagram } from './sample-diagram';
