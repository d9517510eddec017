import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { createApp } from '../../server/http/app';
import { ConditionRecord, Import, ImportRow, RecordRevision } from '../../server/db/models';
import { loadRecordState } from '../../server/core/record-revisions';
import { importDtoSchema, importPreviewSchema } from '../../shared/schemas/import';
import { agentFor, type Agent } from '../helpers/agent';
import { csvRows, importFile, runTag, upload } from '../helpers/imports';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();

const header = 'Compound Name;SMILES;Solvent System;Rf value;TLC Stain;Phase;NB ref;Comments';
/**
 * A spreadsheet as groups keep them: semicolons, decimal commas, a BOM, blank lines, quoted cells, one bad row of each kind
 * that makes a record meaningless, and two good rows with a secondary text the catalogue does not know (kept, with a warning).
 */
const rows = {
  good: `benzyl alcohol;OCc1ccccc1;EtOAc/hexanes 1:4;0,28;UV, KMnO4;silica;NB-1;${tag} first`,
  badStructure: `broken;C1CC(;EtOAc/hexanes 1:4;0,3;UV;silica;NB-2;${tag}`,
  rfTooHigh: `anisole;COc1ccccc1;EtOAc/hexanes 1:9;1,2;UV;silica;NB-3;${tag}`,
  noRf: `toluene;Cc1ccccc1;hexanes;;UV;silica;NB-4;${tag}`,
  noEluent: `phenol;Oc1ccccc1;;0,4;UV;silica;NB-5;${tag}`,
  unknownSolvent: `acetophenone;CC(=O)c1ccccc1;EtOAc/hexxanes 1:4;0,35;UV;silica;NB-6;${tag}`,
  unknownPhase: `benzaldehyde;O=Cc1ccccc1;EtOAc/hexanes 1:9;0,5;UV;silica gold;NB-7;${tag}`,
  unknownStain: `cinnamyl alcohol;OC/C=C/c1ccccc1;EtOAc/hexanes 1:3;0,3;sparkle dust;silica;NB-8;${tag}`,
  amine: `benzylamine;NCc1ccccc1;DCM/MeOH 9:1 + 1% Et3N;0,25;ninhydrin;SiO2;NB-9;"${tag} streaks; needs base\nsecond line"`,
  percent: `methyl benzoate;COC(=O)c1ccccc1;20% EtOAc in hexanes;0,45;uv;Silica Gel;NB-10;${tag}`,
};
const messyCsv = [
  '\uFEFF' + header,
  '',
  rows.good,
  ';;;;;;;',
  rows.badStructure,
  rows.rfTooHigh,
  rows.noRf,
  rows.noEluent,
  rows.unknownSolvent,
  rows.unknownPhase,
  rows.unknownStain,
  rows.amine,
  rows.good,
  rows.percent,
  '',
].join('\r\n');

const taggedRecords = (status = 'active') =>
  ConditionRecord.count({ where: { notes: { [Op.like]: `%${tag}%` }, status } });

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
});
afterAll(close);

