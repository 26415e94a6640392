/** The Workbox worker (scripts/build-service-worker.mjs) on the web: registration, updates, cache clearing. */

const supported = () =>
  typeof navigator !== 'undefined' && 'serviceWorker' in navigator && process.env.NODE_ENV === 'production';

let waiting: ServiceWorker | null = null;
let reloadAsked = false;

/** Registers /sw.js; `onWaiting` hears of a new version that waits for the person's "Reload". */
export function registerServiceWorker(onWaiting: () => void): void {
  if (!supported()) return;
  const found = (worker: ServiceWorker | null) => {
    if (!worker || !navigator.serviceWorker.controller) return;
    waiting = worker;
    onWaiting();
  };
  navigator.serviceWorker.addEventListener('controllerchange', () => {
    if (reloadAsked) window.location.reload();
  });
  navigator.serviceWorker
    .register('/sw.js')
    .then((registration) => {
      found(registration.waiting);
      registration.addEventListener('updatefound', () => {
        const installing = registration.installing;
        installing?.addEventListener('statechange', () => {
          if (installing.state === 'installed') found(installing);
        });
      });
    })
    .catch(() => undefined);
}

/** The person chose "Reload": the waiting worker takes over and the page reloads on the new version. */
export function applyUpdate(): void {
  reloadAsked = true;
  if (waiting) waiting.postMessage({ type: 'SKIP_WAITING' });
  else window.location.reload();
}

/** Deletes every cache but the app shell's precache (which holds no one's data). */
export async function clearRuntimeCaches(): Promise<void> {
  if (typeof caches === 'undefined') return;
  const names = await caches.keys();
  await Promise.all(names.filter((n) => !n.startsWith('workbox-precache')).map((n) => caches.delete(n)));
}
