import type { DeviceStore, NewOutboxItem, OutboxItem, StoredBlob } from './outbox-types';

/** The server's answer to one attempt. */
export type SendAnswer = { status: number; body: unknown };

/** Sends one queued write; throws {@link NetworkFailure} when the server cannot be reached. */
export type Sender = (item: OutboxItem, blob?: StoredBlob) => Promise<SendAnswer>;

/** Makes a write from the items waiting now (called inside the queue's lock). */
export type WriteBuilder = (waiting: OutboxItem[]) => NewOutboxItem | Promise<NewOutboxItem>;

export class NetworkFailure extends Error {
  constructor(message = 'No connection') {
    super(message);
    this.name = 'NetworkFailure';
  }
}

/** What became of a write the person just made. */
export type SubmitResult =
  | { state: 'sent'; body: unknown }
  | { state: 'queued'; item: OutboxItem }
  | { state: 'conflict'; item: OutboxItem }
  | { state: 'rejected'; status: number; body: unknown };

export type OutboxOptions = {
  store: DeviceStore;
  send: Sender;
  /** The server's answer replaces the device's copy (caches, SWR). */
  onSent?: (item: OutboxItem, body: unknown) => Promise<void> | void;
  /** The person threw an item away: its device-only copy goes too. */
  onDiscarded?: (item: OutboxItem) => Promise<void> | void;
  /** Anything in the queue changed (for the status strip). */
  onChange?: () => void;
  now?: () => number;
  newKey?: () => string;
  baseDelayMs?: number;
  maxDelayMs?: number;
};

/** Exponential backoff: base, 2×base, 4×base … capped at max. */
export function backoffDelay(attempts: number, baseMs = 2000, maxMs = 5 * 60_000): number {
  return Math.min(maxMs, baseMs * 2 ** Math.max(0, attempts - 1));
}

type Outcome = 'ok' | 'retry' | 'conflict' | 'stop';

function classify(status: number): Outcome {
  if (status >= 200 && status < 300) return 'ok';
  if (status === 409) return 'conflict';
  if (status === 408 || status === 429 || status >= 500) return 'retry';
  return 'stop';
}

function errorOf(body: unknown): { message?: string; current?: unknown } {
  if (typeof body !== 'object' || body === null || !('error' in body)) return {};
  const error = (body as { error: unknown }).error;
  return typeof error === 'object' && error !== null
    ? (error as { message?: string; current?: unknown })
    : {};
}

const idOf = (record: unknown): string | undefined =>
  typeof record === 'object' && record !== null && typeof (record as { id?: unknown }).id === 'string'
    ? (record as { id: string }).id
    : undefined;

const versionOf = (record: unknown): number | undefined =>
  typeof record === 'object' &&
  record !== null &&
  typeof (record as { version?: unknown }).version === 'number'
    ? (record as { version: number }).version
    : undefined;

const baseOf = (body: unknown): number | undefined =>
  typeof body === 'object' &&
  body !== null &&
  typeof (body as { baseVersion?: unknown }).baseVersion === 'number'
    ? (body as { baseVersion: number }).baseVersion
    : undefined;

const withBase = (body: unknown, baseVersion: number | undefined): unknown =>
  typeof body === 'object' && body !== null && baseVersion !== undefined ? { ...body, baseVersion } : body;

/**
 * The device's queue of writes. Every write is stored first, then sent; a write that cannot be sent
 * (no network, a 5xx or 429) waits and is retried with exponential backoff, always with the same
 * Idempotency-Key. Writes of one group go strictly in order. A 409 keeps the item as a conflict with the
 * server's record for the person to decide; any other 4xx stops the item and shows why. Nothing is
 * dropped unless the person says so.
 */
