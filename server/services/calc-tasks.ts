import { CalcInputError, buildShortlist, buildSpanTable, evaluateLoadPath } from '@/lib/calc';
import type { SentMemberBudget } from '@/lib/budget';
import type { SavedBudget } from '@/server/api/budgets/budgets.repository';
import { memberBudgetView, type PriceBookState } from '@/server/api/budgets/member-budget-view';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { evaluateMember, type MemberToEvaluate } from '@/server/api/members/member-evaluation';
import type { MemberFields } from '@/server/api/members/members.repository';
import { requestPackagePdf, type PackagePhoto } from '@/server/services/pdf/request-package-pdf';
import { clientSummaryPdf } from '@/server/api/budgets/client-summary-pdf';
import type { MemberBudgetView, SentBudget } from '@/shared/schemas/budgets';
import type { Job } from '@/shared/schemas/jobs';
import type { Member } from '@/shared/schemas/members';
import type { LoadPathResult } from '@/shared/schemas/calc/load-path';
import type { ShortlistInput } from '@/shared/schemas/calc/shortlist';
import type { SpanTableInput } from '@/shared/schemas/calc/span-table';
import type { RequestPackage } from '@/shared/schemas/requests/package';

/**
 * What a worker thread of the calculation pool sends back: the result (as JSON text where it goes straight
 * into a response, since serializing a large result is part of the heavy work), or the engine's input error
 * by field, which does not survive the trip between threads as a class.
 */
export type CalcTaskAnswer<T = string> =
  { ok: true; value: T } | { ok: false; field: string; message: string };

function answer<T>(work: () => T): CalcTaskAnswer<T> {
  try {
    return { ok: true, value: work() };
  } catch (error) {
    if (error instanceof CalcInputError) return { ok: false, field: error.field, message: error.message };
    throw error;
  }
}

/** Runs in a worker thread (calc-worker.cjs): every size of the chosen materials, checked and sorted. */
export function shortlist(input: ShortlistInput): CalcTaskAnswer {
  return answer(() => JSON.stringify(buildShortlist(input)));
}

/** Runs in a worker thread (calc-worker.cjs): the largest span of each size at each tributary width. */
export function spanTable(input: SpanTableInput): CalcTaskAnswer {
  return answer(() => JSON.stringify(buildSpanTable(input)));
}

/** Runs in a worker thread (calc-worker.cjs): what a member save stores (check, diagrams, verdict). */
export function memberFields(input: MemberToEvaluate): CalcTaskAnswer<MemberFields> {
  return answer(() => evaluateMember(input));
}

/** What a member save sends the pool: the member to check and the job's load path with it, as JSON text. */
export interface MemberSaveTask {
  member: MemberToEvaluate;
  pathJson: string;
}

/**
 * Runs in a worker thread (calc-worker.cjs): a member save's whole calculation in one trip, what the member
 * stores and the job's load path with the member in it (not evaluated when the member's input is refused).
 */
export function memberSave(task: MemberSaveTask): {
  fields: CalcTaskAnswer<MemberFields>;
  path?: CalcTaskAnswer<LoadPathResult>;
} {
  const fields = memberFields(task.member);
  return fields.ok ? { fields, path: statesOnly(loadPath(task.pathJson)) } : { fields };
}

/** What a job change sends the pool: the members that take a changed value and the job's path as it will be. */
export interface JobRecomputeTask {
  members: (MemberToEvaluate & { id: string })[];
  pathJson: string;
}

/**
 * Runs in a worker thread (calc-worker.cjs): a job change's checks in one trip, each member that takes a
 * changed value checked again (its own answer each, so one refusal names its member) and the job's load
 * path as it will be with them saved.
 */
export function jobRecompute(task: JobRecomputeTask): {
  members: { id: string; fields: CalcTaskAnswer<MemberFields> }[];
  path: CalcTaskAnswer<LoadPathResult>;
} {
  const members = task.members.map(({ id, ...member }) => ({ id, fields: memberFields(member) }));
  return { members, path: statesOnly(loadPath(task.pathJson)) };
}

/**
 * A save or a job change reads only each element's state on the path (see refreshLoadPath), so the beams' own member checks
 * (some 20 KB each, with their diagram samples) stay in the worker instead of being copied to the main
 * thread with every save.
 */
function statesOnly(path: CalcTaskAnswer<LoadPathResult>): CalcTaskAnswer<LoadPathResult> {
  if (!path.ok) return path;
  const elements = path.value.elements.map(({ memberResult: _memberResult, ...element }) => element);
  return { ok: true, value: { ...path.value, elements } };
}

/**
 * Runs in a worker thread (calc-worker.cjs): a job's load path from its input as JSON text, the form the
 * main thread compares with what it reads in the write's transaction.
 */
export function loadPath(inputJson: string): CalcTaskAnswer<LoadPathResult> {
  return answer(() => evaluateLoadPath(JSON.parse(inputJson)));
}

/** What one member's budget is priced from, as read from the database on the main thread. */
export interface MemberBudgetFacts {
  member: Member;
  job: Job;
  saved: SavedBudget | undefined;
  book: PriceBookState;
  /** The engineer's member when a request for it is Designed: the budget is priced from it. */
  design?: MemberDesign;
  /** The member's part of the budget last sent to the client, which a change order compares with. */
  sent?: SentMemberBudget;
}

/** Runs in a worker thread (calc-worker.cjs): each member's budget, priced from its stored check. */
export function budgetViews(input: MemberBudgetFacts[]): CalcTaskAnswer<MemberBudgetView[]> {
  return answer(() => input.map((f) => memberBudgetView(f.member, f.job, f.saved, f.book, f.design, f.sent)));
}

/** Runs in a worker thread (calc-worker.cjs): a sent budget's client summary PDF (fonts embedded whole). */
export function budgetSummaryPdf(sent: SentBudget): Promise<Uint8Array> {
  return clientSummaryPdf(sent);
}

/** Runs in a worker thread (calc-worker.cjs): the design request's PDF (pages, diagrams, photos). */
export function packagePdf(input: { pkg: RequestPackage; photos: PackagePhoto[] }): Promise<Uint8Array> {
  return requestPackagePdf(input.pkg, input.photos);
}
