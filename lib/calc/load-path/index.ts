/**
 * The load path to the ground: what each end of each member bears on, each reaction carried down as a point
 * load on the element below, every element checked under it, and chains closed only on confirmed footings or
 * foundation walls.
 * Reference: AWC Design Aid No. 6; NDS 2018 §§3.3–3.7, 15.3; ASCE 7 §2.4.1; IRC 2021 R401.4.1.
 */
export { evaluateLoadPath, LOAD_TRANSFER_TEXT } from './evaluate-load-path';
export { orderElements, requiredEnds } from './order-elements';
export { addLoads, combineLoad, governingLoad, zeroLoad, type CombinedLoad } from './typed-load';
export { checkBeamElement, type BeamElementCheck, type LandingLoad } from './check-beam-element';
export { checkVerticalElement, type VerticalElementCheck } from './check-vertical-element';
export {
  checkGroundElement,
  DEFAULT_NEW_PAD_THICKNESS_IN,
  type GroundElementCheck,
} from './check-ground-element';
export { closeChains } from './close-chains';
export { chainBelow, type ChainStep } from './chain-below';
