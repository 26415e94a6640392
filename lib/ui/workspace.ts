/**
 * Everything that runs the calculation engine or the pricing on the device (the engine, mathjs, the tables,
 * the diagrams, lib/budget): the member editor, the span table builder, the bearing screen's parts (which
 * questions apply, the nonbearing header rule and framing list, the shoring plan as it is typed), a
 * member's load path, its budget and the price book. Only lazy-workspace.tsx imports it, through import(), so the
 * web build keeps it in one chunk that loads with the screens that use it and never with the sign-in
 * screen. Two such chunks would not do: the web build moves whatever two lazy chunks share (here the engine)
 * into the common chunk that every screen loads at start.
 */
export { MemberBudgetScreen } from './budget/member-budget-screen';
export { PriceBookScreen } from './budget/price-book-screen';
export { MemberLoadPath } from './load-path/member-load-path';
export { ScreenOutcome } from './bearing/screen-outcome';
export { ScreenWizard } from './bearing/screen-wizard';
export { ShoringPlanner } from './bearing/shoring-planner';
export { MemberEditor } from './member/member-editor';
export { SpanTableBuilder } from './span-table/span-table-builder';
