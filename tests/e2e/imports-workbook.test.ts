import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import { shot, useSignedInBrowser } from './browser';
import { buildWorkbook } from '../helpers/workbook';

const baseUrl = inject('baseUrl');
let page: Page;
const tag = randomUUID().slice(0, 8);

/** An invented group's workbook: a notes sheet, the log (title row, group headers, typed cells, a formula), a summary. */
async function workbook(): Promise<Buffer> {
  return buildWorkbook([
    { name: 'Notes', rows: [['Invented example group — how this log is kept'], ['Rf at the spot centre, 5 cm run.']] },
    {
      name: 'TLC log',
      rows: [
        [{ value: `TLC log ${tag}`, columnSpan: 7 }, null, null, null, null, null, null],
        [
          { value: 'Compound', columnSpan: 2 },
          null,
          { value: 'Plate', columnSpan: 4 },
          null,
          null,
          null,
          { value: 'Who', columnSpan: 1 },
        ],
        ['Name', 'SMILES', 'Eluent', 'Rf', 'Plate', 'Stain', 'Chemist'],
        [
          '3-phenylpropanol',
          'OCCCc1ccccc1',
          'EtOAc/hexanes 1:3',
          0.27,
          'Si gel 60 F254',
          'KMnO4 (weak)',
          `R. Ndlovu ${tag}`,
        ],
        [
          '4-methoxyacetophenone',
          'COc1ccc(C(C)=O)cc1',
          'EtOAc/hexanes 1:4',
          { formula: 'D4+0.1', cached: 0.37 },
          'SiO2 (Merck 60)',
          '2,4-DNP',
          `R. Ndlovu ${tag}`,
        ],
        [
          '2-phenylethanol',
          'OCCc1ccccc1',
          'EtOAc/hexanes 1:3',
          '0,24',
          'silica glitter',
          'vanillin dip, 120 °C',
          `R. Ndlovu ${tag}`,
        ],
        ['broken', 'C1CC(', 'EtOAc/hexanes 1:3', 0.3, 'silica', 'UV', `R. Ndlovu ${tag}`],
      ],
    },
    { name: 'Summary', rows: [['Runs', 4]] },
  ]);
}

const session = useSignedInBrowser('curator@example.org');
beforeAll(() => ({ page } = session));

describe('importing an Excel workbook in the browser (issue 24)', () => {
  it('the curator uploads the workbook and sees the sheet and header row found, warnings and the count that will come in', async () => {
    await page.goto(`${baseUrl}/imports`);
    await page.getByRole('heading', { name: 'Import', exact: true }).waitFor();
    await page.locator('input[type=file]').setInputFiles({
      name: 'tlc-log.xlsx',
      mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      buffer: await workbook(),
    });
    await page.getByTestId('preview-counts').waitFor();
    await expect(page.getByLabel('Sheet').inputValue()).resolves.toBe('TLC log');
    await expect(page.getByTestId('table-choice').textContent()).resolves.toContain(
      'Header found on sheet row 3 of “TLC log”.',
    );
    await expect(page.getByTestId('preview-counts').textContent()).resolves.toBe(
      '3 would be added (1 with warnings) · 1 rejected · 0 duplicates',
    );
    await expect(page.getByTestId('row-warnings').first().textContent()).resolves.toContain('"glitter" not recognised');
    await page.getByRole('button', { name: 'Import 3 of 4 rows (1 rejected)' }).waitFor();
    await shot(page, 'imports-workbook-preview');
  });

  it('picking the summary sheet reads that instead, and picking the log again restores the preview', async () => {
    await page.getByLabel('Sheet').selectOption('Summary');
    await page.getByTestId('table-choice').getByText('of “Summary”').waitFor();
    await page.getByLabel('Sheet').selectOption('TLC log');
    await page.getByTestId('table-choice').getByText('Header found on sheet row 3 of “TLC log”.').waitFor();
  });

  it('commits it; the counts say what came in, and the warnings download names the column', async () => {
    await page.getByRole('button', { name: 'Import 3 of 4 rows (1 rejected)' }).click();
    await page.getByText('Import finished: tlc-log.xlsx').waitFor();
    await expect(page.getByTestId('import-counts').first().textContent()).resolves.toMatch(
      /^3 added, 1 rejected, 0 duplicates of 4 rows.*1 came in with warnings/,
    );
    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Download 1 warning' }).first().click();
    const [head, ...rows] = parse(readFileSync((await (await download).path())!, 'utf8'), { bom: true }) as string[][];
    expect(head[head.length - 1]).toBe('warning');
    expect(rows.map((row) => row[0])).toEqual(['2-phenylethanol']);
    expect(rows[0][head.length - 1]).toContain('(column "Plate")');
    await shot(page, 'imports-workbook-finished');
  });
});
