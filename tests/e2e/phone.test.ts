import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import sharp from 'sharp';
import { measureLayout, openBrowser, shot, signIn, type OpenBrowser } from './browser';

/**
 * At the bench, on a phone: 390 × 844 CSS px, touch. Every main page must fit the screen (no sideways scroll of
 * the page; a wide table scrolls inside its own box) and every control must be at least 24 × 24 px (WCAG 2.2,
 * SC 2.5.8 target size, minimum). Then a member contributes a record with a camera photo, from the phone.
 */
const baseUrl = inject('baseUrl');

const everyone = [
  '/',
  '/search',
  '/search?q=KMnO4',
  '/records',
  '/records?group=compound',
  '/scout',
  '/tools',
  '/classes',
  '/bookmarks',
  '/account',
  '/cautions',
];
const pagesOf: Record<string, string[]> = {
  viewer: everyone,
  member: [...everyone, '/contribute'],
  curator: [...everyone, '/contribute', '/curation', '/imports'],
  admin: [...everyone, '/contribute', '/curation', '/imports', '/admin/users', '/admin/mailbox'],
};

/** Words of the code, not of the bench: none may reach a rendered page (see issue 27). */
const internalWords = [
  /from-memory/,
  /\(heuristic\)/,
  /\bprep_tlc\b/,
  /\btlc, /,
  /% strong\b/,
  /Isocratic: Isocratic/i,
  /\(isocratic\): Isocratic/i,
  /mergedRecords|mergedIntoId|photoIds/,
  /ΜM/,
  /\bundefined\b/,
  /\bNaN\b/,
  /\[object Object\]/,
];

async function firstHref(browser: OpenBrowser, path: string, pattern: RegExp): Promise<string> {
  await browser.page.goto(`${baseUrl}${path}`);
  for (let tries = 0; tries < 60; tries += 1) {
    const hrefs = await browser.page
      .locator('a[href]')
      .evaluateAll((links) => links.map((link) => link.getAttribute('href') ?? ''));
    const found = hrefs.find((href) => pattern.test(href));
    if (found) return found;
    await browser.page.waitForTimeout(250);
  }
  throw new Error(`no link like ${pattern} on ${path}`);
}

async function check(browser: OpenBrowser, path: string) {
  const { page } = browser;
  await page.goto(`${baseUrl}${path}`);
  await page.waitForLoadState('networkidle');
  await page
    .locator('[role=status]:has-text("Loading")')
    .first()
    .waitFor({ state: 'detached', timeout: 15_000 })
    .catch(() => undefined);
  const layout = await measureLayout(page);
  const text = await page.evaluate(() => document.body.innerText);
  return { path, ...layout, words: internalWords.filter((word) => word.test(text)).map(String) };
}

describe.each(['viewer', 'member', 'curator', 'admin'])('on a phone, as the demo %s', (role) => {
  let browser: OpenBrowser;
  beforeAll(async () => {
    browser = await openBrowser({ phone: true });
    await signIn(browser.page, baseUrl, `${role}@example.org`);
  });
  afterAll(() => browser?.close());

  it('every main page fits 390 px, has no control under 24 px and no internal words', async () => {
    const record = await firstHref(browser, '/records', /^\/records\/\d+$/);
    const compound = await firstHref(browser, record, /^\/compounds\/\d+$/);
    const pages = [...pagesOf[role]!, record, compound, ...(role === 'viewer' ? [] : [`${record}/edit`])];
    const results = [];
    for (const path of pages) results.push(await check(browser, path));
    expect(results).toHaveLength(pages.length);
    const problems = results.flatMap((result) => [
      ...(result.viewportWidth !== 390 ? [`${result.path}: viewport ${result.viewportWidth} px`] : []),
      ...(result.scrollWidth > 390 ? [`${result.path}: ${result.scrollWidth} px wide`] : []),
      ...(result.targets <= 3 ? [`${result.path}: only ${result.targets} controls (did it load?)`] : []),
      ...result.smallTargets.map((target) => `${result.path}: ${target}`),
      ...result.words.map((word) => `${result.path}: says ${word}`),
    ]);
    expect(problems).toEqual([]);
  });
});

