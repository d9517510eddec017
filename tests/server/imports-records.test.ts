import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { createApp } from '../../server/http/app';
import { Compound, ConditionRecord, ImportRow } from '../../server/db/models';
import { fingerprintIdcodeSync } from '../../server/chem';
import { agentFor, type Agent } from '../helpers/agent';
import { importFile, runTag } from '../helpers/imports';
import { postRecord } from '../helpers/records';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
});
afterAll(close);

/** Share of each solvent in the mixture (parts / total), so 1:4 and 20:80 compare equal. */
const shares = (components: { solvent: string; parts: number }[]) => {
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  return Object.fromEntries(components.map((part) => [part.solvent, Number((part.parts / total).toFixed(4))]));
};

// Eluent notations from lab spreadsheets (issue 9) and their meaning in common practice: "A/B x:y" is
// x parts of A to y parts of B; "n% A in B" is n % v/v of A; "+ n% additive" is % v/v of the whole eluent.
const notations: [string, Record<string, number>, { additive: string; percent: number }[]][] = [
  ['EtOAc/hexanes 1:4', { 'ethyl-acetate': 0.2, hexanes: 0.8 }, []],
  ['"hexane:EtOAc, 9:1"', { hexanes: 0.9, 'ethyl-acetate': 0.1 }, []],
  ['20% EtOAc in hexanes', { 'ethyl-acetate': 0.2, hexanes: 0.8 }, []],
  ['DCM/MeOH 9:1 + 1% Et3N', { dichloromethane: 0.9, methanol: 0.1 }, [{ additive: 'triethylamine', percent: 1 }]],
  ['100% DCM', { dichloromethane: 1 }, []],
  ['ETHYL ACETATE/Hexanes 1:4', { 'ethyl-acetate': 0.2, hexanes: 0.8 }, []],
  ['etoac/HEX 1:4', { 'ethyl-acetate': 0.2, hexanes: 0.8 }, []],
  ['Ethyl acetate : petroleum ether 1:9', { 'ethyl-acetate': 0.1, 'petroleum-ether': 0.9 }, []],
  ['CH2Cl2/MeOH 19:1', { dichloromethane: 0.95, methanol: 0.05 }, []],
  ['5% MeOH in DCM', { methanol: 0.05, dichloromethane: 0.95 }, []],
];

describe('eluent notations found in lab spreadsheets', () => {
  it('when each notation of the issue is imported, then the stored eluent has the parts and additives it means', async () => {
    const csv = [
      'SMILES,Eluent,Rf,NB',
      ...notations.map(([notation], index) => `Oc1ccc(cc1)C(C)(C)CC,${notation},0.3${index},${tag}-N${index}`),
    ].join('\n');
    const done = await importFile(curator, csv, { name: 'notations.csv' });
    expect(done).toMatchObject({ accepted: notations.length, rejected: 0 });
    for (const [index, [notation, expected, additives]] of notations.entries()) {
      const record = await ConditionRecord.findOne({ where: { notebookRef: `${tag}-N${index}` }, rejectOnEmpty: true });
      expect(shares(record.eluent.components), notation).toEqual(expected);
      expect(record.eluent.additives, notation).toEqual(additives);
    }
  });

  it('when a solvent is misspelt, then the row is rejected naming the unknown word and the closest known name', async () => {
    const csv = `SMILES,Eluent,Rf\nOc1ccc(cc1)C(C)(C)CC,EtOAc/heptnae 1:3,0.4\nOc1ccc(cc1)C(C)(C)CC,toluol/EtOAc 4:1,0.4\n`;
    const done = await importFile(curator, csv, { name: 'misspelt.csv' });
    expect(done).toMatchObject({ accepted: 0, rejected: 2 });
    const reasons = (await ImportRow.findAll({ where: { importId: done.id }, order: [['rowNumber', 'ASC']] })).map(
      (row) => row.reason,
    );
    expect(reasons).toEqual([
      'Unknown solvent or additive "heptnae". Did you mean "heptane"? (column "Eluent")',
      'Unknown solvent or additive "toluol". Did you mean "toluene"? (column "Eluent")',
    ]);
  });

  it('when the additive has a column of its own, then it joins the eluent', async () => {
    const csv = `SMILES,Eluent,Additive,Rf,NB\nNCCc1ccc(O)c(O)c1,DCM/MeOH 9:1,1% NH4OH,0.2,${tag}-A1\n`;
    await importFile(curator, csv, { name: 'additive.csv' });
    const record = await ConditionRecord.findOne({ where: { notebookRef: `${tag}-A1` }, rejectOnEmpty: true });
    expect(record.eluent.additives).toEqual([{ additive: 'ammonia', percent: 1 }]);
  });
});

