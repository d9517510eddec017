import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeFingerprintPool, searchKeysForIdcodes } from '../../../server/chem/fingerprint';
import { parseStructure } from '../../../server/chem/parse';
import { StructureSearchIndex } from '../../../server/chem/search-index';
import { readOpenTlc, type TlcRow } from '../../shared/support/open-tlc';
import { rdkit, type RdkitMol } from './rdkit-reference';

/**
 * The project's substructure search (fingerprint pre-screen, then its own graph matcher or OpenChemLib's SSSearcher;
 * server/chem/substructure.ts) against RDKit MinimalLib's get_substruct_match (`@rdkit/rdkit`, an independent
 * implementation) on every structure of the open-tlc dataset (Apache-2.0; H. Xu, J. Lin, D. Zhang, F. Mo et al.,
 * Chem 2022) and 43 SMILES queries (no SMARTS): rings, functional groups, halogens, chains.
 *
 * Measured (printed by this file): 43 × 451 = 19,393 decisions, 56 disagreements (99.7 % agree), every one a
 * structure the project finds and RDKit does not; RDKit never finds one the project misses. Two classes, both
 * aromaticity models:
 * A. Rings with an exocyclic C=O (coumarin, xanthone): RDKit calls them aromatic, OpenChemLib does not, so
 *    aliphatic queries ('CC', 'CO', 'C(=O)O', 'COc1ccccc1') match their ring bonds only in the project.
 * B. Five-membered heteroaromatic rings (thiophene, furan, benzofuran, pyrrole, indole, carbazole, thiazole):
 *    OpenChemLib keeps their bonds' Kekulé single/double orders (only six-ring-like bonds are delocalised), so
 *    'C=C', 'C=CC=C', 'CN', 'c1ccccc1N' match them; RDKit types those bonds aromatic, which only an aromatic query
 *    bond matches. For a chemist searching 'C=C' the project's answer includes thiophenes; RDKit's does not.
 * Left out: 'C:C' (an aromatic bond written between aliphatic atoms) — RDKit matches every aromatic C–C bond
 * (416 structures), OpenChemLib reads it as a bond of unknown order in a ring or chain (43): the notation has no
 * agreed meaning outside SMARTS.
 */
const openData = [
  ...new Set(
    [...readOpenTlc<TlcRow>('tlc-rf.csv'), ...readOpenTlc<TlcRow>('flash-columns.csv')].map((row) => row.smiles),
  ),
];

const QUERIES = [
  'c1ccccc1',
  'NC=O',
  'NS(=O)=O',
  'c1ccncc1',
  'c1ccc2[nH]ccc2c1',
  'CC',
  'C=C',
  'CO',
  'C(=O)O',
  'CN',
  'C1CCNCC1',
  'c1ccsc1',
  'c1ccoc1',
  'c1cc[nH]c1',
  'C#N',
  'Cl',
  'Br',
  'I',
  'F',
  'C(F)(F)F',
  '[N+](=O)([O-])C',
  'O=C(N)c1ccccc1',
  'C1CC1',
  'c1ccc(cc1)-c1ccccc1',
  'CC(C)(C)OC(=O)N',
  'N1CCOCC1',
  'C=CC=C',
  'c1ccc2ccccc2c1',
  'c1cnc2ccccc2c1',
  'CC=C(C)C',
  'S',
  'C#C',
  'C=O',
  'OC(=O)C=C',
  'CC(=O)C',
  'c1ccccc1O',
  'c1ccccc1N',
  'O=CO',
  'OCCO',
  'C1=CC=CC=C1',
  'C1CCCCC1',
  'c1ccc(Cl)cc1',
  'COc1ccccc1',
];

const index = new StructureSearchIndex();
const rdkitMols: RdkitMol[] = [];
const results = new Map<string, { ours: Set<number>; theirs: Set<number> }>();

