import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { drawPyridine as drawPyridineIn } from './drawing';
import { shot, signIn, useSignedInBrowser, type OpenBrowser } from './browser';

const baseUrl = inject('baseUrl');
let browser: OpenBrowser;
let page: Page;

const session = useSignedInBrowser('member@example.org');
beforeAll(() => ({ browser, page } = session));

/** Names of the compounds in the results table, in order, once the answer to the address now in the URL bar is on screen. */
async function resultNames(target: Page = page): Promise<string[]> {
  const search = new URL(target.url()).search;
  await target.locator(`[aria-label="Search results"][aria-busy="false"][data-location="${search}"]`).waitFor();
  return target.locator('tbody tr td:nth-child(3) a').allTextContents();
}

async function pasteStructure(text: string) {
  await page.getByRole('tab', { name: 'Paste or file' }).click();
  await page.getByLabel('SMILES or molfile').fill(text);
  await page.getByText('Accepted').first().waitFor({ timeout: 20_000 });
}

const drawPyridine = () => drawPyridineIn(page);

describe('a member searches the demo group’s records', () => {
  it('finds records by part of a compound name', async () => {
    await page.goto(`${baseUrl}/search`);
    await page.getByLabel('Name, note, notebook reference or class').fill('cinnam');
    await page.getByRole('button', { name: 'Search', exact: true }).click();
    await page.waitForURL(/q=cinnam/);
    await page.getByRole('link', { name: 'cinnamyl alcohol' }).first().waitFor();
    const names = await resultNames();
    expect(names.length).toBeGreaterThan(0);
    expect(names.every((name) => /cinnam/i.test(name))).toBe(true);
    await shot(page, 'search-text');
  });

  it(
    'finds records by a substructure drawn in the editor (a benzene ring with one atom made N): ' +
      'pyridines, not plain benzenes',
    async () => {
      await page.goto(`${baseUrl}/search`);
      await page.getByText('Substructure', { exact: true }).click();
      await drawPyridine();
      await page.getByText('Pyridine-like nitrogen').first().waitFor({ timeout: 20_000 }); // the server read the drawing
      await shot(page, 'search-drawn-pyridine');
      await page.getByRole('button', { name: 'Search', exact: true }).click();
      await page.waitForURL(/mode=substructure/);
      const names = await resultNames();
      expect(names).toContain('quinoline');
      expect(names).toContain('2-bromopyridine');
      expect(names).not.toContain('benzyl alcohol');
      expect(names).not.toContain('toluene');
      await shot(page, 'search-substructure');
    },
  );

  it('finds records by similarity, the closest first with its Tanimoto score, and shows them as a grid of depictions', async () => {
    await page.goto(`${baseUrl}/search`);
    await page.getByText('Similar structure', { exact: true }).click();
    await pasteStructure('OCc1ccccc1');
    await page.getByRole('button', { name: 'Search', exact: true }).click();
    await page.waitForURL(/mode=similar/);
    expect((await resultNames())[0]).toBe('benzyl alcohol');
    expect(await page.locator('tbody tr').first().getByText('1.00').count()).toBe(1);
    await page.getByRole('button', { name: 'Grid of compounds' }).click();
    await page.getByRole('list', { name: 'Compounds found' }).waitFor();
    await page.getByRole('img', { name: 'Structure of benzyl alcohol' }).waitFor();
    await shot(page, 'search-similar-grid');
  });

  it('reproduces the same results from a copied link', async () => {
    await page.goto(`${baseUrl}/search`);
    await page.getByLabel('Name, note, notebook reference or class').fill('benzyl');
    await page.getByRole('button', { name: 'Search', exact: true }).click();
    await page.waitForURL(/q=benzyl/);
    await page.getByLabel('Outcome').selectOption('clean');
    await page.waitForURL(/outcome=clean/);
    const expected = await resultNames();
    const link = page.url();
    const other = await browser.context.newPage();
    await other.goto(link);
    expect(await resultNames(other)).toEqual(expected);
    expect(await other.getByLabel('Outcome').inputValue()).toBe('clean');
    await other.close();
  });
});

describe('bookmarks and class pages', () => {
  it('keeps a bookmark across signing out and in again', async () => {
    await page.goto(`${baseUrl}/search?q=acetophenone`);
    expect(await resultNames()).toContain('acetophenone');
    const star = page.getByRole('button', { name: /^Bookmark record \d+, acetophenone$/ }).first();
    const label = (await star.getAttribute('aria-label')) as string;
    await star.click();
    await page.getByRole('button', { name: label, pressed: true }).waitFor();
    await page.getByLabel('Account').click();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL((url) => url.pathname === '/' || url.pathname.startsWith('/sign-in'));
    await signIn(page, baseUrl, 'member@example.org');
    await page.goto(`${baseUrl}/bookmarks`);
    await page.getByRole('button', { name: label, pressed: true }).waitFor();
    await shot(page, 'bookmarks-page');
  });

  it('shows a class page with charts from the demo data', async () => {
    await page.goto(`${baseUrl}/classes`);
    await page.getByRole('link', { name: 'Ester', exact: true }).click();
    await page.waitForURL(/\/classes\/ester$/);
    const histogram = page.getByRole('img', { name: /^Eluent strength used for Ester\./ });
    await histogram.waitFor();
    expect(await histogram.locator('[data-part="bar"]').count()).toBeGreaterThan(0);
    expect(
      await page
        .getByRole('img', { name: /^Target Rf against eluent composition/ })
        .locator('[data-part="point"]')
        .count(),
    ).toBeGreaterThan(0);
    await shot(page, 'class-ester');
  });
});
