import { mkdirSync } from 'node:fs';
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

/** Saves a screenshot of each diagram, scrolled to the middle of the screen, under screenshots/editor-gaps/. */
async function snapDiagrams(page: Page, name: string): Promise<void> {
  mkdirSync('screenshots/editor-gaps', { recursive: true });
  for (const part of ['loads', 'shear', 'moment', 'deflection']) {
    const diagram = page.getByTestId(`member-diagrams-${part}`);
    await diagram.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await diagram.screenshot({ path: `screenshots/editor-gaps/${name}-${part}.png` });
  }
}

/**
 * The drawn extent of a curve diagram: its curve's box (px, in the drawing), the drawing's width and the
 * number of dashed support guides.
 */
async function curveExtent(page: Page, testID: string) {
  return page.getByTestId(testID).evaluate((el) => {
    const svg = el.querySelector('svg');
    const paths = [...el.querySelectorAll('path')] as SVGPathElement[];
    const line = paths.find(
      (p) => p.getAttribute('fill') === 'none' || p.getAttribute('fill') === 'transparent',
    );
    const box = (line ?? paths[paths.length - 1]).getBBox();
    return {
      left: box.x,
      right: box.x + box.width,
      width: svg?.getBoundingClientRect().width ?? 0,
      guides: el.querySelectorAll('line[stroke-dasharray]').length,
    };
  });
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

    it('draws a two-span member and a member with overhangs over their whole length', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Ranch');
        await page.getByTestId('add-beam').click();
        await page.getByTestId('clear-span').fill('12');
        await page.getByTestId('continuous').click();
        await page.getByTestId('second-span').fill('9');
        await addSource(page, 'floor', { tributary: '10' });
        await addSource(page, 'point', { at: '17', 'dead-lb': '700', 'live-lb': '900' });
        const loads = page.getByTestId('member-diagrams-loads');
        await expect.poll(() => loads.getAttribute('aria-label')).toContain('Two spans continuous');
        const twoSpan = await curveExtent(page, 'member-diagrams-moment');
        expect(twoSpan.guides).toBe(3); // a guide at each support, the centre post too
        expect(twoSpan.left).toBeGreaterThanOrEqual(0);
        expect(twoSpan.right).toBeLessThanOrEqual(twoSpan.width + 0.5);
        expect(twoSpan.right - twoSpan.left).toBeGreaterThan(0.85 * twoSpan.width); // both spans, not the first
        await snapDiagrams(page, `${name}-two-span`);

        await page.getByTestId('continuous').click();
        await page.getByTestId('overhang-left').fill('2');
        await page.getByTestId('overhang-right').fill('3');
        await page.getByTestId('source-1-at').fill('15-6');
        await expect
          .poll(() => loads.getAttribute('aria-label'))
          .toContain('overhangs 3\' 0" past the right support');
        const overhang = await curveExtent(page, 'member-diagrams-moment');
        expect(overhang.guides).toBe(2);
        expect(overhang.right).toBeLessThanOrEqual(overhang.width + 0.5);
        expect(overhang.right - overhang.left).toBeGreaterThan(0.9 * overhang.width); // tip to tip
        await snapDiagrams(page, `${name}-overhang`);
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
        await page.getByTestId('member-row').first().waitFor(); // the demo members, loaded before counting
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
        await page.getByTestId('member-row').first().waitFor();
        expect(await page.getByTestId('member-row').count()).toBe(membersBefore);
      } finally {
        await close();
      }
    });
  });
}
