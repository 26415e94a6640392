import { and, asc, eq, getTableColumns, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { namedAfter, preparedPerDb, rawPreparedPerDb, rawRunPerDb, slot } from '@/db/prepared';
import { members } from '@/db/schema';
import type { Member, MemberListItem, MemberSummary } from '@/shared/schemas/members';

/** What a save writes besides the ids, the people and the dates: the member and what the engine made of it. */
export type MemberFields = Pick<
  Member,
  | 'kind'
  | 'label'
  | 'wall'
  | 'input'
  | 'materialId'
  | 'sizeId'
  | 'summary'
  | 'result'
  | 'prescriptive'
  | 'engineVersion'
>;

const { orgId: _orgId, ...memberColumns } = getTableColumns(members);
const { input: _input, result: _result, prescriptive: _prescriptive, ...listColumns } = memberColumns;

/** The list's columns are plain but the summary, which is parsed here: the list reads them raw. */
const toListItem = namedAfter<MemberListItem>(listColumns);
const membersOfJob = rawPreparedPerDb(
  (db) =>
    db
      .select(listColumns)
      .from(members)
      .where(and(eq(members.jobId, sql.placeholder('jobId')), eq(members.orgId, sql.placeholder('orgId'))))
      // rowid breaks ties between rows written in the same millisecond, keeping insertion order.
      .orderBy(asc(members.createdAt), asc(sql`${members}.rowid`)),
  (values): MemberListItem => {
    const item = toListItem(values);
    return { ...item, summary: JSON.parse(item.summary as unknown as string) as MemberSummary };
  },
);

const memberById = preparedPerDb((db) =>
  db
    .select(memberColumns)
    .from(members)
    .where(and(eq(members.id, sql.placeholder('memberId')), eq(members.orgId, sql.placeholder('orgId'))))
    .prepare(),
);

/** The job's members in the order they were made, without inputs and results. */
export function listMembers(db: DbOrTx, orgId: string, jobId: string): MemberListItem[] {
  return membersOfJob.all(db, jobId, orgId);
}

/** The member holding `memberId` in whatever firm: only for checking a device-chosen id. */
export function findMemberInAnyFirm(db: DbOrTx, memberId: string): (Member & { orgId: string }) | undefined {
  return db.select().from(members).where(eq(members.id, memberId)).get();
}

/** Only a member of `orgId`: another firm's id reads as missing. */
export function findMember(db: DbOrTx, orgId: string, memberId: string): Member | undefined {
  return memberById(db).get({ memberId, orgId });
}

/** A member as a save reads it: everything but the stored result and verdict, which the save replaces. */
export type SavedMember = Omit<Member, 'result' | 'prescriptive'>;

const { result: _r, prescriptive: _p, ...savedColumns } = memberColumns;
const toSaved = namedAfter<SavedMember>(savedColumns);
const memberToSave = rawPreparedPerDb(
  (db) =>
    db
      .select(savedColumns)
      .from(members)
      .where(and(eq(members.id, sql.placeholder('memberId')), eq(members.orgId, sql.placeholder('orgId')))),
  (values): SavedMember => {
    const row = toSaved(values);
    return {
      ...row,
      input: JSON.parse(row.input as unknown as string) as SavedMember['input'],
      summary: JSON.parse(row.summary as unknown as string) as MemberSummary,
    };
  },
);

/** {@link findMember} without the stored result and verdict (read raw: a save's first read). */
export function findMemberToSave(db: DbOrTx, orgId: string, memberId: string): SavedMember | undefined {
  return memberToSave.get(db, memberId, orgId);
}

export function insertMember(
  db: DbOrTx,
  owner: { orgId: string; jobId: string; userId: string },
  fields: MemberFields,
  id: string = newId(),
): Member {
  const now = new Date().toISOString();
  const member: Member = {
    id,
    jobId: owner.jobId,
    ...fields,
    createdBy: owner.userId,
    updatedBy: owner.userId,
    createdAt: now,
    updatedAt: now,
    version: 1,
  };
  db.insert(members)
    .values({ ...member, orgId: owner.orgId })
    .run();
  return member;
}

const memberUpdate = rawRunPerDb((db) =>
  db
    .update(members)
    .set({
      kind: slot('kind'),
      label: slot('label'),
      wall: slot('wall'),
      input: slot('input'),
      materialId: slot('materialId'),
      sizeId: slot('sizeId'),
      summary: slot('summary'),
      result: slot('result'),
      prescriptive: slot('prescriptive'),
      engineVersion: slot('engineVersion'),
      updatedBy: slot('updatedBy'),
      updatedAt: slot('updatedAt'),
      version: slot('version'),
    })
    .where(and(eq(members.id, slot('id')), eq(members.orgId, slot('orgId')))),
);

/**
 * Writes a recomputed member over `saved` (read in the same transaction), as its next version, and answers
 * the member as stored, built from what was written rather than read back: the result's JSON is not parsed
 * again. The statement is prepared once; its parameters follow the order of its `set` keys.
 */
export function updateMember(
  db: DbOrTx,
  orgId: string,
  saved: SavedMember,
  updatedBy: string,
  fields: MemberFields,
): Member | undefined {
  const changes = { ...fields, updatedBy, updatedAt: new Date().toISOString(), version: saved.version + 1 };
  const { changes: written } = memberUpdate(
    db,
    changes.kind,
    changes.label,
    changes.wall,
    JSON.stringify(changes.input),
    changes.materialId,
    changes.sizeId,
    JSON.stringify(changes.summary),
    JSON.stringify(changes.result),
    changes.prescriptive === null ? null : JSON.stringify(changes.prescriptive),
    changes.engineVersion,
    changes.updatedBy,
    changes.updatedAt,
    changes.version,
    saved.id,
    orgId,
  );
  return written > 0 ? { ...saved, ...changes } : undefined;
}

/** True when a member of `orgId` was deleted. */
export function deleteMember(db: DbOrTx, orgId: string, memberId: string): boolean {
  const deleted = db
    .delete(members)
    .where(and(eq(members.id, memberId), eq(members.orgId, orgId)))
    .returning({ id: members.id })
    .all();
  return deleted.length > 0;
}

/** The job's members with their inputs, in the order they were made (for checking them again). */
export function listMembersOfJob(db: DbOrTx, orgId: string, jobId: string): Member[] {
  return db
    .select(memberColumns)
    .from(members)
    .where(and(eq(members.jobId, jobId), eq(members.orgId, orgId)))
    .orderBy(asc(members.createdAt), asc(sql`${members}.rowid`))
    .all();
}

/** What the load path reads of a member, and the summary it writes back: no result or verdict to parse. */
export type MemberOnPath = Pick<Member, 'id' | 'label' | 'kind' | 'input' | 'summary'>;

const onPathColumns = {
  id: members.id,
  label: members.label,
  kind: members.kind,
  input: members.input,
  summary: members.summary,
};
const toOnPath = namedAfter<MemberOnPath>(onPathColumns);
const membersOnPath = rawPreparedPerDb(
  (db) =>
    db
      .select(onPathColumns)
      .from(members)
      .where(and(eq(members.jobId, slot('jobId')), eq(members.orgId, slot('orgId'))))
      .orderBy(asc(members.createdAt), asc(sql`${members}.rowid`)),
  (values): MemberOnPath => {
    const row = toOnPath(values);
    return {
      ...row,
      input: JSON.parse(row.input as unknown as string) as MemberOnPath['input'],
      summary: JSON.parse(row.summary as unknown as string) as MemberSummary,
    };
  },
);

/** The job's members as the load path reads them, in the order they were made (read raw: every save reads it). */
export function listMembersOnPath(db: DbOrTx, orgId: string, jobId: string): MemberOnPath[] {
  return membersOnPath.all(db, jobId, orgId);
}

const summaryUpdate = rawRunPerDb((db) =>
  db
    .update(members)
    .set({ summary: slot('summary') })
    .where(and(eq(members.id, slot('id')), eq(members.orgId, slot('orgId')))),
);

/** Writes a member's summary alone (its state on the job's load path changed). */
export function setMemberSummary(db: DbOrTx, orgId: string, memberId: string, summary: MemberSummary): void {
  summaryUpdate(db, JSON.stringify(summary), memberId, orgId);
}
