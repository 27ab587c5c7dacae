import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { ROOT } from './server';

export const ARTIFACTS = path.join(ROOT, 'test-artifacts', 'screenshots');

export const VIEWPORTS = {
  phone: { width: 390, height: 844 },
  wide: { width: 1280, height: 800 },
} as const;
export type ViewportName = keyof typeof VIEWPORTS;

/**
 * Debian's Chromium, headless, with a fresh profile. A persistent context (not incognito) so the
 * origin-private file system and the service worker behave as for a real user.
 */
export async function openBrowser(viewport: ViewportName): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  const userDataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-chromium-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    viewport: VIEWPORTS[viewport],
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      fs.rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}

/**
 * Saves a PNG of the page. React Native Web scrolls inside its own views, so "full page" alone
 * shows one screenful: the viewport is stretched to the tallest scrolled content for the shot
 * (at most 5000 px) and put back afterwards.
 */
export async function screenshot(page: Page, name: string): Promise<void> {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  const size = page.viewportSize();
  const tallest = await page.evaluate(() => {
    let extra = 0;
    for (const el of Array.from(document.querySelectorAll<HTMLElement>('*'))) {
      const style = getComputedStyle(el);
      if (!/(auto|scroll)/.test(style.overflowY)) continue;
      extra = Math.max(extra, el.scrollHeight - el.clientHeight);
    }
    return extra;
  });
  if (size && tallest > 0) {
    await page.setViewportSize({ width: size.width, height: Math.min(5000, size.height + tallest) });
    await page.waitForTimeout(250);
  }
  try {
    await page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true });
  } finally {
    if (size && tallest > 0) await page.setViewportSize(size);
  }
}

/** True when the page is wider than its viewport (something overflows horizontally). */
export async function overflowsHorizontally(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);
}

export async function signIn(page: Page, baseUrl: string, email: string, password = 'tessera-demo'): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
