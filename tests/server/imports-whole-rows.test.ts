import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { ConditionRecord, ImportRow } from '../../server/db/models';
import { toCsv, toSdf } from '../../server/features/search/export-format';
import { loadListRecords } from '../../server/core/record-queries';
import { importPreviewSchema, undoPlanSchema } from '../../shared/schemas/import';
import { agentFor, createUser, type Agent } from '../helpers/agent';
import { post, recordId } from '../helpers/curation';
import { csvRows, importFile, runTag, upload } from '../helpers/imports';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
});
afterAll(close);

const records = (importId: number) => ConditionRecord.findAll({ where: { importId }, order: [['notebookRef', 'ASC']] });

describe('a row is rejected only when the record would be meaningless or wrong (issue 24 point 2)', () => {
  const header = 'SMILES,Eluent,Rf,Plate,Stain,Technique,Outcome,Yield,Column diameter,Load,Notes,NB';
  const good = [
    `OCc1ccc(Cl)cc1,EtOAc/hexanes 1:4,0.31,mystery resin,"sparkle dust, ` +
      `KMnO4",chromatotron,meh,lots,wide,sideways,=HYPERLINK("x"),${tag}-1`,
    `OCc1ccc(Br)cc1,EtOAc/hexanes 1:4,0.29,SiO2 (Merck 60),UV (faint),TLC,clean,,,,${'long note '.repeat(1100)},${tag}-2`,
  ];
  const bad = [
    `C1CC(,EtOAc/hexanes 1:4,0.3,silica,UV,,,,,,,${tag}-3`,
    `OCc1ccc(I)cc1,EtOAc/hexanes 1:4,1.3,silica,UV,,,,,,,${tag}-4`,
    `OCc1ccc(F)cc1,,0.3,silica,UV,,,,,,,${tag}-5`,
    `OCc1ccc(C)cc1,EtOAc/unobtainium 1:4,0.3,silica,UV,,,,,,,${tag}-6`,
    `=1+2,EtOAc/hexanes 1:4,0.3,silica,UV,,,,,,,${tag}-7`,
  ];
  const csv = [header, ...good, ...bad].join('\n');
  let importId = 0;

  it('when previewed, then secondary problems are warnings naming their column, and the button count is the accepted rows', async () => {
    const res = await upload(curator, csv, { name: 'whole.csv', query: 'dryRun=1' });
    const preview = importPreviewSchema.parse(res.body);
    expect(preview.rows.map((row) => row.result)).toEqual([
      'accepted',
      'accepted',
      'rejected',
      'rejected',
      'rejected',
      'rejected',
      'rejected',
    ]);
    expect(preview).toMatchObject({ checked: 7, total: 7, accepted: 2, warned: 2, rejected: 5 });
    const warnings = preview.rows[0].warnings.join('\n');
    for (const column of ['Plate', 'Stain', 'Technique', 'Outcome', 'Yield', 'Column diameter', 'Load'])
      expect(warnings).toContain(`(column "${column}")`);
    expect(preview.rows[0].notes.join(' ')).toContain('No outcome read');
    expect(preview.rows[1].warnings.join(' ')).toMatch(/too long .*\(column "Notes"\) Cut to that length/);
    const reasons = preview.rows.slice(2).map((row) => row.reason);
    expect(reasons[0]).toMatch(/^Bad structure \(column "SMILES"\)/);
    expect(reasons[1]).toBe('Rf (column "Rf") 1.3 is outside (0, 1].');
    expect(reasons[2]).toBe('Missing eluent: the "Eluent" column is empty.');
    expect(reasons[3]).toMatch(/Unknown solvent or additive "unobtainium".*\(column "Eluent"\)/);
    expect(reasons[4]).toMatch(/\(column "SMILES"\)/);
  });

  it(
    'when committed, then the good rows keep their raw texts and the warnings and rejections download ' +
      'with formula cells neutralised',
    async () => {
      const done = await importFile(curator, csv, { name: 'whole.csv' });
      importId = done.id;
      expect(done).toMatchObject({ accepted: 2, warned: 2, rejected: 5 });
      const [first, second] = await records(done.id);
      expect([first.stationaryPhase, first.stationaryPhaseOther, first.sourceTexts]).toEqual([
        'other',
        'mystery resin',
        { phase: 'mystery resin', stain: 'sparkle dust, KMnO4', technique: 'chromatotron', outcome: 'meh' },
      ]);
      expect(second.stationaryPhase).toBe('silica-tlc-f254');
      // Cut to the 10,000-character limit of notes (then trimmed like any text field).
      expect(second.notes?.length).toBeGreaterThan(9_990);
      expect(second.notes?.length).toBeLessThanOrEqual(10_000);
      const warningsCsv = await curator.get(`/api/imports/${done.id}/warnings.csv`);
      expect(warningsCsv.status).toBe(200);
      expect(warningsCsv.headers['content-disposition']).toContain('whole-warnings.csv');
      const [head, ...rows] = csvRows(warningsCsv.text);
      expect(head[head.length - 1]).toBe('warning');
      expect(rows).toHaveLength(2);
      expect(rows[0][head.indexOf('Notes')]).toBe(`'=HYPERLINK("x")`);
      const rejected = csvRows((await curator.get(`/api/imports/${done.id}/rejected.csv`)).text);
      expect(rejected.slice(1).map((row) => row[0])).toEqual([
        'C1CC(',
        'OCc1ccc(I)cc1',
        'OCc1ccc(F)cc1',
        'OCc1ccc(C)cc1',
        "'=1+2",
      ]);
    },
  );

  it('when the record is opened, then the texts kept show on it', async () => {
    const [first] = await records(importId);
    const res = await curator.get(`/api/records/${first.id}`);
    expect(res.body.sourceTexts).toEqual({
      phase: 'mystery resin',
      stain: 'sparkle dust, KMnO4',
      technique: 'chromatotron',
      outcome: 'meh',
    });
    expect(await ImportRow.count({ where: { importId, kind: 'warning' } })).toBe(2);
  });
});

