import { describe, expect, it } from 'vitest';
import { createMemoryStore } from '@/lib/offline/memory-store';
import { NetworkFailure, backoffDelay, createOutbox, type SendAnswer } from '@/lib/offline/outbox';
import type { NewOutboxItem, OutboxItem } from '@/lib/offline/outbox-types';

/** A fake server: answers from a script per call, records every attempt (path, key, body). */
function fakeServer(script: ((item: OutboxItem) => SendAnswer | 'offline')[]) {
  const calls: { path: string; key: string; body: unknown }[] = [];
  let online = true;
  const send = async (item: OutboxItem): Promise<SendAnswer> => {
    if (!online) throw new NetworkFailure();
    calls.push({ path: item.path, key: item.key, body: item.body });
    const step = script.shift() ?? (() => ({ status: 200, body: { id: item.recordId, saved: true } }));
    const answer = step(item);
    if (answer === 'offline') throw new NetworkFailure();
    return answer;
  };
  return { send, calls, setOnline: (value: boolean) => (online = value) };
}

function write(recordId: string, group = 'job-1', extra: Partial<NewOutboxItem> = {}): NewOutboxItem {
  return {
    key: `key-${recordId}`,
    orgId: 'org-1',
    method: 'POST',
    path: `/api/jobs/${group}/members`,
    body: { id: recordId, label: recordId },
    entity: 'member',
    recordId,
    create: true,
    group,
    label: `New member ${recordId}`,
    cache: {},
    ...extra,
  };
}

function setup(script: Parameters<typeof fakeServer>[0] = []) {
  const clock = { t: 1_000_000 };
  const store = createMemoryStore('test');
  const server = fakeServer(script);
  const sent: { item: OutboxItem; body: unknown }[] = [];
  const outbox = createOutbox({
    store,
    send: server.send,
    now: () => clock.t,
    newKey: () => `fresh-${clock.t}`,
    onSent: (item, body) => {
      sent.push({ item, body });
    },
  });
  return { clock, store, server, sent, outbox };
}

describe('backoffDelay', () => {
  it('doubles from the base and stops at the cap', () => {
    expect([1, 2, 3, 4].map((n) => backoffDelay(n, 2000, 60_000))).toEqual([2000, 4000, 8000, 16000]);
    expect(backoffDelay(20, 2000, 60_000)).toBe(60_000);
  });
});

