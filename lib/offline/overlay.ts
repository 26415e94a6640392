import type { OutboxItem } from './outbox-types';

const idOf = (record: unknown): unknown =>
  typeof record === 'object' && record !== null ? (record as { id?: unknown }).id : undefined;

function upsert(data: unknown, record: unknown, field: string | undefined): unknown {
  const holder = data as Record<string, unknown> | null;
  const list = field ? holder?.[field] : data;
  if (!Array.isArray(list)) return data;
  const id = idOf(record);
  const at = list.findIndex((entry) => idOf(entry) === id);
  const next =
    at >= 0
      ? list.map((entry, i) => (i === at ? { ...(entry as object), ...(record as object) } : entry))
      : [...list, record];
  return field ? { ...holder, [field]: next } : next;
}

/**
 * What the device shows for one cache key: the server's (or the stored) answer with every change still in
 * the outbox laid over it, so a record made or edited with no network stays in view until it is sent.
 */
export function overlayPending(key: string, data: unknown, items: readonly OutboxItem[]): unknown {
  let shown = data;
  for (const item of items) {
    if (item.localRecord === undefined) continue;
    if (item.cache.recordKey === key) shown = item.localRecord;
    else if (item.cache.listKey === key) shown = upsert(shown, item.localRecord, item.cache.listField);
  }
  return shown;
}

/** Ids of records made on this device that the server does not have yet. */
export function deviceOnlyIds(items: readonly OutboxItem[]): Set<string> {
  return new Set(items.filter((i) => i.create).map((i) => i.recordId));
}
