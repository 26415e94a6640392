import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');
const devMailUrl = inject('devMailUrl');

async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

async function signOut(page: Page): Promise<void> {
  await page.getByTestId('nav-account').click();
  await page.getByTestId('sign-out').click();
  await page.getByTestId('sign-in-email').waitFor();
}

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`sign up, see jobs, sign out, sign in (${name})`, () => {
    it('takes a new person from sign-up to an empty Jobs list and back in again', async () => {
      const { page, close } = await openBrowser(name);
      try {
        const email = `new-${name}-${Date.now()}@example.test`;
        await page.goto(`${baseUrl}/sign-up`);
        await page.getByTestId('sign-up-name').fill('Pat Example');
        await page.getByTestId('sign-up-email').fill(email);
        await page.getByTestId('sign-up-password').fill('a long enough passphrase');
        await page.getByTestId('sign-up-firm-name').fill('Example Renovation Co');
        await snap(page, `${name}-sign-up`);
        await page.getByTestId('sign-up-submit').click();

        await page.getByTestId('jobs-empty').waitFor();
        await expect(page.getByRole('heading', { name: 'Jobs' }).first().isVisible()).resolves.toBe(true);
        await snap(page, `${name}-jobs-empty`);

        await signOut(page);
        await expect(page.url()).toContain('/sign-in');
        await snap(page, `${name}-sign-in`);

        await signIn(page, email, 'a long enough passphrase');
        await page.getByTestId('jobs-empty').waitFor();
        expect(page.url()).toContain('/jobs');
      } finally {
        await close();
      }
    });

    it('shows a field message for bad input and stays signed out', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signIn(page, 'not-an-email', 'x');
        await page.getByText('Enter a valid e-mail address').waitFor();
        await signIn(page, 'nobody@example.test', 'wrong password here');
        await page.getByText('E-mail or password is wrong').waitFor();
        expect(page.url()).toContain('/sign-in');
      } finally {
        await close();
      }
    });
  });
}

describe('demo roles see only what their role may see (phone)', () => {
  const cases = [
    {
      email: 'owner@demo.tributary.test',
      visible: ['nav-jobs', 'nav-span-tables', 'nav-members', 'nav-account'],
      hidden: ['nav-requests'],
    },
    {
      email: 'contractor@demo.tributary.test',
      visible: ['nav-jobs', 'nav-span-tables', 'nav-account'],
      hidden: ['nav-members', 'nav-requests'],
    },
    {
      email: 'estimator@demo.tributary.test',
      visible: ['nav-jobs', 'nav-span-tables', 'nav-account'],
      hidden: ['nav-members', 'nav-requests'],
    },
    {
      email: 'engineer@demo.tributary.test',
      visible: ['nav-requests', 'nav-account'],
      hidden: ['nav-jobs', 'nav-span-tables', 'nav-members'],
    },
  ];
  for (const role of cases) {
    it(role.email, async () => {
      const { page, close } = await openBrowser('phone');
      try {
        await signIn(page, role.email, 'tributary-demo');
        await page.getByTestId(role.visible[0]).waitFor();
        for (const id of role.visible) expect(await page.getByTestId(id).count(), id).toBeGreaterThan(0);
        for (const id of role.hidden) expect(await page.getByTestId(id).count(), id).toBe(0);
        await snap(page, `phone-demo-${role.email.split('@')[0]}`);
      } finally {
        await close();
      }
    });
  }

  it('an owner sees the members list on a wide screen', async () => {
    const { page, close } = await openBrowser('wide');
    try {
      await signIn(page, 'owner@demo.tributary.test', 'tributary-demo');
      await page.getByTestId('nav-members').click();
      await page.getByText('estimator@demo.tributary.test').first().waitFor();
      await snap(page, 'wide-demo-members');
    } finally {
      await close();
    }
  });
});

describe('invitation by e-mail (phone)', () => {
  it('an owner invites an estimator, who follows the captured e-mail link and joins the firm', async () => {
    const owner = await openBrowser('phone');
    const invitee = await openBrowser('phone');
    try {
      const email = `hand-${Date.now()}@example.test`;
      await signIn(owner.page, 'owner@demo.tributary.test', 'tributary-demo');
      await owner.page.getByTestId('nav-members').click();
      await owner.page.getByTestId('invite-email').fill(email);
      await owner.page.getByTestId('invite-role-estimator').click();
      await owner.page.getByTestId('invite-submit').click();
      await owner.page.getByText(email).first().waitFor();

      await invitee.page.goto(devMailUrl);
      const link = invitee.page.getByRole('link', { name: /\/invite\// }).first();
      await link.waitFor();
      const href = (await link.getAttribute('href')) ?? '';
      expect(href).toContain('/invite/');
      await invitee.page.goto(href);
      await invitee.page.getByTestId('invite-name').fill('Robin Newhand');
      await invitee.page.getByTestId('invite-password').fill('another long passphrase');
      await snap(invitee.page, 'phone-accept-invitation');
      await invitee.page.getByTestId('invite-accept').click();
      await invitee.page.getByTestId('nav-jobs').waitFor();
      expect(await invitee.page.getByTestId('nav-members').count()).toBe(0);
      await invitee.page.getByTestId('nav-account').click();
      await invitee.page.getByText('Estimator').first().waitFor();
    } finally {
      await owner.close();
      await invitee.close();
    }
  });
});
