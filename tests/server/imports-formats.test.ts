import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Molecule } from 'openchemlib';
import { createApp } from '../../server/http/app';
import { ConditionRecord, Import, RecordSpot } from '../../server/db/models';
import { importPreviewSchema } from '../../shared/schemas/import';
import { agentFor, type Agent } from '../helpers/agent';
import { csvRows, importFile, runTag, upload } from '../helpers/imports';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
});
afterAll(close);

// Open TLC dataset: Xu et al., Chem 2022 (arXiv 2202.05962), Apache-2.0, tests/fixtures/open-tlc/README.md.
const openTlc = readFileSync('tests/fixtures/open-tlc/tlc-rf.csv');
const openTlcRows = csvRows(openTlc.toString('utf8')).length - 1;

describe("POST /api/imports with the open dataset's shape (a column per solvent, volume fractions)", () => {
  it(
    'when previewed, then the solvent columns are recognised, fractions become parts, and out-of-range ' +
      'Rf is clamped with a note',
    async () => {
      const res = await upload(curator, openTlc, { name: 'tlc-rf.csv', query: 'dryRun=1&previewRows=200' });
      expect(res.status).toBe(200);
      const preview = importPreviewSchema.parse(res.body);
      expect(preview.format).toBe('open-tlc');
      expect(preview.mapping).toEqual({
        smiles: 'structure',
        name: 'name',
        cas: 'ignore',
        hexane: 'solvent:hexanes',
        ethyl_acetate: 'solvent:ethyl-acetate',
        dichloromethane: 'solvent:dichloromethane',
        methanol: 'solvent:methanol',
        diethyl_ether: 'solvent:diethyl-ether',
        rf: 'rf',
      });
      expect(preview.total).toBe(openTlcRows);
      // Row 2 of the file: hexane 0.980392, ethyl acetate 0.019608, i.e. hexane/EtOAc 50:1 (README: compositions present).
      expect(preview.rows[1].record?.eluent).toMatch(/^hexanes : EtOAc 50 : 1/);
      expect(preview.rows[1].record?.rf).toBeCloseTo(0.262708, 6);
      // Row 146 reads Rf 0 (a spot on the origin); the README says such values are to be clamped.
      const origin = preview.rows.find((row) => row.row === 146);
      expect(origin?.result).not.toBe('rejected');
      expect(origin?.notes.join(' ')).toContain('Rf 0 clamped to 0.001');
      expect(origin?.record?.rf).toBe(0.001);
    },
    120_000,
  );

  it(
    'when committed, then no row is rejected, every row is accounted for, and importing it again adds nothing',
    { timeout: 300_000 },
    async () => {
      // Rows 1–600 and 2401–3500 of the file: every composition, Rf 0 on the origin and the three Rf above 1 (rows 2461, 3434, 3487).
      const lines = openTlc.toString('utf8').trimEnd().split('\n');
      const slice = [lines[0], ...lines.slice(1, 601), ...lines.slice(2401, 3501)].join('\n');
      const first = await importFile(curator, slice, { name: 'tlc-rf-part.csv' });
      expect(first).toMatchObject({ status: 'completed', format: 'open-tlc', total: 1700, rejected: 0 });
      expect(first.accepted + first.duplicates).toBe(1700);
      const clamped = await ConditionRecord.findAll({ where: { importId: first.id, targetRf: 1 } });
      expect(clamped.length).toBeGreaterThanOrEqual(3);
      const again = await importFile(curator, slice, { name: 'tlc-rf-part-again.csv' });
      expect(again).toMatchObject({ accepted: 0, rejected: 0, duplicates: 1700 });
    },
  );
});

const molfile = (smiles: string, title = '') => {
  const lines = Molecule.fromSmiles(smiles).toMolfile().split('\n');
  lines[0] = title;
  return lines.join('\n');
};

function sdfRecord(smiles: string, title: string, fields: Record<string, string>) {
  const data = Object.entries(fields)
    .map(([name, value]) => `> <${name}>\n${value}\n`)
    .join('\n');
  return `${molfile(smiles, title).replace(/\n$/, '')}\n${data}\n$$$$\n`;
}