describe('POST /api/imports with a messy spreadsheet', () => {
  it('when previewed (dryRun=1), then each row says what would happen and nothing is written', async () => {
    const before = { imports: await Import.count(), records: await taggedRecords() };
    const res = await upload(curator, messyCsv, { query: 'dryRun=1&previewRows=50', name: 'messy.csv' });
    expect(res.status).toBe(200);
    const preview = importPreviewSchema.parse(res.body);
    expect(preview.delimiter).toBe(';');
    expect(preview.mapping).toMatchObject({
      'Compound Name': 'name',
      SMILES: 'structure',
      'Solvent System': 'eluent',
      'Rf value': 'rf',
      'TLC Stain': 'stain',
      Phase: 'phase',
      'NB ref': 'notebook',
      Comments: 'notes',
    });
    expect(preview.total).toBe(11);
    expect(preview.blankRows).toBe(1);
    expect(preview.rows.map((row) => row.result)).toEqual([
      'accepted',
      'rejected',
      'rejected',
      'rejected',
      'rejected',
      'rejected',
      'accepted',
      'accepted',
      'accepted',
      'duplicate',
      'accepted',
    ]);
    expect(preview).toMatchObject({ checked: 11, accepted: 5, rejected: 5, duplicates: 1, warned: 2 });
    expect(preview.rows[6].warnings.join(' ')).toMatch(/Stationary phase \(column "Phase"\): .*"gold" not recognised/);
    expect(preview.rows[7].warnings.join(' ')).toMatch(
      /Visualisation \(column "TLC Stain"\): "sparkle dust" not recognised/,
    );
    expect(preview.rows[0].record).toMatchObject({ name: 'benzyl alcohol', rf: 0.28 });
    expect({ imports: await Import.count(), records: await taggedRecords() }).toEqual(before);
  });

  it('when committed, then accepted + rejected + duplicates = total and every rejection names its reason and column', async () => {
    const done = importDtoSchema.parse(await importFile(curator, messyCsv, { name: 'messy.csv' }));
    expect(done).toMatchObject({
      status: 'completed',
      total: 11,
      processed: 11,
      accepted: 5,
      rejected: 5,
      duplicates: 1,
      warned: 2,
      blankRows: 1,
      format: 'csv',
    });
    expect(await taggedRecords()).toBe(5);
    const reasons = (
      await ImportRow.findAll({ where: { importId: done.id, kind: 'rejected' }, order: [['rowNumber', 'ASC']] })
    ).map((row) => row.reason);
    expect(reasons).toHaveLength(5);
    expect(reasons[0]).toMatch(/^Bad structure \(column "SMILES"\): /);
    expect(reasons[1]).toBe('Rf (column "Rf value") 1.2 is outside (0, 1].');
    expect(reasons[2]).toBe('Missing Rf: the "Rf value" column is empty.');
    expect(reasons[3]).toBe('Missing eluent: the "Solvent System" column is empty.');
    expect(reasons[4]).toBe(
      'Unknown solvent or additive "hexxanes". Did you mean "hexanes"? (column "Solvent System")',
    );
    const warnings = await ImportRow.findAll({
      where: { importId: done.id, kind: 'warning' },
      order: [['rowNumber', 'ASC']],
    });
    expect(warnings.map((row) => row.cells['Compound Name'])).toEqual(['benzaldehyde', 'cinnamyl alcohol']);
    const kept = await ConditionRecord.findAll({
      where: { importId: done.id, notebookRef: ['NB-7', 'NB-8'] },
      order: [['notebookRef', 'ASC']],
    });
    expect(kept.map((record) => [record.stationaryPhase, record.sourceTexts])).toEqual([
      ['silica-tlc-f254', { phase: 'silica gold' }],
      ['silica-tlc-f254', { stain: 'sparkle dust' }],
    ]);
    firstImportId = done.id;
  });
});

let firstImportId = 0;
const fixes: Record<string, [string, string]> = {
  broken: ['SMILES', 'C1CCCCC1O'],
  anisole: ['Rf value', '0,6'],
  toluene: ['Rf value', '0,7'],
  phenol: ['Solvent System', 'EtOAc/hexanes 1:3'],
  acetophenone: ['Solvent System', 'EtOAc/hexanes 1:4'],
};

