import { LRUCache } from 'lru-cache';
import type { Db } from '@/db/client';
import { changeStamp } from '@/db/prepared';

/** How many answers are kept (the least recently used go first). */
const KEPT_ANSWERS = 2_000;

export type AnswerCache = ReturnType<typeof createAnswerCache>;

/**
 * The JSON text of the most read answers (a firm's jobs, a job, its members), kept until anything is written
 * to the database: each answer is kept with the database's change stamp (db/prepared.ts `changeStamp`) and
 * used again only while the stamp is the same, so an answer is never older than the data. Access is checked
 * before an answer is looked up, on every request, and a key names the firm whose data it holds. Use it
 * outside transactions only: inside one, a write later rolled back would leave its rows in a kept answer.
 */
export function createAnswerCache(db: Db) {
  const kept = new LRUCache<string, { stamp: string; text: string }>({ max: KEPT_ANSWERS });
  return {
    /** `answer()` as JSON text, from the cache while the database is unchanged since it was kept. */
    text(key: string, answer: () => unknown): string {
      const stamp = changeStamp(db);
      const hit = kept.get(key);
      if (hit !== undefined && hit.stamp === stamp) return hit.text;
      const text = JSON.stringify(answer());
      kept.set(key, { stamp, text });
      return text;
    },
  };
}
