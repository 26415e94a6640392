import { useSyncExternalStore } from 'react';
import { device } from '@/lib/offline/device';
import type { DeviceSnapshot } from '@/lib/offline/device-session';
import type { OutboxItem } from '@/lib/offline/outbox-types';

/** The device's queue and connection as they change: online or not, what waits, the last sync. */
export function useDeviceStatus(): DeviceSnapshot {
  return useSyncExternalStore(device.subscribe, device.snapshot, device.snapshot);
}

export type DeviceMark = 'new' | 'changed' | 'conflict' | null;

/** Whether a record is only on this device (made or changed here, not sent yet), or stuck on a conflict. */
export function markOf(items: readonly OutboxItem[], recordId: string): DeviceMark {
  const mine = items.filter((i) => i.recordId === recordId);
  if (mine.length === 0) return null;
  if (mine.some((i) => i.status === 'conflict')) return 'conflict';
  return mine.some((i) => i.create) ? 'new' : 'changed';
}

/** {@link markOf} for one record, kept up to date. */
export function useDeviceMark(recordId: string | undefined): DeviceMark {
  const { items } = useDeviceStatus();
  return recordId ? markOf(items, recordId) : null;
}
