// Writes dist/sw.js after `expo export`: a Workbox service worker that precaches the app shell, every route
// chunk, the fonts and the icons, and answers navigations with the shell so a deep link opens with no
// network. API answers are never cached by the worker: the app keeps its records in the signed-in person's
// own IndexedDB database (lib/offline), which sign-out deletes.
// Run: node scripts/build-service-worker.mjs [outputDir]   (default dist)
import { generateSW } from 'workbox-build';

export async function buildServiceWorker(outputDir = 'dist') {
  const { count, size, warnings } = await generateSW({
    globDirectory: outputDir,
    globPatterns: [
      'index.html',
      'manifest.webmanifest',
      'favicon.ico',
      'icons/*.png',
      '_expo/static/**/*.{js,css}',
      'assets/**/*.{ttf,otf,woff,woff2,png,jpg,svg}',
    ],
    // Expo puts package assets (the Inter fonts) under assets/_main/node_modules/: Workbox's default
    // ignore of node_modules would leave them out of the precache.
    globIgnores: ['sw.js'],
    // Expo names these files by their content hash, so the URL alone identifies the version.
    dontCacheBustURLsMatching: /\/(_expo\/static|assets)\//,
    maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
    swDest: `${outputDir}/sw.js`,
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api(\/|$)/],
    cleanupOutdatedCaches: true,
    clientsClaim: true,
    // A new version waits until the person chooses "Reload" (the app posts SKIP_WAITING).
    skipWaiting: false,
    inlineWorkboxRuntime: true,
    sourcemap: false,
    mode: 'production',
  });
  for (const warning of warnings) console.warn(`service worker: ${warning}`);
  console.log(`service worker: ${count} files precached (${(size / 1024 / 1024).toFixed(1)} MB)`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  await buildServiceWorker(process.argv[2] ?? 'dist');
}
