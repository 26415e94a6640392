import { mkdirSync } from 'node:fs';
import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');
const shot = (page: Page, name: string) => {
  mkdirSync('screenshots/bearing', { recursive: true });
  return snap(page, `bearing/${name}`);
};

async function signInAsContractor(page: Page): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill('contractor@demo.tributary.test');
  await page.getByTestId('sign-in-password').fill('tributary-demo');
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('job-row').first().waitFor();
}

async function openJob(page: Page, name: string): Promise<string> {
  await page
    .getByRole('link', { name: new RegExp(name) })
    .first()
    .click();
  await page.getByTestId('job-screens').waitFor();
  return page.url().split('/jobs/')[1].split(/[/?]/)[0];
}

/** Answers one question (seen, the default) and moves on. */
async function answer(page: Page, question: string, value: string): Promise<void> {
  await page.getByTestId(`question-${question}`).waitFor();
  await page.getByTestId(`answer-${question}-${value}`).click();
  await page.getByTestId('screen-next').click();
}

/** An interior wall under an attic, ceiling joists parallel to it, nothing above or below (invented). */
async function screenWall(page: Page, wall: string, tie: 'yes' | 'no'): Promise<void> {
  await page.getByTestId('screen-new').click();
  await page.getByTestId('screen-step').waitFor();
  // Answers left unsaved earlier in this browser come back: start this wall afresh.
  if ((await page.getByTestId('screen-draft-restored').count()) > 0) {
    await page.getByTestId('screen-draft-discard').click();
  }
  await page.getByTestId('screen-wall-label').fill(wall);
  await page.getByTestId('screen-next').click();
  const steps: [string, string][] = [
    ['exterior', 'no'],
    ['above', 'attic'],
    ['joistDirection', 'parallel'],
    ['furring', 'no'],
    ['beamAbove', 'no'],
    ['hiddenPost', 'no'],
    ['wallAbove', 'no'],
    ['ridge', 'board'],
    ['ceilingJoistsTie', tie],
    ['purlinBraces', 'no'],
    ['bracedWall', 'no'],
    ['below', 'joists-only'],
    ['sag', 'no'],
  ];
  for (const [question, value] of steps) await answer(page, question, value);
  await page.getByTestId('screen-span-a').fill('12');
  await page.getByTestId('screen-span-b').fill('10');
  await page.getByTestId('screen-finish').click();
  await page.getByTestId('screen-outcome').waitFor();
}

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`bearing screen (${name})`, () => {
    it('screens a wall to likely nonbearing and gives the nominal header and framing list', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Ranch');
        await page.getByTestId('screen-new').waitFor();
        await shot(page, `${name}-job-page`);
        await page.getByTestId('screen-new').click();
        await page.getByTestId('screen-wall-label').fill('Hall / bedroom');
        await page.getByTestId('screen-next').click();
        await answer(page, 'exterior', 'no');
        await page.getByTestId('answer-above-attic').click();
        await shot(page, `${name}-screen-question`);
        await page.goBack();
        await screenWall(page, 'Hall / bedroom', 'no');
        await page.getByTestId('screen-outcome').getByText('Likely nonbearing', { exact: true }).waitFor();
        await page
          .getByTestId('nonbearing-rule')
          .getByText(/single flat 2x4 header is allowed/)
          .waitFor();
        await page
          .getByTestId('nonbearing-framing-list')
          .getByText(/King studs/i)
          .waitFor();
        await page.getByTestId('caution-note').waitFor();
        await shot(page, `${name}-screen-nonbearing`);
        await page.getByTestId('nonbearing-framing-list').scrollIntoViewIfNeeded();
        await shot(page, `${name}-screen-nonbearing-framing`);
      } finally {
        await close();
      }
    });

    it('screens a wall whose ceiling joists tie the rafters to engineer required, with that reason', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Bungalow');
        await screenWall(page, 'Living / dining', 'yes');
        await page.getByTestId('screen-outcome').getByText('Engineer required', { exact: true }).waitFor();
        await page
          .getByTestId('screen-reasons')
          .getByText(/Roof thrust/)
          .first()
          .waitFor();
        await page
          .getByTestId('engineer-next')
          .getByText(/cutting those joists/)
          .waitFor();
        await shot(page, `${name}-screen-engineer`);
        await page.getByTestId('screen-reasons').scrollIntoViewIfNeeded();
        await shot(page, `${name}-screen-engineer-reasons`);
        const screenUrl = page.url();
        // The outcome opens a design request holding the reasons, each with its basis and source.
        await page.getByTestId('screen-new-request').click();
        await page.getByTestId('compose-from-screen').waitFor();
        const note = page.getByTestId('compose-conditions.bearingPoints');
        await expect
          .poll(() => note.inputValue())
          .toMatch(/^Bearing screen of the wall "Living \/ dining" \(version 1\): engineer required\./);
        expect(await note.inputValue()).toMatch(/• Roof thrust: .*\(seen; IRC 2021 R802\.5\.2/);
        await note.scrollIntoViewIfNeeded();
        await shot(page, `${name}-screen-engineer-request`);
        await page.getByTestId('compose-save').click();
        await expect.poll(() => page.getByTestId('request-status').innerText()).toBe('Draft');
        const requestId = page.url().split('/requests/')[1].split(/[/?]/)[0];
        const draft = await page.request.get(`${baseUrl}/api/requests/${requestId}`);
        expect((await draft.json()).draft.conditions.bearingPoints).toMatch(/Roof thrust/);
        await page.goto(screenUrl);
        await page.getByTestId('screen-outcome').waitFor();
        await page.getByText('Back to the job').click();
        await page
          .getByTestId('job-engineer-needed')
          .getByText(/Living \/ dining/)
          .first()
          .waitFor();
      } finally {
        await close();
      }
    });

    it('plans shoring for a beam and shows the standing-surface warning', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        const jobId = await openJob(page, 'Split-level');
        // Invented demo beam: 10 ft under 11 ft of floor (HUD RSDG 12 psf dead, ASCE 7 40 psf live).
        const res = await page.request.post(`${baseUrl}/api/jobs/${jobId}/members`, {
          data: {
            label: `Family room beam ${name}`,
            input: {
              kind: 'beam',
              edition: 'ASCE 7-22',
              clearSpanFt: 10,
              sources: [{ kind: 'floor', tributaryFt: 11, deadPsf: 12, livePsf: 40 }],
              materialId: 'lvl-2.0e',
              sizeId: '2-ply-1.75x11.875',
            },
          },
        });
        expect(res.status()).toBe(201);
        await page.reload();
        await page.getByRole('link', { name: `Plan shoring: Family room beam ${name}` }).click();
        await page.getByTestId('shoring-span-a').fill('12');
        await page.getByTestId('shoring-span-b').fill('10');
        // The plan is computed on the device as it is typed, before any save.
        await page
          .getByTestId('shoring-status')
          .getByText(/Computed on this device as you type/)
          .waitFor();
        await page.getByTestId('shoring-takeoff-A').waitFor();
        await page.getByTestId('shoring-stands-on-floor-framing-parallel').click();
        await page
          .getByTestId('standing-A')
          .getByText(/plate along the joists/)
          .waitFor();
        await page.getByTestId('shoring-result').getByText('Plan does not hold').waitFor();
        await page.getByTestId('shoring-status').scrollIntoViewIfNeeded();
        await shot(page, `${name}-shoring-live`);
        await page.getByTestId('shoring-setback').fill('-1');
        await page
          .getByText(/The setback must be above 0/)
          .first()
          .waitFor();
        await page
          .getByTestId('shoring-status')
          .getByText(/Fix the fields marked above/)
          .waitFor();
        await page.getByTestId('shoring-setback').fill('2');
        await page.getByTestId('shoring-save').click();
        await page
          .getByTestId('shoring-status')
          .getByText(/The plan shown is the server’s/)
          .waitFor();
        expect(await page.getByTestId('shoring-differs').count()).toBe(0);
        await page
          .getByTestId('standing-A')
          .getByText(/plate along the joists/)
          .waitFor();
        await page.getByTestId('shoring-result').getByText('Plan does not hold').waitFor();
        await page.getByTestId('standing-A').scrollIntoViewIfNeeded();
        await shot(page, `${name}-shoring-not-acceptable`);
        await page.getByTestId('shoring-stands-on-floor-framing-perpendicular').click();
        await page.getByTestId('shoring-save').click();
        await page
          .getByTestId('standing-A')
          .getByText(/each joist takes a point load/)
          .waitFor();
        await page.getByTestId('shoring-takeoff-A').waitFor();
        await page
          .getByTestId('shoring-sequence')
          .getByText(/do not jack/)
          .waitFor();
        await page
          .getByTestId('caution-note')
          .getByText(/shoring itself may need/)
          .waitFor();
        // The sketch settles once the saved plan replaces the device's; scroll to it once it holds still.
        const wall = page.getByTestId('shoring-wall-A');
        await expect
          .poll(() =>
            wall.scrollIntoViewIfNeeded({ timeout: 2000 }).then(
              () => true,
              () => false,
            ),
          )
          .toBe(true);
        await shot(page, `${name}-shoring`);
      } finally {
        await close();
      }
    });

    it('keeps the answers in progress on the device and offers them back after a reload', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        await openJob(page, 'Ranch');
        await page.getByTestId('screen-new').click();
        await page.getByTestId('screen-wall-label').fill(`Den / office ${name}`);
        await page.getByTestId('screen-next').click();
        await answer(page, 'exterior', 'no');
        await answer(page, 'above', 'attic');
        await page.getByTestId('question-joistDirection').waitFor();
        const step = await page.getByTestId('screen-step').innerText();
        await page.reload();
        await page.getByTestId('screen-draft-restored').waitFor();
        // Back at the same step, with the earlier answers and the wall's name.
        await page.getByTestId('question-joistDirection').waitFor();
        expect(await page.getByTestId('screen-step').innerText()).toBe(step);
        await shot(page, `${name}-screen-restored`);
        await page.getByTestId('screen-back').click();
        await page.getByTestId('question-above').waitFor();
        expect(await page.getByTestId('answer-above-attic').getAttribute('aria-checked')).toBe('true');
        await page.getByTestId('screen-draft-discard').click();
        await page.getByTestId('screen-wall-label').waitFor();
        expect(await page.getByTestId('screen-wall-label').inputValue()).toBe('');
        expect(await page.getByTestId('screen-draft-restored').count()).toBe(0);
        await page.reload();
        await page.getByTestId('screen-wall-label').waitFor();
        expect(await page.getByTestId('screen-draft-restored').count()).toBe(0);
      } finally {
        await close();
      }
    });

    it('ticks checklist items and shows the progress on the jobs list', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await signInAsContractor(page);
        const jobId = await openJob(page, 'Ranch');
        const checklist = page.getByTestId('job-checklist');
        await checklist.getByText(/Raised: Built in 1957/).waitFor();
        // Two quick taps, the second before the first is answered: both must reach the server.
        await page.getByTestId('checklist-permit-state-done').click();
        await page.getByTestId('checklist-utilities-gas-state-not-needed').click();
        await page
          .getByTestId('checklist-progress')
          .getByText(/Checklist 2 of 12 settled/)
          .waitFor();
        await page
          .getByTestId('checklist-permit')
          .getByText(/Set by/)
          .waitFor();
        const onServer = async () => {
          const answer = await page.request.get(`${baseUrl}/api/jobs/${jobId}/checklist`);
          const { items } = (await answer.json()) as { items: { key: string; state: string }[] };
          return Object.fromEntries(items.map((i) => [i.key, i.state]));
        };
        await expect
          .poll(onServer, { timeout: 10_000 })
          .toMatchObject({ permit: 'done', 'utilities-gas': 'not-needed' });
        await shot(page, `${name}-checklist`);
        await page.getByText('All jobs').click();
        await page
          .getByTestId('job-row')
          .filter({ hasText: 'Ranch' })
          .getByTestId('job-progress')
          .getByText(/Checklist 2 of 12 settled/)
          .waitFor();
        await page
          .getByTestId('job-row')
          .filter({ hasText: 'Bungalow' })
          .getByText(/Engineer needed/)
          .waitFor();
        await shot(page, `${name}-jobs-progress`);
      } finally {
        await close();
      }
    });
  });
}