describe('contributing from a phone', () => {
  let browser: OpenBrowser;
  beforeAll(async () => {
    browser = await openBrowser({ phone: true });
    await signIn(browser.page, baseUrl, 'member@example.org');
  });
  afterAll(() => browser?.close());

  it('takes the plate photo with the camera, sees it before saving, fills the spot and saves; the record shows the photo', async () => {
    const { page } = browser;
    await page.goto(`${baseUrl}/contribute`);
    await page.getByLabel('SMILES or molfile').fill('OCc1ccc(Cl)cc1');
    await page.getByText('C7H7ClO').first().waitFor({ timeout: 20_000 }); // the server's parse of 4-chlorobenzyl alcohol
    await page.getByLabel('Compound name').fill('4-chlorobenzyl alcohol (phone e2e)');
    await page.getByLabel('Spot 1 Rf').fill('0.28');
    await page.getByRole('button', { name: 'KMnO4' }).tap();

    // The ratio changes after the Rf was typed: the form asks whether the Rf still holds.
    await page.getByLabel('Parts of solvent 2').fill('3');
    const question = page.getByRole('alert').filter({ hasText: 'Do they still hold' });
    await question.waitFor();
    await question.getByRole('button', { name: /^Yes, run in/ }).click();
    await question.waitFor({ state: 'detached' });
    expect(await page.getByLabel('Spot 1 Rf').inputValue()).toBe('0.28');

    const camera = page.locator('input[type=file][capture=environment]');
    expect(await camera.getAttribute('accept')).toBe('image/*');
    const photo = await sharp({ create: { width: 360, height: 800, channels: 3, background: '#ecefe6' } })
      .jpeg()
      .toBuffer();
    await camera.setInputFiles({ name: 'plate-under-uv.jpg', mimeType: 'image/jpeg', buffer: photo });
    const preview = page.getByRole('img', { name: 'Preview of plate-under-uv.jpg' });
    await preview.waitFor();
    expect(await preview.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(360);
    await page.waitForTimeout(200);
    const layout = await measureLayout(page);
    expect(layout.scrollWidth).toBeLessThanOrEqual(390);
    expect(layout.smallTargets).toEqual([]);
    await shot(page, 'phone-contribute');

    await page.getByRole('button', { name: 'Save record' }).tap();
    await page.waitForURL(/\/records\/\d+$/, { timeout: 30_000 });
    await page.getByRole('heading', { level: 1, name: '4-chlorobenzyl alcohol (phone e2e)' }).waitFor();
    const saved = page.getByRole('img', { name: /Plate photo \d+, 360 × 800 px/ });
    await saved.waitFor({ state: 'attached' });
    await saved.scrollIntoViewIfNeeded();
    await saved.waitFor();
    await page
      .getByText('hexanes : EtOAc 3 : 1', { exact: false })
      .first()
      .waitFor()
      .catch(() => undefined);
    expect((await measureLayout(page)).scrollWidth).toBeLessThanOrEqual(390);
    await shot(page, 'phone-record');

    await page.getByRole('link', { name: '4-chlorobenzyl alcohol (phone e2e)' }).first().tap();
    await page.waitForURL(/\/compounds\/\d+$/);
    await page.getByRole('heading', { level: 1, name: '4-chlorobenzyl alcohol (phone e2e)' }).waitFor();
    await page.getByRole('heading', { name: /^Records \(\d+\)$/ }).waitFor();
    await page.waitForLoadState('networkidle');
    expect((await measureLayout(page)).scrollWidth).toBeLessThanOrEqual(390);
    await shot(page, 'phone-compound');

    await page.goto(`${baseUrl}/search?q=KMnO4`);
    await page.waitForLoadState('networkidle');
    await page.getByRole('link', { name: '4-chlorobenzyl alcohol (phone e2e)' }).first().waitFor();
    expect((await measureLayout(page)).scrollWidth).toBeLessThanOrEqual(390);
    await shot(page, 'phone-search');
  });
});
