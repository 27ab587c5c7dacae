// Accounts end to end: register, sign out, ask for a password reset, read the code in the admin's
// e-mail outbox (the local mail fake), set a new password with it and sign in with that.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server';
import { openBrowser, overflowsHorizontally, screenshot, signIn } from './support/browser';

describe('accounts', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('when someone registers and later resets the password, then the code from the e-mail outbox lets them sign in with the new one', async () => {
    const email = `e2e-${Date.now()}@example.test`;
    const person = await openBrowser('phone');
    const admin = await openBrowser('wide');
    try {
      const p = person.page;
      await p.goto(`${server.url}/sign-in`);
      await p.getByRole('link', { name: 'Create an account' }).click();
      await p.getByLabel('Your name').fill('Test Student');
      await p.getByLabel('E-mail').fill(email);
      await p.getByLabel('Password (at least 10 characters)').fill('short');
      await p.getByRole('button', { name: 'Create the account' }).click();
      await p.getByText('password must be at least 10 characters').waitFor();
      expect(await overflowsHorizontally(p)).toBe(false);
      await screenshot(p, 'register-phone');
      await p.getByLabel('Password (at least 10 characters)').fill('first-password-1');
      await p.getByRole('button', { name: 'Create the account' }).click();
      await p.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });

      await p.goto(`${server.url}/account`);
      expect(await p.getByLabel('Signed in as').innerText()).toBe(`${email} · student`);
      await p.getByRole('button', { name: 'Sign out of this device' }).click();
      await p.getByRole('link', { name: 'Lost access? Get a reset code' }).click();
      await p.getByLabel('E-mail of the account').fill(email);
      await p.getByRole('button', { name: 'Send a reset code' }).click();
      await p.getByText(/a message with a reset code is on its way/).waitFor();

      const a = admin.page;
      await signIn(a, server.url, 'admin@demo.tessera.test');
      await a.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await a.goto(`${server.url}/admin`);
      const message = a.getByLabel('E-mail outbox').getByText(/enter this code in the app: /).first();
      await message.waitFor({ timeout: 15_000 });
      const code = (await message.innerText()).match(/enter this code in the app: (\S+)/)![1];

      await p.getByLabel('Reset code', { exact: true }).fill(code);
      await p.getByLabel('New password (at least 10 characters)').fill('second-password-2');
      await p.getByRole('button', { name: 'Set the new password' }).click();
      await p.getByText('Password changed; sign in with it now.').waitFor({ timeout: 10_000 });
      await signIn(p, server.url, email, 'second-password-2');
      await p.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
    } finally {
      await person.close();
      await admin.close();
    }
  });
});
