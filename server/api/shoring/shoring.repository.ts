import { and, eq } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { shoringPlans, users } from '@/db/schema';
import type { ShoringRecord } from '@/shared/schemas/shoring-plans';

/** The member's shoring plan, only within `orgId`. */
export function findShoring(db: DbOrTx, orgId: string, memberId: string): ShoringRecord | undefined {
  return db
    .select({
      memberId: shoringPlans.memberId,
      jobId: shoringPlans.jobId,
      input: shoringPlans.input,
      result: shoringPlans.result,
      engineVersion: shoringPlans.engineVersion,
      updatedBy: shoringPlans.updatedBy,
      updatedByName: users.name,
      updatedAt: shoringPlans.updatedAt,
    })
    .from(shoringPlans)
    .innerJoin(users, eq(users.id, shoringPlans.updatedBy))
    .where(and(eq(shoringPlans.memberId, memberId), eq(shoringPlans.orgId, orgId)))
    .get();
}

export function saveShoring(
  db: DbOrTx,
  orgId: string,
  row: Omit<ShoringRecord, 'updatedByName' | 'updatedAt'>,
): void {
  const updatedAt = new Date().toISOString();
  db.insert(shoringPlans)
    .values({ ...row, orgId, updatedAt })
    .onConflictDoUpdate({
      target: shoringPlans.memberId,
      set: {
        input: row.input,
        result: row.result,
        engineVersion: row.engineVersion,
        updatedBy: row.updatedBy,
        updatedAt,
      },
    })
    .run();
}
