import { and, asc, desc, eq, ne, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import {
  attachments,
  designRequestVersions,
  designRequests,
  engineerReplies,
  jobs,
  organizations,
  requestMessages,
  users,
} from '@/db/schema';
import type { RequestCompose } from '@/shared/schemas/requests/compose';
import type { EngineerReply } from '@/shared/schemas/requests/reply';
import type { ChangeLine, RequestSnapshot } from '@/shared/schemas/requests/snapshot';
import type { RequestSide, RequestState } from '@/shared/schemas/requests/workflow';
import { wordedChanges } from './request-changes';

export type RequestRow = typeof designRequests.$inferSelect;
export type AttachmentRow = typeof attachments.$inferSelect;

/** The firm's next request number (1, 2, …); call inside the transaction that inserts the request. */
function nextNumber(db: DbOrTx, orgId: string): number {
  const row = db
    .select({ top: sql<number | null>`max(${designRequests.number})` })
    .from(designRequests)
    .where(eq(designRequests.orgId, orgId))
    .get();
  return (row?.top ?? 0) + 1;
}

export function insertRequest(
  db: DbOrTx,
  owner: { orgId: string; jobId: string; userId: string },
  draft: RequestCompose,
): RequestRow {
  const now = new Date().toISOString();
  const row: RequestRow = {
    id: newId(),
    orgId: owner.orgId,
    jobId: owner.jobId,
    number: nextNumber(db, owner.orgId),
    createdBy: owner.userId,
    engineerEmail: draft.engineerEmail,
    engineerUserId: null,
    status: 'draft',
    draft,
    version: 0,
    feeUsd: null,
    turnaroundDays: null,
    siteVisit: null,
    feeNote: null,
    feeQuotedAt: null,
    feeAcceptedAt: null,
    declineReason: null,
    firmUnread: false,
    engineerUnread: false,
    createdAt: now,
    updatedAt: now,
    sentAt: null,
  };
  db.insert(designRequests).values(row).run();
  return row;
}

export function findRequest(db: DbOrTx, requestId: string): RequestRow | undefined {
  return db.select().from(designRequests).where(eq(designRequests.id, requestId)).get();
}

/** Writes `changes` and moves `updated_at`. */
export function updateRequest(
  db: DbOrTx,
  requestId: string,
  changes: Partial<Omit<RequestRow, 'id' | 'orgId' | 'jobId' | 'number' | 'createdBy' | 'createdAt'>>,
): RequestRow {
  return db
    .update(designRequests)
    .set({ ...changes, updatedAt: new Date().toISOString() })
    .where(eq(designRequests.id, requestId))
    .returning()
    .get();
}

export interface ListRow {
  row: RequestRow;
  jobName: string;
  firmName: string;
}

const listSelect = (db: DbOrTx) =>
  db
    .select({ row: designRequests, jobName: jobs.name, firmName: organizations.name })
    .from(designRequests)
    .innerJoin(jobs, eq(jobs.id, designRequests.jobId))
    .innerJoin(organizations, eq(organizations.id, designRequests.orgId));

const newestFirst = [desc(designRequests.updatedAt), desc(sql`${designRequests}.rowid`)];

/** The firm's requests (optionally one job's or one state's), newest first. */
export function listFirmRequests(
  db: DbOrTx,
  orgId: string,
  filter: { jobId?: string; state?: RequestState },
): ListRow[] {
  return listSelect(db)
    .where(
      and(
        eq(designRequests.orgId, orgId),
        filter.jobId ? eq(designRequests.jobId, filter.jobId) : undefined,
        filter.state ? eq(designRequests.status, filter.state) : undefined,
      ),
    )
    .orderBy(...newestFirst)
    .all();
}

/** Requests bound to the engineer, never a Draft, newest first. */
export function listEngineerRequests(db: DbOrTx, userId: string, state?: RequestState): ListRow[] {
  return listSelect(db)
    .where(
      and(
        eq(designRequests.engineerUserId, userId),
        ne(designRequests.status, 'draft'),
        state ? eq(designRequests.status, state) : undefined,
      ),
    )
    .orderBy(...newestFirst)
    .all();
}

export function findNames(db: DbOrTx, row: RequestRow): { jobName: string; firmName: string } {
  const found = listSelect(db).where(eq(designRequests.id, row.id)).get();
  return { jobName: found?.jobName ?? '', firmName: found?.firmName ?? '' };
}

export function insertVersion(
  db: DbOrTx,
  version: {
    requestId: string;
    snapshot: RequestSnapshot;
    changes: ChangeLine[];
    note: string;
    sentBy: string;
  },
): void {
  db.insert(designRequestVersions)
    .values({
      id: newId(),
      ...version,
      version: version.snapshot.version,
      sentAt: version.snapshot.sentAt,
    })
    .run();
}

/** A request's sent versions, oldest first, each change list worded (see wordedChanges). */
export function listVersions(db: DbOrTx, requestId: string) {
  return wordedChanges(
    db
      .select()
      .from(designRequestVersions)
      .where(eq(designRequestVersions.requestId, requestId))
      .orderBy(asc(designRequestVersions.version))
      .all(),
  );
}

export function findVersion(db: DbOrTx, requestId: string, version: number) {
  return db
    .select()
    .from(designRequestVersions)
    .where(and(eq(designRequestVersions.requestId, requestId), eq(designRequestVersions.version, version)))
    .get();
}

export function insertThreadEntry(
  db: DbOrTx,
  entry: {
    requestId: string;
    kind: 'message' | 'event';
    side: RequestSide;
    userId: string;
    body: string;
    event?: string;
    version: number;
  },
): string {
  const id = newId();
  db.insert(requestMessages)
    .values({ id, ...entry, event: entry.event ?? null, createdAt: new Date().toISOString() })
    .run();
  return id;
}

export function listThread(db: DbOrTx, requestId: string) {
  return db
    .select({ entry: requestMessages, authorName: users.name })
    .from(requestMessages)
    .innerJoin(users, eq(users.id, requestMessages.userId))
    .where(eq(requestMessages.requestId, requestId))
    .orderBy(asc(requestMessages.createdAt), asc(sql`${requestMessages}.rowid`))
    .all();
}

export function insertReply(
  db: DbOrTx,
  reply: { requestId: string; version: number; reply: EngineerReply; userId: string },
): void {
  db.insert(engineerReplies)
    .values({ id: newId(), ...reply, createdAt: new Date().toISOString() })
    .run();
}

export function latestReply(db: DbOrTx, requestId: string) {
  return db
    .select()
    .from(engineerReplies)
    .where(eq(engineerReplies.requestId, requestId))
    .orderBy(desc(engineerReplies.createdAt), desc(sql`${engineerReplies}.rowid`))
    .get();
}

export function listAttachments(db: DbOrTx, requestId: string): AttachmentRow[] {
  return db
    .select()
    .from(attachments)
    .where(eq(attachments.requestId, requestId))
    .orderBy(asc(attachments.createdAt), asc(sql`${attachments}.rowid`))
    .all();
}

export function findAttachment(db: DbOrTx, requestId: string, attachmentId: string) {
  return db
    .select()
    .from(attachments)
    .where(and(eq(attachments.id, attachmentId), eq(attachments.requestId, requestId)))
    .get();
}

/** The file holding `attachmentId` in whatever request: only for checking a device-chosen id. */
export function findAttachmentAnywhere(db: DbOrTx, attachmentId: string) {
  return db.select().from(attachments).where(eq(attachments.id, attachmentId)).get();
}

export function insertAttachment(db: DbOrTx, row: AttachmentRow): void {
  db.insert(attachments).values(row).run();
}

export function deleteAttachment(db: DbOrTx, requestId: string, attachmentId: string): void {
  db.delete(attachments)
    .where(and(eq(attachments.id, attachmentId), eq(attachments.requestId, requestId)))
    .run();
}

/** Ties files the side uploaded (and no message holds yet) to a message; false when one is not such a file. */
export function claimForMessage(
  db: DbOrTx,
  requestId: string,
  side: RequestSide,
  attachmentIds: string[],
  messageId: string,
): boolean {
  for (const id of attachmentIds) {
    const file = findAttachment(db, requestId, id);
    if (!file || file.side !== side || file.purpose !== 'message' || file.messageId) return false;
    db.update(attachments).set({ messageId }).where(eq(attachments.id, id)).run();
  }
  return true;
}
