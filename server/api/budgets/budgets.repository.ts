import { and, desc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { memberBudgets, priceItems, sentBudgets } from '@/db/schema';
import type {
  BudgetChoicesInput,
  BudgetOverrides,
  SentBudget,
  SentBudgetSnapshot,
} from '@/shared/schemas/budgets';

export interface SavedBudget {
  choices: BudgetChoicesInput;
  overrides: BudgetOverrides;
  updatedAt: string;
}

export function findMemberBudget(db: DbOrTx, orgId: string, memberId: string): SavedBudget | undefined {
  return db
    .select({
      choices: memberBudgets.choices,
      overrides: memberBudgets.overrides,
      updatedAt: memberBudgets.updatedAt,
    })
    .from(memberBudgets)
    .where(and(eq(memberBudgets.memberId, memberId), eq(memberBudgets.orgId, orgId)))
    .get();
}

export function saveMemberBudget(
  db: DbOrTx,
  owner: { orgId: string; userId: string; memberId: string },
  saved: { choices: BudgetChoicesInput; overrides: BudgetOverrides },
): void {
  const updatedAt = new Date().toISOString();
  db.insert(memberBudgets)
    .values({ memberId: owner.memberId, orgId: owner.orgId, ...saved, updatedAt, updatedBy: owner.userId })
    .onConflictDoUpdate({
      target: memberBudgets.memberId,
      set: { ...saved, updatedAt, updatedBy: owner.userId },
    })
    .run();
}

/** The firm's price amounts and when each was set, by key. */
export function priceAmounts(
  db: DbOrTx,
  orgId: string,
): { amounts: Map<string, number>; setAt: Map<string, string> } {
  const rows = db
    .select({ key: priceItems.key, amount: priceItems.amount, setAt: priceItems.setAt })
    .from(priceItems)
    .where(eq(priceItems.orgId, orgId))
    .all();
  return {
    amounts: new Map(rows.map((r) => [r.key, r.amount])),
    setAt: new Map(rows.map((r) => [r.key, r.setAt])),
  };
}

export function insertSentBudget(
  db: DbOrTx,
  owner: { orgId: string; jobId: string; userId: string },
  clientName: string,
  snapshot: SentBudgetSnapshot,
): SentBudget {
  const sent: SentBudget = {
    id: newId(),
    jobId: owner.jobId,
    clientName,
    sentAt: new Date().toISOString(),
    sentBy: owner.userId,
    snapshot,
  };
  db.insert(sentBudgets)
    .values({ ...sent, orgId: owner.orgId })
    .run();
  return sent;
}

export function listSentBudgets(db: DbOrTx, orgId: string, jobId: string): SentBudget[] {
  return db
    .select({
      id: sentBudgets.id,
      jobId: sentBudgets.jobId,
      clientName: sentBudgets.clientName,
      sentAt: sentBudgets.sentAt,
      sentBy: sentBudgets.sentBy,
      snapshot: sentBudgets.snapshot,
    })
    .from(sentBudgets)
    .where(and(eq(sentBudgets.orgId, orgId), eq(sentBudgets.jobId, jobId)))
    .orderBy(desc(sentBudgets.sentAt), desc(sql`${sentBudgets}.rowid`))
    .all();
}

/** Only a sent budget of `orgId`: another firm's id reads as missing. */
export function findSentBudget(db: DbOrTx, orgId: string, budgetId: string): SentBudget | undefined {
  return db
    .select({
      id: sentBudgets.id,
      jobId: sentBudgets.jobId,
      clientName: sentBudgets.clientName,
      sentAt: sentBudgets.sentAt,
      sentBy: sentBudgets.sentBy,
      snapshot: sentBudgets.snapshot,
    })
    .from(sentBudgets)
    .where(and(eq(sentBudgets.orgId, orgId), eq(sentBudgets.id, budgetId)))
    .get();
}
