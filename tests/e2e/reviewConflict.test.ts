// Two curators decide on the same submission: the second one is told someone decided first and
// sees that decision (the server answers 409 on the stale version).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server';
import { openBrowser, signIn } from './support/browser';

const NAME = 'Demo: e2e conflict sorrel ester';

async function submitAsAnalyst(url: string): Promise<void> {
  const session = await (
    await fetch(`${url}/api/auth/sign-in`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: 'analyst@demo.tessera.test', password: 'tessera-demo' }) })
  ).json();
  const entry = {
    id: 'user:e2e-conflict-sorrel-ester:CDCl3',
    name: NAME,
    formula: 'C4H8O2',
    category: 'user',
    source: 'Tessera browser test (invented demo entry)',
    solvent: 'CDCl3',
    mhz: 400,
    signals: [
      { nucleus: '1H', shift: 3.58, multiplicity: 's', nuclei: 3 },
      { nucleus: '1H', shift: 2.21, multiplicity: 'q', j: [7.5], nuclei: 2 },
      { nucleus: '1H', shift: 1.04, multiplicity: 't', j: [7.5], nuclei: 3 },
    ],
  };
  const res = await fetch(`${url}/api/submissions`, { method: 'POST', headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${session.accessToken}` }, body: JSON.stringify({ entry }) });
  expect(res.status).toBe(201);
}

describe('review conflict', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('when two curators decide on one submission, then the second is told and shown the first decision', async () => {
    await submitAsAnalyst(server.url);
    const one = await openBrowser('wide');
    const two = await openBrowser('phone');
    try {
      for (const p of [one.page, two.page]) {
        await signIn(p, server.url, 'curator@demo.tessera.test');
        await p.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
        await p.goto(`${server.url}/review`);
        await p.getByRole('button', { name: `Review ${NAME}` }).click();
        await p.getByLabel('Decision: approve').waitFor({ timeout: 15_000 });
      }
      await one.page.getByRole('button', { name: 'Record the decision' }).click();
      await one.page.getByLabel('Recorded decision').waitFor({ timeout: 15_000 });

      const b = two.page;
      await b.getByLabel('Decision: reject').click();
      await b.getByRole('button', { name: 'Record the decision' }).click();
      await b.getByText('Comment: a comment is required to reject.').waitFor();
      await b.getByLabel('Comment to the submitter').fill('Duplicate of an existing entry.');
      await b.getByRole('button', { name: 'Record the decision' }).click();
      await b.getByText(/Another curator decided on this submission first/).waitFor({ timeout: 15_000 });
      await expect.poll(() => b.getByLabel('Recorded decision').count(), { timeout: 15_000 }).toBe(1);
      expect(await b.getByLabel('Recorded decision').innerText()).toContain('Decided: approved');
    } finally {
      await one.close();
      await two.close();
    }
  });
});
