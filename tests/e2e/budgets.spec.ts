import { readFileSync } from 'node:fs';
import { describe, expect, inject, it } from 'vitest';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');

/** Invented demo beam: 2-ply 1-3/4 x 11-7/8 LVL over 12 ft under 12 ft of floor, flush with the joists. */
const beam = {
  label: 'Family room beam',
  input: {
    kind: 'beam',
    edition: 'ASCE 7-22',
    clearSpanFt: 12,
    sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
    materialId: 'lvl-2.0e',
    sizeId: '2-ply-1.75x11.875',
    mount: 'flush',
    joistDepthIn: 11.875,
  },
};

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`budgets (${name})`, () => {
    it('an estimator compares sizes, changes a price, sees the budget move, exports CSV and downloads the client summary', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await page.goto(`${baseUrl}/sign-in`);
        await page.getByTestId('sign-in-email').fill('estimator@demo.tributary.test');
        await page.getByTestId('sign-in-password').fill('tributary-demo');
        await page.getByTestId('sign-in-submit').click();
        await page.getByTestId('nav-price-book').waitFor();

        const jobs = await (await page.request.get(`${baseUrl}/api/jobs`)).json();
        const jobId = jobs.jobs[0].id as string;
        const created = await page.request.post(`${baseUrl}/api/jobs/${jobId}/members`, { data: beam });
        expect(created.status()).toBe(201);
        const memberId = (await created.json()).id as string;

        await page.goto(`${baseUrl}/jobs/${jobId}/members/${memberId}`);
        await page.getByText('Budget for this member').click();
        await page.getByTestId('comparison-chart').waitFor();
        await page.getByTestId('comparison-table').waitFor();
        await expect(page.getByTestId('comparison-table').textContent()).resolves.toContain(
          'Cheapest that passes',
        );
        const before = await page.getByTestId('budget-total').textContent();
        await snap(page, `budgets/${name}-member-budget`);
        await page.getByTestId('comparison-table').scrollIntoViewIfNeeded();
        await page.screenshot({ path: `screenshots/budgets/${name}-member-compare.png` });
        await page.getByText('Every line', { exact: true }).scrollIntoViewIfNeeded();
        await page.screenshot({ path: `screenshots/budgets/${name}-member-lines.png` });

        await page.getByTestId('nav-price-book').click();
        const input = page.getByTestId('price-input-lvl/11.875');
        const value = Number(await input.inputValue());
        await input.fill((value + 1).toFixed(2));
        await page.getByTestId('price-save-lvl/11.875').click();
        await page
          .getByTestId('price-lvl/11.875')
          .getByText(/Set \d{4}-\d{2}-\d{2} by Ines Thornquist/)
          .waitFor();
        await snap(page, `budgets/${name}-price-book`);

        await page.goto(`${baseUrl}/jobs/${jobId}/budget/${memberId}`);
        await page.getByTestId('budget-total').waitFor();
        await page.waitForFunction(
          (old) => document.querySelector('[data-testid="budget-total"]')?.textContent !== old,
          before,
        );
        expect(await page.getByTestId('budget-total').textContent()).not.toBe(before);

        await page.goto(`${baseUrl}/jobs/${jobId}/budget`);
        await page.getByTestId('job-range').waitFor();
        const [csv] = await Promise.all([page.waitForEvent('download'), page.getByTestId('job-csv').click()]);
        expect(readFileSync((await csv.path())!, 'utf8').split('\r\n')[0]).toBe(
          'member,group,line,quantity,unit,unit_price,amount,basis,price_item,override_note',
        );
        await page.getByTestId('client-name').fill('R. Client');
        const [pdf] = await Promise.all([
          page.waitForEvent('download'),
          page.getByTestId('send-budget').click(),
        ]);
        expect(
          readFileSync((await pdf.path())!)
            .subarray(0, 5)
            .toString('latin1'),
        ).toBe('%PDF-');
        await page.getByText('Sent to the client').waitFor();
        await snap(page, `budgets/${name}-job-budget`);
      } finally {
        await close();
      }
    });
  });
}
