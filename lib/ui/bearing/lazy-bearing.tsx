import { lazy } from 'react';

const loadBearing = () => import('@/lib/ui/bearing/bearing-workspace');

/** The step-by-step bearing screen, loaded with the engine when it first opens. */
export const LazyScreenWizard = lazy(() => loadBearing().then((m) => ({ default: m.ScreenWizard })));

/** A screen's outcome page, loaded with the engine (nonbearing header rule, framing list). */
export const LazyScreenOutcome = lazy(() => loadBearing().then((m) => ({ default: m.ScreenOutcome })));

/** The shoring planner, loaded with the engine: it computes the plan on the device as it is typed. */
export const LazyShoringPlanner = lazy(() => loadBearing().then((m) => ({ default: m.ShoringPlanner })));
