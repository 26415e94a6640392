import { useState } from 'react';
import { startFieldMode } from '@/lib/offline/device';
import { registerServiceWorker } from '@/lib/offline/service-worker';

/**
 * Starts field mode once, during the first render (before any data hook asks the server, so the last
 * person's device database is open when the network is not), and registers the service worker in
 * production builds. Answers whether a new version of the app waits for a reload.
 */
export function useFieldMode(): boolean {
  const [updateWaiting, setUpdateWaiting] = useState(false);
  useState(() => {
    startFieldMode();
    registerServiceWorker(() => setUpdateWaiting(true));
    return true;
  });
  return updateWaiting;
}
