/**
 * The bearing screen's parts that run the engine on the device (which questions apply, the nonbearing header
 * rule and framing list, the shoring plan as it is typed). Only lazy-bearing.tsx imports it, through import(), so it loads with those screens.
 */
export { ScreenOutcome } from './screen-outcome';
export { ScreenWizard } from './screen-wizard';
export { ShoringPlanner } from './shoring-planner';
