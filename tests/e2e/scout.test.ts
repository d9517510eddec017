import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { shot, useSignedInBrowser } from './browser';
import { drawPyridine } from './drawing';

const baseUrl = inject('baseUrl');
let page: Page;

const session = useSignedInBrowser('member@example.org');
beforeAll(() => ({ page } = session));

describe('Scout in the browser', () => {
  it(
    'when the demo member pastes a molecule and asks Scout, then a first plate with its evidence ' +
      'appears, and the column plan follows it',
    async () => {
      await page.goto(`${baseUrl}/scout`);
      await page.getByRole('heading', { level: 1, name: 'Scout' }).waitFor();
      await page.getByLabel('SMILES or molfile').fill('COC(=O)c1ccc(O)cc1');
      await page.getByText('C8H8O3').first().waitFor({ timeout: 20_000 }); // the server's parse of the pasted SMILES
      await page.getByRole('button', { name: 'Scout conditions' }).click();
      const heading = page.locator('#scout-suggestion');
      await heading.waitFor({ timeout: 30_000 });
      // A ratio as parts and as % of the strong solvent (LOOK.md), e.g. "EtOAc : hexanes 1 : 4 (20 % EtOAc)", then any
      // additive ("+ 1% Et3N").
      expect(await heading.textContent()).toMatch(
        /^\S+ : \S+ [\d.]+ : [\d.]+ \([\d.]+ % \S+\)( \+ [\d.]+% \S+)*$|^100 % /,
      );
      await expect(page.getByTestId('scout-confidence').textContent()).resolves.toMatch(
        /Confidence: (high|medium|low)/,
      );
      const card = (title: string) =>
        page
          .locator('section')
          .filter({ has: page.getByRole('heading', { name: title, exact: true }) })
          .last();
      const evidence = card('Why these numbers');
      await expect(evidence.textContent()).resolves.toMatch(/predicted Rf/);
      await expect(evidence.textContent()).resolves.toMatch(/Snyder/);
      const neighbours = page
        .locator('section')
        .filter({ has: page.getByRole('heading', { name: /^Nearest recorded neighbours/ }) })
        .last();
      expect(await neighbours.locator('a[href^="/records/"]').count()).toBeGreaterThan(0);
      await shot(page, 'scout-suggestion');

      const predicted = (await page.locator('text=Expected Rf').locator('span.figure').first().textContent())?.trim();
      const plan = card('Column plan for this suggestion');
      await plan.scrollIntoViewIfNeeded();
      await expect(plan.getByLabel('Target Rf').inputValue()).resolves.toBe(predicted);
      await plan.getByLabel('Sample (mg)').fill('400');
      await plan.getByLabel('Nearest other spot Rf').fill('0.6');
      await plan.getByText('Column diameter').waitFor();
      await expect(plan.textContent()).resolves.toMatch(/Still, Kahn & Mitra, J\. Org\. Chem\. 1978/);
      await shot(page, 'scout-column-plan');
    },
  );

  it(
    'when the demo member draws a molecule in the editor and asks Scout, then a first plate for it ' +
      'appears with its predicted Rf, interval and cautions',
    async () => {
      await page.goto(`${baseUrl}/scout`);
      await page.getByRole('heading', { level: 1, name: 'Scout' }).waitFor();
      await drawPyridine(page);
      await page.getByText('C5H5N').first().waitFor({ timeout: 20_000 }); // the server read the drawing as pyridine
      await page.getByRole('button', { name: 'Scout conditions' }).click();
      const heading = page.locator('#scout-suggestion');
      await heading.waitFor({ timeout: 30_000 });
      expect(await heading.textContent()).toMatch(
        /^\S+ : \S+ [\d.]+ : [\d.]+ \([\d.]+ % \S+\)( \+ [\d.]+% \S+)*$|^100 % /,
      );
      const expected = await page.locator('text=Expected Rf').locator('..').textContent();
      expect(expected).toMatch(/0\.\d\d/);
      await expect(page.getByTestId('scout-confidence').textContent()).resolves.toMatch(
        /Confidence: (high|medium|low)/,
      );
      await expect(page.locator('body').textContent()).resolves.toMatch(/safety data sheet/i);
      await shot(page, 'scout-drawn-pyridine');
    },
  );
});
