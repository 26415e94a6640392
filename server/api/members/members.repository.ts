import { and, asc, eq, getTableColumns, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { members } from '@/db/schema';
import type { Member, MemberListItem } from '@/shared/schemas/members';

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

/** The job's members in the order they were made, without inputs and results. */
export function listMembers(db: DbOrTx, orgId: string, jobId: string): MemberListItem[] {
  return (
    db
      .select(listColumns)
      .from(members)
      .where(and(eq(members.jobId, jobId), eq(members.orgId, orgId)))
      // rowid breaks ties between rows written in the same millisecond, keeping insertion order.
      .orderBy(asc(members.createdAt), asc(sql`${members}.rowid`))
      .all()
  );
}

/** Only a member of `orgId`: another firm's id reads as missing. */
export function findMember(db: DbOrTx, orgId: string, memberId: string): Member | undefined {
  return db
    .select(memberColumns)
    .from(members)
    .where(and(eq(members.id, memberId), eq(members.orgId, orgId)))
    .get();
}

export function insertMember(
  db: DbOrTx,
  owner: { orgId: string; jobId: string; userId: string },
  fields: MemberFields,
): Member {
  const now = new Date().toISOString();
  const member: Member = {
    id: newId(),
    jobId: owner.jobId,
    ...fields,
    createdBy: owner.userId,
    updatedBy: owner.userId,
    createdAt: now,
    updatedAt: now,
  };
  db.insert(members)
    .values({ ...member, orgId: owner.orgId })
    .run();
  return member;
}

export function updateMember(
  db: DbOrTx,
  orgId: string,
  memberId: string,
  updatedBy: string,
  fields: MemberFields,
): Member | undefined {
  return db
    .update(members)
    .set({ ...fields, updatedBy, updatedAt: new Date().toISOString() })
    .where(and(eq(members.id, memberId), eq(members.orgId, orgId)))
    .returning(memberColumns)
    .get();
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
