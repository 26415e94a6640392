import { describe, expect, inject, it } from 'vitest';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');

/**
 * The demo ranch job's ground snow, viewport by viewport: 25 psf (the demo's) → 80 psf, past what header
 * tables cover, and back. Its demo header then needs an engineer, and passes again.
 */
const steps: Record<ViewportName, { snow: string; line: string }> = {
  phone: { snow: '80', line: 'Kitchen pass-through header: passes before, now needs an engineer' },
  wide: { snow: '25', line: 'Kitchen pass-through header: needs an engineer before, now passes' },
};

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`job page after a change to the job's loads (${name})`, () => {
    it('names the members the server checked again that changed state', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await page.goto(`${baseUrl}/sign-in`);
        await page.getByTestId('sign-in-email').fill('contractor@demo.tributary.test');
        await page.getByTestId('sign-in-password').fill('tributary-demo');
        await page.getByTestId('sign-in-submit').click();
        await page.getByRole('link', { name: /Ranch/ }).first().click();
        await page.getByTestId('job-members').waitFor();
        await page.getByTestId('member-row').getByText('Kitchen pass-through header').waitFor(); // a demo member
        await page.getByTestId('job-edit').click();
        await page.getByTestId('job-ground-snow').fill(steps[name].snow);
        await page.getByTestId('job-submit').click();
        const notice = page.getByTestId('members-recomputed');
        await notice.getByText(steps[name].line).waitFor();
        await expect.poll(() => notice.textContent()).toContain("with the job's new values");
        const box = await notice.boundingBox();
        expect(box?.y ?? Infinity).toBeLessThan(viewports[name].height); // seen without scrolling back up
        await snap(page, `editor-gaps/${name}-job-recomputed`);
      } finally {
        await close();
      }
    });
  });
}
