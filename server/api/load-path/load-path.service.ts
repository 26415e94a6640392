import type { Db, DbOrTx } from '@/db/client';
import { CalcInputError, evaluateLoadPath } from '@/lib/calc';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import {
  findMember,
  listMembersOnPath,
  setMemberSummary,
  type MemberOnPath,
} from '@/server/api/members/members.repository';
import { AppError, notFound } from '@/server/app-error';
import type { CalcTaskAnswer } from '@/server/services/calc-tasks';
import type {
  LoadPathEnd,
  LoadPathInput,
  LoadPathNode,
  LoadPathResult,
} from '@/shared/schemas/calc/load-path';
import type { Job } from '@/shared/schemas/jobs';
import type {
  BearingSaved,
  BearingSet,
  Element,
  ElementCreate,
  ElementPatch,
  JobLoadPath,
} from '@/shared/schemas/load-path-elements';
import type { MemberSummary } from '@/shared/schemas/members';
import {
  deleteBearing,
  deleteBearingsOf,
  deleteElement,
  findElement,
  insertElement,
  listBearings,
  listElements,
  updateElement,
  upsertBearing,
} from './load-path.repository';
import { memberStateOnPath } from './member-load-path-state';

function openJob(db: DbOrTx, orgId: string, jobId: string): Job {
  const job = findJob(db, orgId, jobId);
  if (!job) throw notFound('Job');
  if (job.archivedAt)
    throw new AppError('conflict', 'This job is archived: its load path can be read, not changed');
  return job;
}

/** Names the body field an engine refusal belongs to (the engine names its own input's field). */
export type FieldOf = (engineField: string) => string;

/** A bearing body: where it lands (`atFt`) or what it bears on (`ontoId`; a cycle too). */
const bearingField: FieldOf = (field) => (field.endsWith('.atFt') ? 'atFt' : 'ontoId');
const elementField: FieldOf = () => 'element';

/** What the load path's input takes of a member (its summary is what the path writes back). */
export type PathMember = Omit<MemberOnPath, 'summary'>;

/** What a job's load path is evaluated from, as read from the database: the engine's input is plain data. */
interface JobPathRead<M extends PathMember = MemberOnPath> {
  members: M[];
  elements: Element[];
  bearings: ReturnType<typeof listBearings>;
  input: LoadPathInput;
}

/** The job's members (given, or as stored) and existing framing as the engine's nodes. */
function readJobPath<M extends PathMember = MemberOnPath>(
  db: DbOrTx,
  orgId: string,
  job: Job,
  members: M[],
): JobPathRead<M> {
  const elements = listElements(db, orgId, job.id);
  const bearings = listBearings(db, orgId, job.id);
  const bearingsOf = (id: string) =>
    bearings.filter((b) => b.fromId === id).map(({ id: _id, fromId: _from, ...b }) => b);
  const nodes: LoadPathNode[] = [
    ...members.map((m) => ({
      id: m.id,
      label: m.label,
      element: { kind: 'member' as const, input: m.input },
      bearings: bearingsOf(m.id),
    })),
    ...elements.map((e) => ({ id: e.id, label: e.label, element: e.element, bearings: bearingsOf(e.id) })),
  ];
  return { members, elements, bearings, input: { edition: job.loadStandard, nodes } };
}

/** The answer from what was read and its evaluation; an engine refusal is a 400 on `fieldOf` its field. */
function answerOf(read: JobPathRead, evaluate: () => LoadPathResult, fieldOf: FieldOf): JobLoadPath {
  try {
    const result = evaluate();
    return {
      members: read.members.map((m) => ({ id: m.id, label: m.label, kind: m.kind })),
      elements: read.elements,
      bearings: read.bearings,
      result,
    };
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    throw new AppError('bad_request', error.message, {
      [fieldOf(error.field)]: [error.message],
    });
  }
}

/**
 * The job's members and existing framing as the engine's nodes, and its evaluation (also frozen into a
 * design request's snapshot). An engine refusal (a
 * cycle, a load off the member it lands on, an end the element does not have) is a 400 on `field`.
 */
export function evaluateJob(
  db: DbOrTx,
  orgId: string,
  job: Job,
  fieldOf: FieldOf,
  members?: MemberOnPath[],
): JobLoadPath {
  const read = readJobPath(db, orgId, job, members ?? listMembersOnPath(db, orgId, job.id));
  return answerOf(read, () => evaluateLoadPath(read.input), fieldOf);
}

