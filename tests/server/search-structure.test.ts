import { Molecule } from 'openchemlib';
import { atomPairBitsOfMolecule, atomPairTanimoto } from '../../server/chem/fingerprint-atom-pairs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import initRDKitModule from '@rdkit/rdkit';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord, recordHits, searchFor, uniqueWord } from '../helpers/search';

type RDKitMol = { get_substruct_match: (query: RDKitMol) => string; delete: () => void };
type RDKitModule = { get_mol: (smiles: string) => RDKitMol | null; get_qmol: (smarts: string) => RDKitMol | null };

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
let rdkit: RDKitModule;

/** Structures of this file; whether each holds a pyridine ring is decided by RDKit MinimalLib below, not by hand. */
const structures = {
  '3-methylpyridine': 'Cc1cccnc1',
  '2-phenylpyridine': 'c1ccc(-c2ccccn2)cc1',
  quinoline: 'c1ccc2ncccc2c1',
  '4-dodecylpyridine': 'CCCCCCCCCCCCc1ccncc1',
  '4-dodecyltoluene': 'CCCCCCCCCCCCc1ccc(C)cc1',
  dodecylbenzene: 'CCCCCCCCCCCCc1ccccc1',
  '1-dodecylpiperidine': 'CCCCCCCCCCCCN1CCCCC1',
  '5-dodecylpyrimidine': 'CCCCCCCCCCCCc1cncnc1',
} as const;
const records = new Map<string, { id: number; compoundId: number }>();
const word = uniqueWord();

/** RDKit MinimalLib's substructure answer (an independent implementation of aromatic ring matching). */
function rdkitHasSubstructure(smiles: string, query: string): boolean {
  const mol = rdkit.get_mol(smiles) as RDKitMol;
  const q = rdkit.get_qmol(query) as RDKitMol;
  const match = mol.get_substruct_match(q) !== '{}';
  mol.delete();
  q.delete();
  return match;
}

/** Tanimoto from the stored fingerprint bytes, counted bit by bit (deliberately not the server's popcount). */
async function storedTanimoto(a: number, b: number): Promise<number> {
  const rows = await sequelize.query<{ id: number; fingerprint: Buffer }>(
    'SELECT id, fingerprint FROM compounds WHERE id IN (:ids)',
    {
      replacements: { ids: [a, b] },
      type: QueryTypes.SELECT,
    },
  );
  const [fa, fb] = [a, b].map((id) => rows.find((row) => row.id === id)!.fingerprint);
  let both = 0;
  let either = 0;
  for (let i = 0; i < fa.length * 8; i++) {
    const x = (fa[i >> 3] >> (i & 7)) & 1;
    const y = (fb[i >> 3] >> (i & 7)) & 1;
    both += x & y;
    either += x | y;
  }
  return both / either;
}

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  rdkit = await (initRDKitModule as unknown as () => Promise<RDKitModule>)();
  for (const [name, smiles] of Object.entries(structures)) {
    const record = await createRecord(member, { structure: smiles, name, notes: `structure set ${word}` });
    records.set(name, { id: record.id, compoundId: record.compound.id });
  }
});
afterAll(close);

describe('GET /api/search?mode=substructure', () => {
  it(
    'when the query is pyridine, then exactly the records whose compounds RDKit finds a pyridine ring ' +
      'in are returned (benzene, piperidine and pyrimidine are not)',
    async () => {
      const result = await searchFor(viewer, {
        mode: 'substructure',
        structure: 'c1ccncc1',
        q: word,
        limit: 5000,
        pageSize: 200,
      });
      const found = new Set(recordHits(result).map((hit) => hit.recordId));
      for (const [name, smiles] of Object.entries(structures)) {
        expect(found.has(records.get(name)!.id), name).toBe(rdkitHasSubstructure(smiles, 'c1ccncc1'));
      }
      expect([...found].length).toBeGreaterThanOrEqual(4);
    },
  );

  it('when the query is a drawn molfile of pyridine, then it finds the same records as the SMILES', async () => {
    const molfile = (
      await member.post('/api/structures/parse').set('X-CSRF-Token', member.csrf).send({ structure: 'c1ccncc1' })
    ).body.molfile as string;
    const bySmiles = await searchFor(viewer, { mode: 'substructure', structure: 'c1ccncc1', q: word, pageSize: 200 });
    const byMolfile = await searchFor(viewer, { mode: 'substructure', structure: molfile, q: word, pageSize: 200 });
    expect(
      recordHits(byMolfile)
        .map((hit) => hit.recordId)
        .sort(),
    ).toEqual(
      recordHits(bySmiles)
        .map((hit) => hit.recordId)
        .sort(),
    );
  });

  it('when results are ranked, then each carries its Tanimoto similarity to the query, best first', async () => {
    const hits = recordHits(await searchFor(viewer, { mode: 'substructure', structure: 'c1ccncc1', pageSize: 200 }));
    const scores = hits.map((hit) => hit.similarity as number);
    expect(scores.length).toBeGreaterThan(0);
    expect(scores.every((score) => score > 0 && score <= 1)).toBe(true);
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
  });
});

