import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { ConditionRecord } from '../../server/db/models';
import { importPreviewSchema } from '../../shared/schemas/import';
import { agentFor, type Agent } from '../helpers/agent';
import { importFile, runTag, upload } from '../helpers/imports';
import { buildWorkbook, type FixtureCell } from '../helpers/workbook';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();

/**
 * A group's workbook as kept for years (invented rows): a notes sheet first, the data sheet with a merged title
 * row, a blank row, a merged group-header row above the real header row, typed numbers and dates, a formula whose
 * cached value is the Rf, text with a decimal comma and a "~", and a summary sheet after it.
 */
function dataRows(): FixtureCell[][] {
  return [
    [{ value: 'Purification log — invented example group', columnSpan: 8 }, null, null, null, null, null, null, null],
    [],
    [
      { value: 'Compound', columnSpan: 2 },
      null,
      { value: 'TLC', columnSpan: 4 },
      null,
      null,
      null,
      { value: 'Provenance', columnSpan: 2 },
      null,
    ],
    ['Name', 'SMILES', 'Eluent', 'Rf', 'Plate', 'Stain', 'Date', 'NB'],
    [
      'benzyl alcohol',
      'OCc1ccccc1',
      'EtOAc/hexanes 1:4',
      0.28,
      'Si gel 60 F254',
      'UV, KMnO4 (weak)',
      new Date(Date.UTC(2019, 10, 5)),
      `${tag}-1`,
    ],
    [
      'anisole',
      'COc1ccccc1',
      'EtOAc/hexanes 1:9',
      { formula: 'D5+0.3', cached: 0.58 },
      'SiO2 (Merck 60)',
      '2,4-DNP',
      new Date(Date.UTC(2019, 10, 6)),
      `${tag}-2`,
    ],
    [],
    [
      'benzaldehyde',
      'O=Cc1ccccc1',
      'EtOAc/hexanes 1:9',
      '0,45',
      'silica',
      'vanillin dip, 120 °C',
      '07/11/2019',
      `${tag}-3`,
    ],
    [
      'acetophenone',
      'CC(=O)c1ccccc1',
      'EtOAc/hexanes 1:4',
      '~0.4',
      'silica',
      'PMA + heat gun',
      '25/11/2019',
      `${tag}-4`,
    ],
    ['bad row', 'C1CC(', 'EtOAc/hexanes 1:4', 0.3, 'silica', 'UV', '26/11/2019', `${tag}-5`],
  ];
}

async function groupWorkbook(): Promise<Buffer> {
  return buildWorkbook([
    {
      name: 'Read me',
      rows: [['How this log is kept'], ['One row per TLC; Rf measured at the spot centre.'], ['Ask before editing.']],
    },
    { name: 'Log 2019', rows: dataRows() },
    {
      name: 'Summary',
      rows: [
        ['Compounds', 'Runs'],
        [5, 5],
      ],
    },
  ]);
}

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
});
afterAll(close);

