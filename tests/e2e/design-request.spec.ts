import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, snap, viewports, type ViewportName } from './browser';
import { postDemoHeader } from './demo-header';

const baseUrl = inject('baseUrl');
const devMailUrl = inject('devMailUrl');

/** A tiny valid PNG (1 x 1, one grey pixel). */
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAAAAAA6fptVAAAACklEQVR4nGNoAAAAggCBd81ytgAAAABJRU5ErkJggg==',
  'base64',
);

async function signIn(page: Page, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill('tributary-demo');
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('job-row').first().waitFor();
}

async function act(page: Page, action: string, text = ''): Promise<void> {
  if (text) await page.getByTestId('action-text').fill(text);
  await page.getByTestId(`action-${action}`).click();
}

async function upload(page: Page, action: string, name: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByTestId(`action-${action}`).click();
  await (await chooser).setFiles({ name, mimeType: 'image/png', buffer: PNG });
  await page.getByText(name).first().waitFor();
}

const state = (page: Page, word: string) =>
  expect.poll(() => page.getByTestId('request-status').innerText()).toBe(word);

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`design request round trip (${name})`, () => {
    it('contractor sends with a photo; a new engineer signs up from the mail, asks, designs; the contractor sees the member', async () => {
      const contractor = await openBrowser(name);
      const engineer = await openBrowser(name);
      const engineerEmail = `engineer-${name}-${Date.now()}@example.test`;
      try {
        const c = contractor.page;
        await signIn(c, 'contractor@demo.tributary.test');
        await c.getByTestId('job-row').first().click();
        await c.getByTestId('job-members').waitFor();
        const jobId = c.url().split('/jobs/')[1];
        const made = await postDemoHeader(contractor.context, baseUrl, jobId, `Hall header ${name}`);
        expect(made.status()).toBe(201);
        await c.reload();
        await c.getByTestId('new-request').click();
        await c.getByRole('checkbox', { name: new RegExp(`Hall header ${name}`) }).click();
        await c.getByTestId('compose-engineerEmail').fill(engineerEmail);
        await c.getByTestId('compose-state').click();
        await c.getByTestId('compose-state-PA').click();
        await c.getByTestId('compose-questions').fill('Can it be flush?');
        await c.getByTestId('compose-save').click();
        await state(c, 'Draft');
        await upload(c, 'photo', 'attic.png');
        await act(c, 'send');
        await state(c, 'Sent');
        await snap(c, `handoff/${name}-contractor-sent`);

        const e = engineer.page;
        await e.goto(devMailUrl);
        const link = e.getByRole('link', { name: /\/request-invite\// }).first();
        await link.waitFor();
        const mails = await e.locator('body').innerText();
        expect(mails).toContain(engineerEmail);
        await e.goto((await link.getAttribute('href')) ?? '');
        await e.getByTestId('request-invite-name').fill('New Engineer');
        await e.getByTestId('request-invite-firm').fill('New Structural');
        await e.getByTestId('request-invite-password').fill('a long enough password');
        await e.getByTestId('request-invite-accept').click();
        await state(e, 'Sent');
        await expect.poll(() => e.getByTestId('request-member').first().innerText()).toContain('Preliminary');
        const pdf = await e.request.get(`${e.url().replace('/requests/', '/api/requests/')}/package.pdf`);
        expect(pdf.status()).toBe(200);
        expect(pdf.headers()['content-type']).toBe('application/pdf');
        await act(e, 'in-review');
        await state(e, 'In review');
        await act(e, 'needs-info', 'What is under the left end?');
        await state(e, 'Needs info');

        await c.reload();
        await state(c, 'Needs info');
        await c.getByTestId('message-body').fill('A 4x4 post on the foundation wall');
        await c.getByTestId('message-send').click();
        await c.getByText('A 4x4 post on the foundation wall').first().waitFor();
        await act(c, 'in-review');
        await state(c, 'In review');

        await e.reload();
        await e.getByTestId('fee-usd').fill('600');
        await e.getByTestId('fee-days').fill('5');
        await act(e, 'quote-fee');
        await c.reload();
        await act(c, 'accept-fee');
        await c
          .getByText(/accepted/)
          .first()
          .waitFor();

        await e.reload();
        await upload(e, 'design', 'design.png');
        await e.getByTestId('reply-designation-0').fill('2-ply 1-3/4 x 9-1/4 LVL 2.0E');
        await e.getByTestId('reply-plies-0').fill('2');
        await e.getByTestId('reply-widthIn-0').fill('3.5');
        await e.getByTestId('reply-depthIn-0').fill('9.25');
        await e.getByTestId('reply-verify').fill('Post under the left end (photo)');
        await e.getByTestId('reply-send').click();
        await e.getByTestId('engineer-member').waitFor();
        await act(e, 'designed');
        await state(e, 'Designed');
        await snap(e, `handoff/${name}-engineer-designed`);

        await c.reload();
        await state(c, 'Designed');
        const member = await c.getByTestId('request-member').first().innerText();
        expect(member).toContain('Preliminary size superseded');
        expect(member).toContain('Engineer: LVL, 2-ply 1-3/4 x 9-1/4 LVL 2.0E');
        expect(await c.getByTestId('verify-in-field').innerText()).toContain(
          'Post under the left end (photo wanted)',
        );
        await snap(c, `handoff/${name}-contractor-designed`);

        // The job page: the member marked as the engineer's, its preliminary size superseded, and the
        // engineer's item on the checklist, marked as from the engineer, asking for its photo.
        await c.goto(`${baseUrl}/jobs/${jobId}`);
        const row = c.getByTestId('member-row').filter({ hasText: `Hall header ${name}` });
        await row.getByTestId('member-designed').waitFor();
        expect(await row.innerText()).toContain('Preliminary size superseded');
        // Both viewports' requests are on the same demo job: this run's is the newest, listed last.
        const item = c.getByTestId('engineer-item').filter({ hasText: 'Post under the left end' }).last();
        await item.waitFor();
        expect(await item.innerText()).toContain('From the engineer');
        expect(await item.innerText()).toContain('asks for a photo');
        await item.scrollIntoViewIfNeeded();
        await snap(c, `handoff/${name}-job-checklist-engineer`);

        // The member page: superseded, and the header's framing list rebuilt at the engineer's member.
        const memberId = ((await made.json()) as { id: string }).id;
        await c.goto(`${baseUrl}/jobs/${jobId}/members/${memberId}`);
        await c.getByTestId('superseded-notice').waitFor();
        expect(await c.getByTestId('superseded-by').innerText()).toContain('2-ply 1-3/4 x 9-1/4 LVL 2.0E');
        await expect
          .poll(() => c.getByTestId('framing-list').innerText())
          .toContain('Header 2-ply 1-3/4 x 9-1/4 LVL 2.0E (LVL)');
        expect(await c.getByTestId('framing-from-design').innerText()).toContain('superseded');
        await snap(c, `handoff/${name}-member-superseded`);

        // The budgets rebuild from the engineer's member, and the change order shows the difference.
        await c.goto(`${baseUrl}/jobs/${jobId}/budget/${memberId}`);
        await c.getByTestId('change-order').waitFor();
        expect(await c.getByTestId('budget-total').innerText()).toContain('engineer’s member');
        expect(await c.getByTestId('change-order').innerText()).toContain('material Sawn lumber → LVL');
        await snap(c, `handoff/${name}-budget-change-order`);
        await c.goto(`${baseUrl}/jobs/${jobId}/budget`);
        await c.getByTestId('job-change-order').first().waitFor();
        expect(await c.getByTestId('job-change-orders').innerText()).toMatch(/change order/);
        await snap(c, `handoff/${name}-job-budget-change-order`);
      } finally {
        await contractor.close();
        await engineer.close();
      }
    }, 180_000);

    it('composes with the phone-back fields, then edits the draft: a field, the members, a photo removed', async () => {
      const { page: c, context, close } = await openBrowser(name);
      try {
        await signIn(c, 'contractor@demo.tributary.test');
        await c.getByTestId('job-row').first().click();
        await c.getByTestId('job-members').waitFor();
        const jobId = c.url().split('/jobs/')[1];
        const header = (label: string) => postDemoHeader(context, baseUrl, jobId, label);
        expect((await header(`Den header ${name}`)).status()).toBe(201);
        expect((await header(`Porch header ${name}`)).status()).toBe(201);
        await c.reload();
        await c.getByTestId('new-request').click();
        await c.getByRole('checkbox', { name: new RegExp(`Den header ${name}`) }).click();
        await c.getByTestId('compose-phoneBack.joists.size').fill('2x8, 1-1/2 × 7-1/4 in');
        await c.getByTestId('compose-tape-in-photo').click();
        await c.getByTestId('compose-heavy-solar').click();
        await c.getByTestId('compose-heavy-cast-iron-tub').click();
        await c.getByTestId('compose-damage-notched').click();
        await c.getByTestId('compose-damage-rot').click();
        await c.getByTestId('compose-yard-add').click();
        await c.getByTestId('compose-yard-grade-0').fill('2.0E');
        // Bad input: a sag in words and an E grade without its product are named at the field; nothing saved.
        await c.getByTestId('compose-phoneBack.sag.sagIn').fill('about half');
        await c.getByTestId('compose-save').click();
        await c.getByTestId('compose-problem').waitFor();
        await c.getByText('Enter a number, like 16 or 9.5').waitFor();
        await c.getByText(/Name the product/).waitFor();
        expect(c.url()).toContain('/requests/new');
        await c.getByTestId('compose-yard').scrollIntoViewIfNeeded();
        await snap(c, `handoff/${name}-compose-field-messages`);
        await c.getByTestId('compose-phoneBack.sag.sagIn').fill('0.5');
        await c.getByTestId('compose-yard-product-0').fill('1-3/4 in LVL');
        await c.getByTestId('compose-save').click();
        await state(c, 'Draft');
        const requestId = c.url().split('/requests/')[1].split(/[/?]/)[0];
        const read = async () => await (await c.request.get(`${baseUrl}/api/requests/${requestId}`)).json();
        const saved = (await read()).draft;
        expect(saved.phoneBack).toMatchObject({
          heavyAbove: ['solar', 'cast-iron-tub'],
          damage: { notched: true, rot: true, sistered: false, bored: false },
          joists: { tapeInPhoto: true, size: '2x8, 1-1/2 × 7-1/4 in' },
          sag: { sagIn: 0.5 },
          yardStock: [{ product: '1-3/4 in LVL', eGrade: '2.0E' }],
        });

        await c.getByTestId('action-edit-draft').click();
        await c.getByTestId('draft-photos').waitFor();
        const chooser = c.waitForEvent('filechooser');
        await c.getByTestId('draft-photo-caption').fill('Wrong wall');
        await c.getByTestId('draft-photo-add').click();
        await (await chooser).setFiles({ name: 'wrong-wall.png', mimeType: 'image/png', buffer: PNG });
        await c.getByTestId('draft-photo').getByText('Wrong wall').waitFor();
        expect(await c.getByTestId('compose-tape-in-photo').getAttribute('aria-checked')).toBe('true');
        await snap(c, `handoff/${name}-draft-edit`);
        await c.getByTestId('draft-photo-remove').click();
        await c.getByTestId('draft-photo-confirm-remove').click();
        await c.getByTestId('draft-photos').getByText('No photos yet.').waitFor();
        await c.getByRole('checkbox', { name: new RegExp(`Den header ${name}`) }).click();
        await c.getByRole('checkbox', { name: new RegExp(`Porch header ${name}`) }).click();
        await c.getByTestId('compose-questions').fill('Can the porch header be flush?');
        await c.getByTestId('compose-save').click();
        await state(c, 'Draft');
        const edited = await read();
        expect(edited.files).toEqual([]);
        expect(edited.draft.questions).toBe('Can the porch header be flush?');
        expect(edited.draft.memberIds).toHaveLength(1);
        expect(edited.draft.memberIds[0]).not.toBe(saved.memberIds[0]);
        expect(edited.draft.phoneBack.yardStock).toEqual(saved.phoneBack.yardStock);
        await snap(c, `handoff/${name}-draft-edited`);
      } finally {
        await close();
      }
    }, 120_000);

    it('revises a sent request from its page: fields, members and a photo changed, sent as version 2 with its change list', async () => {
      const { page: c, context, close } = await openBrowser(name);
      try {
        await signIn(c, 'contractor@demo.tributary.test');
        await c.getByTestId('job-row').first().click();
        await c.getByTestId('job-members').waitFor();
        const jobId = c.url().split('/jobs/')[1];
        const stamp = Date.now();
        expect((await postDemoHeader(context, baseUrl, jobId, `Stair header ${name}`)).status()).toBe(201);
        expect((await postDemoHeader(context, baseUrl, jobId, `Attic header ${name}`)).status()).toBe(201);
        await c.reload();
        await c.getByTestId('new-request').click();
        await c.getByRole('checkbox', { name: new RegExp(`Stair header ${name}`) }).click();
        await c.getByTestId('compose-engineerEmail').fill(`revise-${name}-${stamp}@example.test`);
        await c.getByTestId('compose-state').click();
        await c.getByTestId('compose-state-PA').click();
        await c.getByTestId('compose-questions').fill('Can it be flush?');
        await c.getByTestId('compose-save').click();
        await state(c, 'Draft');
        const requestId = c.url().split('/requests/')[1].split(/[/?]/)[0];
        const read = async () => await (await c.request.get(`${baseUrl}/api/requests/${requestId}`)).json();
        await upload(c, 'photo', 'stair.png');
        // The photo goes through the device's queue: send once the server holds it, so version 1 has it.
        await expect.poll(async () => (await read()).files.length, { timeout: 20_000 }).toBe(1);
        await act(c, 'send');
        await state(c, 'Sent');

        await c.getByTestId('request-actions').scrollIntoViewIfNeeded();
        await snap(c, `handoff/${name}-revise-link`);
        await c.getByRole('link', { name: 'Revise and send' }).click();
        await c.getByTestId('revision-intro').waitFor();
        await snap(c, `handoff/${name}-revision-top`);
        // The photo version 1 went with stays; a new one is added.
        await c.getByTestId('draft-photo-sent').first().waitFor();
        const chooser = c.waitForEvent('filechooser');
        await c.getByTestId('draft-photo-caption').fill('Joists over the stair, tape at 16 in');
        await c.getByTestId('draft-photo-add').click();
        await (await chooser).setFiles({ name: 'attic-over.png', mimeType: 'image/png', buffer: PNG });
        await c.getByText('Joists over the stair, tape at 16 in').waitFor();
        await c.getByRole('checkbox', { name: new RegExp(`Attic header ${name}`) }).click();
        await c.getByTestId('compose-questions').fill('Can both be flush?');
        await c.getByTestId('revision-note').fill('The attic header goes too');
        await snap(c, `handoff/${name}-revision-edit`);
        await c.getByTestId('compose-save').click();
        await c.getByTestId('request-changes').waitFor();
        await state(c, 'Sent');
        // The card loads the two versions it compares before it lists their changes.
        await c.getByTestId('change-count').waitFor();
        const changes = await c.getByTestId('request-changes').innerText();
        expect(changes).toContain('Version 2: The attic header goes too');
        // The change card names each field in words, the old value beside the new.
        expect(changes).toContain('Questions for the engineer');
        expect(changes).toMatch(/Was \(version 1\)\s+Can it be flush\?/);
        expect(changes).toMatch(/Now \(version 2\)\s+Can both be flush\?/);
        expect(changes).toContain('Photo attic-over.png');
        expect(changes).not.toContain('members.');
        expect(changes).toContain(`Attic header ${name}`);
        await c.getByTestId('request-changes').scrollIntoViewIfNeeded();
        await snap(c, `handoff/${name}-revision-sent`);
        const detail = await read();
        expect(detail.version).toBe(2);
        expect(detail.snapshot.members).toHaveLength(2);
        expect(detail.snapshot.files).toHaveLength(2);
        expect(detail.versions[1].changes).toContainEqual(
          expect.objectContaining({
            group: 'Job and request',
            section: 'Photos',
            field: 'Photo attic-over.png',
            kind: 'added',
            before: null,
          }),
        );
      } finally {
        await close();
      }
    }, 120_000);
  });
}