/** A job's load path evaluated in the calculation pool, with the input (JSON text) it was evaluated from. */
export interface PooledLoadPath {
  inputJson: string;
  answer: CalcTaskAnswer<LoadPathResult>;
}

/**
 * The job's load path input as it will be once `member` is saved (in its place, or last when it is new),
 * read before the write's transaction so the pool can evaluate it meanwhile.
 */
export function pathInputWith(db: DbOrTx, orgId: string, job: Job, member: PathMember): LoadPathInput {
  const members: PathMember[] = listMembersOnPath(db, orgId, job.id);
  const saved = members.some((m) => m.id === member.id);
  const next = saved ? members.map((m) => (m.id === member.id ? member : m)) : [...members, member];
  return jobPathInputOf(db, orgId, job, next);
}

/** The job's load path input with `members` as given (each with the input it will have) and its framing. */
export const jobPathInputOf = (db: DbOrTx, orgId: string, job: Job, members: PathMember[]): LoadPathInput =>
  readJobPath(db, orgId, job, members).input;

/** The job's load path input as stored now. */
export const jobPathInput = (db: DbOrTx, orgId: string, job: Job): LoadPathInput =>
  readJobPath(db, orgId, job, listMembersOnPath(db, orgId, job.id)).input;

/** The pool's evaluation when it was made from the same input as `input`, else undefined. */
function pooledResult(input: LoadPathInput, pooled?: PooledLoadPath): LoadPathResult | undefined {
  if (!pooled || JSON.stringify(input) !== pooled.inputJson) return undefined;
  if (!pooled.answer.ok) throw new CalcInputError(pooled.answer.field, pooled.answer.message);
  return pooled.answer.value;
}

/**
 * Checks the whole load path of the job again inside the caller's transaction (a change anywhere re-checks
 * everything below it) and writes each member's state on the path into its summary, so the job page never
 * says "passes" of a member whose load does not reach the ground. With `pooled`, the pool's evaluation is
 * used when it was made from exactly what the transaction reads (else, the job changed meanwhile, the path
 * is evaluated here): the stored summaries are the same either way.
 * @returns the evaluation, and each member's summary as now stored
 */
export function refreshLoadPath(
  tx: DbOrTx,
  orgId: string,
  job: Job,
  fieldOf: FieldOf,
  pooled?: PooledLoadPath,
): { loadPath: JobLoadPath; summaries: Map<string, MemberSummary> } {
  const read = readJobPath(tx, orgId, job, listMembersOnPath(tx, orgId, job.id));
  const { members } = read;
  const loadPath = answerOf(
    read,
    () => pooledResult(read.input, pooled) ?? evaluateLoadPath(read.input),
    fieldOf,
  );
  const summaries = new Map<string, MemberSummary>();
  for (const member of members) {
    const onPath = loadPath.result.elements.find((e) => e.id === member.id);
    if (!onPath) continue;
    const summary: MemberSummary = {
      ...member.summary,
      checkState: member.summary.checkState ?? 'passes',
      state: memberStateOnPath(member.summary, onPath),
      loadPath: { closed: onPath.closed, openReasons: onPath.openReasons },
    };
    if (JSON.stringify(summary) !== JSON.stringify(member.summary))
      setMemberSummary(tx, orgId, member.id, summary);
    summaries.set(member.id, summary);
  }
  return { loadPath, summaries };
}

/** The job an end belongs to: a member's or an element's, of the actor's firm. */
function ownerOfEnd(db: DbOrTx, orgId: string, from: { memberId?: string; elementId?: string }) {
  if (from.memberId) {
    const member = findMember(db, orgId, from.memberId);
    if (!member) throw notFound('Member');
    return { id: member.id, jobId: member.jobId, label: member.label };
  }
  const element = findElement(db, orgId, from.elementId ?? '');
  if (!element) throw notFound('Element');
  return { id: element.id, jobId: element.jobId, label: element.label };
}

/**
 * A job's existing framing and the bearings of every end of its members and elements. Every write checks
 * the whole load path again in its transaction: a change the engine refuses (a cycle, a load off the member
 * it lands on) is a 400 and writes nothing. Another firm's ids are "not found"; an archived job is read-only.
 */
