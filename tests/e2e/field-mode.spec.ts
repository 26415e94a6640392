import { mkdirSync } from 'node:fs';
import { describe, expect, inject, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, snap } from './browser';
import { postDemoHeader } from './demo-header';

const baseUrl = inject('baseUrl');
const EMAIL = 'contractor@demo.tributary.test';
/** A 1×1 PNG, standing in for a photo taken in the attic. */
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);

async function signIn(page: Page): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(EMAIL);
  await page.getByTestId('sign-in-password').fill('tributary-demo');
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('job-row').first().waitFor();
}

/** The service worker controls the page and its precache (app shell, every route chunk) is complete. */
async function workerReady(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (!navigator.serviceWorker.controller)
      await new Promise((resolve) => navigator.serviceWorker.addEventListener('controllerchange', resolve));
  });
}

const pillText = (page: Page) => page.getByTestId('sync-pill-text').innerText();

/** The person's device databases in this browser (IndexedDB). */
const deviceDatabases = (page: Page) =>
  page.evaluate(async () =>
    (await indexedDB.databases()).map((d) => d.name ?? '').filter((n) => n.startsWith('tributary-device-')),
  );

async function api(context: BrowserContext, path: string) {
  const answer = await context.request.get(`${baseUrl}${path}`);
  expect(answer.status()).toBe(200);
  return answer.json();
}

