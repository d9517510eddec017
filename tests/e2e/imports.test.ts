import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import { shot, useSignedInBrowser } from './browser';

const baseUrl = inject('baseUrl');
let page: Page;
const tag = randomUUID().slice(0, 8);

/** A spreadsheet as a group keeps it: semicolons, decimal commas, a BOM, a blank line, odd header case, and bad rows. */
const messy = [
  '\uFEFFCompound;SMILES;Solvent system;RF;Visualization;Notebook',
  `4-nitrobenzyl alcohol;OCc1ccc(cc1)[N+](=O)[O-];EtOAc/hexanes 1:2;0,31;UV;${tag}-1`,
  '',
  `2-naphthol;Oc1ccc2ccccc2c1;hexane:EtOAc, 4:1;0,42;UV, KMnO4;${tag}-2`,
  `bad ring;c1ccccc;EtOAc/hexanes 1:4;0,5;UV;${tag}-3`,
  `indole;c1ccc2[nH]ccc2c1;20% EtOAc in hexanes;1,4;UV;${tag}-4`,
  `benzophenone;O=C(c1ccccc1)c1ccccc1;EtOAc/hexxanes 1:9;0,55;UV;${tag}-5`,
  `tryptamine;NCCc1c[nH]c2ccccc12;DCM/MeOH 9:1 + 1% Et3N;0,2;ninhydrin;${tag}-6`,
].join('\r\n');

/** What the curator types into the downloaded sheet, by compound name: [column, corrected cell]. */
const corrections: Record<string, [string, string]> = {
  'bad ring': ['SMILES', 'c1ccccc1O'],
  indole: ['RF', '0,4'],
  benzophenone: ['Solvent system', 'EtOAc/hexanes 1:9'],
};

const session = useSignedInBrowser('curator@example.org');
beforeAll(() => ({ page } = session));

async function chooseFile(name: string, content: string) {
  await page
    .locator('input[type=file]')
    .setInputFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(content, 'utf8') });
  await page.getByTestId('preview-counts').waitFor();
}

describe('importing a messy spreadsheet in the browser', () => {
  let importId = 0;

  it('the demo curator uploads it and sees, before committing, which rows would fail and why', async () => {
    await page.goto(`${baseUrl}/imports`);
    await page.getByRole('heading', { name: 'Import', exact: true }).waitFor();
    await chooseFile('group-history.csv', messy);
    await expect(page.getByTestId('preview-counts').textContent()).resolves.toBe(
      '3 would be added · 3 rejected · 0 duplicates',
    );
    await expect(page.getByLabel('Field for column "Solvent system"').inputValue()).resolves.toBe('eluent');
    const rejected = page.locator('tr[data-result=rejected]');
    await expect(rejected.count()).resolves.toBe(3);
    await expect(rejected.nth(1).textContent()).resolves.toContain('1.4 is outside (0, 1]');
    await expect(rejected.nth(2).textContent()).resolves.toContain(
      'Unknown solvent or additive "hexxanes". Did you mean "hexanes"?',
    );
    await shot(page, 'imports-preview');
  });

  it('commits it and sees the counts; the rejected rows are listed with their reasons in the download', async () => {
    await page.getByRole('button', { name: 'Import 3 of 6 rows (3 rejected)' }).click();
    await page.getByText('Import finished: group-history.csv').waitFor();
    await expect(page.getByTestId('import-counts').textContent()).resolves.toMatch(
      /^3 added, 3 rejected, 0 duplicates of 6 rows/,
    );
    importId = Number(await page.locator('tr[data-import-id]').first().getAttribute('data-import-id'));
    await shot(page, 'imports-finished');
  });

  it('downloads the rejected rows, fixes them and imports only those: all three are added, nothing is rejected', async () => {
    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Download 3 rejected rows' }).first().click();
    const file = readFileSync((await (await download).path())!, 'utf8');
    const [head, ...rows] = parse(file, { bom: true, delimiter: ';' }) as string[][];
    expect(head).toEqual(['Compound', 'SMILES', 'Solvent system', 'RF', 'Visualization', 'Notebook', 'reason']);
    expect(rows.map((row) => row[0])).toEqual(['bad ring', 'indole', 'benzophenone']);
    const fixed = rows.map((row) => {
      const [column, value] = corrections[row[0]];
      const copy = [...row];
      copy[head.indexOf(column)] = value;
      return copy.join(';');
    });
    await chooseFile('group-history-rejected-rows.csv', [head.join(';'), ...fixed].join('\n'));
    await expect(page.getByTestId('preview-counts').textContent()).resolves.toBe(
      '3 would be added · 0 rejected · 0 duplicates',
    );
    await expect(page.getByLabel('Field for column "reason"').inputValue()).resolves.toBe('ignore');
    await page.getByRole('button', { name: 'Import 3 of 3 rows' }).click();
    await page.getByText('Import finished: group-history-rejected-rows.csv').waitFor();
    await expect(page.getByTestId('import-counts').textContent()).resolves.toMatch(
      /^3 added, 0 rejected, 0 duplicates of 3 rows/,
    );
    await shot(page, 'imports-fixed-rows');
  });

  it('importing the first file again adds nothing: its good rows are duplicates', async () => {
    await chooseFile('group-history.csv', messy);
    await expect(page.getByTestId('preview-counts').textContent()).resolves.toBe(
      '0 would be added · 3 rejected · 3 duplicates',
    );
    const history = (await page.evaluate(async () => (await fetch('/api/imports')).json())) as {
      items: { id: number; accepted: number }[];
    };
    expect(history.items.find((item) => item.id === importId)?.accepted).toBe(3);
  });
});
