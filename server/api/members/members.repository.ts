import { and, asc, eq, getTableColumns, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { namedAfter, preparedPerDb, rawPreparedPerDb } from '@/db/prepared';
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

/**
 * Writes a recomputed member over `saved` (read in the same transaction), as its next version, and answers
 * the member as stored, built from what was written rather than read back: the result's JSON is not parsed
 * again.
 */
export function updateMember(
  db: DbOrTx,
  orgId: string,
  saved: Member,
  updatedBy: string,
  fields: MemberFields,
): Member | undefined {
  const changes = { ...fields, updatedBy, updatedAt: new Date().toISOString(), version: saved.version + 1 };
  const { changes: written } = db
    .update(members)
    .set(changes)
    .where(and(eq(members.id, saved.id), eq(members.orgId, orgId)))
    .run();
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

const membersOnPath = preparedPerDb((db) =>
  db
    .select({
      id: members.id,
      label: members.label,
      kind: members.kind,
      input: members.input,
      summary: members.summary,
    })
    .from(members)
    .where(and(eq(members.jobId, sql.placeholder('jobId')), eq(members.orgId, sql.placeholder('orgId'))))
    .orderBy(asc(members.createdAt), asc(sql`${members}.rowid`))
    .prepare(),
);

/** The job's members as the load path reads them, in the order they were made. */
export function listMembersOnPath(db: DbOrTx, orgId: string, jobId: string): MemberOnPath[] {
  return membersOnPath(db).all({ jobId, orgId });
}

/** Writes a member's summary alone (its state on the job's load path changed). */
export function setMemberSummary(db: DbOrTx, orgId: string, memberId: string, summary: MemberSummary): void {
  db.update(members)
    .set({ summary })
    .where(and(eq(members.id, memberId), eq(members.orgId, orgId)))
    .run();
}
