import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const viewports = {
  phone: { width: 390, height: 844, deviceScaleFactor: 2, isMobile: true, hasTouch: true },
  wide: { width: 1280, height: 800, deviceScaleFactor: 1, isMobile: false, hasTouch: false },
} as const;
export type ViewportName = keyof typeof viewports;

const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Opens Debian's chromium with a fresh profile at the given viewport. Close with the returned `close`. */
export async function openBrowser(
  name: ViewportName,
): Promise<{ page: Page; context: BrowserContext; close: () => Promise<void> }> {
  const executablePath = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
  const profile = mkdtempSync(join(tmpdir(), 'tributary-chromium-'));
  const { width, height, ...device } = viewports[name];
  const context = await chromium.launchPersistentContext(profile, {
    executablePath,
    headless: true,
    args: FLAGS,
    viewport: { width, height },
    ...device,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    page,
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page screenshot under the git-ignored screenshots/ folder. */
export async function snap(page: Page, name: string): Promise<void> {
  mkdirSync('screenshots', { recursive: true });
  await page.screenshot({ path: join('screenshots', `${name}.png`), fullPage: true });
}