export function createOutbox(options: OutboxOptions) {
  const { store, send } = options;
  const now = options.now ?? Date.now;
  const newKey = options.newKey ?? (() => crypto.randomUUID());
  const base = options.baseDelayMs ?? 2000;
  const max = options.maxDelayMs ?? 5 * 60_000;
  const changed = () => options.onChange?.();
  let running: Promise<number> | null = null;
  let lock: Promise<unknown> = Promise.resolve();

  /**
   * Runs `task` after every earlier send, flush pass or decision has ended: one item of the queue is in
   * flight at a time, and no decision rewrites the queue while a send reads it.
   */
  function exclusive<T>(task: () => Promise<T>): Promise<T> {
    const result = lock.then(task);
    lock = result.catch(() => undefined);
    return result;
  }

  async function sendOne(item: OutboxItem): Promise<{ outcome: Outcome | 'network'; answer?: SendAnswer }> {
    const blob = item.blobId ? await store.getBlob(item.blobId) : undefined;
    try {
      const answer = await send(item, blob);
      return { outcome: classify(answer.status), answer };
    } catch (error) {
      if (error instanceof NetworkFailure) return { outcome: 'network' };
      throw error;
    }
  }

  /**
   * A server that made its own id for a create (one that does not take the client's id): later writes that
   * name the device's id (a member of a job made offline) are rewritten to the server's id.
   */
  async function remap(localId: string, serverId: string) {
    for (const later of await store.listOutbox()) {
      const text = JSON.stringify(later);
      if (text.includes(localId)) await store.putOutbox(JSON.parse(text.split(localId).join(serverId)));
    }
  }

  async function succeeded(item: OutboxItem, body: unknown) {
    await store.deleteOutbox(item.seq);
    const serverId = idOf(body);
    if (item.create && serverId && serverId !== item.recordId) await remap(item.recordId, serverId);
    if (item.blobId) await store.deleteBlob(item.blobId);
    await store.setMeta('lastSyncAt', now());
    await options.onSent?.(item, body);
  }

  async function postpone(item: OutboxItem, reason: string) {
    const attempts = item.attempts + 1;
    await store.putOutbox({
      ...item,
      attempts,
      nextAttemptAt: now() + backoffDelay(attempts, base, max),
      lastError: reason,
    });
  }

  /** Sends what is due, oldest first; answers how many were sent. One pass runs at a time. */
  function flush(): Promise<number> {
    running ??= exclusive(async () => {
      let sent = 0;
      try {
        const held = new Set<string>();
        const order = (await store.listOutbox()).map((i) => i.seq);
        for (const seq of order) {
          // Read again: a create sent just before may have rewritten this item (remap).
          const item = (await store.listOutbox()).find((i) => i.seq === seq);
          if (!item || held.has(item.group)) continue;
          if (item.status !== 'waiting' || item.nextAttemptAt > now()) {
            held.add(item.group);
            continue;
          }
          const { outcome, answer } = await sendOne(item);
          if (outcome === 'ok' && answer) {
            await succeeded(item, answer.body);
            sent += 1;
            continue;
          }
          held.add(item.group);
          if (outcome === 'network') {
            await postpone(item, 'No connection');
            break;
          }
          const error = errorOf(answer?.body);
          if (outcome === 'retry') {
            await postpone(item, error.message ?? `The server answered ${answer?.status}`);
          } else if (outcome === 'conflict') {
            await store.putOutbox({
              ...item,
              status: 'conflict',
              current: error.current,
              lastError: error.message,
            });
          } else {
            await store.putOutbox({
              ...item,
              status: 'failed',
              lastError: error.message ?? `The server refused it (${answer?.status})`,
            });
          }
        }
      } finally {
        running = null;
        changed();
      }
      return sent;
    });
    return running;
  }

  /**
   * Stores the write, then sends it at once unless earlier writes of its group still wait. Given a builder,
   * the write is made inside the queue's lock from what waits at that moment, so a quick second edit bases
   * on the first one rather than on what was last drawn.
   */
  function submit(input: NewOutboxItem | WriteBuilder): Promise<SubmitResult> {
    return exclusive(async () =>
      submitNow(typeof input === 'function' ? await input(await store.listOutbox()) : input),
    );
  }

  async function submitNow(input: NewOutboxItem): Promise<SubmitResult> {
    const item = await store.addOutbox({
      ...input,
      createdAt: now(),
      attempts: 0,
      nextAttemptAt: now(),
      status: 'waiting',
    });
    changed();
    const earlier = (await store.listOutbox()).some((i) => i.group === item.group && i.seq < item.seq);
    if (earlier) {
      void flush();
      return { state: 'queued', item };
    }
    const { outcome, answer } = await sendOne(item);
    if (outcome === 'ok' && answer) {
      await succeeded(item, answer.body);
      changed();
      return { state: 'sent', body: answer.body };
    }
    if (outcome === 'stop' && answer) {
      // The person is still at the form: the field messages show there and nothing is kept.
      await store.deleteOutbox(item.seq);
      changed();
      return { state: 'rejected', status: answer.status, body: answer.body };
    }
    if (outcome === 'conflict' && answer) {
      const error = errorOf(answer.body);
      const conflict = {
        ...item,
        status: 'conflict' as const,
        current: error.current,
        lastError: error.message,
      };
      await store.putOutbox(conflict);
      changed();
      return { state: 'conflict', item: conflict };
    }
    await postpone(
      item,
      outcome === 'network'
        ? 'No connection'
        : (errorOf(answer?.body).message ?? `The server answered ${answer?.status}`),
    );
    changed();
    return { state: 'queued', item };
  }

  async function find(seq: number): Promise<OutboxItem> {
    const item = (await store.listOutbox()).find((i) => i.seq === seq);
    if (!item) throw new Error(`No waiting change ${seq}`);
    return item;
  }

  return {
    submit,
    flush,
    list: () => store.listOutbox(),
    /** Send my version over theirs: the same fields, now based on the server's version, under a new key. */
    async keepMine(seq: number) {
      await exclusive(async () => {
        const item = await find(seq);
        const baseVersion = versionOf(item.current);
        const shift =
          baseVersion === undefined ? undefined : baseVersion - (baseOf(item.body) ?? baseVersion);
        if (shift)
          for (const later of await store.listOutbox()) {
            const laterBase = baseOf(later.body);
            if (later.seq > item.seq && later.recordId === item.recordId && laterBase !== undefined)
              await store.putOutbox({ ...later, body: withBase(later.body, laterBase + shift) });
          }
        await store.putOutbox({
          ...item,
          body: withBase(item.body, baseVersion),
          key: newKey(),
          status: 'waiting',
          attempts: 0,
          nextAttemptAt: now(),
          current: undefined,
          lastError: undefined,
        });
      });
      changed();
      return flush();
    },
    /** Take the server's version: my edit is dropped and the device shows theirs. */
    async keepTheirs(seq: number) {
      await exclusive(async () => {
        const item = await find(seq);
        await store.deleteOutbox(seq);
        await options.onSent?.(item, item.current);
      });
      changed();
    },
    /** Try a stopped item again (after the cause was fixed elsewhere). */
    async retry(seq: number) {
      await exclusive(async () => {
        const item = await find(seq);
        await store.putOutbox({ ...item, status: 'waiting', attempts: 0, nextAttemptAt: now() });
      });
      changed();
      return flush();
    },
    /** Throw the change away, on the person's word only. */
    async discard(seq: number) {
      await exclusive(async () => {
        const item = await find(seq);
        await store.deleteOutbox(seq);
        if (item.blobId) await store.deleteBlob(item.blobId);
        await options.onDiscarded?.(item);
      });
      changed();
    },
    /** The network is back: every waiting item is due now, whatever its backoff said. */
    async wake() {
      await exclusive(async () => {
        for (const item of await store.listOutbox())
          if (item.status === 'waiting' && item.nextAttemptAt > now())
            await store.putOutbox({ ...item, nextAttemptAt: now() });
      });
      return flush();
    },
    /** When the next waiting item is due (for the retry timer), or null. */
    async nextDueAt(): Promise<number | null> {
      const due = (await store.listOutbox())
        .filter((i) => i.status === 'waiting')
        .map((i) => i.nextAttemptAt);
      return due.length ? Math.min(...due) : null;
    },
  };
}

export type Outbox = ReturnType<typeof createOutbox>;
