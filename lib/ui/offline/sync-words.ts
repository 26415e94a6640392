import type { DeviceSnapshot } from '@/lib/offline/device-session';

/** A clock time for people, e.g. "3:07 PM", or "Mar 4, 3:07 PM" when not today. */
export function syncTimeLabel(at: number, now: number = Date.now()): string {
  const date = new Date(at);
  const sameDay = new Date(now).toDateString() === date.toDateString();
  return sameDay
    ? date.toLocaleTimeString('en-US', { hour: 'numeric', minute: '2-digit' })
    : date.toLocaleString('en-US', { month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit' });
}

export type SyncSummary = {
  /** online | offline: the connection; attention: something waits for the person's decision. */
  tone: 'online' | 'offline' | 'attention';
  /** The pill's short line: "Offline · 3 waiting". */
  short: string;
  /** The full sentence for the sync page and screen readers. */
  long: string;
};

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** What the sync pill and the sync page say about the device's connection and queue. */
export function syncSummary(snapshot: DeviceSnapshot, now: number = Date.now()): SyncSummary {
  const stuck = snapshot.items.filter((i) => i.status !== 'waiting').length;
  const waiting = snapshot.items.length - stuck;
  const last = snapshot.lastSyncAt
    ? `last sync ${syncTimeLabel(snapshot.lastSyncAt, now)}`
    : 'not synced yet';
  const connection = snapshot.online ? 'Online' : 'Offline';
  // Something to decide says so first (the pill's icon and colour change too); the connection is in `long`.
  const parts = stuck > 0 ? [plural(stuck, 'needs you', 'need you')] : [connection];
  if (waiting > 0) parts.push(`${waiting} waiting`);
  if (stuck === 0 && waiting === 0) parts.push(snapshot.lastSyncAt ? 'all sent' : 'nothing waiting');
  const queue =
    waiting + stuck === 0
      ? 'Every change is on the server.'
      : `${plural(waiting + stuck, 'change is', 'changes are')} only on this device${
          stuck > 0 ? `; ${plural(stuck, 'needs', 'need')} your decision` : ''
        }.`;
  return {
    tone: stuck > 0 ? 'attention' : snapshot.online ? 'online' : 'offline',
    short: parts.join(' · '),
    long: `${connection}, ${last}. ${queue}`,
  };
}
