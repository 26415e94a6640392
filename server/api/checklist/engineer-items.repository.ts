import { and, eq, inArray, ne, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { attachments, designRequests, engineerReplies, jobEngineerItems, users } from '@/db/schema';
import type { ChecklistState } from '@/shared/schemas/job-checklist';
import type { FieldItem } from '@/shared/schemas/requests/reply';

export type EngineerItemRow = typeof jobEngineerItems.$inferSelect;

export interface EngineerItemListRow {
  row: EngineerItemRow;
  requestNumber: number;
  updatedByName: string | null;
}

/** The same item in other words only by case and spacing. */
const sameText = (a: string, b: string) =>
  a.trim().replace(/\s+/g, ' ').toLowerCase() === b.trim().replace(/\s+/g, ' ').toLowerCase();

/**
 * Writes the reply's "verify in the field" items as the rows of `version` of the request, in place of any
 * that version had. Each keeps the state, note, photos, who and when of the request's latest row with the
 * same text (of any version), so a revised reply does not undo what the contractor has checked.
 */
export function syncEngineerItems(
  db: DbOrTx,
  request: { orgId: string; jobId: string; requestId: string; version: number },
  items: readonly FieldItem[],
): void {
  const earlier = db
    .select()
    .from(jobEngineerItems)
    .where(eq(jobEngineerItems.requestId, request.requestId))
    .orderBy(sql`${jobEngineerItems.version} desc`, sql`${jobEngineerItems}.rowid desc`)
    .all();
  db.delete(jobEngineerItems)
    .where(
      and(eq(jobEngineerItems.requestId, request.requestId), eq(jobEngineerItems.version, request.version)),
    )
    .run();
  const now = new Date().toISOString();
  items.forEach((field, position) => {
    const kept = earlier.find((row) => sameText(row.item, field.item));
    db.insert(jobEngineerItems)
      .values({
        id: newId(),
        ...request,
        position,
        item: field.item,
        photoAsked: field.photo,
        state: kept?.state ?? 'to-do',
        note: kept?.note ?? '',
        photoIds: kept?.photoIds ?? [],
        updatedBy: kept?.updatedBy ?? null,
        updatedAt: kept?.updatedAt ?? null,
        createdAt: now,
      })
      .run();
  });
}

/**
 * The engineer's items on the checklist of the firm's job (or, without `jobId`, of every job of the firm):
 * for each request not declined, the rows of the version its latest reply answers, in the reply's order.
 */
export function listEngineerItems(db: DbOrTx, orgId: string, jobId?: string): EngineerItemListRow[] {
  const answered = db
    .select({
      requestId: engineerReplies.requestId,
      version: sql<number>`max(${engineerReplies.version})`.as('answered_version'),
    })
    .from(engineerReplies)
    .groupBy(engineerReplies.requestId)
    .as('answered');
  return db
    .select({ row: jobEngineerItems, requestNumber: designRequests.number, updatedByName: users.name })
    .from(jobEngineerItems)
    .innerJoin(designRequests, eq(designRequests.id, jobEngineerItems.requestId))
    .innerJoin(
      answered,
      and(eq(answered.requestId, jobEngineerItems.requestId), eq(answered.version, jobEngineerItems.version)),
    )
    .leftJoin(users, eq(users.id, jobEngineerItems.updatedBy))
    .where(
      and(
        eq(jobEngineerItems.orgId, orgId),
        jobId === undefined ? undefined : eq(jobEngineerItems.jobId, jobId),
        ne(designRequests.status, 'declined'),
      ),
    )
    .orderBy(designRequests.number, jobEngineerItems.position)
    .all();
}

/** The photos of the items: the files' names and captions, by id. */
export function listItemPhotos(db: DbOrTx, ids: readonly string[]) {
  if (ids.length === 0) return [];
  return db
    .select({
      id: attachments.id,
      requestId: attachments.requestId,
      side: attachments.side,
      mimeType: attachments.mimeType,
      fileName: attachments.fileName,
      caption: attachments.caption,
    })
    .from(attachments)
    .where(inArray(attachments.id, [...ids]))
    .all();
}

export function updateEngineerItem(
  db: DbOrTx,
  id: string,
  change: { state: ChecklistState; note: string; photoIds: string[]; updatedBy: string },
): void {
  db.update(jobEngineerItems)
    .set({ ...change, updatedAt: new Date().toISOString() })
    .where(eq(jobEngineerItems.id, id))
    .run();
}
