import { overlayPending } from './overlay';
import {
  createOutbox,
  NetworkFailure,
  type Outbox,
  type Sender,
  type SubmitResult,
  type WriteBuilder,
} from './outbox';
import type { DeviceStore, NewOutboxItem, OutboxItem, StoredBlob } from './outbox-types';

/** SWR's `mutate`, as the session needs it: set data (or an updater) and/or revalidate one key. */
export type CacheMutate = (
  key: unknown,
  data?: unknown,
  options?: { revalidate?: boolean },
) => Promise<unknown>;

export type DeviceSnapshot = {
  userId: string | null;
  online: boolean;
  items: readonly OutboxItem[];
  /** Last time the device heard from the server (a read or a sent change), ms since the epoch. */
  lastSyncAt: number | null;
};

export type DeviceSessionDeps = {
  openStore: (userId: string) => Promise<DeviceStore>;
  send: Sender;
  mutate: CacheMutate;
  /** Whose device database opens at start with no network (the last signed-in person), or null. */
  pointer: { read: () => string | null; write: (userId: string | null) => void };
  /** Deletes the service worker's runtime caches (sign-out). */
  clearCaches: () => Promise<void>;
  isOnline: () => boolean;
  now?: () => number;
};

/**
 * Makes a write from the device's newest copy of a key (its stored record with every waiting change laid
 * over it); runs inside the queue's lock.
 */
export type DeviceWriteBuilder = (
  latest: (key: string) => Promise<unknown>,
) => NewOutboxItem | Promise<NewOutboxItem>;

const ME_META = 'me';
const isMeKey = (key: string) => key.startsWith('["me",');
const parseKey = (key: string): unknown => JSON.parse(key);
const userIdOfMe = (data: unknown): string | undefined =>
  (data as { user?: { id?: string } } | undefined)?.user?.id;

/**
 * The signed-in person's device: their own database (cached records, the outbox, photo blobs), the queue
 * that sends what waits, and what the status strip shows. Opening another person's session closes this
 * one's database; ending it (sign-out) deletes the database and the worker's runtime caches.
 */
