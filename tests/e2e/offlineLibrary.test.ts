// The foundation slice end to end: the built server serves the web export; the demo analyst signs
// in; the library arrives from the API, is written to the browser's own SQLite database and read
// back from it; with the server stopped, a reload still shows it.
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

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('library offline-first at %s size', (viewport) => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('when the analyst signs in, then the library shows, and still shows after a reload with the server stopped', async () => {
    const names = shippedEntryNames();
    expect(names.length).toBeGreaterThan(0);
    const first = names[0];
    const { page, close } = await openBrowser(viewport);
    try {
      await signIn(page, server.url, 'analyst@demo.tessera.test');
      await expect.poll(async () => page.getByLabel(`Entry ${first}`).count(), { timeout: 30_000 }).toBeGreaterThan(0);
      await expect.poll(() => page.getByText(`${names.length} entries on this device`).count(), { timeout: 30_000 }).toBe(1);
      expect(await overflowsHorizontally(page)).toBe(false);
      await screenshot(page, `library-online-${viewport}`);

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