describe('outbox', () => {
  it('sends at once when online and hands the server answer over', async () => {
    const { outbox, sent, store } = setup();
    const result = await outbox.submit(write('m1'));
    expect(result).toEqual({ state: 'sent', body: { id: 'm1', saved: true } });
    expect(sent.map((s) => s.item.recordId)).toEqual(['m1']);
    expect(await store.listOutbox()).toEqual([]);
    expect(await store.getMeta('lastSyncAt')).toBe(1_000_000);
  });

  it('queues writes made offline and sends them in the order they were made', async () => {
    const { outbox, server, sent, clock } = setup();
    server.setOnline(false);
    for (const id of ['m1', 'm2', 'm3']) expect((await outbox.submit(write(id))).state).toBe('queued');
    expect(server.calls).toEqual([]);
    server.setOnline(true);
    clock.t += backoffDelay(1);
    expect(await outbox.flush()).toBe(3);
    expect(server.calls.map((c) => c.body)).toEqual([
      { id: 'm1', label: 'm1' },
      { id: 'm2', label: 'm2' },
      { id: 'm3', label: 'm3' },
    ]);
    expect(sent.map((s) => s.item.recordId)).toEqual(['m1', 'm2', 'm3']);
  });

  it('waits out the backoff and reuses the same Idempotency-Key on every retry', async () => {
    const { outbox, server, clock, store } = setup([
      () => ({ status: 503, body: { error: { code: 'internal', message: 'Busy' } } }),
      () => 'offline',
      () => ({ status: 201, body: { id: 'm1' } }),
    ]);
    expect((await outbox.submit(write('m1'))).state).toBe('queued');
    const [queued] = await store.listOutbox();
    expect(queued.attempts).toBe(1);
    expect(queued.nextAttemptAt).toBe(clock.t + 2000);

    expect(await outbox.flush()).toBe(0); // not due yet: nothing is sent
    expect(server.calls).toHaveLength(1);

    clock.t += 2000;
    expect(await outbox.flush()).toBe(0); // the network drops again
    const [again] = await store.listOutbox();
    expect(again.attempts).toBe(2);
    expect(again.nextAttemptAt).toBe(clock.t + 4000);

    clock.t += 4000;
    expect(await outbox.flush()).toBe(1);
    expect(server.calls.map((c) => c.key)).toEqual(['key-m1', 'key-m1', 'key-m1']);
    expect(await store.listOutbox()).toEqual([]);
  });

  it('a later write of the same job waits behind an earlier one that is still queued', async () => {
    const { outbox, server, clock } = setup([() => 'offline']);
    expect((await outbox.submit(write('m1'))).state).toBe('queued');
    // Back online, but m1's backoff is not over: m2 of the same job must not overtake it.
    expect((await outbox.submit(write('m2'))).state).toBe('queued');
    expect(server.calls.map((c) => c.key)).toEqual(['key-m1']);
    clock.t += 2000;
    await outbox.flush();
    expect(server.calls.map((c) => c.key)).toEqual(['key-m1', 'key-m1', 'key-m2']);
  });

  it('a refused write stops, keeps its reason, holds its job and lets other jobs through', async () => {
    const { outbox, server, clock, store } = setup([
      () => 'offline',
      () => ({ status: 422, body: { error: { code: 'bad_request', message: 'Span is missing' } } }),
    ]);
    await outbox.submit(write('m1', 'job-1'));
    server.setOnline(false);
    await outbox.submit(write('m2', 'job-1'));
    await outbox.submit(write('x1', 'job-2'));
    server.setOnline(true);
    clock.t += 60_000;
    expect(await outbox.flush()).toBe(1);
    const left = await store.listOutbox();
    expect(left.map((i) => [i.recordId, i.status, i.lastError ?? null])).toEqual([
      ['m1', 'failed', 'Span is missing'],
      ['m2', 'waiting', null],
    ]);
    expect(server.calls.map((c) => c.key)).toEqual(['key-m1', 'key-m1', 'key-x1']);
  });

  it('a refused write made at the form is answered to the form and not kept', async () => {
    const { outbox, store } = setup([
      () => ({
        status: 400,
        body: { error: { code: 'bad_request', message: 'Bad', fields: { label: ['x'] } } },
      }),
    ]);
    const result = await outbox.submit(write('m1'));
    expect(result).toMatchObject({ state: 'rejected', status: 400 });
    expect(await store.listOutbox()).toEqual([]);
  });

  it('surfaces a 409 with the server record; keep mine resends on its version under a new key', async () => {
    const theirs = { id: 'm1', label: 'Theirs', version: 4 };
    const { outbox, server, store, sent, clock } = setup([
      () => ({
        status: 409,
        body: { error: { code: 'conflict', message: 'Changed elsewhere', current: theirs } },
      }),
      () => ({ status: 200, body: { id: 'm1', label: 'Mine', version: 5 } }),
    ]);
    const patch = write('m1', 'job-1', {
      method: 'PATCH',
      create: false,
      body: { label: 'Mine', baseVersion: 3 },
    });
    const result = await outbox.submit(patch);
    expect(result.state).toBe('conflict');
    const [conflict] = await store.listOutbox();
    expect(conflict).toMatchObject({ status: 'conflict', current: theirs, lastError: 'Changed elsewhere' });

    clock.t += 5;
    await outbox.keepMine(conflict.seq);
    expect(server.calls[1]).toEqual({
      path: patch.path,
      key: `fresh-${clock.t}`,
      body: { label: 'Mine', baseVersion: 4 },
    });
    expect(sent.at(-1)?.body).toEqual({ id: 'm1', label: 'Mine', version: 5 });
    expect(await store.listOutbox()).toEqual([]);
  });

  it('keep theirs drops my edit and gives the server record to the device copy', async () => {
    const theirs = { id: 'm1', label: 'Theirs', version: 4 };
    const { outbox, store, sent, server } = setup([
      () => ({ status: 409, body: { error: { code: 'conflict', message: 'x', current: theirs } } }),
    ]);
    await outbox.submit(write('m1', 'job-1', { method: 'PATCH', create: false }));
    const [conflict] = await store.listOutbox();
    await outbox.keepTheirs(conflict.seq);
    expect(sent).toEqual([{ item: conflict, body: theirs }]);
    expect(await store.listOutbox()).toEqual([]);
    expect(server.calls).toHaveLength(1);
  });

  it('a 429 is retried like a dropped connection, not stopped', async () => {
    const { outbox, store } = setup([() => ({ status: 429, body: { error: { message: 'Slow down' } } })]);
    await outbox.submit(write('m1'));
    const [item] = await store.listOutbox();
    expect(item).toMatchObject({ status: 'waiting', attempts: 1, lastError: 'Slow down' });
  });

  it('uploads a queued photo with its blob and deletes the blob once sent', async () => {
    const store = createMemoryStore('photos');
    const seen: (string | undefined)[] = [];
    const outbox = createOutbox({
      store,
      send: async (_item, blob) => {
        seen.push(blob?.name);
        return { status: 201, body: { id: 'a1' } };
      },
    });
    await store.putBlob({ id: 'b1', blob: new Blob(['jpeg']), name: 'wall.jpg', type: 'image/jpeg' });
    await outbox.submit(write('a1', 'job-1', { entity: 'photo', blobId: 'b1' }));
    expect(seen).toEqual(['wall.jpg']);
    expect(await store.getBlob('b1')).toBeUndefined();
  });

  it('discarding is the person’s act and reports the item so its device copy can go', async () => {
    const store = createMemoryStore('discard');
    const discarded: string[] = [];
    const outbox = createOutbox({
      store,
      send: async () => {
        throw new NetworkFailure();
      },
      onDiscarded: (item) => {
        discarded.push(item.recordId);
      },
    });
    await outbox.submit(write('m1'));
    const [item] = await store.listOutbox();
    await outbox.discard(item.seq);
    expect(discarded).toEqual(['m1']);
    expect(await store.listOutbox()).toEqual([]);
  });

  it('rewrites later writes to the server’s id when the server made its own id for a create', async () => {
    const { outbox, server, clock } = setup([
      () => 'offline',
      () => ({ status: 201, body: { id: 'server-job' } }),
      () => ({ status: 201, body: { id: 'server-member' } }),
    ]);
    await outbox.submit(write('local-job', 'local-job', { entity: 'job', path: '/api/jobs' }));
    await outbox.submit(write('m1', 'local-job'));
    clock.t += 2000;
    expect(await outbox.flush()).toBe(2);
    expect(server.calls.at(-1)).toMatchObject({ path: '/api/jobs/server-job/members' });
  });

  it('wake makes every waiting item due at once when the network returns', async () => {
    const { outbox, server } = setup([() => 'offline']);
    await outbox.submit(write('m1'));
    expect(await outbox.flush()).toBe(0);
    expect(await outbox.wake()).toBe(1);
    expect(server.calls.map((c) => c.key)).toEqual(['key-m1', 'key-m1']);
  });
});

