import { openBrowser } from '@/tests/e2e/browser';
import { throttle } from './web-editor';

/**
 * The app opened cold with no network after one visit: a phone signs in, opens the jobs list once (the
 * service worker precaches the app, the device keeps the answers), then the network is cut and a fresh tab
 * with the CPU slowed 4× opens the jobs list; timed until a job row shows (from the worker and the
 * device's own database).
 */
export async function coldOfflineStartMs(baseUrl: string): Promise<number> {
  const { page, context, close } = await openBrowser('phone');
  try {
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('sign-in-email').fill('contractor@demo.tributary.test');
    await page.getByTestId('sign-in-password').fill('tributary-demo');
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('job-row').first().waitFor();
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.close();
    await context.setOffline(true);
    const cold = await context.newPage();
    await throttle(context, cold, 4, false);
    const start = Date.now();
    await cold.goto(`${baseUrl}/jobs`);
    await cold.getByTestId('job-row').first().waitFor();
    return Date.now() - start;
  } finally {
    await close();
  }
}
