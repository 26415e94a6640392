import { openBrowser } from '@/tests/e2e/browser';
import { startServer } from '@/tests/helpers/start-server';
import { editorColdMs, keystrokeToResultMs } from './web-editor';

// First-screen benchmark: how long a phone takes to show a usable sign-in form, with an empty cache, over
// a throttled link (150 ms latency, 1.6 Mbit/s down, 750 kbit/s up) and a CPU slowed 4×, in Debian's
// chromium. Needs `npx expo export --platform web --output-dir dist` first.
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

async function main(): Promise<void> {
  const server = await startServer();
  try {
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) times.push(await firstScreenMs(server.baseUrl));
    times.sort((a, b) => a - b);
    console.log(
      `first screen (sign-in form usable), throttled phone, cold cache: median ${times[Math.floor(RUNS / 2)]} ms, best ${times[0]} ms over ${RUNS} runs`,
    );
    const editor: number[] = [];
    for (let i = 0; i < RUNS; i++) editor.push(await editorColdMs(server.baseUrl));
    editor.sort((a, b) => a - b);
    console.log(
      `member editor opened cold (signed in, empty cache), throttled phone: median ${editor[Math.floor(RUNS / 2)]} ms, best ${editor[0]} ms over ${RUNS} runs`,
    );
    const keys = (await keystrokeToResultMs(server.baseUrl, 21, 4)).sort((a, b) => a - b);
    console.log(
      `keystroke to result in the member editor, CPU slowed 4x: median ${keys[Math.floor(keys.length / 2)].toFixed(1)} ms, best ${keys[0].toFixed(1)} ms, worst ${keys[keys.length - 1].toFixed(1)} ms over ${keys.length} keys (target: median under 16 ms)`,
    );
  } finally {
    await server.stop();
  }
}

void main();