describe('outbox serialisation', () => {
  it('two quick submits and a flush never have two sends in flight, and go in the order made', async () => {
    const store = createMemoryStore('test');
    let inFlight = 0;
    let most = 0;
    const order: string[] = [];
    const outbox = createOutbox({
      store,
      send: async (item) => {
        inFlight += 1;
        most = Math.max(most, inFlight);
        await new Promise((resolve) => setTimeout(resolve, 5));
        order.push(item.recordId);
        inFlight -= 1;
        return { status: 200, body: { id: item.recordId } };
      },
    });
    const results = await Promise.all([
      outbox.submit(write('m1')),
      outbox.flush(),
      outbox.submit(write('m2')),
      outbox.submit(write('m3', 'job-2')),
    ]);
    expect(most).toBe(1);
    expect(order).toEqual(['m1', 'm2', 'm3']);
    expect(results.map((r) => (typeof r === 'number' ? r : r.state))).toEqual(['sent', 0, 'sent', 'sent']);
    expect(await store.listOutbox()).toEqual([]);
  });

  it('a builder makes its write inside the lock, from the writes waiting at that moment', async () => {
    const { outbox, server } = setup();
    server.setOnline(false);
    const seen: number[][] = [];
    const build = (recordId: string) => (waiting: OutboxItem[]) => {
      seen.push(waiting.map((i) => i.seq));
      return write(recordId, 'job-1', { body: { id: recordId, after: waiting.length } });
    };
    const [first, second] = await Promise.all([outbox.submit(build('m1')), outbox.submit(build('m2'))]);
    expect(first.state).toBe('queued');
    expect(second.state).toBe('queued');
    // The second builder ran after the first write was stored, so it saw it.
    expect(seen).toEqual([[], [first.state === 'queued' ? first.item.seq : -1]]);
    expect(second.state === 'queued' && second.item.body).toEqual({ id: 'm2', after: 1 });
  });

  it('keep mine shifts the base version of later waiting edits of the same record', async () => {
    const theirs = { id: 'm1', label: 'Theirs', version: 6 };
    const { outbox, server, store } = setup([
      () => ({ status: 409, body: { error: { code: 'conflict', message: 'Changed', current: theirs } } }),
      () => ({ status: 200, body: { id: 'm1', version: 7 } }),
      () => ({ status: 200, body: { id: 'm1', version: 8 } }),
      () => ({ status: 200, body: { id: 'm2', version: 2 } }),
    ]);
    const edit = (recordId: string, label: string, baseVersion: number) =>
      write(recordId, 'job-1', {
        key: `key-${label}`,
        method: 'PATCH',
        create: false,
        body: { label, baseVersion },
      });
    expect((await outbox.submit(edit('m1', 'first', 3))).state).toBe('conflict');
    // Made on the device copy after the first edit (version 4), it waits behind the conflict.
    expect((await outbox.submit(edit('m1', 'second', 4))).state).toBe('queued');
    expect((await outbox.submit(edit('m2', 'other', 1))).state).toBe('queued');
    const [conflict] = await store.listOutbox();
    await outbox.keepMine(conflict.seq);
    expect(server.calls.slice(1).map((c) => c.body)).toEqual([
      { label: 'first', baseVersion: 6 },
      { label: 'second', baseVersion: 7 },
      { label: 'other', baseVersion: 1 },
    ]);
    expect(await store.listOutbox()).toEqual([]);
  });
  it('a decision waits for the send in flight: discarding during a send rewrites nothing under it', async () => {
    const store = createMemoryStore('test');
    let release: () => void = () => undefined;
    const events: string[] = [];
    const outbox = createOutbox({
      store,
      send: async (item) => {
        events.push(`send ${item.recordId}`);
        await new Promise<void>((resolve) => (release = resolve));
        events.push(`answer ${item.recordId}`);
        return { status: 200, body: { id: item.recordId } };
      },
      onDiscarded: (item) => {
        events.push(`discard ${item.recordId}`);
      },
    });
    const queued = await store.addOutbox({
      ...write('m2', 'job-2'),
      createdAt: 0,
      attempts: 1,
      nextAttemptAt: Number.MAX_SAFE_INTEGER,
      status: 'waiting',
    });
    const sending = outbox.submit(write('m1'));
    await new Promise((resolve) => setTimeout(resolve, 0));
    const discarding = outbox.discard(queued.seq);
    await new Promise((resolve) => setTimeout(resolve, 5));
    expect(events).toEqual(['send m1']);
    release();
    await Promise.all([sending, discarding]);
    expect(events).toEqual(['send m1', 'answer m1', 'discard m2']);
    expect(await store.listOutbox()).toEqual([]);
  });
});
