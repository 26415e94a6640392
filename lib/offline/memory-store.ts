import type { DeviceStore, OutboxItem, StoredBlob, StoredRecord } from './outbox-types';

/** A device store held in memory: the platform without IndexedDB, and the queue's unit tests. */
export function createMemoryStore(name: string): DeviceStore {
  const records = new Map<string, StoredRecord>();
  const outbox = new Map<number, OutboxItem>();
  const blobs = new Map<string, StoredBlob>();
  const meta = new Map<string, unknown>();
  let nextSeq = 1;
  const copy = <T>(value: T): T => structuredClone(value);

  return {
    name,
    getRecord: async (key) => copy(records.get(key)),
    putRecord: async (key, data) => {
      records.set(key, { data: copy(data), savedAt: Date.now() });
    },
    deleteRecord: async (key) => {
      records.delete(key);
    },
    listOutbox: async () => [...outbox.values()].sort((a, b) => a.seq - b.seq).map(copy),
    addOutbox: async (item) => {
      const stored = { ...copy(item), seq: nextSeq++ };
      outbox.set(stored.seq, stored);
      return copy(stored);
    },
    putOutbox: async (item) => {
      outbox.set(item.seq, copy(item));
    },
    deleteOutbox: async (seq) => {
      outbox.delete(seq);
    },
    putBlob: async (blob) => {
      blobs.set(blob.id, blob);
    },
    getBlob: async (id) => blobs.get(id),
    deleteBlob: async (id) => {
      blobs.delete(id);
    },
    getMeta: async (key) => copy(meta.get(key)),
    setMeta: async (key, value) => {
      meta.set(key, copy(value));
    },
    close: () => undefined,
    destroy: async () => {
      records.clear();
      outbox.clear();
      blobs.clear();
      meta.clear();
    },
  };
}
