import { mkdirSync } from 'node:fs';
import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');
const devMailUrl = inject('devMailUrl');
const PASSWORD = 'a long enough passphrase';
/** Each flow signs up, reads mail and follows links: longer than the suite's default on a busy machine. */
const FLOW_MS = 150_000;
mkdirSync('screenshots/accounts', { recursive: true });

/** The newest link to `path` in mail to `email`, read from the captured-mail page as a person would. */
async function mailedLink(page: Page, email: string, path: string): Promise<string> {
  await page.goto(devMailUrl);
  const link = page
    .getByTestId('mail-message')
    .filter({ hasText: email })
    .getByRole('link', { name: new RegExp(path) })
    .first();
  await link.waitFor({ timeout: 20_000 });
  const href = (await link.getAttribute('href')) ?? '';
  expect(href).toContain(path);
  return href;
}

async function signUp(page: Page, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-up`);
  await page.getByTestId('sign-up-name').fill('Sam Accounts');
  await page.getByTestId('sign-up-email').fill(email);
  await page.getByTestId('sign-up-password').fill(PASSWORD);
  await page.getByTestId('sign-up-firm-name').fill('Accounts Test Remodeling');
  await page.getByTestId('sign-up-submit').click();
  await page.getByTestId('jobs-empty').waitFor();
}

async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

for (const name of Object.keys(viewports) as ViewportName[]) {
  const shot = (page: Page, what: string) => snap(page, `accounts/${name}-${what}`);

  describe(`accounts (${name})`, () => {
    it(
      'confirms the e-mail address from the mailed link, and the shell stops asking',
      async () => {
        const { page, close } = await openBrowser(name);
        try {
          const email = `confirm-${name}-${Date.now()}@example.test`;
          await signUp(page, email);
          await page.getByTestId('unconfirmed-email').waitFor();
          await shot(page, 'unconfirmed-shell');

          const link = await mailedLink(page, email, '/verify-email/');
          await page.goto(link);
          await page.getByTestId('email-confirmed').waitFor();
          await shot(page, 'email-confirmed');
          await page.getByTestId('email-confirmed-continue').click();
          await page.getByTestId('jobs-empty').waitFor();
          expect(await page.getByTestId('unconfirmed-email').count()).toBe(0);

          await page.goto(link);
          await page.getByText('This confirmation link is not valid any more').waitFor();
          await page.getByText(`${email} is confirmed already`).waitFor();
          await shot(page, 'confirmation-spent');
        } finally {
          await close();
        }
      },
      FLOW_MS,
    );

    it(
      'lists the sessions with this browser marked, and signs out everywhere',
      async () => {
        const first = await openBrowser(name);
        const second = await openBrowser(name);
        try {
          const email = `sessions-${name}-${Date.now()}@example.test`;
          await signUp(first.page, email);
          await signIn(second.page, email, PASSWORD);
          await second.page.getByTestId('jobs-empty').waitFor();

          await first.page.getByTestId('nav-account').click();
          await first.page.getByTestId('sessions').waitFor();
          await expect.poll(() => first.page.getByTestId('session-row').count()).toBe(2);
          expect(await first.page.getByTestId('session-current').count()).toBe(1);
          await first.page.getByText('Chrome on Linux').first().waitFor();
          await shot(first.page, 'sessions');

          await first.page.getByTestId('sign-out-everywhere').click();
          await shot(first.page, 'sign-out-everywhere-confirm');
          await first.page.getByTestId('sign-out-everywhere-confirm').click();
          await first.page.getByTestId('sign-in-email').waitFor();

          await second.page.goto(`${baseUrl}/jobs`);
          await second.page.getByTestId('sign-in-email').waitFor();
          expect(second.page.url()).toContain('/sign-in');
        } finally {
          await first.close();
          await second.close();
        }
      },
      FLOW_MS,
    );

    it(
      'resets a forgotten password from the mailed link and is signed in',
      async () => {
        const { page, close } = await openBrowser(name);
        try {
          const email = `forgot-${name}-${Date.now()}@example.test`;
          await signUp(page, email);
          await page.context().clearCookies();

          await page.goto(`${baseUrl}/sign-in`);
          await page.getByTestId('sign-in-email').fill(email);
          await page.getByTestId('sign-in-forgot').click();
          await expect.poll(() => page.getByTestId('forgot-email').inputValue()).toBe(email);
          await page.getByTestId('forgot-email').fill('not an address');
          await page.getByTestId('forgot-submit').click();
          await page.getByText('Enter a valid e-mail address').waitFor();
          await page.getByTestId('forgot-email').fill(email);
          await page.getByTestId('forgot-submit').click();
          await page.getByTestId('reset-requested').waitFor();
          await shot(page, 'reset-requested');

          const link = await mailedLink(page, email, '/reset-password/');
          await page.goto(link);
          await page.getByText('not a common password').first().waitFor();
          await page.getByTestId('reset-password').fill('short');
          await page.getByTestId('reset-submit').click();
          await page.getByText('Use at least 10 characters').waitFor();
          await page.getByTestId('reset-password').fill('1234567890');
          await page.getByTestId('reset-submit').click();
          await page.getByText('among the most common ones').waitFor();
          await shot(page, 'reset-common-password');

          await page.getByTestId('reset-password').fill('a different new passphrase');
          await page.getByTestId('reset-submit').click();
          await page.getByTestId('jobs-empty').waitFor();
          await shot(page, 'reset-signed-in');

          await page.context().clearCookies();
          await signIn(page, email, 'a different new passphrase');
          await page.getByTestId('jobs-empty').waitFor();
        } finally {
          await close();
        }
      },
      FLOW_MS,
    );
  });
}

describe('forgot password for an unknown address (phone)', () => {
  it('gives the same answer as for a known one', async () => {
    const { page, close } = await openBrowser('phone');
    try {
      await page.goto(`${baseUrl}/forgot-password`);
      await page.getByTestId('forgot-email').fill(`nobody-${Date.now()}@example.test`);
      await page.getByTestId('forgot-submit').click();
      await page.getByTestId('reset-requested').waitFor();
      expect(await page.getByTestId('reset-requested').innerText()).toContain('If an account uses');
    } finally {
      await close();
    }
  });
});
