import { mutate, type Arguments } from 'swr';
import { createDeviceSession } from './device-session';
import { openIdbStore } from './idb-store';
import { createMemoryStore } from './memory-store';
import { deviceDbName } from './outbox-types';
import { sendWrite } from './send-write';
import { clearRuntimeCaches } from './service-worker';

/** Only whose database to open at a start with no network; the person's data is in that database. */
const POINTER = 'tributary.device-user';
const storage = () => (typeof localStorage === 'undefined' ? null : localStorage);

/** This browser's device session (one at a time: the signed-in person's). */
export const device = createDeviceSession({
  openStore: async (userId) =>
    typeof indexedDB === 'undefined'
      ? createMemoryStore(deviceDbName(userId))
      : openIdbStore(deviceDbName(userId)),
  send: sendWrite,
  mutate: (key, data, options) =>
    data === undefined ? mutate(key as Arguments) : mutate(key as Arguments, data, options),
  pointer: {
    read: () => storage()?.getItem(POINTER) ?? null,
    write: (userId) => (userId ? storage()?.setItem(POINTER, userId) : storage()?.removeItem(POINTER)),
  },
  clearCaches: clearRuntimeCaches,
  isOnline: () => typeof navigator === 'undefined' || navigator.onLine !== false,
});

const RETRY_EVERY_MS = 15_000;
let started = false;

/** Once per page: the last person's database, the online/offline events and the periodic retry. */
export function startFieldMode(): void {
  if (started || typeof window === 'undefined' || !window.addEventListener) return;
  started = true;
  device.resume();
  window.addEventListener('online', () => void device.setOnline(true));
  window.addEventListener('offline', () => void device.setOnline(false));
  setInterval(() => void device.tick(), RETRY_EVERY_MS);
}
