// Role-gated routes (hidden in the navigation AND refused when typed), and a screenshot of every
// main screen at phone and wide size, none of them wider than the viewport.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startServer, type RunningServer } from './support/server';
import { VIEWPORTS, openBrowser, overflowsHorizontally, screenshot, signIn, type ViewportName } from './support/browser';

async function signedIn(page: Page, url: string, who: string): Promise<void> {
  await signIn(page, url, `${who}@demo.tessera.test`);
  await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
}

/** Every navigation item the signed-in role can see (phone: the bar plus the "More" page). */
async function navLabels(page: Page, url: string, viewport: ViewportName): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main navigation' });
  const labels = await nav.getByRole('link').allInnerTexts();
  if (viewport === 'phone') {
    await page.goto(`${url}/more`);
    await page.getByRole('heading', { name: 'More' }).waitFor();
    await screenshot(page, 'more-phone');
    labels.push(...(await page.getByRole('link', { name: /^Open / }).allInnerTexts()));
  }
  return labels.map((l) => l.replace(/^\W+\s*/, '').trim());
}

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('roles and screens at %s size', (viewport) => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('when a student opens the review screen, then it is refused and the navigation does not offer it', async () => {
    const { page, close } = await openBrowser(viewport);
    try {
      await signedIn(page, server.url, 'student');
      const labels = await navLabels(page, server.url, viewport);
      expect(labels).toContain('Analyse');
      expect(labels).not.toContain('Review');
      expect(labels).not.toContain('Admin');
      await page.goto(`${server.url}/review`);
      await page.getByLabel('Not allowed for your role').waitFor({ timeout: 15_000 });
      expect(await page.getByLabel('Review queue').count()).toBe(0);
      await screenshot(page, `review-refused-student-${viewport}`);
    } finally {
      await close();
    }
  });

  it('when an analyst opens the admin screen, then it is refused and the navigation does not offer it', async () => {
    const { page, close } = await openBrowser(viewport);
    try {
      await signedIn(page, server.url, 'analyst');
      const labels = await navLabels(page, server.url, viewport);
      expect(labels).not.toContain('Admin');
      expect(labels).not.toContain('Review');
      await page.goto(`${server.url}/admin`);
      await page.getByLabel('Not allowed for your role').waitFor({ timeout: 15_000 });
      expect(await page.getByLabel('Accounts').count()).toBe(0);
    } finally {
      await close();
    }
  });

  it('when a curator and an admin go through every main screen, then each renders within the viewport', async () => {
    const { page, close } = await openBrowser(viewport);
    const visit = async (path: string, name: string, ready: (p: Page) => Promise<unknown>) => {
      await page.goto(`${server.url}${path}`);
      await ready(page);
      expect(await overflowsHorizontally(page), `${name} overflows`).toBe(false);
      await screenshot(page, `${name}-${viewport}`);
    };
    try {
      await signedIn(page, server.url, 'curator');
      expect(await navLabels(page, server.url, viewport)).toContain('Review');
      await visit('/library', 'library', (p) => p.getByLabel(/^Entry /).first().waitFor());
      await page.getByLabel('Search the library').fill('maleic');
      await page.getByLabel('Entry maleic acid (qNMR internal standard)').first().click();
      await page.getByLabel(/^Simulated 1H spectrum of maleic acid/).first().waitFor({ timeout: 15_000 });
      expect(await overflowsHorizontally(page)).toBe(false);
      await screenshot(page, `library-entry-${viewport}`);
      await visit('/analyse', 'analyse-form', (p) => p.getByRole('button', { name: 'Run analysis' }).waitFor());
      await visit('/history', 'history-empty', (p) => p.getByText(/No analyses yet/).waitFor());
      await visit('/batch', 'batch', (p) => p.getByRole('button', { name: 'Run the batch' }).waitFor());
      await visit('/submit', 'submit-form', (p) => p.getByRole('button', { name: 'Submit the entry' }).waitFor());
      await visit('/sync', 'sync-status', (p) => p.getByLabel('Pending outbox count').waitFor());
      await visit('/review', 'review-queue', (p) => p.getByLabel('Review queue').waitFor({ timeout: 15_000 }));
      await visit('/account', 'account', (p) => p.getByLabel('Signed in as').waitFor());
      await page.getByRole('button', { name: 'Sign out of this device' }).click();
      await page.getByLabel('E-mail').waitFor();
      await screenshot(page, `sign-in-${viewport}`);

      await signedIn(page, server.url, 'admin');
      await visit('/admin', 'admin', (p) => p.getByText('student@demo.tessera.test').first().waitFor({ timeout: 15_000 }));
      expect(await page.getByLabel('E-mail outbox').count()).toBe(1);
    } finally {
      await close();
    }
  });
});
