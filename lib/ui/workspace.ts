/**
 * Everything that runs the calculation engine on the device (the engine, mathjs, the tables, the diagrams).
 * Only lazy-workspace.tsx imports it, through import(), so the web build keeps it in one chunk that loads
 * with the screens that use it and never with the sign-in screen.
 */
export { MemberEditor } from './member/member-editor';
export { SpanTableBuilder } from './span-table/span-table-builder';
