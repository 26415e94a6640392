import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');

async function signInAsContractor(page: Page): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill('contractor@demo.tributary.test');
  await page.getByTestId('sign-in-password').fill('tributary-demo');
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('job-row').first().waitFor();
}

async function openJob(page: Page, name: string): Promise<void> {
  await page
    .getByRole('link', { name: new RegExp(name) })
    .first()
    .click();
  await page.getByTestId('job-members').waitFor();
}

async function addSource(page: Page, kind: string, fields: Record<string, string>): Promise<void> {
  const before = await page.locator('[data-testid^="source-"][data-testid$="-label"]').count();
  await page.getByTestId(`add-${kind}`).click();
  for (const [field, value] of Object.entries(fields)) {
    await page.getByTestId(`source-${before}-${field}`).fill(value);
  }
}

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`member editor (${name})`, () => {
    it('takes a beam from loads to a chosen size with its diagrams, saved across a reload', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Split-level');
        await page.getByTestId('add-beam').click();
        await page.getByTestId('clear-span').fill('13-6-3/8');
        await page.getByTestId('bearing-left').fill('6');
        await page.getByTestId('bearing-right').fill('6');
        await addSource(page, 'roof', { tributary: '8' });
        await addSource(page, 'ceiling', { tributary: '6' });
        await addSource(page, 'floor', { tributary: '12' });
        await addSource(page, 'point', { at: '5', 'dead-lb': '500', 'live-lb': '800' });
        await page.getByTestId('check-table').waitFor();
        await page.getByTestId('member-diagrams').waitFor();
        for (const id of ['bending', 'shear', 'deflection-live', 'deflection-total', 'bearing']) {
          await page.getByTestId(`check-${id}`).waitFor();
        }
        await snap(page, `${name}-member-beam-live`);
        await page.getByTestId('member-save').click();
        await page.waitForURL(/\/members\/[^/]+$/);
        await page.getByTestId('save-status').getByText('Saved').waitFor();

        await page.getByTestId('find-sizes').click();
        await page.getByTestId('filter-depth').fill('11-7/8');
        const choose = page.locator('[data-testid^="choose-"]').first();
        await choose.waitFor();
        const chosenId = (await choose.getAttribute('data-testid'))?.replace('choose-', '') ?? '';
        await choose.click();
        await page.getByTestId('save-status').getByText('Saved').waitFor();
        await snap(page, `${name}-member-shortlist`);

        await page.reload();
        await page.getByTestId('check-table').waitFor();
        await page.getByTestId('find-sizes').click();
        await page.getByTestId(`choose-${chosenId}`).getByText('Chosen').waitFor();
        expect(await page.getByTestId('source-3-at').inputValue()).toBe(`5' 0"`);
        await page.getByTestId('member-diagrams').waitFor();
        await snap(page, `${name}-member-reloaded`);
      } finally {
        await close();
      }
    });

    it('shows a header its prescriptive verdict and framing list', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Bungalow');
        await page.getByTestId('add-header').click();
        await page.getByTestId('clear-span').fill('3 0');
        await addSource(page, 'roof', { tributary: '12' });
        await addSource(page, 'ceiling', { tributary: '6' });
        await page.getByTestId('prescriptive-verdict').waitFor();
        await page
          .getByTestId('framing-list')
          .getByText(/Jack studs/)
          .waitFor();
        await snap(page, `${name}-member-header`);
      } finally {
        await close();
      }
    });

    it('puts a message at the field for letters in the span, a negative width and no loads, and saves nothing', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Ranch');
        const membersBefore = await page.getByTestId('member-row').count();
        await page.getByTestId('add-beam').click();
        await page.getByTestId('clear-span').fill('twelve');
        await page
          .getByText(/Clear span: can't read/)
          .first()
          .waitFor();
        await page.getByTestId('member-save').click();
        await page.getByText('Add at least one load source', { exact: false }).first().waitFor();
        await page.getByTestId('clear-span').fill('12');
        await addSource(page, 'floor', { tributary: '-3' });
        await page
          .getByText(/can't be negative/)
          .first()
          .waitFor();
        await page.getByTestId('member-save').click();
        await page.getByTestId('save-status').getByText('Nothing was saved').waitFor();
        await snap(page, `${name}-member-bad-input`);
        expect(page.url()).toContain('/members/new');
        await page.goBack();
        await page.getByTestId('job-members').waitFor();
        expect(await page.getByTestId('member-row').count()).toBe(membersBefore);
      } finally {
        await close();
      }
    });
  });
}
