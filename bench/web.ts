import { gzipSync } from 'node:zlib';
import { openBrowser } from '@/tests/e2e/browser';
import { startServer } from '@/tests/helpers/start-server';
import type { Figure } from './figures';
import { printTable } from './figures';
import { editorColdMs, keystrokeToResultMs } from './web-editor';
import { coldOfflineStartMs } from './web-offline';

// First-screen benchmark: how long a phone takes to show a usable sign-in form, with an empty cache, over
// a throttled link (150 ms latency, 1.6 Mbit/s down, 750 kbit/s up) and a CPU slowed 4×, in Debian's
// chromium. Needs `npm run build:web` first (the export and its service worker, for the offline start).
const RUNS = 5;

async function firstScreenMs(baseUrl: string): Promise<number> {
  const { page, context, close } = await openBrowser('phone');
  try {
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 150,
      downloadThroughput: (1.6 * 1024 * 1024) / 8,
      uploadThroughput: (750 * 1024) / 8,
    });
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    const start = Date.now();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('sign-in-email').waitFor();
    return Date.now() - start;
  } finally {
    await close();
  }
}

/**
 * The JavaScript the sign-in screen loads before its form is usable (the scripts of the page and every
 * chunk the router fetches for it), each script gzipped at the default level; KB = 1,000 bytes.
 */
export async function firstScreenScripts(baseUrl: string): Promise<{ name: string; gzipKb: number }[]> {
  const { page, close } = await openBrowser('phone');
  try {
    const scripts: Promise<{ name: string; gzipKb: number }>[] = [];
    page.on('response', (response) => {
      if (response.request().resourceType() !== 'script') return;
      const name = new URL(response.url()).pathname.split('/').pop() ?? response.url();
      scripts.push(response.body().then((body) => ({ name, gzipKb: gzipSync(body).length / 1000 })));
    });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('sign-in-email').waitFor();
    await page.waitForLoadState('networkidle');
    return await Promise.all(scripts);
  } finally {
    await close();
  }
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const best = (values: number[]) => Math.min(...values);

/** The first screen, the member editor opened cold and keystroke to result, each over several runs. */
export async function webFigures(): Promise<Figure[]> {
  const server = await startServer();
  try {
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) times.push(await firstScreenMs(server.baseUrl));
    const editor: number[] = [];
    for (let i = 0; i < RUNS; i++) editor.push(await editorColdMs(server.baseUrl));
    const keys = await keystrokeToResultMs(server.baseUrl, 21, 4);
    const scripts = await firstScreenScripts(server.baseUrl);
    const firstScreenKb = scripts.reduce((sum, s) => sum + s.gzipKb, 0);
    const offline: number[] = [];
    for (let i = 0; i < RUNS; i++) offline.push(await coldOfflineStartMs(server.baseUrl));
    return [
      {
        task: `first screen's JS, gzip (${scripts.length} scripts)`,
        measured: `${firstScreenKb.toFixed(0)} KB`,
        target: '≤ 250 KB',
      },
      {
        task: 'first screen (sign-in form usable), throttled phone, cold cache',
        measured: `median ${median(times)} ms, best ${best(times)} ms of ${RUNS}`,
        target: '—',
      },
      {
        task: 'member editor opened cold, signed in, throttled phone',
        measured: `median ${median(editor)} ms, best ${best(editor)} ms of ${RUNS}`,
        target: '—',
      },
      {
        task: 'keystroke to result in the member editor, CPU slowed 4×',
        measured: `median ${median(keys).toFixed(1)} ms, best ${best(keys).toFixed(1)} ms of ${keys.length}`,
        target: '< 16 ms',
      },
      {
        task: 'cold offline start (jobs list from the worker and the device), network cut after one visit, CPU slowed 4×',
        measured: `median ${median(offline)} ms, best ${best(offline)} ms of ${RUNS}`,
        target: 'opens with no network',
      },
    ];
  } finally {
    await server.stop();
  }
}

if (require.main === module) {
  webFigures()
    .then((figures) => printTable('web (npm run bench:web)', figures))
    .catch((error: unknown) => {
      console.error(error);
      process.exit(1);
    });
}
