import { and, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { shoringPlans, users } from '@/db/schema';
import type { ShoringRecord } from '@/shared/schemas/shoring-plans';

/** The member's shoring plan, only within `orgId`. */
export function findShoring(db: DbOrTx, orgId: string, memberId: string): ShoringRecord | undefined {
  return db
    .select({
      id: shoringPlans.id,
      memberId: shoringPlans.memberId,
      jobId: shoringPlans.jobId,
      input: shoringPlans.input,
      result: shoringPlans.result,
      engineVersion: shoringPlans.engineVersion,
      updatedBy: shoringPlans.updatedBy,
      updatedByName: users.name,
      updatedAt: shoringPlans.updatedAt,
      version: shoringPlans.version,
    })
    .from(shoringPlans)
    .innerJoin(users, eq(users.id, shoringPlans.updatedBy))
    .where(and(eq(shoringPlans.memberId, memberId), eq(shoringPlans.orgId, orgId)))
    .get();
}

/** The plan holding `planId`, in whatever firm: only for checking a device-chosen id. */
export function findShoringByPlanId(
  db: DbOrTx,
  planId: string,
): { orgId: string; memberId: string } | undefined {
  return db
    .select({ orgId: shoringPlans.orgId, memberId: shoringPlans.memberId })
    .from(shoringPlans)
    .where(eq(shoringPlans.id, planId))
    .get();
}

/**
 * Makes the member's plan (version 1, with `id`) or writes its next version; a plan keeps the id it was
 * made with.
 */
export function saveShoring(
  db: DbOrTx,
  orgId: string,
  row: Omit<ShoringRecord, 'updatedByName' | 'updatedAt' | 'version'> & { id: string },
): void {
  const updatedAt = new Date().toISOString();
  db.insert(shoringPlans)
    .values({ ...row, orgId, updatedAt, version: 1 })
    .onConflictDoUpdate({
      target: shoringPlans.memberId,
      set: {
        input: row.input,
        result: row.result,
        engineVersion: row.engineVersion,
        updatedBy: row.updatedBy,
        updatedAt,
        version: sql`${shoringPlans.version} + 1`,
      },
    })
    .run();
}
