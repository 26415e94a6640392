import { and, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { jobChecklistItems, users } from '@/db/schema';
import type { ChecklistItemKey, ChecklistState } from '@/shared/schemas/job-checklist';

export interface ChecklistRow {
  jobId: string;
  itemKey: ChecklistItemKey;
  state: ChecklistState;
  note: string;
  updatedBy: string;
  updatedByName: string;
  updatedAt: string;
  version: number;
}

const columns = {
  jobId: jobChecklistItems.jobId,
  itemKey: jobChecklistItems.itemKey,
  state: jobChecklistItems.state,
  note: jobChecklistItems.note,
  updatedBy: jobChecklistItems.updatedBy,
  updatedByName: users.name,
  updatedAt: jobChecklistItems.updatedAt,
  version: jobChecklistItems.version,
};

/** The items someone has set on the job (or, without `jobId`, on every job of the firm). */
export function listChecklistRows(db: DbOrTx, orgId: string, jobId?: string): ChecklistRow[] {
  return db
    .select(columns)
    .from(jobChecklistItems)
    .innerJoin(users, eq(users.id, jobChecklistItems.updatedBy))
    .where(
      and(
        eq(jobChecklistItems.orgId, orgId),
        jobId === undefined ? undefined : eq(jobChecklistItems.jobId, jobId),
      ),
    )
    .all();
}

export function upsertChecklistRow(
  db: DbOrTx,
  orgId: string,
  row: { jobId: string; itemKey: ChecklistItemKey; state: ChecklistState; note: string; updatedBy: string },
): void {
  const updatedAt = new Date().toISOString();
  db.insert(jobChecklistItems)
    .values({ ...row, orgId, updatedAt, version: 1 })
    .onConflictDoUpdate({
      target: [jobChecklistItems.jobId, jobChecklistItems.itemKey],
      set: {
        state: row.state,
        note: row.note,
        updatedBy: row.updatedBy,
        updatedAt,
        version: sql`${jobChecklistItems.version} + 1`,
      },
    })
    .run();
}