describe("the sheet's own dates and people (issue 24 point 3)", () => {
  it('keeps each row\'s date and person: a member by name or e-mail, else "recorded by" text on the record', async () => {
    const member = await createUser('member', { name: `Ines Varga ${tag}` });
    const local = member.email.split('@')[0];
    const csv = [
      'SMILES,Eluent,Rf,Date,Chemist,NB',
      `OCCc1ccc(Cl)cc1,EtOAc/hexanes 1:3,0.3,15/03/2018,Ines Varga ${tag},${tag}-d1`,
      `OCCc1ccc(Br)cc1,EtOAc/hexanes 1:3,0.3,02/04/2018,${local},${tag}-d2`,
      `OCCc1ccc(I)cc1,EtOAc/hexanes 1:3,0.3,2018-05-06,K. Osei (visitor),${tag}-d3`,
    ].join('\n');
    const done = await importFile(curator, csv, { name: 'people.csv' });
    expect(done).toMatchObject({ accepted: 3, dateOrder: 'dmy' });
    const rows = await records(done.id);
    expect(rows.map((row) => [row.createdAt.toISOString().slice(0, 10), row.authorId, row.recordedBy])).toEqual([
      ['2018-03-15', member.id, null],
      ['2018-04-02', member.id, null],
      ['2018-05-06', curator.user!.id, 'K. Osei (visitor)'],
    ]);
    const shown = await curator.get(`/api/records/${rows[2].id}`);
    expect(shown.body).toMatchObject({
      recordedBy: 'K. Osei (visitor)',
      createdAt: expect.stringMatching(/^2018-05-06/),
    });
  });

  it('asks when the date column cannot decide day/month order, and follows the order chosen', async () => {
    const csv = [
      'SMILES,Eluent,Rf,Date,NB',
      `OCCCc1ccccc1,EtOAc/hexanes 1:3,0.3,04/03/2017,${tag}-a1`,
      `OCCCCc1ccccc1,EtOAc/hexanes 1:3,0.3,05/06/2017,${tag}-a2`,
    ].join('\n');
    const preview = importPreviewSchema.parse(
      (await upload(curator, csv, { name: 'dates.csv', query: 'dryRun=1' })).body,
    );
    expect(preview.dates).toMatchObject({ column: 'Date', order: null, needsChoice: true, evidence: { ambiguous: 2 } });
    expect(preview.rows[0].warnings.join(' ')).toMatch(
      /Date \(column "Date"\): "04\/03\/2017" could be day\/month or month\/day/,
    );
    const res = await upload(curator, csv, { name: 'dates.csv', query: 'wait=10000' }).field('dateOrder', 'mdy');
    expect(res.status).toBe(201);
    const rows = await records(res.body.id);
    expect(rows.map((row) => row.createdAt.toISOString().slice(0, 10))).toEqual(['2017-04-03', '2017-05-06']);
  });
});