describe('POST /api/imports with an SD file', () => {
  it(
    'maps the data fields like headers, takes names from the title line, and rejects a broken molfile ' +
      "with the chemistry engine's message",
    async () => {
      const brokenMolfile = [
        'broken',
        '  handmade',
        '',
        '  2  1  0  0  0  0  0  0  0  0999 V2000',
        '    0.0000    0.0000    0.0000 C   0  0',
        'M  END',
      ].join('\n');
      const sdf = [
        sdfRecord('COc1ccc(C)cc1Br', '2-bromo-4-methylanisole', {
          Rf: '0.31',
          'Solvent system': 'EtOAc/hexanes 1:3',
          Visualisation: 'UV, KMnO4',
          Notes: `${tag} sdf 1`,
        }),
        sdfRecord('CC(=O)Nc1ccc(O)c(C)c1', '', {
          Name: '4-acetamido-2-methylphenol',
          Rf: '0.22',
          'Solvent system': 'DCM/MeOH 95:5',
          Visualisation: 'UV 254',
          Notes: `${tag} sdf 2`,
        }),
        `${brokenMolfile}\n> <Rf>\n0.5\n\n> <Solvent system>\nEtOAc\n\n$$$$\n`,
        sdfRecord('COc1ccc(C)cc1Br', '2-bromo-4-methylanisole', {
          Rf: '1.7',
          'Solvent system': 'EtOAc/hexanes 1:3',
          Visualisation: 'UV',
          Notes: `${tag} sdf 4`,
        }),
      ].join('');
      const preview = await upload(curator, sdf, { name: 'plates.sdf', query: 'dryRun=1' });
      expect(preview.status).toBe(200);
      expect(preview.body).toMatchObject({ format: 'sdf', total: 4 });
      expect(preview.body.mapping).toMatchObject({
        molfile: 'structure',
        Rf: 'rf',
        'Solvent system': 'eluent',
        Visualisation: 'stain',
        Notes: 'notes',
        Name: 'name',
      });

      const done = await importFile(curator, sdf, { name: 'plates.sdf' });
      expect(done).toMatchObject({
        status: 'completed',
        format: 'sdf',
        total: 4,
        accepted: 2,
        rejected: 2,
        duplicates: 0,
      });
      const records = await ConditionRecord.findAll({
        where: { importId: done.id },
        include: ['compound'],
        order: [['id', 'ASC']],
      });
      expect(
        records.map((record) => (record as ConditionRecord & { compound: { name: string } }).compound.name),
      ).toEqual(['2-bromo-4-methylanisole', '4-acetamido-2-methylphenol']);
      const spots = await RecordSpot.findAll({ where: { recordId: records[0].id } });
      expect(spots.map((spot) => [spot.role, spot.rf])).toEqual([['target', 0.31]]);

      const rejected = await curator.get(`/api/imports/${done.id}/rejected.csv`);
      const [head, ...body] = csvRows(rejected.text);
      expect(head).toEqual(['molfile', 'Rf', 'Solvent system', 'Visualisation', 'Notes', 'Name', 'reason']);
      expect(body[0][0].split('\n')[0]).toBe('broken');
      expect(body[0][6]).toMatch(/^Bad structure \(column "molfile"\): /);
      expect(body[1][6]).toBe('Rf (column "Rf") 1.7 is outside (0, 1].');
    },
  );
});

describe('POST /api/imports refuses what it cannot read', () => {
  it('when the file is over 20 MB, then 413', async () => {
    const res = await upload(curator, Buffer.alloc(20 * 1024 * 1024 + 1, 'a'), { name: 'huge.csv' });
    expect(res.status).toBe(413);
    expect(res.body.error.message).toContain('20 MB');
  });

  it(
    'when the file is a broken workbook, then 422 with the reason; an .ods, an image or plain text ' +
      'without columns, then 415',
    async () => {
      const xlsx = Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00]);
      const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
      const before = await Import.count();
      const broken = await upload(curator, xlsx, { name: 'history.xlsx' });
      expect(broken.status).toBe(422);
      expect(broken.body.error.message).toMatch(/workbook could not be read/);
      for (const [content, name, reason] of [
        [xlsx, 'history.ods', /OpenDocument/],
        [png, 'plate.csv', /PNG image/],
        ['just some words\nand more words\n', 'notes.txt', /No line holds a comma, semicolon or tab/],
        ['', 'empty.csv', /empty/],
      ] as const) {
        const res = await upload(curator, content, { name });
        expect(res.status, name).toBe(415);
        expect(res.body.error.message).toMatch(reason);
      }
      expect(await Import.count()).toBe(before);
    },
  );

  it('when a quoted cell is never closed, then 422 naming the line', async () => {
    const res = await upload(curator, 'smiles,eluent,rf\nCCO,"EtOAc/hexanes 1:4,0.3\nCCN,EtOAc,0.2\n', {
      name: 'unclosed.csv',
    });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/line/);
  });

  it("when no column holds the structure, then a commit is refused with 422 while a dry run shows every row's reason", async () => {
    const csv = `compound,eluent,rf\nbenzene,hexanes,0.8\n`;
    expect((await upload(curator, csv, { name: 'no-smiles.csv' })).status).toBe(422);
    const preview = await upload(curator, csv, { name: 'no-smiles.csv', query: 'dryRun=1' });
    expect(preview.body.rows[0].reason).toBe('Missing structure: no column holds a SMILES or molfile.');
  });
});

describe('POST /api/imports with a mapping chosen by the user', () => {
  const csv = `Cpd;Struct;Mob. ph.;Retention;Vis;Lab\nveratrole ${tag};COc1ccccc1OC;Et2O/pentane 1:4;0,42;UV;${tag}-L1\n`;

  it('when headers are not recognised, then they are ignored until the user maps them, and then the row imports', async () => {
    const preview = await upload(curator, csv, { name: 'odd-headers.csv', query: 'dryRun=1' });
    expect(preview.body.mapping).toEqual({
      Cpd: 'ignore',
      Struct: 'ignore',
      'Mob. ph.': 'ignore',
      Retention: 'ignore',
      Vis: 'ignore',
      Lab: 'ignore',
    });
    const mapping = {
      Cpd: 'name',
      Struct: 'structure',
      'Mob. ph.': 'eluent',
      Retention: 'rf',
      Vis: 'stain',
      Lab: 'notebook',
    };
    const done = await importFile(curator, csv, { name: 'odd-headers.csv', mapping });
    expect(done).toMatchObject({ accepted: 1, rejected: 0, mapping });
    const [record] = await ConditionRecord.findAll({ where: { importId: done.id } });
    expect(record.notebookRef).toBe(`${tag}-L1`);
    expect(record.eluent.components).toEqual([
      { solvent: 'diethyl-ether', parts: 1 },
      { solvent: 'pentane', parts: 4 },
    ]);
  });

  it('when the mapping names a column the file lacks, two columns for one field, or a field that does not exist, then 400', async () => {
    const mappings: Record<string, string>[] = [
      { Nope: 'rf' },
      { Struct: 'structure', Cpd: 'structure' },
      { Struct: 'colour' },
    ];
    for (const mapping of mappings) {
      const res = await upload(curator, csv, { name: 'odd-headers.csv', query: 'dryRun=1', mapping });
      expect(res.status, JSON.stringify(mapping)).toBe(400);
    }
  });
});
