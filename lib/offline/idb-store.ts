import { deleteDB, openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { DeviceStore, OutboxItem, StoredBlob, StoredRecord } from './outbox-types';

interface DeviceSchema extends DBSchema {
  records: { key: string; value: StoredRecord };
  outbox: { key: number; value: OutboxItem };
  blobs: { key: string; value: StoredBlob };
  meta: { key: string; value: unknown };
}

/** The person's device database in the browser's IndexedDB, through idb. */
export async function openIdbStore(name: string): Promise<DeviceStore> {
  let db: IDBPDatabase<DeviceSchema> | null = await openDB<DeviceSchema>(name, 1, {
    upgrade(database) {
      database.createObjectStore('records');
      database.createObjectStore('outbox', { keyPath: 'seq', autoIncrement: true });
      database.createObjectStore('blobs', { keyPath: 'id' });
      database.createObjectStore('meta');
    },
  });
  const open = () => {
    if (!db) throw new Error(`The device database ${name} was deleted`);
    return db;
  };

  return {
    name,
    getRecord: (key) => open().get('records', key),
    putRecord: async (key, data) => {
      await open().put('records', { data, savedAt: Date.now() }, key);
    },
    deleteRecord: (key) => open().delete('records', key),
    listOutbox: () => open().getAll('outbox'),
    addOutbox: async (item) => {
      // `seq` is given by the store's key generator.
      const seq = await open().add('outbox', item as OutboxItem);
      return { ...item, seq };
    },
    putOutbox: async (item) => {
      await open().put('outbox', item);
    },
    deleteOutbox: (seq) => open().delete('outbox', seq),
    putBlob: async (blob) => {
      await open().put('blobs', blob);
    },
    getBlob: (id) => open().get('blobs', id),
    deleteBlob: (id) => open().delete('blobs', id),
    getMeta: (key) => open().get('meta', key),
    setMeta: async (key, value) => {
      await open().put('meta', value, key);
    },
    close: () => {
      db?.close();
      db = null;
    },
    destroy: async () => {
      db?.close();
      db = null;
      await deleteDB(name);
    },
  };
}
