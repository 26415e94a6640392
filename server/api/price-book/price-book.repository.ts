import { and, asc, eq } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { priceBookSettings, priceItems, users } from '@/db/schema';

export type PriceRow = typeof priceItems.$inferSelect & { setByName: string };

const columns = {
  id: priceItems.id,
  orgId: priceItems.orgId,
  key: priceItems.key,
  amount: priceItems.amount,
  note: priceItems.note,
  setAt: priceItems.setAt,
  setBy: priceItems.setBy,
  setByName: users.name,
};

/** The firm's prices with the name of whoever set each, by key. */
export function listPrices(db: DbOrTx, orgId: string): PriceRow[] {
  return db
    .select(columns)
    .from(priceItems)
    .innerJoin(users, eq(users.id, priceItems.setBy))
    .where(eq(priceItems.orgId, orgId))
    .orderBy(asc(priceItems.key))
    .all();
}

/** Only a price of `orgId`: another firm's id reads as missing. */
export function findPrice(db: DbOrTx, orgId: string, itemId: string): PriceRow | undefined {
  return db
    .select(columns)
    .from(priceItems)
    .innerJoin(users, eq(users.id, priceItems.setBy))
    .where(and(eq(priceItems.orgId, orgId), eq(priceItems.id, itemId)))
    .get();
}

/** Sets a price (new or changed), stamping when and by whom; returns its id. */
export function upsertPrice(
  db: DbOrTx,
  orgId: string,
  userId: string,
  price: { key: string; amount: number; note: string },
): string {
  const setAt = new Date().toISOString();
  const row = db
    .insert(priceItems)
    .values({ id: newId(), orgId, ...price, setAt, setBy: userId })
    .onConflictDoUpdate({
      target: [priceItems.orgId, priceItems.key],
      set: { amount: price.amount, note: price.note, setAt, setBy: userId },
    })
    .returning({ id: priceItems.id })
    .get();
  return row.id;
}

export function deletePrice(db: DbOrTx, orgId: string, itemId: string): boolean {
  const deleted = db
    .delete(priceItems)
    .where(and(eq(priceItems.orgId, orgId), eq(priceItems.id, itemId)))
    .returning({ id: priceItems.id })
    .all();
  return deleted.length > 0;
}

/** The firm's stale age in days, or undefined when it never chose one. */
export function findStaleAfterDays(db: DbOrTx, orgId: string): number | undefined {
  return db
    .select({ days: priceBookSettings.staleAfterDays })
    .from(priceBookSettings)
    .where(eq(priceBookSettings.orgId, orgId))
    .get()?.days;
}

export function saveStaleAfterDays(db: DbOrTx, orgId: string, userId: string | null, days: number): void {
  const updatedAt = new Date().toISOString();
  db.insert(priceBookSettings)
    .values({ orgId, staleAfterDays: days, updatedAt, updatedBy: userId })
    .onConflictDoUpdate({
      target: priceBookSettings.orgId,
      set: { staleAfterDays: days, updatedAt, updatedBy: userId },
    })
    .run();
}
