import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser } from '@/tests/e2e/browser';

/** The throttled phone of bench/web.ts: 150 ms latency, 1.6 Mbit/s down, 750 kbit/s up. */
export async function throttle(context: BrowserContext, page: Page, cpuRate: number, network: boolean) {
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  if (network)
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 150,
      downloadThroughput: (1.6 * 1024 * 1024) / 8,
      uploadThroughput: (750 * 1024) / 8,
    });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: cpuRate });
}

async function signedInJobId(page: Page, baseUrl: string): Promise<string> {
  const signIn = await page.request.post(`${baseUrl}/api/auth/sign-in`, {
    data: { email: 'contractor@demo.tributary.test', password: 'tributary-demo' },
    headers: { Origin: baseUrl },
  });
  if (!signIn.ok()) throw new Error(`sign-in failed: ${signIn.status()}`);
  const jobs = (await (await page.request.get(`${baseUrl}/api/jobs`)).json()) as { jobs: { id: string }[] };
  return jobs.jobs[0].id;
}

/**
 * The member editor opened cold: signed in (cookie only, nothing cached), the throttled phone opens a new
 * beam's editor by its address; timed until the clear-span field can be typed in.
 */
export async function editorColdMs(baseUrl: string): Promise<number> {
  const { page, context, close } = await openBrowser('phone');
  try {
    const jobId = await signedInJobId(page, baseUrl);
    await throttle(context, page, 4, true);
    const start = Date.now();
    await page.goto(`${baseUrl}/jobs/${jobId}/members/new?kind=beam`);
    await page.getByTestId('clear-span').waitFor();
    return Date.now() - start;
  } finally {
    await close();
  }
}

/**
 * Keystroke to result in the editor with the CPU slowed `cpuRate`×: a beam with roof, ceiling, floor and a
 * point load; each key types over the span's last digit (12, 13, 14 … ft), and the time runs from the key's keydown to the frame after
 * both the bending row and the moment diagram show the new numbers (check and diagrams re-rendered). Returns
 * each key's time, ms.
 */
export async function keystrokeToResultMs(baseUrl: string, keys: number, cpuRate: number): Promise<number[]> {
  const { page, context, close } = await openBrowser('phone');
  try {
    const jobId = await signedInJobId(page, baseUrl);
    await page.goto(`${baseUrl}/jobs/${jobId}/members/new?kind=beam`);
    await page.getByTestId('clear-span').fill('12');
    for (const [kind, field, value] of [
      ['roof', 'tributary', '8'],
      ['ceiling', 'tributary', '6'],
      ['floor', 'tributary', '12'],
      ['point', 'at', '5'],
    ]) {
      const index = await page.locator('[data-testid^="source-"][data-testid$="-label"]').count();
      await page.getByTestId(`add-${kind}`).click();
      await page.getByTestId(`source-${index}-${field}`).fill(value);
    }
    await page.getByTestId('check-bending').waitFor();
    await throttle(context, page, cpuRate, false);
    const span = page.getByTestId('clear-span');
    await span.click();
    await page.keyboard.press('End');
    const times: number[] = [];
    for (let i = 0; i < keys; i++) {
      // Select the span's last digit and type over it: 12 ft → 13 ft → 14 ft …, one key, always a valid span.
      await page.keyboard.press('Shift+ArrowLeft');
      const key = String(3 + (i % 6));
      await page.evaluate(() => {
        // Both the check table's bending row and the moment diagram must show the new span's numbers.
        const pending = new Set(
          ['check-bending', 'member-diagrams-moment'].map((id) =>
            document.querySelector(`[data-testid="${id}"]`),
          ),
        );
        const w = window as unknown as { __done?: Promise<number> };
        w.__done = new Promise<number>((resolve) => {
          let t0 = 0;
          window.addEventListener('keydown', () => (t0 = performance.now()), { once: true, capture: true });
          const observer = new MutationObserver((records) => {
            for (const record of records)
              for (const target of pending) if (target?.contains(record.target)) pending.delete(target);
            if (pending.size > 0) return;
            observer.disconnect();
            requestAnimationFrame(() => resolve(performance.now() - t0));
          });
          for (const target of pending)
            if (target)
              observer.observe(target, {
                subtree: true,
                characterData: true,
                childList: true,
                attributes: true,
              });
        });
      });
      await page.keyboard.press(key);
      times.push(await page.evaluate(() => (window as unknown as { __done: Promise<number> }).__done));
    }
    return times;
  } finally {
    await close();
  }
}
