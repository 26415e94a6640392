import { describe, expect, it } from 'vitest';
import { createDeviceSession } from '@/lib/offline/device-session';
import { createMemoryStore } from '@/lib/offline/memory-store';
import { NetworkFailure, type SendAnswer } from '@/lib/offline/outbox';
import { deviceDbName, type DeviceStore, type NewOutboxItem } from '@/lib/offline/outbox-types';

/** One memory database per person, kept across opens like IndexedDB; `destroy` removes it. */
function setup(answer: () => SendAnswer | 'offline' = () => 'offline') {
  const databases = new Map<string, DeviceStore>();
  const mutations: { key: unknown; data: unknown }[] = [];
  const pointer = { value: null as string | null };
  let cachesCleared = 0;
  const session = createDeviceSession({
    openStore: async (userId) => {
      const name = deviceDbName(userId);
      if (!databases.has(name)) {
        const store = createMemoryStore(name);
        const destroy = store.destroy;
        databases.set(name, {
          ...store,
          destroy: async () => {
            await destroy();
            databases.delete(name);
          },
        });
      }
      return databases.get(name) as DeviceStore;
    },
    send: async (item) => {
      const next = answer();
      if (next === 'offline') throw new NetworkFailure();
      return { ...next, body: next.body ?? { id: item.recordId } };
    },
    mutate: async (key, data) => {
      mutations.push({ key, data: typeof data === 'function' ? data([]) : data });
      return data;
    },
    pointer: { read: () => pointer.value, write: (id) => (pointer.value = id) },
    clearCaches: async () => {
      cachesCleared += 1;
    },
    isOnline: () => true,
  });
  return { session, databases, mutations, pointer, caches: () => cachesCleared };
}

const me = (userId: string) => ({ user: { id: userId, name: userId }, activeOrgId: 'org-1' });
const membersKey = JSON.stringify(['job-members', 'org-1', 'job-1']);
const memberKey = JSON.stringify(['member', 'org-1', 'm1']);

function newMember(): NewOutboxItem {
  return {
    key: 'k1',
    orgId: 'org-1',
    method: 'POST',
    path: '/api/jobs/job-1/members',
    body: { id: 'm1' },
    entity: 'member',
    recordId: 'm1',
    create: true,
    group: 'job-1',
    label: 'New member H1',
    cache: { recordKey: memberKey, listKey: membersKey },
    localRecord: { id: 'm1', label: 'H1' },
  };
}

describe('device session', () => {
  it('a me answer opens that person’s own database and answers for them with no network', async () => {
    const { session, databases, pointer } = setup();
    await session.remember(JSON.stringify(['me', null]), me('u1'));
    await session.remember(membersKey, [{ id: 'a' }]);
    expect([...databases.keys()]).toEqual(['tributary-device-u1']);
    expect(pointer.value).toBe('u1');
    expect(await session.recall(membersKey)).toEqual([{ id: 'a' }]);
    // The active firm changed since: any stored "me" still opens the app offline.
    expect(await session.recall(JSON.stringify(['me', 'org-2']))).toEqual(me('u1'));
  });

  it('nothing of one person is answered to the next one signed in on the same browser', async () => {
    const { session } = setup();
    await session.remember(JSON.stringify(['me', null]), me('u1'));
    await session.remember(membersKey, [{ id: 'secret' }]);
    await session.remember(JSON.stringify(['me', null]), me('u2'));
    expect(await session.recall(membersKey)).toBeUndefined();
    expect(session.snapshot().userId).toBe('u2');
  });

  it('a write made offline waits, shows in its record and list, and is marked device-only', async () => {
    const { session, mutations } = setup();
    await session.open('u1');
    const result = await session.submit(newMember());
    expect(result.state).toBe('queued');
    expect(session.snapshot().items.map((i) => i.recordId)).toEqual(['m1']);
    expect(mutations).toEqual([
      { key: ['member', 'org-1', 'm1'], data: { id: 'm1', label: 'H1' } },
      { key: ['job-members', 'org-1', 'job-1'], data: [{ id: 'm1', label: 'H1' }] },
    ]);
    expect(session.overlay(membersKey, [{ id: 'other' }])).toEqual([
      { id: 'other' },
      { id: 'm1', label: 'H1' },
    ]);
    expect(await session.recall(memberKey)).toEqual({ id: 'm1', label: 'H1' });
  });

  it('after the network returns the server answer replaces the device copy', async () => {
    let online = false;
    const { session, mutations } = setup(() =>
      online ? { status: 201, body: { id: 'm1', label: 'H1', engineVersion: 'server' } } : 'offline',
    );
    await session.open('u1');
    await session.submit(newMember());
    online = true;
    await session.setOnline(true);
    expect(session.snapshot().items).toEqual([]);
    expect(mutations.slice(-2)).toEqual([
      { key: ['member', 'org-1', 'm1'], data: { id: 'm1', label: 'H1', engineVersion: 'server' } },
      { key: ['job-members', 'org-1', 'job-1'], data: undefined },
    ]);
    expect(await session.recall(memberKey)).toEqual({ id: 'm1', label: 'H1', engineVersion: 'server' });
    expect(session.snapshot().lastSyncAt).not.toBeNull();
  });

  it('a photo’s file is kept in the person’s database until the upload is on the server', async () => {
    let online = false;
    const sent: (string | undefined)[] = [];
    const { session, databases } = setup(() => (online ? { status: 201, body: { id: 'p1' } } : 'offline'));
    await session.open('u1');
    const blob = { id: 'b1', blob: new Blob(['jpeg bytes']), name: 'attic.jpg', type: 'image/jpeg' };
    const photo: NewOutboxItem = {
      ...newMember(),
      entity: 'photo',
      recordId: 'p1',
      blobId: 'b1',
      cache: {},
      localRecord: undefined,
    };
    expect((await session.submit(photo, blob)).state).toBe('queued');
    const store = databases.get('tributary-device-u1') as DeviceStore;
    expect((await store.getBlob('b1'))?.name).toBe('attic.jpg');
    sent.push((await store.listOutbox())[0]?.blobId);
    online = true;
    await session.setOnline(true);
    expect(sent).toEqual(['b1']);
    expect(await store.getBlob('b1')).toBeUndefined();
    expect(session.snapshot().items).toEqual([]);
  });

  it('a request that cannot reach the server marks the device offline, and an answer marks it online again', async () => {
    let online = false;
    const { session } = setup(() => (online ? { status: 201, body: undefined } : 'offline'));
    await session.open('u1');
    await session.submit(newMember());
    expect(session.snapshot().online).toBe(false);
    online = true;
    await session.remember(membersKey, []);
    expect(session.snapshot().online).toBe(true);
    await expect.poll(() => session.snapshot().items.length).toBe(0);
  });

  it('sign-out deletes the person’s database, the pointer and the runtime caches', async () => {
    const { session, databases, pointer, caches } = setup();
    await session.remember(JSON.stringify(['me', null]), me('u1'));
    await session.submit(newMember());
    await session.end();
    expect(databases.size).toBe(0);
    expect(pointer.value).toBeNull();
    expect(caches()).toBe(1);
    expect(session.snapshot()).toMatchObject({ userId: null, items: [] });
    expect(await session.recall(membersKey)).toBeUndefined();
    await session.remember(membersKey, [{ id: 'after' }]); // no one signed in: nothing is kept
    expect(databases.size).toBe(0);
  });
});

