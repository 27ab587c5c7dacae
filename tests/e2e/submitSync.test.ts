// Offline-first submission end to end: the analyst submits an entry while the server is down
// (it waits in the device outbox), the server comes back, sync sends it, a curator approves it,
// and the analyst's next sync brings it into the library on the device.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server';
import { openBrowser, overflowsHorizontally, screenshot, signIn } from './support/browser';

// An invented demo entry (not a real compound's data), unique to this test.
const NAME = 'Demo: e2e brookfern ester';

describe('submit offline, sync, approve, sync back', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('when the analyst submits with the server down, then sync sends it, a curator approves it and the analyst finds it in the library', async () => {
    const analyst = await openBrowser('phone');
    const curator = await openBrowser('wide');
    try {
      const a = analyst.page;
      await signIn(a, server.url, 'analyst@demo.tessera.test');
      await a.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await expect.poll(() => a.getByText(/^Last sync: \d/).count(), { timeout: 30_000 }).toBe(1);

      await server.stop();
      await a.getByRole('link', { name: 'Submit' }).click();
      await a.getByLabel('Compound name').fill(NAME);
      await a.getByLabel('Formula (Hill order)').fill('C5H8O2');
      await a.getByLabel('Source (citation or your lab notebook)').fill('Tessera browser test (invented demo entry)');
      const signal = async (n: number, shift: string, mult: string, j: string, nuclei: string) => {
        await a.getByLabel(`Signal ${n} shift (ppm)`).fill(shift);
        await a.getByLabel(`Signal ${n} multiplicity`).fill(mult);
        await a.getByLabel(`Signal ${n} J (Hz)`).fill(j);
        await a.getByLabel(`Signal ${n} nuclei`).fill(nuclei);
      };
      await signal(1, '3.69', 's', '', '3');
      await a.getByRole('button', { name: 'Add a signal' }).click();
      await signal(2, '0.97', 't', '7.4', '3');
      await a.getByRole('button', { name: 'Add a signal' }).click();
      await signal(3, '2.33', 't', '7.4', '2');
      await a.getByRole('button', { name: 'Add a signal' }).click();
      await signal(4, '1.68', 'm', '', '2');
      // Live curation check while typing: 10 protons against a formula with 8 H.
      await expect.poll(() => a.getByText(/\[formula vs nuclei\] signals: 1H signals hold 10 nuclei/).count(), { timeout: 5_000 }).toBe(1);
      await a.getByLabel('Formula (Hill order)').fill('C5H10O2');
      // Reorder: the singlet moves from first to last.
      await a.getByRole('button', { name: 'Move signal 1 down' }).click();
      await a.getByRole('button', { name: 'Move signal 2 down' }).click();
      await a.getByRole('button', { name: 'Move signal 3 down' }).click();
      expect(await a.getByLabel('Signal 4 shift (ppm)').inputValue()).toBe('3.69');
      await expect.poll(() => a.getByText('Curation checks: no problems found').count(), { timeout: 5_000 }).toBe(1);
      expect(await overflowsHorizontally(a)).toBe(false);
      await screenshot(a, 'submit-phone');
      await a.getByRole('button', { name: 'Submit the entry' }).click();
      await a.getByLabel('Submission saved').waitFor({ timeout: 10_000 });

      await a.getByRole('link', { name: 'More' }).click();
      await a.getByRole('link', { name: 'Open Sync' }).click();
      await expect.poll(() => a.getByLabel('Pending outbox count').innerText(), { timeout: 15_000 }).toBe('1 waiting in the outbox');
      await a.getByRole('button', { name: 'Sync now' }).click();
      await expect.poll(() => a.getByText(/offline or the server is down/).count(), { timeout: 15_000 }).toBeGreaterThan(0);
      expect(await a.getByLabel('Pending outbox count').innerText()).toBe('1 waiting in the outbox');
      await screenshot(a, 'sync-offline-phone');

      await server.start();
      await a.getByRole('button', { name: 'Sync now' }).click();
      await expect.poll(() => a.getByLabel('Pending outbox count').innerText(), { timeout: 20_000 }).toBe('0 waiting in the outbox');
      expect(await a.getByLabel(`Status of ${NAME}`).innerText()).toBe('with the curators');

      const c = curator.page;
      await signIn(c, server.url, 'curator@demo.tessera.test');
      await c.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await c.getByRole('link', { name: 'Review' }).click();
      await c.getByRole('button', { name: `Review ${NAME}` }).click();
      await c.getByLabel('Decision: approve').waitFor({ timeout: 15_000 });
      await screenshot(c, 'review-wide');
      await c.getByLabel('Comment to the submitter').fill('Checked against the lab notebook.');
      await c.getByRole('button', { name: 'Record the decision' }).click();
      await expect.poll(() => c.getByLabel('Recorded decision').count(), { timeout: 15_000 }).toBeGreaterThan(0);
      expect(await c.getByLabel('Recorded decision').innerText()).toContain('Decided: approved');

      await a.getByRole('button', { name: 'Sync now' }).click();
      await expect.poll(() => a.getByLabel(`Status of ${NAME}`).innerText(), { timeout: 20_000 }).toMatch(/^approved/);
      await screenshot(a, 'sync-phone');
      await a.getByRole('link', { name: 'Library' }).click();
      await a.getByLabel('Search the library').fill('brookfern');
      await expect.poll(() => a.getByLabel(`Entry ${NAME}`).count(), { timeout: 15_000 }).toBe(1);
    } finally {
      await analyst.close();
      await curator.close();
    }
  });

  it('when the connection drops after the first page of library changes, then the next sync resumes from the stored cursor', async () => {
    const { page, close } = await openBrowser('wide');
    try {
      const pulls: string[] = [];
      page.on('request', (r) => {
        if (r.url().includes('/api/sync/changes')) pulls.push(r.url());
      });
      // Every page after the first fails as if the network went away mid-sync.
      await page.route(/\/api\/sync\/changes\?.*cursor=/, (route) => route.abort('internetdisconnected'));
      await signIn(page, server.url, 'student@demo.tessera.test');
      await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await page.getByRole('link', { name: 'Sync' }).click();
      await expect.poll(() => page.getByText(/offline or the server is down/).count(), { timeout: 20_000 }).toBeGreaterThan(0);
      const first = pulls.find((u) => !u.includes('cursor='));
      expect(first, 'the first pull starts from the beginning').toBeDefined();
      const cursorAfterFirstPage = new URL(pulls.find((u) => u.includes('cursor='))!).searchParams.get('cursor');
      expect(cursorAfterFirstPage).toBeTruthy();

      await page.unroute(/\/api\/sync\/changes\?.*cursor=/);
      pulls.length = 0;
      await page.getByRole('button', { name: 'Sync now' }).click();
      await expect.poll(() => page.getByLabel('Last sync outcome').count(), { timeout: 20_000 }).toBe(1);
      // The round asked from where the broken one stopped, not from the beginning.
      expect(new URL(pulls[0]).searchParams.get('cursor')).toBe(cursorAfterFirstPage);
      expect(await page.getByText(/offline or the server is down/).count()).toBe(0);
    } finally {
      await close();
    }
  });

  it('when a new entry takes an id the library already has, then sync marks it refused and says why', async () => {
    const { page: a, close } = await openBrowser('phone');
    try {
      await signIn(a, server.url, 'analyst@demo.tessera.test');
      await a.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await a.getByRole('link', { name: 'Submit' }).click();
      await a.getByLabel('Compound name').fill('Demo: e2e clashing entry');
      await a.getByLabel('Entry id (optional)').fill('reference:dss:D2O');
      await a.getByLabel('Formula (Hill order)').fill('C2H6O');
      await a.getByLabel('Source (citation or your lab notebook)').fill('Tessera browser test (invented demo entry)');
      await a.getByLabel('Signal 1 shift (ppm)').fill('1.17');
      await a.getByLabel('Signal 1 multiplicity').fill('t');
      await a.getByLabel('Signal 1 J (Hz)').fill('7.0');
      await a.getByLabel('Signal 1 nuclei').fill('3');
      await a.getByRole('button', { name: 'Submit the entry' }).click();
      await a.getByLabel('Submission saved').waitFor({ timeout: 10_000 });
      await a.getByRole('link', { name: 'More' }).click();
      await a.getByRole('link', { name: 'Open Sync' }).click();
      const status = a.getByLabel('Status of Demo: e2e clashing entry');
      await expect.poll(() => status.innerText(), { timeout: 20_000 }).toBe('refused by the server');
      const item = await a.getByLabel('Outbox item Demo: e2e clashing entry').innerText();
      expect(item).toContain('Conflict');
      expect(item).toContain('reference:dss:D2O');
      expect(await a.getByLabel('Pending outbox count').innerText()).toBe('0 waiting in the outbox');
    } finally {
      await close();
    }
  });
});
