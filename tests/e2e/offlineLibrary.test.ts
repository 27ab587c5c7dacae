// The foundation slice end to end: the built server serves the web export; the demo analyst signs
// in; the library arrives from the API, is written to the browser's own SQLite database and read
// back from it; with the server stopped, a reload still shows it. One entry exists only on the
// server (approved through the API before the browser starts), so the app's bundled snapshot
// cannot be what shows it.
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LibraryFileSchema } from '../../shared/libraryEntry';
import { ROOT, startServer, type RunningServer } from './support/server';
import { VIEWPORTS, openBrowser, overflowsHorizontally, screenshot, signIn, type ViewportName } from './support/browser';

function shippedEntryNames(): string[] {
  const dir = path.join(ROOT, 'library-data');
  const names: string[] = [];
  for (const f of fs.readdirSync(dir).filter((f) => f.endsWith('.json'))) {
    const parsed = LibraryFileSchema.safeParse(JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8')));
    if (parsed.success) names.push(...parsed.data.entries.filter((e) => !e.retired).map((e) => e.name));
  }
  return names.sort((a, b) => a.localeCompare(b));
}

async function api<T>(url: string, path: string, body: unknown, token?: string): Promise<T> {
  const res = await fetch(url + path, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Analyst submits, curator approves: the entry is then on the server only. */
async function approveServerOnlyEntry(url: string, name: string): Promise<void> {
  const signIn = (email: string) => api<{ accessToken: string }>(url, '/api/auth/sign-in', { email, password: 'tessera-demo' });
  const analyst = await signIn('analyst@demo.tessera.test');
  const created = await api<{ submission: { id: string; version: number } }>(
    url,
    '/api/submissions',
    {
      kind: 'new',
      entry: {
        id: `e2e.${name.replace(/[^A-Za-z0-9]+/g, '-').toLowerCase()}`,
        name,
        formula: 'C2H6O',
        category: 'user',
        source: 'browser test submission',
        solvent: 'CDCl3',
        mhz: 400,
        // ethanol in CDCl3, Gottlieb et al., J. Org. Chem. 1997, 62, 7512, Table 1
        signals: [
          { nucleus: '1H', shift: 1.25, multiplicity: 't', j: [7], nuclei: 3, label: 'CH3' },
          { nucleus: '1H', shift: 3.72, multiplicity: 'q', j: [7], nuclei: 2, label: 'CH2' },
          { nucleus: '1H', shift: 1.32, multiplicity: 's', nuclei: 1, label: 'OH', exchangeable: true },
        ],
      },
    },
    analyst.accessToken,
  );
  const curator = await signIn('curator@demo.tessera.test');
  await api(url, `/api/review/submissions/${created.submission.id}/decision`, { decision: 'approve', comment: '', version: created.submission.version }, curator.accessToken);
}

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('library offline-first at %s size', (viewport) => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('when the analyst signs in, then the library shows, and still shows after a reload with the server stopped', async () => {
    const shipped = shippedEntryNames();
    expect(shipped.length).toBeGreaterThan(0);
    const first = `E2E server-only compound ${viewport}`;
    await approveServerOnlyEntry(server.url, first);
    const names = [...shipped, first];
    const { page, close } = await openBrowser(viewport);
    try {
      await signIn(page, server.url, 'analyst@demo.tessera.test');
      await expect.poll(async () => page.getByLabel(`Entry ${first}`).count(), { timeout: 30_000 }).toBeGreaterThan(0);
      await expect.poll(() => page.getByText(`${names.length} entries on this device`).count(), { timeout: 30_000 }).toBe(1);
      expect(await overflowsHorizontally(page)).toBe(false);
      await screenshot(page, `library-online-${viewport}`);
      // The service worker tells the page when the shell is kept for offline use.
      await page.waitForSelector('html[data-offline-shell="ready"]', { state: 'attached', timeout: 30_000 });

      await server.stop();
      await page.reload();
      await expect.poll(async () => page.getByLabel(`Entry ${first}`).count(), { timeout: 30_000 }).toBeGreaterThan(0);
      await expect.poll(() => page.getByText(`${names.length} entries on this device`).count(), { timeout: 30_000 }).toBe(1);
      // The pull failed (server down) and the screen says so instead of failing.
      await expect.poll(() => page.getByText(/offline or the server is down/).count(), { timeout: 15_000 }).toBeGreaterThan(0);
      await screenshot(page, `library-offline-${viewport}`);
    } finally {
      await close();
    }
  });
});