export function createLoadPathService(db: Db) {
  return {
    get(orgId: string, jobId: string): JobLoadPath {
      const job = findJob(db, orgId, jobId);
      if (!job) throw notFound('Job');
      return evaluateJob(db, orgId, job, bearingField);
    },

    listElements(orgId: string, jobId: string): Element[] {
      if (!findJob(db, orgId, jobId)) throw notFound('Job');
      return listElements(db, orgId, jobId);
    },

    getElement(orgId: string, elementId: string): Element {
      const element = findElement(db, orgId, elementId);
      if (!element) throw notFound('Element');
      return element;
    },

    createElement(actor: Actor, jobId: string, body: ElementCreate): Element {
      return db.transaction((tx) => {
        const job = openJob(tx, actor.orgId, jobId);
        const element = insertElement(tx, { ...actor, jobId }, body);
        refreshLoadPath(tx, actor.orgId, job, elementField);
        recordAudit(tx, actor, {
          action: 'element.create',
          subject: element.id,
          detail: { jobId, kind: element.kind, label: element.label },
        });
        return element;
      });
    },

    updateElement(actor: Actor, elementId: string, patch: ElementPatch): Element {
      return db.transaction((tx) => {
        const saved = findElement(tx, actor.orgId, elementId);
        if (!saved) throw notFound('Element');
        const job = openJob(tx, actor.orgId, saved.jobId);
        if (patch.element && patch.element.kind !== saved.kind) {
          const message = 'The kind of an element stays: delete it and add the other kind';
          throw new AppError('bad_request', message, { 'element.kind': [message] });
        }
        const element = updateElement(tx, actor.orgId, saved, {
          label: patch.label ?? saved.label,
          element: patch.element ?? saved.element,
        });
        refreshLoadPath(tx, actor.orgId, job, elementField);
        recordAudit(tx, actor, {
          action: 'element.update',
          subject: elementId,
          detail: { jobId: saved.jobId, fields: Object.keys(patch) },
        });
        return element;
      });
    },

    removeElement(actor: Actor, elementId: string): void {
      db.transaction((tx) => {
        const saved = findElement(tx, actor.orgId, elementId);
        if (!saved) throw notFound('Element');
        const job = openJob(tx, actor.orgId, saved.jobId);
        deleteBearingsOf(tx, actor.orgId, elementId);
        deleteElement(tx, actor.orgId, elementId);
        refreshLoadPath(tx, actor.orgId, job, bearingField);
        recordAudit(tx, actor, {
          action: 'element.delete',
          subject: elementId,
          detail: { jobId: saved.jobId, label: saved.label },
        });
      });
    },

    setBearing(
      actor: Actor,
      from: { memberId?: string; elementId?: string },
      end: LoadPathEnd,
      body: BearingSet,
    ): BearingSaved {
      return db.transaction((tx) => {
        const owner = ownerOfEnd(tx, actor.orgId, from);
        const job = openJob(tx, actor.orgId, owner.jobId);
        const { onto, ontoId, ...rest } = body;
        const created = onto ? insertElement(tx, { ...actor, jobId: job.id }, onto) : null;
        const bearing = upsertBearing(tx, { orgId: actor.orgId, jobId: job.id }, owner.id, end, {
          ...rest,
          ontoId: created?.id ?? (ontoId as string),
        });
        const { loadPath } = refreshLoadPath(tx, actor.orgId, job, bearingField);
        recordAudit(tx, actor, {
          action: 'bearing.set',
          subject: owner.id,
          detail: { jobId: job.id, end, ontoId: bearing.ontoId, created: created?.id ?? null },
        });
        return { bearing, created, loadPath };
      });
    },

    clearBearing(actor: Actor, from: { memberId?: string; elementId?: string }, end: LoadPathEnd): void {
      db.transaction((tx) => {
        const owner = ownerOfEnd(tx, actor.orgId, from);
        const job = openJob(tx, actor.orgId, owner.jobId);
        // Clearing an end that bears on nothing already is no change, and no error.
        if (!deleteBearing(tx, actor.orgId, owner.id, end)) return;
        refreshLoadPath(tx, actor.orgId, job, bearingField);
        recordAudit(tx, actor, {
          action: 'bearing.clear',
          subject: owner.id,
          detail: { jobId: job.id, end },
        });
      });
    },
  };
}

export type LoadPathService = ReturnType<typeof createLoadPathService>;
