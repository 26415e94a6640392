/**
 * Beam analysis: span models (simple spans; members overhanging a support or continuous over a centre post),
 * span states for fast superposition, diagram sampling.
 * Reference: AWC Design Aid No. 6 (2007); AISC Manual Table 3-23.
 */
export type { DiagramSample, Extremum, ShearSide, SpanModel, SupportReaction } from './span-model';
export { createSimpleSpan, IN3_PER_FT3, spanModelFromState, type SimpleSpanInput } from './simple-span';
export { simpleSpanBreakpoints, simpleSpanState } from './simple-span-state';
export { supportedBeamBreakpoints, supportedBeamState, type SupportedBeam } from './supported-beam-state';
export { createSupportedBeam, type SupportedBeamInput } from './supported-beam';
export {
  blankStateLike,
  combineStates,
  emptySpanState,
  stateEiSlope,
  stateEiY,
  stateMaxEiDeflection,
  stateMaxEiDeflectionBetween,
  stateMaxMoment,
  stateMaxShear,
  stateMomentLbFt,
  stateShearLb,
  type SpanState,
} from './span-state';
export { sampleDiagram } from './sample-diagram';
