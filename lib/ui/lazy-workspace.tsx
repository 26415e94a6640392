import { lazy, Suspense, type ReactNode } from 'react';
import { LoadingView } from './loading-view';

const loadWorkspace = () => import('@/lib/ui/workspace');

/** The member editor, loaded with the engine when a member screen first opens. */
export const LazyMemberEditor = lazy(() => loadWorkspace().then((m) => ({ default: m.MemberEditor })));

/** Shows the loading view while the engine's chunk arrives. */
export function WorkspaceSuspense({ children }: { children: ReactNode }) {
  return <Suspense fallback={<LoadingView />}>{children}</Suspense>;
}

/** The span table builder, loaded with the engine when the span tables screen first opens. */
export const LazySpanTableBuilder = lazy(() =>
  loadWorkspace().then((m) => ({ default: m.SpanTableBuilder })),
);

/** The step-by-step bearing screen, loaded with the engine when it first opens. */
export const LazyScreenWizard = lazy(() => loadWorkspace().then((m) => ({ default: m.ScreenWizard })));

/** A screen's outcome page, loaded with the engine (nonbearing header rule, framing list). */
export const LazyScreenOutcome = lazy(() => loadWorkspace().then((m) => ({ default: m.ScreenOutcome })));

/** The shoring planner, loaded with the engine: it computes the plan on the device as it is typed. */
export const LazyShoringPlanner = lazy(() => loadWorkspace().then((m) => ({ default: m.ShoringPlanner })));

/** A member's load path, loaded with the engine: it checks every element down to the ground on the device. */
export const LazyMemberLoadPath = lazy(() => loadWorkspace().then((m) => ({ default: m.MemberLoadPath })));

/** A member's budget, loaded with the pricing (lib/budget), which the price book shares. */
export const LazyMemberBudgetScreen = lazy(() =>
  loadWorkspace().then((m) => ({ default: m.MemberBudgetScreen })),
);

/** The price book, loaded with the pricing (lib/budget), which a member's budget shares. */
export const LazyPriceBookScreen = lazy(() => loadWorkspace().then((m) => ({ default: m.PriceBookScreen })));