describe('GET /api/imports/:id/rejected.csv, then fixing and importing only those rows', () => {
  it("gives back the original rows, cell for cell, with the reason added, in the file's own delimiter", async () => {
    const res = await curator.get(`/api/imports/${firstImportId}/rejected.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain('messy-rejected-rows.csv');
    const [head, ...body] = csvRows(res.text, ';');
    expect(head).toEqual([...header.split(';'), 'reason']);
    const original = [rows.badStructure, rows.rfTooHigh, rows.noRf, rows.noEluent, rows.unknownSolvent];
    expect(body.map((cells) => cells.slice(0, -1))).toEqual(original.map((row) => row.split(';')));
    expect(body).toHaveLength(5);
    expect(body.every((cells) => cells[cells.length - 1].length > 10)).toBe(true);
  });

  it('when the curator fixes the cells and imports that file, then exactly those rows are added and nothing is rejected', async () => {
    const res = await curator.get(`/api/imports/${firstImportId}/rejected.csv`);
    const [head, ...body] = csvRows(res.text, ';');
    const fixed = body.map((cells) => {
      const [column, value] = fixes[cells[0]];
      const copy = [...cells];
      copy[head.indexOf(column)] = value;
      return copy.join(';');
    });
    const done = await importFile(curator, [head.join(';'), ...fixed].join('\n'), { name: 'messy-rejected-rows.csv' });
    expect(done).toMatchObject({ status: 'completed', total: 5, accepted: 5, rejected: 0, duplicates: 0 });
    expect(done.mapping.reason).toBe('ignore');
    expect(await taggedRecords()).toBe(10);
  });

  it('when the original file is imported a second time, then it adds nothing: its good rows are duplicates', async () => {
    const done = await importFile(curator, messyCsv, { name: 'messy-again.csv' });
    expect(done).toMatchObject({ status: 'completed', accepted: 0, rejected: 5, duplicates: 6 });
    expect(await taggedRecords()).toBe(10);
  });
});

describe('DELETE /api/imports/:id', () => {
  it(
    'retires what the import added (kept, with the reason "import N undone"), leaves other imports ' +
      'alone, and refuses a second undo',
    async () => {
      const res = await curator.delete(`/api/imports/${firstImportId}`).set('X-CSRF-Token', curator.csrf);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ status: 'undone', retiredRecords: 5 });
      const retired = await ConditionRecord.findAll({ where: { importId: firstImportId } });
      expect(retired.map((record) => [record.status, record.retiredReason])).toEqual(
        retired.map(() => ['retired', `import ${firstImportId} undone`]),
      );
      const record = await curator.get(`/api/records/${retired[0].id}`);
      expect(record.body.status).toBe('retired');
      const history = await curator.get(`/api/records/${retired[0].id}/history`);
      expect(
        history.body.revisions.map((revision: { action: string; number: number }) => [
          revision.number,
          revision.action,
        ]),
      ).toEqual([
        [2, 'retire'],
        [1, 'import'],
      ]);
      // The retire revision's snapshot is the record as the records service reads it back.
      const retireRevision = await RecordRevision.findOne({
        where: { recordId: retired[0].id, number: 2 },
        rejectOnEmpty: true,
      });
      expect(retireRevision.snapshot).toEqual(JSON.parse(JSON.stringify(await loadRecordState(retired[0].id))));
      expect(await taggedRecords()).toBe(5);
      const again = await curator.delete(`/api/imports/${firstImportId}`).set('X-CSRF-Token', curator.csrf);
      expect(again.status).toBe(409);
    },
  );

  it('when the undone file is imported again, then its rows come back as new records', async () => {
    const done = await importFile(curator, messyCsv, { name: 'messy-third.csv' });
    expect(done).toMatchObject({ accepted: 5, duplicates: 1, rejected: 5 });
    expect(await taggedRecords()).toBe(10);
  });

  it('when a member or a viewer calls the import API, then 403', async () => {
    const member = await agentFor(app, 'member');
    expect((await upload(member, messyCsv)).status).toBe(403);
    expect((await member.get('/api/imports')).status).toBe(403);
  });
});

describe('GET /api/imports', () => {
  it('lists past imports with who, when, file name, hash and counts', async () => {
    const res = await curator.get('/api/imports');
    expect(res.status).toBe(200);
    const mine = res.body.items.find((item: { id: number }) => item.id === firstImportId);
    expect(mine).toMatchObject({
      fileName: 'messy.csv',
      user: { id: curator.user?.id },
      status: 'undone',
      accepted: 5,
      rejected: 5,
      duplicates: 1,
      warned: 2,
    });
    expect(mine.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(Date.parse(mine.createdAt)).toBeGreaterThan(Date.now() - 10 * 60_000);
  });
});