describe('round trips and undo (issue 24 point 4)', () => {
  it(
    'an export whose cells no longer match its records (a stain note, an older column phase on a TLC ' +
      'record) is recognised by record id',
    async () => {
      const ids = [
        await recordId(curator, {
          structure: 'OCc1ccc(OC)cc1',
          visualisation: [{ method: 'KMnO4', note: 'faint' }],
          notes: `${tag} faint`,
        }),
        await recordId(curator, {
          structure: 'OCc1ccc(OC)cc1',
          stationaryPhase: 'silica',
          notes: `${tag} column silica`,
        }),
      ];
      const { records: loaded } = await loadListRecords(ids, { withMolfile: true });
      for (const [text, name] of [
        [toCsv(loaded), 'export.csv'],
        [toSdf(loaded), 'export.sdf'],
      ] as const) {
        const done = await importFile(curator, text, { name });
        expect(done, name).toMatchObject({ total: 2, accepted: 0, duplicates: 2, rejected: 0 });
      }
    },
  );

  it('undo says first what it will do to records merged since, then leaves records, merges and the import agreeing', async () => {
    const structure = 'OC(c1ccccc1)c1ccc(Cl)cc1';
    const csv = [
      'SMILES,Eluent,Rf,NB',
      ...[0.21, 0.34, 0.47].map((rf, i) => `${structure},EtOAc/hexanes 1:4,${rf},${tag}-u${i}`),
    ].join('\n');
    const done = await importFile(curator, csv, { name: 'to-undo.csv' });
    const [survivor, mergedAway, plain] = await records(done.id);
    const outsideIn = await recordId(curator, { structure, notes: `${tag} merged into an imported record` });
    const outsideSurvivor = await recordId(curator, { structure, notes: `${tag} takes an imported record` });
    expect(
      (await post(curator, '/api/curation/merge', { survivorId: survivor.id, mergedIds: [outsideIn] })).status,
    ).toBe(201);
    expect(
      (await post(curator, '/api/curation/merge', { survivorId: outsideSurvivor, mergedIds: [mergedAway.id] })).status,
    ).toBe(201);
    const plan = undoPlanSchema.parse((await curator.get(`/api/imports/${done.id}/undo-plan`)).body);
    expect(plan).toMatchObject({
      retire: 1,
      keptSurvivors: [{ id: survivor.id, absorbed: [outsideIn] }],
      mergedAway: [{ id: mergedAway.id, into: outsideSurvivor }],
    });
    expect(plan.summary).toMatch(/^Retires 1 record .*keeps 1 that other records were merged into/);
    expect((await curator.delete(`/api/imports/${done.id}`).set('X-CSRF-Token', curator.csrf)).body).toMatchObject({
      status: 'undone',
      retiredRecords: 1,
    });
    const states = await ConditionRecord.findAll({
      where: { id: [survivor.id, mergedAway.id, plain.id, outsideIn, outsideSurvivor] },
      order: [['id', 'ASC']],
    });
    expect(Object.fromEntries(states.map((row) => [row.id, [row.status, row.mergedIntoId]]))).toEqual({
      [survivor.id]: ['active', null],
      [mergedAway.id]: ['merged', outsideSurvivor],
      [plain.id]: ['retired', null],
      [outsideIn]: ['merged', survivor.id],
      [outsideSurvivor]: ['active', null],
    });
    const [{ dangling }] = await sequelize.query<{ dangling: number }>(
      `SELECT count(*)::int AS dangling FROM condition_records m JOIN condition_records s ON s.id = m.merged_into_id
        WHERE m.status = 'merged' AND s.status <> 'active' AND (m.import_id = :id OR s.import_id = :id)`,
      { replacements: { id: done.id }, type: QueryTypes.SELECT },
    );
    expect(dangling).toBe(0);
  });
});
