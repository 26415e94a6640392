import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { openBrowser, snap, viewports, type ViewportName } from './browser';

const baseUrl = inject('baseUrl');
const DFL2 = 'sawn-douglas-fir-larch-no2';

/**
 * Invented demo chain, set up through the API as a contractor would have entered it: a 12 ft LVL beam under
 * 12 ft of floor, its left end on jack studs over the foundation wall, and an old 3-ply 2x10 basement girder
 * of unreadable grade spanning 12 ft between foundation walls.
 */
async function setUp(page: Page, name: ViewportName) {
  const api = async (method: 'post' | 'put', path: string, data: unknown) => {
    const res = await page.request[method](`${baseUrl}${path}`, { data, headers: { Origin: baseUrl } });
    expect(res.status(), `${method} ${path}: ${await res.text()}`).toBeLessThan(300);
    return res.json();
  };
  const job = await api('post', '/api/jobs', { name: `Load path bungalow (${name})` });
  const beam = await api('post', `/api/jobs/${job.id}/members`, {
    label: 'Kitchen beam',
    input: {
      kind: 'beam',
      edition: 'ASCE 7-22',
      clearSpanFt: 12,
      sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
      materialId: 'lvl-2.0e',
      sizeId: '3-ply-1.75x11.875',
    },
  });
  const wall = await api('post', `/api/jobs/${job.id}/elements`, {
    label: 'Foundation wall',
    element: { kind: 'foundation-wall', confirmed: true },
  });
  const girder = await api('post', `/api/jobs/${job.id}/elements`, {
    label: 'Basement girder',
    element: {
      kind: 'girder',
      input: {
        kind: 'beam',
        edition: 'ASCE 7-22',
        clearSpanFt: 12,
        bearingLeftIn: 4,
        bearingRightIn: 4,
        sources: [{ kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 }],
        materialId: DFL2,
        sizeId: '3-ply-2x10',
        gradeUnknown: true,
      },
    },
  });
  for (const end of ['left', 'right'])
    await api('put', `/api/elements/${girder.id}/ends/${end}`, { ontoId: wall.id });
  const jacks = await api('put', `/api/members/${beam.id}/ends/left`, {
    onto: {
      label: 'Jack studs',
      element: {
        kind: 'wall',
        studMaterialId: 'sawn-spruce-pine-fir-no1-no2',
        studSizeId: '2x4',
        jackStuds: 2,
        heightFt: 8,
      },
    },
  });
  await api('put', `/api/elements/${jacks.created.id}/ends/bottom`, { ontoId: wall.id });
  return { jobId: job.id as string, beamId: beam.id as string };
}

/** The section drawing scrolled to the top of the screen, and the screen taken (the drawing sits in a scroll view). */
async function drawingInView(page: Page, shot: string) {
  await page.getByTestId('load-path-drawing').evaluate((el) => el.scrollIntoView({ block: 'start' }));
  await page.screenshot({ path: `screenshots/load-path/${shot}.png` });
}

for (const name of Object.keys(viewports) as ViewportName[]) {
  describe(`load path to the ground (${name})`, () => {
    it('a beam on a post on a girder mid-span: the girder fails, the beam is open; a post and pad close it', async () => {
      const { page, close } = await openBrowser(name);
      try {
        await page.goto(`${baseUrl}/sign-in`);
        await page.getByTestId('sign-in-email').fill('contractor@demo.tributary.test');
        await page.getByTestId('sign-in-password').fill('tributary-demo');
        await page.getByTestId('sign-in-submit').click();
        await page
          .getByTestId('nav-jobs')
          .or(page.getByRole('link', { name: /Ranch/ }))
          .first()
          .waitFor();
        const { jobId, beamId } = await setUp(page, name);

        // The job page never says "passes" of a beam with an open load path.
        await page.goto(`${baseUrl}/jobs/${jobId}`);
        const row = page.getByTestId('member-row').filter({ hasText: 'Kitchen beam' });
        await row.getByText(/Load path open/).waitFor();

        await page.goto(`${baseUrl}/jobs/${jobId}/load-path/${beamId}`);
        const beamCard = page.getByTestId('chain-Kitchen beam');
        await beamCard.getByTestId('end-right-bears-on-post').click();
        await beamCard.getByTestId('end-right-new-heightFt').fill('8');
        await beamCard.getByTestId('end-right-save').click();

        const postCard = page.getByTestId('chain-Post under Kitchen beam');
        await postCard.getByTestId('end-bottom-bears-on-beam').click();
        await postCard.getByTestId('end-bottom-at').fill('6');
        await postCard.getByTestId('end-bottom-through-squash-blocks').click();
        await postCard.getByTestId('end-bottom-save').click();

        const girderCard = page.getByTestId('chain-Basement girder');
        await girderCard.getByTestId('chain-state').getByText('Fails under the load').waitFor();
        await beamCard.getByTestId('chain-state').getByText('Load path open').waitFor();
        await page
          .getByTestId('load-path-state')
          .getByText(/Post under Kitchen beam/)
          .waitFor();
        await page
          .getByTestId('load-path-drawing-text')
          .getByText(/Basement girder/)
          .first()
          .waitFor();
        await snap(page, `load-path/${name}-girder-fails`);
        await drawingInView(page, `${name}-drawing-fails`);

        await page.goto(`${baseUrl}/jobs/${jobId}`);
        await row.getByText(/Load path open/).waitFor();

        // The fix: a new post under the girder (now two spans over it) on a new pad.
        await page.goto(`${baseUrl}/jobs/${jobId}/framing`);
        const girder = page.getByTestId('element-Basement girder');
        await girder.getByTestId('edit-element-Basement girder').click();
        await girder.getByTestId('edit-element-spanFt').fill('5.75');
        await girder.getByTestId('edit-element-secondSpanFt').fill('5.95');
        await girder.getByTestId('edit-element-centreBearingIn').fill('5.5');
        await girder.getByTestId('edit-element-save').click();
        await girder.getByTestId('end-centre-bears-on-post').click();
        await girder.getByTestId('end-centre-save').click();

        const newPost = page.getByTestId('element-Post under Basement girder');
        await newPost.getByTestId('end-bottom-bears-on-footing').click();
        await newPost.getByTestId('end-bottom-new-confirmed-yes').click();
        await newPost.getByTestId('end-bottom-save').click();
        await page
          .getByTestId('element-Footing under Post under Basement girder')
          .getByText(/Passes/)
          .waitFor();
        await snap(page, `load-path/${name}-framing`);

        await page.goto(`${baseUrl}/jobs/${jobId}/load-path/${beamId}`);
        await page.getByTestId('load-path-state').getByText('Load path closed').waitFor();
        await girderCard
          .getByTestId('chain-state')
          .getByText(/Passes/)
          .waitFor();
        await expect
          .poll(() => page.getByTestId('load-path-drawing-text').textContent())
          .toContain('New pad');
        await snap(page, `load-path/${name}-closed`);
        await drawingInView(page, `${name}-drawing-closed`);

        await page.goto(`${baseUrl}/jobs/${jobId}`);
        await row.getByText(/engineer needed/).waitFor();
        await snap(page, `load-path/${name}-job`);
      } finally {
        await close();
      }
    });
  });
}
