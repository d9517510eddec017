import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { randomUUID } from 'node:crypto';
import { shot, useSignedInBrowser } from './browser';
import { carbonPositions, chooseTool, clickDrawingArea, openDrawTab } from './drawing';

const baseUrl = inject('baseUrl');
let page: Page;
let recordId = 0;

/** A word only this run's record carries, in its notebook reference. */
const tag = `jrn${randomUUID().slice(0, 6)}`;

const session = useSignedInBrowser('member@example.org');
beforeAll(() => ({ page } = session));

/** Waits for the results of the search now in the address bar and says whether this journey's record is among them. */
async function resultsHoldRecord(): Promise<boolean> {
  const search = new URL(page.url()).search;
  const results = page.locator(`[aria-label="Search results"][aria-busy="false"][data-location="${search}"]`);
  await results.waitFor();
  return (await results.locator(`a[href="/records/${recordId}"]`).count()) > 0;
}

async function searchStructure(mode: 'Substructure' | 'Similar structure', smiles: string) {
  await page.goto(`${baseUrl}/search`);
  await page.getByText(mode, { exact: true }).click();
  await page.getByRole('tab', { name: 'Paste or file' }).click();
  await page.getByLabel('SMILES or molfile').fill(smiles);
  await page.getByText('Accepted').first().waitFor({ timeout: 20_000 });
  await page.getByRole('button', { name: 'Search', exact: true }).click();
  await page.waitForURL(mode === 'Substructure' ? /mode=substructure/ : /mode=similar/);
}

describe('a member contributes a drawn structure, finds it three ways, and bookmarks it', () => {
  it('draws piperidine in the editor (cyclohexane ring, one atom made N); the server reads the drawing; the record is saved', async () => {
    await page.goto(`${baseUrl}/contribute`);
    await openDrawTab(page);
    await chooseTool(page, 'cyclohexane');
    await clickDrawingArea(page);
    const ring = await carbonPositions(page);
    expect(ring).toHaveLength(6);
    const top = ring.reduce((best, atom) => (atom.y < best.y ? atom : best));
    await chooseTool(page, 'N');
    await page.mouse.click(top.x, top.y);
    // The server's parse of the drawing (POST /api/structures/parse): depiction, formula and class.
    await page.getByRole('img', { name: 'Depiction of C1CCNCC1' }).waitFor({ timeout: 20_000 });
    await page.getByText('C5H11N').first().waitFor();
    await shot(page, 'journey-drawn-structure');

    await page.getByLabel('Compound name').fill('piperidine');
    await page.getByLabel('Spot 1 Rf').fill('0.18');
    await page.getByRole('button', { name: 'KMnO4' }).click();
    await page.getByLabel('Notebook reference').fill(`${tag} p. 3`);
    await page.getByRole('button', { name: 'Save record' }).click();
    await page.waitForURL(/\/records\/\d+$/, { timeout: 30_000 });
    recordId = Number(new URL(page.url()).pathname.split('/').pop());
    await page.getByRole('heading', { level: 1, name: 'piperidine' }).waitFor();
    await shot(page, 'journey-drawn-record-page');
  });

  it('finds the record by text: the word of its notebook reference', async () => {
    await page.goto(`${baseUrl}/search`);
    await page.getByLabel('Name, note, notebook reference or class').fill(tag);
    await page.getByRole('button', { name: 'Search', exact: true }).click();
    await page.waitForURL(new RegExp(`q=${tag}`));
    expect(await resultsHoldRecord()).toBe(true);
    await shot(page, 'journey-found-by-text');
  });

  it('finds the record by substructure: piperidine as the query holds it, alongside the demo’s 1-benzylpiperidine', async () => {
    await searchStructure('Substructure', 'C1CCNCC1');
    expect(await resultsHoldRecord()).toBe(true);
    await expect(page.getByRole('link', { name: '1-benzylpiperidine' }).count()).resolves.toBeGreaterThan(0);
    await shot(page, 'journey-found-by-substructure');
  });

  it('finds the record by similarity: its own structure first, with Tanimoto 1.00', async () => {
    await searchStructure('Similar structure', 'N1CCCCC1');
    expect(await resultsHoldRecord()).toBe(true);
    const first = page.locator('tbody tr').first();
    await expect(first.getByRole('link', { name: 'piperidine', exact: true }).count()).resolves.toBe(1);
    await expect(first.getByText('1.00').count()).resolves.toBe(1);
    await shot(page, 'journey-found-by-similarity');
  });

  it('bookmarks the record from its page, sees it under Bookmarks, and removes the bookmark there', async () => {
    const name = `Bookmark record ${recordId}, piperidine`;
    await page.goto(`${baseUrl}/records/${recordId}`);
    await page.getByRole('button', { name, pressed: false }).click();
    await page.getByRole('button', { name, pressed: true }).waitFor();
    await page.goto(`${baseUrl}/bookmarks`);
    const star = page.getByRole('button', { name, pressed: true });
    await star.waitFor();
    await shot(page, 'journey-bookmarked');
    await star.click();
    await page.getByRole('button', { name, pressed: true }).waitFor({ state: 'detached' });
    await page.reload();
    // The list has loaded when it shows a bookmark (the member may keep others) or says there are none.
    await page
      .getByRole('button', { name: /^Bookmark /, pressed: true })
      .first()
      .or(page.getByText('No bookmarks yet'))
      .first()
      .waitFor();
    await expect(page.getByRole('button', { name, pressed: true }).count()).resolves.toBe(0);
    await shot(page, 'journey-unbookmarked');
  });
});
