import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, shot, signIn } from './browser';

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
});
afterAll(() => browser?.close());

describe('the built app in chromium', () => {
  it('loads the home page with the wordmark and fonts shipped in the bundle', async () => {
    const failed: string[] = [];
    page.on('requestfailed', (r) => failed.push(r.url()));
    await page.goto(baseUrl);
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toMatch(/purification memory/i);
    await shot(page, 'shell-home-anonymous');
    const external = failed.filter((u) => !u.startsWith(baseUrl));
    expect(external).toEqual([]);
  });

  it('signs in as the demo member and shows the member navigation', async () => {
    await signIn(page, baseUrl, 'member@example.org');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Contribute' }).waitFor();
    await expect(nav.textContent()).resolves.not.toContain('Curation');
    await shot(page, 'shell-home-member');
  });

  it('shows the 404 page for an unknown address', async () => {
    await page.goto(`${baseUrl}/no/such/page`);
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toMatch(/nothing moved/i);
  });
});