describe('GET /api/search?mode=similar', () => {
  it('when a stored structure is the query, then its record comes first with similarity 1 and scores descend', async () => {
    const result = await searchFor(viewer, {
      mode: 'similar',
      structure: structures['4-dodecylpyridine'],
      threshold: 0.3,
      pageSize: 100,
    });
    const hits = recordHits(result);
    const own = records.get('4-dodecylpyridine')!;
    expect(hits[0].similarity).toBe(1);
    expect(hits.filter((hit) => hit.similarity === 1).map((hit) => hit.recordId)).toContain(own.id);
    const scores = hits.map((hit) => hit.similarity as number);
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
    expect(scores.length).toBeGreaterThan(0);
    expect(scores.every((score) => score >= 0.3)).toBe(true);
    // The echoed query is the same structure: each contains the other (RDKit MinimalLib).
    const echoed = result.structureSmiles as string;
    const drawn = structures['4-dodecylpyridine'];
    expect([rdkitHasSubstructure(echoed, drawn), rdkitHasSubstructure(drawn, echoed)]).toEqual([true, true]);
  });

  it(
    'when a neighbour is scored, then its similarity is the mean of the stored fingerprints’ Tanimoto ' +
      '(counted independently) and the atom-pair Tanimoto',
    async () => {
      const hits = recordHits(
        await searchFor(viewer, {
          mode: 'similar',
          structure: structures['4-dodecylpyridine'],
          threshold: 0,
          limit: 5000,
          q: word,
          pageSize: 200,
        }),
      );
      const query = records.get('4-dodecylpyridine')!.compoundId;
      for (const name of ['dodecylbenzene', '5-dodecylpyrimidine', '3-methylpyridine'] as const) {
        const hit = hits.find((item) => item.recordId === records.get(name)!.id);
        expect(hit?.recordId, name).toBe(records.get(name)!.id);
        // Issue 26 rule 4: 1 only for the identical compound; others fuse two descriptors (server/chem/fingerprint-atom-pairs.ts).
        const pairs = atomPairTanimoto(
          atomPairBitsOfMolecule(Molecule.fromSmiles(structures['4-dodecylpyridine'])),
          atomPairBitsOfMolecule(Molecule.fromSmiles(structures[name])),
        );
        expect(hit!.similarity).toBeCloseTo(
          Math.min(0.99, ((await storedTanimoto(query, records.get(name)!.compoundId)) + pairs) / 2),
          3,
        );
        expect(hit!.similarity).toBeLessThan(1);
      }
    },
  );

  it('when the threshold is high, then only compounds at or above it are returned', async () => {
    const hits = recordHits(
      await searchFor(viewer, { mode: 'similar', structure: structures['4-dodecylpyridine'], threshold: 0.95 }),
    );
    expect(hits.length).toBeGreaterThan(0);
    expect(hits.every((hit) => (hit.similarity as number) >= 0.95)).toBe(true);
    expect(hits.map((hit) => hit.recordId)).not.toContain(records.get('3-methylpyridine')!.id);
  });

  it(
    'when the compounds view is asked, then each item carries the compound id, its similarity and ' +
      'the conditions that worked',
    async () => {
      const result = await searchFor(viewer, {
        mode: 'similar',
        structure: structures['4-dodecylpyridine'],
        threshold: 0.3,
        view: 'compounds',
      });
      const first = result.items[0];
      expect(first.kind).toBe('compound');
      if (first.kind !== 'compound') return;
      expect(first.similarity).toBe(1);
      expect(first.conditions[0]).toMatchObject({
        eluent: expect.stringContaining('EtOAc'),
        targetRf: 0.28,
        outcome: 'clean',
      });
    },
  );

  it('when the structure is broken, then 400 with the chemistry engine’s message', async () => {
    const res = await viewer.get('/api/search').query({ mode: 'similar', structure: 'c1ccccc1C(' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toMatch(/^smiles_/);
  });

  it('when a structure mode has no structure, then 400 naming the field', async () => {
    const res = await viewer.get('/api/search').query({ mode: 'substructure' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('query.structure');
  });
});