describe('an imported record and a contributed one', () => {
  const structure = 'O=C(OCc1ccccc1)c1ccc(F)cc1';
  const row = (notes: string) =>
    `SMILES,Eluent,Rf,Stain,Phase,Technique,Outcome,Notes\n${structure},EtOAc/hexanes 1:9,0.41,"UV 254, KMnO4",silica,TLC,clean,${notes}\n`;
  // A TLC row on "silica" is a silica TLC plate (issue 24), so the contributed twin names the plate.
  const body = (notes: string) => ({
    structure,
    eluent: 'EtOAc/hexanes 1:9',
    spots: [{ role: 'target', rf: 0.41 }],
    visualisation: ['UV 254', 'KMnO4'],
    notes,
    stationaryPhase: 'silica TLC plate',
  });

  it('when a row says what a contributed record says, then it counts as a duplicate (one content-hash definition)', async () => {
    const contributed = await postRecord(curator, body(`${tag} same content`));
    expect(contributed.status).toBe(201);
    const done = await importFile(curator, row(`${tag} same content`), { name: 'same-as-contributed.csv' });
    expect(done).toMatchObject({ accepted: 0, duplicates: 1 });
  });

  it('when a row is imported, then its record reads exactly like a contributed one, with an "import" first revision', async () => {
    const contributed = await postRecord(curator, body(`${tag} contributed`));
    const done = await importFile(curator, row(`${tag} imported`), { name: 'like-contributed.csv' });
    const [imported] = await ConditionRecord.findAll({ where: { importId: done.id } });
    const a = (await curator.get(`/api/records/${contributed.body.id}`)).body;
    const b = (await curator.get(`/api/records/${imported.id}`)).body;
    const comparable = (dto: Record<string, unknown>) => {
      const {
        id: _id,
        notes: _notes,
        createdAt: _c,
        updatedAt: _u,
        importId: _import,
        spots,
        ...rest
      } = dto as Record<string, unknown> & { spots: { id: number }[] };
      return { ...rest, spots: spots.map(({ id: _spotId, ...spot }) => spot) };
    };
    expect(comparable(b)).toEqual(comparable(a));
    expect([a.importId, b.importId]).toEqual([null, done.id]);
    const history = (await curator.get(`/api/records/${imported.id}/history`)).body;
    expect(
      history.revisions.map((revision: { number: number; action: string }) => [revision.number, revision.action]),
    ).toEqual([[1, 'import']]);
  });
});

describe('compounds an import creates', () => {
  it('get their fingerprint once each, equal to one computed independently on this thread', async () => {
    const smiles = ['CCCCCCCCCCCCCCCCCCCCCCCCCCCCN', 'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCN'];
    const lines = ['SMILES,Eluent,Rf,NB'];
    for (let i = 0; i < 450; i++)
      lines.push(`${smiles[i % 2]},DCM/MeOH 9:1 + 1% Et3N,${(0.1 + (i % 80) / 100).toFixed(2)},${tag}-F${i}`);
    const done = await importFile(curator, lines.join('\n'), { name: 'amines.csv' });
    expect(done).toMatchObject({ accepted: 450, newCompounds: 2, batchesCommitted: 3 });
    const compounds = await Compound.findAll({ where: { inputStructure: { [Op.in]: smiles } } });
    expect(compounds).toHaveLength(2);
    for (const compound of compounds) {
      expect(compound.fingerprint?.equals(Buffer.from(fingerprintIdcodeSync(compound.idcode).buffer))).toBe(true);
    }
  });
});
