import { createHash } from 'node:crypto';
import { and, eq, lt } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { idempotencyKeys } from '@/db/schema';

/** How long an answer is kept under its key. */
export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;
/** A first attempt still unanswered after this long died with its process: its key may be taken again. */
export const ABANDONED_AFTER_MS = 2 * 60 * 1000;

export type KeptWrite = typeof idempotencyKeys.$inferSelect;

/** JSON with every object's keys sorted, so the same value always hashes the same. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/** SHA-256 (hex) of a request body's canonical JSON; an absent body hashes as null. */
export function bodyHash(body: unknown): string {
  return createHash('sha256')
    .update(canonicalJson(body ?? null))
    .digest('hex');
}

/** True when two parsed values hold the same content (key order and undefined fields aside). */
export function sameContent(a: unknown, b: unknown): boolean {
  return canonicalJson(a) === canonicalJson(b);
}

export function findKeptWrite(db: DbOrTx, userId: string, key: string): KeptWrite | undefined {
  return db
    .select()
    .from(idempotencyKeys)
    .where(and(eq(idempotencyKeys.userId, userId), eq(idempotencyKeys.key, key)))
    .get();
}

/** Holds the key for a first attempt (no answer yet), replacing an abandoned or expired hold. */
export function reserveKey(
  db: DbOrTx,
  row: Pick<KeptWrite, 'userId' | 'key' | 'method' | 'path' | 'bodyHash'>,
  now: Date,
): void {
  db.delete(idempotencyKeys)
    .where(and(eq(idempotencyKeys.userId, row.userId), eq(idempotencyKeys.key, row.key)))
    .run();
  db.insert(idempotencyKeys)
    .values({ ...row, status: null, response: null, createdAt: now.toISOString() })
    .run();
}

/** Keeps the answer of the write that holds the key. */
export function keepAnswer(db: DbOrTx, userId: string, key: string, status: number, response: unknown): void {
  db.update(idempotencyKeys)
    .set({ status, response: response ?? null })
    .where(and(eq(idempotencyKeys.userId, userId), eq(idempotencyKeys.key, key)))
    .run();
}

/** Lets the key go (the answer is not one to keep): a retry runs again. */
export function releaseKey(db: DbOrTx, userId: string, key: string): void {
  db.delete(idempotencyKeys)
    .where(and(eq(idempotencyKeys.userId, userId), eq(idempotencyKeys.key, key)))
    .run();
}

/** Deletes every kept answer older than IDEMPOTENCY_TTL_MS; returns how many went. */
export function sweepKeptWrites(db: DbOrTx, now: Date): number {
  const cutoff = new Date(now.getTime() - IDEMPOTENCY_TTL_MS).toISOString();
  return db.delete(idempotencyKeys).where(lt(idempotencyKeys.createdAt, cutoff)).run().changes;
}

/** True when a kept row is past its day, or a first attempt that never answered. */
export function isStale(row: KeptWrite, now: Date): boolean {
  const age = now.getTime() - Date.parse(row.createdAt);
  return age > IDEMPOTENCY_TTL_MS || (row.status === null && age > ABANDONED_AFTER_MS);
}
