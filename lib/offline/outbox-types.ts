/** What the device keeps: cached records by SWR key, the outbox of writes, queued photo blobs, small facts. */

export type WriteMethod = 'POST' | 'PUT' | 'PATCH' | 'DELETE';
export type OutboxEntity = 'job' | 'member' | 'screen' | 'checklist' | 'shoring' | 'photo';
export type OutboxStatus = 'waiting' | 'failed' | 'conflict';

/** Where a queued write shows on the device until the server answers (serialised SWR keys). */
export type OutboxCache = {
  /** The record's own key: its local copy is the item's `localRecord` until sent. */
  recordKey?: string;
  /** A list the record belongs to: while the item waits, `localRecord` is added to it if missing. */
  listKey?: string;
  /** The list's array inside the answer (`screens` of a screen list); none when the answer is the array. */
  listField?: string;
};

export type OutboxItem = {
  /** Order of the queue (assigned by the store). */
  seq: number;
  /** Sent as `Idempotency-Key` on every attempt, so a retry never makes a second row. */
  key: string;
  orgId: string;
  method: WriteMethod;
  path: string;
  body?: unknown;
  entity: OutboxEntity;
  /** The record written; for creates the client-generated id the server keeps. */
  recordId: string;
  create: boolean;
  /** Writes of one group (a job) are sent strictly in order; a stopped item holds the rest of its group. */
  group: string;
  /** For the person: "New member H1 (Kitchen wall)". */
  label: string;
  cache: OutboxCache;
  /** The device's version of the record, shown until the server's answer replaces it. */
  localRecord?: unknown;
  /** Photos: the blob's id in the device store; the request is a multipart upload of it. */
  blobId?: string;
  createdAt: number;
  attempts: number;
  nextAttemptAt: number;
  status: OutboxStatus;
  /** Why it stopped or last failed, in words for the person. */
  lastError?: string;
  /** A 409's `current`: the server's record the edit conflicts with. */
  current?: unknown;
};

export type NewOutboxItem = Omit<OutboxItem, 'seq' | 'attempts' | 'nextAttemptAt' | 'status' | 'createdAt'>;

export type StoredRecord = { data: unknown; savedAt: number };

export type StoredBlob = { id: string; blob: Blob; name: string; type: string };

/** The signed-in person's device database (IndexedDB through idb on the web; memory in tests). */
export interface DeviceStore {
  readonly name: string;
  getRecord(key: string): Promise<StoredRecord | undefined>;
  putRecord(key: string, data: unknown): Promise<void>;
  deleteRecord(key: string): Promise<void>;
  /** Every outbox item, oldest first. */
  listOutbox(): Promise<OutboxItem[]>;
  addOutbox(item: Omit<OutboxItem, 'seq'>): Promise<OutboxItem>;
  putOutbox(item: OutboxItem): Promise<void>;
  deleteOutbox(seq: number): Promise<void>;
  putBlob(blob: StoredBlob): Promise<void>;
  getBlob(id: string): Promise<StoredBlob | undefined>;
  deleteBlob(id: string): Promise<void>;
  getMeta(key: string): Promise<unknown>;
  setMeta(key: string, value: unknown): Promise<void>;
  /** Closes the database (another person signed in); it stays on the device for its owner. */
  close(): void;
  /** Closes and deletes the whole database. */
  destroy(): Promise<void>;
}

/** The device database's name for one person: nothing of theirs is ever opened for someone else. */
export const deviceDbName = (userId: string) => `tributary-device-${userId}`;
