/**
 * NDS 2018 adjustment factors (ASD), one file per factor.
 * Reference: NDS 2018 Table 4.3.1 (sawn), Table 5.3.1 (glulam), Table 8.3.1 (SCL).
 */
export {
  CONSTRUCTION_LOAD_DURATION_FACTOR,
  LOAD_DURATION_FACTORS,
  loadDurationFactor,
} from './load-duration';
export { sawnSizeFactors, type SawnSizeFactors } from './size-factor';
export { glulamVolumeFactor, GLULAM_VOLUME_REFERENCE } from './volume-factor';
export { lvlDepthFactor } from './lvl-depth-factor';
export { bendingSizeFactor } from './bending-size-factor';
export {
  beamStabilityFactor,
  effectiveLengthIn,
  type BeamStability,
  type BeamStabilityCase,
} from './beam-stability';
export { columnBucklingCoefficient, columnStabilityFactor, type ColumnStability } from './column-stability';
export { bearingAreaFactor } from './bearing-area';
export { wetServiceFactors } from './wet-service';
export { temperatureFactors } from './temperature';
export { incisingFactors } from './incising';
export { flatUseFactor } from './flat-use';
export { repetitiveMemberFactor } from './repetitive-member';
export { UNIT_STRESS_FACTORS, type StressFactors } from './stress-factors';