describe('device session: the newest copy wins', () => {
  const recordKey = JSON.stringify(['checklist', 'org-1', 'job-1']);
  const edit = (label: string, version: number, baseVersion: number): NewOutboxItem => ({
    key: `key-${label}`,
    orgId: 'org-1',
    method: 'PATCH',
    path: '/api/jobs/job-1/checklist/a',
    body: { label, baseVersion },
    entity: 'checklist',
    recordId: 'job-1:a',
    create: false,
    group: 'job-1',
    label: `Checklist ${label}`,
    cache: { recordKey },
    localRecord: { jobId: 'job-1', label, version },
  });

  it('a server answer for one edit does not hide a later edit still waiting', async () => {
    let online = false;
    const { session, mutations } = setup(() =>
      online ? { status: 200, body: { jobId: 'job-1', label: 'server', version: 9 } } : 'offline',
    );
    await session.remember(JSON.stringify(['me', null]), me('u1'));
    expect((await session.submit(edit('first', 2, 1))).state).toBe('queued');
    expect((await session.submit(edit('second', 3, 2))).state).toBe('queued');
    online = true;
    mutations.length = 0;
    const outbox = await session.outbox();
    // Send only the first: the second is made not due yet.
    const [first, second] = (await outbox?.list()) ?? [];
    const opened = await session.open('u1');
    await opened.store.putOutbox({ ...first, nextAttemptAt: 0 });
    await opened.store.putOutbox({ ...second, nextAttemptAt: Number.MAX_SAFE_INTEGER });
    await outbox?.flush();
    const shown = mutations.filter((m) => JSON.stringify(m.key) === recordKey).map((m) => m.data);
    expect(shown).toEqual([{ jobId: 'job-1', label: 'second', version: 3 }]);
  });

  it('a write built from the device’s newest copy bases on a quick earlier edit', async () => {
    const { session } = setup();
    await session.remember(JSON.stringify(['me', null]), me('u1'));
    await session.remember(recordKey, { jobId: 'job-1', label: 'server', version: 1 });
    const tap = (label: string) =>
      session.submit(async (latest) => {
        const { version } = (await latest(recordKey)) as { version: number };
        return edit(label, version + 1, version);
      });
    const [first, second] = await Promise.all([tap('first'), tap('second')]);
    expect(first.state === 'queued' && first.item.body).toEqual({ label: 'first', baseVersion: 1 });
    expect(second.state === 'queued' && second.item.body).toEqual({ label: 'second', baseVersion: 2 });
  });
});
