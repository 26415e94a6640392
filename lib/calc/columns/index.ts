/**
 * Posts, temporary shoring walls (with the plan of their loads and what they stand on) and footing pads.
 * Reference: NDS 2018 §3.7, §3.10, §15.3; IRC 2021 R401.4.1; ASCE 7 §2.4.1.
 */
export { axialCapacity, type AxialCapacity, type ColumnAxis, type ColumnAxisResult } from './axial-capacity';
export { checkColumn, type ColumnCheck, type ColumnInput } from './check-column';
export {
  checkShoringWall,
  type ShoringWallCheck,
  type ShoringWallInput,
  type ShoringWeakAxisBracing,
} from './shoring-wall';
export { shoringLineLoad, type ShoringLineLoad, type ShoringPointLoad } from './shoring-load';
export {
  standingSurface,
  type StandingSurfaceInput,
  type StandingSurfaceResult,
  type StandingVerdict,
} from './standing-surface';
export { evaluateShoringPlan } from './shoring-evaluate';
export { planShoring, type ShoringLine, type ShoringPlan, type ShoringWallPlan } from './shoring-plan';
export {
  NORMAL_WEIGHT_CONCRETE_PCF,
  PRESUMPTIVE_SOIL_BEARING_PSF,
  sizeFootingPad,
  type FootingPad,
  type FootingPadInput,
} from './footing-pad';
export {
  SHORING_END_RUN_FT,
  SHORING_SEQUENCE,
  rentedShores,
  studWallTakeoff,
  type ShoreLayout,
  type StudWallTakeoff,
} from './shoring-takeoff';