beforeAll(async () => {
  const idcodes = openData.map((smiles) => parseStructure(smiles).molecule.getIDCode());
  const keys = await searchKeysForIdcodes(idcodes);
  idcodes.forEach((idcode, id) =>
    index.upsert({ id, idcode, fingerprint: keys.fingerprints[id], graph: keys.graphs[id] }),
  );
  const lib = await rdkit();
  for (const smiles of openData) rdkitMols.push(lib.get_mol(smiles) as RdkitMol);
  for (const query of QUERIES) {
    const ours = new Set(index.substructure(parseStructure(query).molecule).ids);
    const pattern = lib.get_mol(query) as RdkitMol;
    const theirs = new Set(
      rdkitMols.flatMap((mol, id) =>
        Object.keys(JSON.parse(mol.get_substruct_match(pattern))).length > 0 ? [id] : [],
      ),
    );
    pattern.delete();
    results.set(query, { ours, theirs });
  }
}, 120_000);
afterAll(async () => {
  for (const mol of rdkitMols) mol.delete();
  await closeFingerprintPool();
});

const onlyOurs = (query: string) => {
  const { ours, theirs } = results.get(query) as { ours: Set<number>; theirs: Set<number> };
  return [...ours].filter((id) => !theirs.has(id));
};

describe('substructure search against RDKit MinimalLib (open-tlc structures, SMILES queries)', () => {
  it('runs every query over a few hundred structures, and most queries find something', () => {
    expect(openData.length).toBeGreaterThan(400);
    expect(rdkitMols).toHaveLength(openData.length);
    expect(rdkitMols.every((mol) => mol !== null)).toBe(true);
    expect([...results.values()].filter((result) => result.theirs.size > 0).length).toBeGreaterThan(35);
  });

  it.each(QUERIES)('finds every structure RDKit finds for %s', (query) => {
    const { ours, theirs } = results.get(query) as { ours: Set<number>; theirs: Set<number> };
    expect([...theirs].filter((id) => !ours.has(id)).map((id) => openData[id])).toEqual([]);
  });

  it('finds more than RDKit only in rings the two toolkits call aromatic differently (classes A and B)', async () => {
    const lib = await rdkit();
    const exocyclicCarbonyl = lib.get_qmol('[a;R]=O') as RdkitMol;
    const fiveRingHeteroaromatic = lib.get_qmol('[a;r5;!#6]') as RdkitMol;
    const has = (id: number, pattern: RdkitMol) =>
      Object.keys(JSON.parse(rdkitMols[id].get_substruct_match(pattern))).length > 0;
    const extra = QUERIES.flatMap((query) => onlyOurs(query).map((id) => ({ query, id })));
    const decisions = QUERIES.length * openData.length;
    const listed = extra.map(({ query, id }) => `${query} in ${openData[id]}`).join('; ');
    console.log(`substructure vs RDKit: ${decisions - extra.length}/${decisions} agree; only here: ${listed}`);
    for (const { query, id } of extra) {
      expect(has(id, exocyclicCarbonyl) || has(id, fiveRingHeteroaromatic), `${query} in ${openData[id]}`).toBe(true);
    }
    exocyclicCarbonyl.delete();
    fiveRingHeteroaromatic.delete();
    expect(extra.length).toBeLessThanOrEqual(0.01 * decisions);
  });

  it('agrees exactly on aromatic-ring queries, which both toolkits type alike', () => {
    for (const query of [
      'c1ccccc1',
      'c1ccncc1',
      'c1ccsc1',
      'c1ccoc1',
      'c1cc[nH]c1',
      'c1ccc2[nH]ccc2c1',
      'c1ccc2ccccc2c1',
      'c1ccc(Cl)cc1',
    ]) {
      const { ours, theirs } = results.get(query) as { ours: Set<number>; theirs: Set<number> };
      expect(theirs.size, query).toBeGreaterThan(0);
      expect(
        [...ours].sort((a, b) => a - b),
        query,
      ).toEqual([...theirs].sort((a, b) => a - b));
    }
  });
});
