import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { shot, useSignedInBrowser } from './browser';
import { generatePhoto } from '../bench/plates-photo';

const baseUrl = inject('baseUrl');
let page: Page;

/** Phenyl acetate: a small real compound; the plate photo is drawn by the bench generator (invented, KMnO4 look, SM / co-spot / RM). */
const smiles = 'CC(=O)Oc1ccccc1';
const compoundName = 'phenyl acetate plate e2e';

const session = useSignedInBrowser('member@example.org');
beforeAll(() => ({ page } = session));

describe('a member reads a plate photo while contributing', () => {
  it('uploads a generated photo, has the plate read, drags a spot on the overlay, saves, and finds that Rf on the record', async () => {
    const photo = await generatePhoto(3033, 'kmno4');
    await page.setViewportSize({ width: 390, height: 844 }); // a phone at the bench
    await page.goto(`${baseUrl}/contribute`);
    await page.getByLabel('SMILES or molfile').fill(smiles);
    await page.getByText('C8H8O2').first().waitFor({ timeout: 20_000 });
    await page.getByLabel('Compound name').fill(compoundName);
    await page
      .locator('input[type=file][accept*="image/png"]')
      .setInputFiles({ name: 'plate.jpg', mimeType: photo.contentType, buffer: photo.bytes });
    await page.getByRole('button', { name: 'Read the plate from the photo' }).click();
    const overlay = page.getByTestId('plate-overlay');
    const spots = overlay.locator('g[data-rf]');
    await spots.first().waitFor({ timeout: 30_000 });
    const found = await spots.count();
    expect(found).toBeGreaterThanOrEqual(3);
    const panel = (await page.getByRole('region', { name: 'Read the plate from the photo' }).boundingBox())!;
    expect(panel.x + panel.width).toBeLessThanOrEqual(390); // the reader and its overlay fit a 390 px phone

    const last = spots.nth(found - 1);
    const before = Number(await last.getAttribute('data-rf'));
    await last.scrollIntoViewIfNeeded();
    const box = (await last.locator('circle').first().boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2 - 25, { steps: 5 });
    await page.mouse.up();
    const after = Number(await spots.nth(found - 1).getAttribute('data-rf'));
    expect(after).toBeGreaterThan(before + 0.01);
    await page.getByLabel('Selected spot role').selectOption('target');
    await shot(page, 'plates-overlay-corrected');

    await page.getByRole('button', { name: 'Use these Rf values for the spots' }).click();
    const rfInputs = page.locator('input[aria-label$=" Rf"]');
    await expect
      .poll(async () => Promise.all((await rfInputs.all()).map((input) => input.inputValue())))
      .toContain(String(after));
    await page.getByRole('button', { name: 'Save record' }).click();
    await page.waitForURL(/\/records\/\d+$/, { timeout: 30_000 });
    await page.getByRole('heading', { level: 1, name: compoundName }).waitFor();
    await page.getByText(after.toFixed(2)).filter({ visible: true }).first().waitFor();
    await shot(page, 'plates-record-page');
  });
});
