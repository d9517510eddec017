import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import initRDKitModule from '@rdkit/rdkit';
import { createApp } from '../../server/http/app';
import { parseSdf } from '../../server/chem';
import { exportColumns } from '../../server/features/search/export-format';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord, uniqueWord } from '../helpers/search';

type RDKitMol = { get_smiles: () => string; delete: () => void };
type RDKitModule = { get_mol: (input: string) => RDKitMol | null };

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
let rdkit: RDKitModule;
const word = uniqueWord();
const made: Record<string, { id: number; compound: { canonicalSmiles: string } }> = {};

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  rdkit = await (initRDKitModule as unknown as () => Promise<RDKitModule>)();
  made.amine = await createRecord(member, {
    structure: 'CN(C)Cc1ccc(cc1)C(=O)OC',
    name: `amine ester ${word}`,
    notes: `export ${word}`,
    eluent: {
      components: [
        { solvent: 'EtOAc', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      additives: [{ additive: 'Et3N', percent: 1 }],
    },
    spots: [
      { role: 'target', rf: 0.31 },
      { role: 'starting_material', rf: 0.55 },
    ],
  });
  made.failed = await createRecord(member, {
    structure: 'OC(=O)c1ccc(O)cc1',
    name: `hydroxy acid ${word}`,
    notes: `=HYPERLINK("http://example.invalid") export ${word}`,
    outcome: 'failed',
  });
});
afterAll(close);

/** Canonical SMILES by RDKit MinimalLib: an independent reading of both structures. */
function rdkitSmiles(input: string): string {
  const mol = rdkit.get_mol(input) as RDKitMol;
  const smiles = mol.get_smiles();
  mol.delete();
  return smiles;
}

describe('GET /api/export.csv', () => {
  it(
    'when a search is exported, then the CSV has the header row and one row per matching record, read ' +
      'back by an independent CSV parser',
    async () => {
      const res = await viewer.get('/api/export.csv').query({ q: `export ${word}` });
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      expect(res.headers['content-disposition']).toMatch(/attachment; filename="rfolio-export-.*\.csv"/);
      const rows = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
      expect(Object.keys(rows[0])).toEqual([...exportColumns]);
      expect(rows.map((row) => Number(row['record id'])).sort()).toEqual([made.amine.id, made.failed.id].sort());
      const amine = rows.find((row) => Number(row['record id']) === made.amine.id)!;
      expect(amine).toMatchObject({
        eluent: 'EtOAc : hexanes 1 : 4',
        additive: '1% Et3N',
        rf: '0.31',
        'rf sm': '0.55',
        stain: 'UV 254; KMnO4',
        outcome: 'clean',
        technique: 'TLC',
      });
      expect(rdkitSmiles(amine.smiles)).toBe(rdkitSmiles('CN(C)Cc1ccc(cc1)C(=O)OC'));
    },
  );

  it('when the export carries a filter, then only matching records are in it', async () => {
    const res = await viewer.get('/api/export.csv').query({ q: `export ${word}`, outcome: 'failed' });
    const rows = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
    expect(rows.map((row) => Number(row['record id']))).toEqual([made.failed.id]);
  });

  it(
    'when a note starts like a spreadsheet formula, then the cell is defused with a leading apostrophe ' +
      '(OWASP CSV injection)',
    async () => {
      const res = await viewer.get('/api/export.csv').query({ q: `export ${word}`, outcome: 'failed' });
      const [row] = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
      expect(row.notes.startsWith(`'=HYPERLINK`)).toBe(true);
    },
  );

  it('when nobody is signed in, then 401', async () => {
    expect((await (await agentFor(app)).get('/api/export.csv')).status).toBe(401);
  });
});

describe('GET /api/export.sdf', () => {
  it(
    'when a search is exported as SDF, then the chemistry engine’s parseSdf reads every record with ' +
      'its structure and data items',
    async () => {
      const res = await viewer.get('/api/export.sdf').query({ q: `export ${word}` });
      expect(res.status).toBe(200);
      const records = parseSdf(res.text);
      expect(records).toHaveLength(2);
      for (const record of records) {
        expect(record.error).toBeUndefined();
        const made_ = Object.values(made).find((item) => item.id === Number(record.fields['record id']))!;
        expect(Object.values(made).map((item) => item.id)).toContain(Number(record.fields['record id']));
        expect(rdkitSmiles(record.structure!.molecule.toMolfile())).toBe(rdkitSmiles(made_.compound.canonicalSmiles));
      }
      const amine = records.find((record) => Number(record.fields['record id']) === made.amine.id)!;
      expect(amine.fields).toMatchObject({ rf: '0.31', additive: '1% Et3N', outcome: 'clean' });
      expect(amine.structure!.name).toBe(`amine ester ${word}`);
    },
  );

  it('when a similarity search is exported, then it holds the records the search finds', async () => {
    const res = await viewer
      .get('/api/export.sdf')
      .query({ mode: 'similar', structure: 'CN(C)Cc1ccc(cc1)C(=O)OC', threshold: 0.99, q: word });
    expect(parseSdf(res.text).map((record) => Number(record.fields['record id']))).toEqual([made.amine.id]);
  });
});
