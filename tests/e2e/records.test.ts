import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { openBrowser, shot, signIn, useSignedInBrowser } from './browser';

const baseUrl = inject('baseUrl');
let page: Page;
let recordPath = '';

/** 4-fluoro-4′-methoxybiphenyl: a real compound the demo does not hold, so the journey starts a new compound. */
const smiles = 'COc1ccc(-c2ccc(F)cc2)cc1';
const compoundName = 'fluoro-methoxy-biphenyl e2e';

const session = useSignedInBrowser('member@example.org');
beforeAll(() => ({ page } = session));

describe('a member records a purification in the browser', () => {
  it('contributes a record with a pasted structure and a plate photo, then lands on the record page showing both', async () => {
    await page.goto(`${baseUrl}/contribute`);
    await page.getByLabel('SMILES or molfile').fill(smiles);
    await page.getByText('C13H11FO').first().waitFor({ timeout: 20_000 }); // the server's parse of the pasted SMILES
    await page.getByLabel('Compound name').fill(compoundName);
    await page.getByLabel('Spot 1 Rf').fill('0.31');
    await page.getByRole('button', { name: 'KMnO4' }).click();
    await page.getByLabel('Notebook reference').fill('E2E-01 p. 7');
    const photo = await sharp({ create: { width: 300, height: 700, channels: 3, background: '#e9eee4' } })
      .png()
      .toBuffer();
    await page
      .locator('input[type=file][accept*="image/png"]')
      .setInputFiles({ name: 'plate.png', mimeType: 'image/png', buffer: photo });
    await shot(page, 'records-contribute-filled');
    await page.getByRole('button', { name: 'Save record' }).click();
    await page.waitForURL(/\/records\/\d+$/, { timeout: 30_000 });
    recordPath = new URL(page.url()).pathname;
    await page.getByRole('heading', { level: 1, name: compoundName }).waitFor();
    await page.getByRole('img', { name: /Plate photo \d+, 300 × 700 px/ }).waitFor();
    await page.getByText('EtOAc : hexanes 1 : 4', { exact: true }).filter({ visible: true }).first().waitFor();
    await shot(page, 'records-record-page');
  });

  it('sees the record on the compound page', async () => {
    await page.getByRole('link', { name: compoundName }).first().click();
    await page.waitForURL(/\/compounds\/\d+$/);
    const recordId = recordPath.split('/').pop();
    await page.getByText(`#${recordId} · C13H11FO`).waitFor();
    await shot(page, 'records-compound-page');
  });

  it('edits the record and sees the change in its history', async () => {
    await page.goto(`${baseUrl}${recordPath}`);
    await page.getByRole('link', { name: 'Edit record' }).click();
    await page.waitForURL(/\/edit$/);
    await page.getByLabel('Outcome').selectOption('partial');
    await page.getByLabel('Reason').fill('Tail of the by-product in the last fractions.');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.waitForURL((url) => url.pathname === recordPath);
    const history = page.getByRole('list', { name: 'Revisions, newest first' });
    await history.getByText('edited').waitFor();
    const text = (await history.textContent()) ?? '';
    expect(text).toMatch(/outcome\s*clean\s*→\s*partial/);
    expect(text).toContain('added a photo');
    expect(text).toContain('created the record');
    await shot(page, 'records-history');
  });

  it('as the viewer, sees the record but no edit link', async () => {
    const viewer = await openBrowser();
    try {
      await signIn(viewer.page, baseUrl, 'viewer@example.org');
      await viewer.page.goto(`${baseUrl}${recordPath}`);
      await viewer.page.getByRole('heading', { level: 1, name: compoundName }).waitFor();
      await expect(viewer.page.getByRole('link', { name: 'Edit record' }).count()).resolves.toBe(0);
    } finally {
      await viewer.close();
    }
  });
});
