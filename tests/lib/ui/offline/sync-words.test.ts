import { describe, expect, it } from 'vitest';
import { markOf } from '@/lib/hooks/use-device-status';
import type { DeviceSnapshot } from '@/lib/offline/device-session';
import type { OutboxItem } from '@/lib/offline/outbox-types';
import { syncSummary, syncTimeLabel } from '@/lib/ui/offline/sync-words';
import { waitingLossText } from '@/lib/ui/offline/waiting-loss-text';

const now = Date.UTC(2026, 2, 4, 15, 7);
const item = (over: Partial<OutboxItem>): OutboxItem => ({
  seq: 1,
  key: 'k',
  orgId: 'o',
  method: 'POST',
  path: '/api/jobs',
  entity: 'job',
  recordId: 'j1',
  create: true,
  group: 'j1',
  label: 'New job',
  cache: {},
  createdAt: now,
  attempts: 0,
  nextAttemptAt: now,
  status: 'waiting',
  ...over,
});
const snapshot = (over: Partial<DeviceSnapshot>): DeviceSnapshot => ({
  userId: 'u1',
  online: true,
  items: [],
  lastSyncAt: null,
  ...over,
});

describe('syncSummary', () => {
  it('says offline and how many changes wait', () => {
    const s = syncSummary(snapshot({ online: false, items: [item({}), item({ seq: 2 })] }), now);
    expect(s.tone).toBe('offline');
    expect(s.short).toBe('Offline · 2 waiting');
    expect(s.long).toBe('Offline, not synced yet. 2 changes are only on this device.');
  });

  it('a conflict or refusal needs the person, whatever the connection', () => {
    const items = [item({ status: 'conflict' }), item({ seq: 2 })];
    const s = syncSummary(snapshot({ items, lastSyncAt: now }), now);
    expect(s.tone).toBe('attention');
    expect(s.short).toBe('1 needs you · 1 waiting');
    expect(s.long).toMatch(/^Online, last sync /);
    expect(s.long).toContain('2 changes are only on this device; 1 needs your decision.');
  });

  it('online with nothing waiting says everything is sent and when', () => {
    const s = syncSummary(snapshot({ lastSyncAt: now }), now);
    expect(s.short).toBe('Online · all sent');
    expect(s.long).toBe(`Online, last sync ${syncTimeLabel(now, now)}. Every change is on the server.`);
  });
});

describe('markOf', () => {
  it('marks records made here, changed here, or stuck on a conflict', () => {
    expect(markOf([item({})], 'j1')).toBe('new');
    expect(markOf([item({ create: false })], 'j1')).toBe('changed');
    expect(markOf([item({ create: false, status: 'conflict' })], 'j1')).toBe('conflict');
    expect(markOf([item({})], 'other')).toBeNull();
  });
});

describe('waitingLossText', () => {
  it('warns only when changes wait, and says what to do', () => {
    expect(waitingLossText(0, true)).toBeNull();
    expect(waitingLossText(1, false)).toContain('1 change is only on this device');
    expect(waitingLossText(3, true)).toContain('Open Sync to send them first');
  });
});
