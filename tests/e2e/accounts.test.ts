import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { randomUUID } from 'node:crypto';
import { openBrowser, shot, signIn } from './browser';

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;

const invitee = {
  email: `e2e-${randomUUID().slice(0, 8)}@example.org`,
  name: 'Noor Fraction-Collector',
  password: 'amber lantern over quiet fjords',
};

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
});
afterAll(() => browser?.close());

async function signOut() {
  await page.locator('summary[aria-label="Account"]').click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL((url) => url.pathname === '/sign-in');
}

/** As the demo admin, reads the newest link mailed to `to` under `path` from the local inbox page. */
async function linkFromInbox(to: string, path: string): Promise<string> {
  await signIn(page, baseUrl, 'admin@example.org');
  await page.goto(`${baseUrl}/admin/mailbox`);
  const link = page.locator(`a[data-mail-to="${to}"][href*="${path}"]`).first();
  await link.waitFor();
  const href = (await link.getAttribute('href'))!;
  await shot(page, `accounts-inbox-${path.replaceAll('/', '')}`);
  await signOut();
  return href;
}

describe('accounts in the browser', () => {
  it.each(['admin', 'curator', 'member', 'viewer'])(
    'the demo %s signs in and the account menu shows that role',
    async (role) => {
      await signIn(page, baseUrl, `${role}@example.org`);
      await expect(page.locator('summary[aria-label="Account"]').textContent()).resolves.toContain(role);
      await shot(page, `accounts-demo-${role}`);
      await signOut();
    },
  );

  it('an admin invites a new member; the invitee follows the mailed link, sets name and password, and signs in', async () => {
    await signIn(page, baseUrl, 'admin@example.org');
    await page.goto(`${baseUrl}/admin/users`);
    await page.getByLabel('E-mail').fill(invitee.email);
    await page.getByLabel('Role', { exact: true }).selectOption('member');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${invitee.email}`).waitFor();
    await page.getByRole('cell', { name: invitee.email, exact: true }).waitFor();
    await shot(page, 'accounts-admin-invited');
    await signOut();

    const link = await linkFromInbox(invitee.email, '/invitations/');
    expect(link.startsWith(`${baseUrl}/invitations/`)).toBe(true);
    await page.goto(link);
    await page.getByText(`${invitee.email} to join as member`).waitFor();
    await page.getByLabel('Your name').fill(invitee.name);
    await page.getByLabel('Choose a password').fill(invitee.password);
    await shot(page, 'accounts-accept-invitation');
    await page.getByRole('button', { name: 'Join the group' }).click();
    await page.getByRole('heading', { name: `Welcome, ${invitee.name}` }).waitFor();
    await signOut();

    await signIn(page, baseUrl, invitee.email, invitee.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Contribute' }).waitFor();
    await signOut();
  });

  it('a password reset: asked for on the sign-in page, the mailed link sets a new password, the old one stops working', async () => {
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('E-mail').fill(invitee.email);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await page.getByText(/If that address has an account/).waitFor();

    const link = await linkFromInbox(invitee.email, '/password-reset/');
    await page.goto(link);
    const newPassword = 'pipette tips in a blue rack';
    await page.getByLabel('New password').fill(newPassword);
    await page.getByRole('button', { name: 'Set the new password' }).click();
    await page.waitForURL((url) => url.pathname === '/sign-in' && url.search.includes('reset=done'));
    await page.getByText(/Password changed/).waitFor();
    await shot(page, 'accounts-reset-done');

    // The old password is refused on purpose: the browser logs that 401 as a console error.
    browser.allowConsoleError(/api\/auth\/login.*401|401 \(Unauthorized\)/);
    await page.getByLabel('E-mail').fill(invitee.email);
    await page.getByLabel('Password').fill(invitee.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert').textContent()).resolves.toMatch(/Wrong e-mail or password/);

    await signIn(page, baseUrl, invitee.email, newPassword);
    await expect(page.locator('summary[aria-label="Account"]').textContent()).resolves.toContain(invitee.name);
    await signOut();
  });
});
