export type { DiagramSample, Extremum, ShearSide, SpanModel, SupportReaction } from './span-model';
export { createSimpleSpan, type SimpleSpanInput } from './simple-span';
export { sampleDiagram } from './sample-diagram';
export { loadsAwayFromSupports } from './loads-near-supports';
export { findRoot } from './find-root';