describe('POST /api/imports with an .xlsx workbook', () => {
  it(
    'when previewed, then the data sheet and its header row are found below the title and group-header ' +
      'rows, and every typed cell reads right',
    async () => {
      const res = await upload(curator, await groupWorkbook(), { name: 'log.xlsx', query: 'dryRun=1&previewRows=50' });
      expect(res.status).toBe(200);
      const preview = importPreviewSchema.parse(res.body);
      expect(preview).toMatchObject({
        format: 'xlsx',
        sheet: 'Log 2019',
        sheets: ['Read me', 'Log 2019', 'Summary'],
        headerRow: 4,
        total: 5,
        blankRows: 1,
      });
      expect(preview.titleRows).toEqual(['Purification log — invented example group', 'Compound · TLC · Provenance']);
      expect(preview.mapping).toMatchObject({
        Name: 'name',
        SMILES: 'structure',
        Eluent: 'eluent',
        Rf: 'rf',
        Plate: 'phase',
        Stain: 'stain',
        Date: 'date',
        NB: 'notebook',
      });
      expect(preview.rows.map((row) => row.result)).toEqual([
        'accepted',
        'accepted',
        'accepted',
        'accepted',
        'rejected',
      ]);
      // A number cell, a formula's cached value, a decimal comma and a "~", all as the sheet shows them.
      expect(preview.rows.map((row) => row.record?.rf ?? null)).toEqual([0.28, 0.58, 0.45, 0.4, null]);
      // Typed date cells arrive as ISO dates; the typed "07/11/2019" and "25/11/2019" decide the column: day first.
      expect(preview.rows[0].values.Date).toBe('2019-11-05');
      expect(preview.dates).toMatchObject({ column: 'Date', order: 'dmy', needsChoice: false });
      // Plates read as TLC plates, every stain with its qualifiers: no warnings for these usual forms.
      expect(preview.rows.slice(0, 4).map((row) => [row.record?.phase, row.warnings])).toEqual(
        Array.from({ length: 4 }, () => ['silica TLC plate with fluorescent indicator (F254)', []]),
      );
      expect(preview.rows[4].reason).toMatch(/^Bad structure \(column "SMILES"\)/);
      expect(preview).toMatchObject({ checked: 5, accepted: 4, rejected: 1 });
    },
  );

  it('when the curator picks another sheet or header row, then the preview reads that instead', async () => {
    const bytes = await groupWorkbook();
    const summary = await upload(curator, bytes, { name: 'log.xlsx', query: 'dryRun=1' }).field('sheet', 'Summary');
    expect(summary.status).toBe(200);
    expect(summary.body).toMatchObject({ sheet: 'Summary', headers: ['Compounds', 'Runs'], total: 1 });
    const lower = await upload(curator, bytes, { name: 'log.xlsx', query: 'dryRun=1' }).field('headerRow', '5');
    expect(lower.body).toMatchObject({ sheet: 'Log 2019', headerRow: 5 });
    expect(lower.body.headers[0]).toBe('benzyl alcohol');
    const missing = await upload(curator, bytes, { name: 'log.xlsx', query: 'dryRun=1' }).field('sheet', 'Log 2020');
    expect(missing.status).toBe(422);
    expect(missing.body.error.message).toContain('no sheet "Log 2020"');
  });

  it(
    'when committed, then the four good rows come in with their own dates and TLC plates, and the ' +
      'bad one is rejected naming its column',
    async () => {
      const done = await importFile(curator, await groupWorkbook(), { name: 'log.xlsx' });
      expect(done).toMatchObject({
        status: 'completed',
        format: 'xlsx',
        sheet: 'Log 2019',
        headerRow: 4,
        dateOrder: 'dmy',
        accepted: 4,
        rejected: 1,
      });
      const records = await ConditionRecord.findAll({ where: { importId: done.id }, order: [['notebookRef', 'ASC']] });
      expect(
        records.map((record) => [record.createdAt.toISOString().slice(0, 10), record.stationaryPhase, record.targetRf]),
      ).toEqual([
        ['2019-11-05', 'silica-tlc-f254', 0.28],
        ['2019-11-06', 'silica-tlc-f254', 0.58],
        ['2019-11-07', 'silica-tlc-f254', 0.45],
        ['2019-11-25', 'silica-tlc-f254', 0.4],
      ]);
      expect(records[2].sourceTexts).toEqual({ stain: 'vanillin dip, 120 °C' });
    },
  );
});

describe('a CSV with title rows above its header', () => {
  it('is read from its real header row, as a workbook is', async () => {
    const csv = [
      `Column log ${tag}`,
      'kept by the invented example group',
      '',
      'SMILES,Eluent,Rf,Stain',
      'OCc1ccccc1,EtOAc/hexanes 1:3,0.33,"ninhydrin (after heating)"',
    ].join('\n');
    const res = await upload(curator, csv, { name: 'titled.csv', query: 'dryRun=1' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      format: 'csv',
      headerRow: 4,
      headers: ['SMILES', 'Eluent', 'Rf', 'Stain'],
      total: 1,
      accepted: 1,
    });
    expect(res.body.titleRows).toEqual([`Column log ${tag}`, 'kept by the invented example group']);
  });
});
