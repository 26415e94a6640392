import { describe, expect, inject, it } from 'vitest';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`span table builder (${name})`, () => {
    it('builds a table for the person’s own loads, says which span it prints, and prints on its own', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await page.goto(`${baseUrl}/sign-in`);
        await page.getByTestId('sign-in-email').fill('estimator@demo.tributary.test');
        await page.getByTestId('sign-in-password').fill('tributary-demo');
        await page.getByTestId('sign-in-submit').click();
        await page.getByTestId('nav-span-tables').click();
        await page.getByTestId('span-widths').fill('4, 8, 12-6');
        await page.getByTestId('span-table-grid').waitFor();
        await expect(page.getByTestId('span-basis').textContent()).resolves.toMatch(/clear span/i);
        await snap(page, `${name}-span-table`);

        await page.getByTestId('span-design-spans').click();
        await page
          .getByTestId('span-basis')
          .getByText(/design span/i)
          .first()
          .waitFor();

        await page.emulateMedia({ media: 'print' });
        const sheet = page.locator('#span-table-print');
        await expect(sheet.isVisible()).resolves.toBe(true);
        await expect(sheet.textContent()).resolves.toMatch(/Preliminary check only/);
        await expect(page.locator('#root').isVisible()).resolves.toBe(false);
        await page.screenshot({ path: `screenshots/${name}-span-table-print.png` });
      } finally {
        await close();
      }
    });

    it('puts a message at the widths field for a negative width and builds no table', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await page.goto(`${baseUrl}/sign-in`);
        await page.getByTestId('sign-in-email').fill('contractor@demo.tributary.test');
        await page.getByTestId('sign-in-password').fill('tributary-demo');
        await page.getByTestId('sign-in-submit').click();
        await page.getByTestId('nav-span-tables').click();
        await page.getByTestId('span-widths').fill('4, -8');
        await page.getByTestId('span-table-blocked').waitFor();
        expect(await page.getByTestId('span-table-grid').count()).toBe(0);
      } finally {
        await close();
      }
    });
  });
}