export function createDeviceSession(deps: DeviceSessionDeps) {
  const now = deps.now ?? Date.now;
  type Open = { userId: string; store: DeviceStore; outbox: Outbox };
  let current: Promise<Open> | null = null;
  let currentUser: string | null = null;
  let snapshot: DeviceSnapshot = { userId: null, online: deps.isOnline(), items: [], lastSyncAt: null };
  const listeners = new Set<() => void>();

  const emit = (patch: Partial<DeviceSnapshot>) => {
    snapshot = { ...snapshot, ...patch };
    for (const listener of listeners) listener();
  };

  /** What the last request told of the connection (the browser's online flag can say "online" without one). */
  const heard = (reached: boolean) => {
    if (snapshot.online !== reached) emit({ online: reached });
  };

  const send: Sender = async (item, blob) => {
    try {
      const answer = await deps.send(item, blob);
      heard(true);
      return answer;
    } catch (error) {
      if (error instanceof NetworkFailure) heard(false);
      throw error;
    }
  };

  async function refresh(open: Open) {
    if (currentUser !== open.userId) return;
    const [items, lastSyncAt] = await Promise.all([open.outbox.list(), open.store.getMeta('lastSyncAt')]);
    emit({ items, lastSyncAt: typeof lastSyncAt === 'number' ? lastSyncAt : snapshot.lastSyncAt });
  }

  async function sent(store: DeviceStore, item: OutboxItem, body: unknown) {
    const { recordKey, listKey } = item.cache;
    if (recordKey) {
      // The answer is the record itself (a checklist answers with the whole list, which has no id).
      const sameShape =
        typeof body === 'object' &&
        body !== null &&
        ('id' in body || item.entity === 'checklist') &&
        item.entity !== 'screen';
      if (sameShape) {
        await store.putRecord(recordKey, body);
        // Changes made after this one still wait: they stay in view over the server's answer.
        const shown = overlayPending(recordKey, body, await store.listOutbox());
        await deps.mutate(parseKey(recordKey), shown, { revalidate: false });
      } else {
        await store.deleteRecord(recordKey);
        await deps.mutate(parseKey(recordKey));
      }
    }
    if (listKey) await deps.mutate(parseKey(listKey));
  }

  async function discarded(store: DeviceStore, item: OutboxItem) {
    if (item.cache.recordKey) {
      if (item.create) await store.deleteRecord(item.cache.recordKey);
      await deps.mutate(parseKey(item.cache.recordKey));
    }
    if (item.cache.listKey) await deps.mutate(parseKey(item.cache.listKey));
  }

  function open(userId: string): Promise<Open> {
    if (current && currentUser === userId) return current;
    const previous = current;
    currentUser = userId;
    deps.pointer.write(userId);
    emit({ userId, items: [], lastSyncAt: null });
    current = (async () => {
      await previous?.then(({ store }) => store.close()).catch(() => undefined);
      const store = await deps.openStore(userId);
      const opened: Open = {
        userId,
        store,
        outbox: createOutbox({
          store,
          send,
          now,
          onSent: (item, body) => sent(store, item, body),
          onDiscarded: (item) => discarded(store, item),
          onChange: () => void refresh(opened),
        }),
      };
      await refresh(opened);
      return opened;
    })();
    return current;
  }

  const session = async (): Promise<Open | null> => (current ? current : null);

  return {
    subscribe(listener: () => void) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    snapshot: () => snapshot,
    open,
    /** At start: the last signed-in person's database, so the app opens with no network. */
    resume() {
      const userId = deps.pointer.read();
      if (userId) void open(userId);
    },
    /** Keeps an answer from the server on the device (a `me` answer opens that person's database first). */
    async remember(key: string, data: unknown) {
      const meId = isMeKey(key) ? userIdOfMe(data) : undefined;
      const opened = meId ? await open(meId) : await session();
      if (!opened) return;
      await opened.store.putRecord(key, data);
      if (meId) await opened.store.setMeta(ME_META, data);
      const wasOffline = !snapshot.online;
      emit({ lastSyncAt: now(), online: true });
      // The server answered again: what waits goes now rather than at its next backoff.
      if (wasOffline) void opened.outbox.wake();
    },
    /** The device's copy of a key when the server cannot be reached. */
    async recall(key: string): Promise<unknown> {
      heard(false);
      const opened = await session();
      if (!opened) return undefined;
      const stored = await opened.store.getRecord(key);
      if (stored) return stored.data;
      return isMeKey(key) ? opened.store.getMeta(ME_META) : undefined;
    },
    overlay: (key: string, data: unknown) => overlayPending(key, data, snapshot.items),
    /**
     * Stores and sends one write (a photo's blob is kept on the device first, so the upload resumes after a
     * reload); when it has to wait, the device's copy shows in its record and list.
     */
    async submit(input: NewOutboxItem | DeviceWriteBuilder, blob?: StoredBlob): Promise<SubmitResult> {
      const opened = await session();
      if (!opened) throw new Error('No device session: sign in first');
      if (blob) await opened.store.putBlob(blob);
      const { store } = opened;
      const write: NewOutboxItem | WriteBuilder =
        typeof input === 'function'
          ? (waiting) =>
              input(async (key) => overlayPending(key, (await store.getRecord(key))?.data, waiting))
          : input;
      const result = await opened.outbox.submit(write);
      if (result.state === 'queued' || result.state === 'conflict') {
        await refresh(opened);
        const { recordKey, listKey } = result.item.cache;
        // The newest waiting copy shows, never this write's over a later one made meanwhile.
        const waiting = await store.listOutbox();
        if (recordKey && result.item.localRecord !== undefined) {
          const shown = overlayPending(recordKey, result.item.localRecord, waiting);
          if (result.item.create) await store.putRecord(recordKey, shown);
          await deps.mutate(parseKey(recordKey), shown, { revalidate: false });
        }
        if (listKey)
          await deps.mutate(parseKey(listKey), (shown: unknown) => overlayPending(listKey, shown, waiting), {
            revalidate: false,
          });
      }
      return result;
    },
    /** The outbox's actions for the waiting-changes page. */
    async outbox(): Promise<Outbox | null> {
      return (await session())?.outbox ?? null;
    },
    /** The network came back (or went): wake the queue. */
    async setOnline(online: boolean) {
      emit({ online });
      const opened = await session();
      if (online && opened) await opened.outbox.wake();
    },
    /** The periodic retry: sends whatever is due. */
    async tick() {
      const opened = await session();
      if (opened && deps.isOnline()) await opened.outbox.flush();
    },
    /** Sign-out: the person's database and the worker's runtime caches are deleted. */
    async end() {
      const opened = await session();
      current = null;
      currentUser = null;
      deps.pointer.write(null);
      await opened?.store.destroy();
      await deps.clearCaches();
      emit({ userId: null, items: [], lastSyncAt: null });
    },
  };
}

export type DeviceSession = ReturnType<typeof createDeviceSession>;
