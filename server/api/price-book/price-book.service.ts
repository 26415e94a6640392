import type { Db, DbOrTx } from '@/db/client';
import { catalogueItem, FIXED_ITEMS, type PriceUnit } from '@/lib/budget';
import { AppError, notFound } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import type { PriceBook, PriceImport, PriceItem, PricePatch, PriceSet } from '@/shared/schemas/price-book';
import { priceBookCsv, readPriceCsv } from './price-csv';
import {
  deletePrice,
  findPrice,
  findStaleAfterDays,
  listPrices,
  saveStaleAfterDays,
  upsertPrice,
  type PriceRow,
} from './price-book.repository';
import { amountProblem } from './price-rules';

/** Stale age of a firm that has not chosen one, days (Tributary's default; each firm sets its own). */
export const DEFAULT_STALE_AFTER_DAYS = 90;
const DAY_MS = 86_400_000;

export function staleAfterDays(db: DbOrTx, orgId: string): number {
  return findStaleAfterDays(db, orgId) ?? DEFAULT_STALE_AFTER_DAYS;
}

/** True when a price set at `setAt` is older than `days` at `now`. */
export function isStale(setAt: string, days: number, now = Date.now()): boolean {
  return now - Date.parse(setAt) > days * DAY_MS;
}

function toItem(row: PriceRow, staleDays: number, now: number): PriceItem {
  const item = catalogueItem(row.key);
  return {
    id: row.id,
    key: row.key,
    category: item?.category ?? 'unknown',
    description: item?.label ?? row.key,
    unit: item?.unit ?? 'each',
    amount: row.amount,
    note: row.note,
    setAt: row.setAt,
    setBy: { id: row.setBy, name: row.setByName },
    stale: isStale(row.setAt, staleDays, now),
  };
}

/** The item a key names, with its amount checked for its unit; a 400 at the field otherwise. */
function checkedPrice(key: string, amount: number): void {
  const item = catalogueItem(key);
  if (!item) throw new AppError('bad_request', 'Not a price book item', { key: ['Not a price book item'] });
  const problem = amountProblem(amount, item.unit as PriceUnit);
  if (problem) throw new AppError('bad_request', problem, { amount: [problem] });
}

/**
 * A firm's price book: every price with when and by whom it was set, stale past the firm's age, set one at a
 * time or imported from CSV in one transaction (a file with any bad row changes nothing).
 */
export function createPriceBookService(db: Db) {
  const read = (orgId: string): PriceBook => {
    const days = staleAfterDays(db, orgId);
    const now = Date.now();
    const items = listPrices(db, orgId).map((row) => toItem(row, days, now));
    const priced = new Set(items.map((i) => i.key));
    return {
      items,
      staleAfterDays: days,
      unpriced: FIXED_ITEMS.filter((i) => !priced.has(i.key)).map(({ key, category, label, unit }) => ({
        key,
        category,
        description: label,
        unit,
      })),
    };
  };

  const itemById = (orgId: string, itemId: string): PriceItem => {
    const row = findPrice(db, orgId, itemId);
    if (!row) throw notFound('Price');
    return toItem(row, staleAfterDays(db, orgId), Date.now());
  };

  return {
    read,

    csv(orgId: string): string {
      return priceBookCsv(read(orgId).items);
    },

    set(actor: Actor, body: PriceSet): PriceItem {
      checkedPrice(body.key, body.amount);
      const id = db.transaction((tx) => {
        const itemId = upsertPrice(tx, actor.orgId, actor.userId, body);
        recordAudit(tx, actor, {
          action: 'price.set',
          subject: itemId,
          detail: { key: body.key, amount: body.amount },
        });
        return itemId;
      });
      return itemById(actor.orgId, id);
    },

    update(actor: Actor, itemId: string, patch: PricePatch): PriceItem {
      db.transaction((tx) => {
        const saved = findPrice(tx, actor.orgId, itemId);
        if (!saved) throw notFound('Price');
        const amount = patch.amount ?? saved.amount;
        checkedPrice(saved.key, amount);
        upsertPrice(tx, actor.orgId, actor.userId, {
          key: saved.key,
          amount,
          note: patch.note ?? saved.note,
        });
        recordAudit(tx, actor, { action: 'price.set', subject: itemId, detail: { key: saved.key, amount } });
      });
      return itemById(actor.orgId, itemId);
    },

    remove(actor: Actor, itemId: string): void {
      db.transaction((tx) => {
        const saved = findPrice(tx, actor.orgId, itemId);
        if (!saved || !deletePrice(tx, actor.orgId, itemId)) throw notFound('Price');
        recordAudit(tx, actor, { action: 'price.delete', subject: itemId, detail: { key: saved.key } });
      });
    },

    setStaleAfterDays(actor: Actor, days: number): PriceBook {
      db.transaction((tx) => {
        saveStaleAfterDays(tx, actor.orgId, actor.userId, days);
        recordAudit(tx, actor, { action: 'price-book.settings', subject: actor.orgId, detail: { days } });
      });
      return read(actor.orgId);
    },

    /** Every row checked first; any problem → 400 naming each line, and nothing is written. */
    importCsv(actor: Actor, body: PriceImport): { imported: number; changed: number } {
      const { rows, problems } = readPriceCsv(body.csv);
      if (problems.size > 0) {
        const fields: Record<string, string[]> = {};
        for (const [line, messages] of [...problems].sort((a, b) => a[0] - b[0]))
          fields[`csv.line ${line}`] = messages;
        const lines = [...problems.keys()].sort((a, b) => a - b);
        throw new AppError(
          'bad_request',
          `Nothing was imported: ${lines.length === 1 ? `line ${lines[0]} has a problem` : `lines ${lines.join(', ')} have problems`}`,
          fields,
        );
      }
      return db.transaction((tx) => {
        const current = new Map(listPrices(tx, actor.orgId).map((r) => [r.key, r]));
        let changed = 0;
        for (const row of rows) {
          const saved = current.get(row.key);
          if (saved && saved.amount === row.amount && saved.note === row.note) continue;
          upsertPrice(tx, actor.orgId, actor.userId, row);
          changed++;
        }
        recordAudit(tx, actor, {
          action: 'price-book.import',
          subject: actor.orgId,
          detail: { rows: rows.length, changed },
        });
        return { imported: rows.length, changed };
      });
    },
  };
}

export type PriceBookService = ReturnType<typeof createPriceBookService>;