describe('field mode (phone)', () => {
  it('opens offline after one visit; a member and a photo made offline reach the server once; a conflict is resolved; sign-out clears the device', async () => {
    mkdirSync('screenshots/field', { recursive: true });
    const first = await openBrowser('phone');
    const second = await openBrowser('phone');
    try {
      const page = first.page;
      await signIn(page);
      await workerReady(page);
      await page.getByTestId('job-row').first().click();
      await page.getByTestId('job-members').waitFor();
      const jobId = page.url().split('/jobs/')[1];

      // A draft design request to attach photos to, made online (the hand-off has its own browser test).
      const label = `Offline beam ${Date.now()}`;
      const made = await postDemoHeader(first.context, baseUrl, jobId, 'Hall header (field)');
      expect(made.status()).toBe(201);
      await page.reload();
      await page.getByTestId('new-request').click();
      await page.getByRole('checkbox', { name: /Hall header \(field\)/ }).click();
      await page.getByTestId('compose-engineerEmail').fill(`field-engineer-${Date.now()}@example.test`);
      await page.getByTestId('compose-state').click();
      await page.getByTestId('compose-state-PA').click();
      await page.getByTestId('compose-save').click();
      await page.getByTestId('request-status').waitFor();
      const requestPath = new URL(page.url()).pathname;
      const requestId = requestPath.split('/requests/')[1];
      // One visit of the job page keeps it on the device.
      await page.goto(`${baseUrl}/jobs/${jobId}`);
      await page.getByTestId('member-row').first().waitFor();

      // No signal: the app opens from the worker and the device.
      await first.context.setOffline(true);
      const started = Date.now();
      await page.goto(`${baseUrl}/jobs/${jobId}`);
      await page.getByTestId('job-members').waitFor();
      console.log(`cold offline open: ${Date.now() - started} ms`);
      await expect.poll(() => pillText(page)).toContain('Offline');

      // A member created and checked offline: the engine runs on the device, the caution stays.
      await page.getByTestId('add-beam').click();
      await page.getByTestId('member-label').fill(label);
      await page.getByTestId('clear-span').fill('12');
      await page.getByTestId('bearing-left').fill('4-1/2');
      await page.getByTestId('bearing-right').fill('4-1/2');
      await page.getByTestId('add-floor').click();
      await page.getByTestId('source-0-tributary').fill('7');
      await page.getByTestId('check-table').waitFor();
      await page.getByTestId('member-diagrams').waitFor();
      await page.getByTestId('caution-note').first().waitFor();
      await page.getByTestId('member-save').click();
      await page.getByTestId('save-status').getByText('Saved on this device only').waitFor();
      await page.getByTestId('device-mark-new').waitFor();
      await page.getByTestId('caution-note').first().waitFor();
      const offlineMemberUrl = page.url();

      // A photo attached offline waits on the device.
      await page.goto(`${baseUrl}${requestPath}`);
      await page.getByTestId('request-status').waitFor();
      const chooser = page.waitForEvent('filechooser');
      await page.getByTestId('action-photo').click();
      await (await chooser).setFiles({ name: 'attic-offline.png', mimeType: 'image/png', buffer: PNG });
      await page.getByTestId('photo-queued').waitFor();
      await page.getByTestId('request-file-waiting').waitFor();
      await expect.poll(() => pillText(page)).toBe('Offline · 2 waiting');
      await snap(page, 'field/phone-pill-offline');

      // The network returns: everything goes, once, and the server's result replaces the device's.
      await first.context.setOffline(false);
      await expect.poll(() => pillText(page), { timeout: 30000 }).toBe('Online · all sent');
      const { members } = await api(first.context, `/api/jobs/${jobId}/members`);
      const mine = members.filter((m: { label: string }) => m.label === label);
      expect(mine).toHaveLength(1);
      const detail = await api(first.context, `/api/requests/${requestId}`);
      const photos = detail.files.filter((f: { fileName: string }) => f.fileName === 'attic-offline.png');
      expect(photos).toHaveLength(1);
      const server = await api(first.context, `/api/members/${mine[0].id}`);
      expect(server.result.pass).toBeTypeOf('boolean');
      expect(offlineMemberUrl).toContain(mine[0].id);
      await page.goto(`${baseUrl}/jobs/${jobId}/members/${mine[0].id}`);
      await page.getByTestId('check-table').waitFor();
      await expect.poll(() => page.getByTestId('device-mark-new').count()).toBe(0);

      // The same member changed in a second browser while this one is offline: a conflict, shown and resolved.
      await signIn(second.page);
      const before = await api(second.context, `/api/members/${mine[0].id}`);
      await first.context.setOffline(true);
      await page.getByTestId('member-label').fill(`${label} (mine)`);
      await page.getByTestId('member-save').click();
      await page.getByTestId('save-status').getByText('Saved on this device only').waitFor();
      const theirs = await second.context.request.patch(`${baseUrl}/api/members/${mine[0].id}`, {
        headers: { Origin: baseUrl },
        data: { label: `${label} (theirs)`, baseVersion: before.version },
      });
      expect(theirs.status()).toBe(200);
      await first.context.setOffline(false);
      await expect.poll(() => pillText(page), { timeout: 30000 }).toContain('1 needs you');
      await snap(page, 'field/phone-pill-conflict');
      await page.getByTestId('sync-pill').click();
      await page.getByTestId('conflict-compare').waitFor();
      expect(await page.getByTestId('conflict-mine-label').innerText()).toBe(`${label} (mine)`);
      expect(await page.getByTestId('conflict-server-label').innerText()).toBe(`${label} (theirs)`);
      await snap(page, 'field/phone-sync-conflict');
      await page.setViewportSize({ width: 1280, height: 800 });
      await snap(page, 'field/wide-sync-conflict');
      await page.setViewportSize({ width: 390, height: 844 });

      // Signing out while a change waits warns first, and can be cancelled.
      await page.getByTestId('nav-account').click();
      await page.getByTestId('sign-out').click();
      await page.getByTestId('sign-out-warning').waitFor();
      await snap(page, 'field/phone-sign-out-warning');
      await page.getByTestId('sign-out-cancel').click();

      await page.getByTestId('sync-pill').click();
      await page.locator('[data-testid^="outbox-keepMine-"]').first().click();
      await expect.poll(() => pillText(page), { timeout: 30000 }).toBe('Online · all sent');
      const kept = await api(first.context, `/api/members/${mine[0].id}`);
      expect(kept.label).toBe(`${label} (mine)`);
      expect(kept.version).toBe(before.version + 2);
      await page.getByTestId('sync-empty').waitFor();
      await snap(page, 'field/phone-sync-empty');
      await page.setViewportSize({ width: 1280, height: 800 });
      await snap(page, 'field/wide-sync-empty');
      await page.setViewportSize({ width: 390, height: 844 });

      // Sign-out deletes this person's device store.
      expect(await deviceDatabases(page)).toHaveLength(1);
      await page.getByTestId('nav-account').click();
      await page.getByTestId('sign-out').click();
      await page.getByTestId('sign-in-email').waitFor();
      await expect.poll(() => deviceDatabases(page)).toEqual([]);
    } finally {
      await first.close();
      await second.close();
    }
  }, 240_000);
});
