import { Molecule, SSSearcher } from 'openchemlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeFingerprintPool, searchKeysForIdcodes } from '../../../server/chem/fingerprint';
import { parseStructure } from '../../../server/chem/parse';
import { StructureSearchIndex } from '../../../server/chem/search-index';
import { generateLibrary } from '../../bench/library';

/** A slice of the generated library plus molecules with charges, isotopes and fused heteroaromatics. */
const LIBRARY = [
  ...generateLibrary(300, 99),
  'O=[N+]([O-])c1ccc(cc1)C(=O)OC',
  'C[N+](C)(C)CCOC(C)=O',
  '[2H]C([2H])([2H])Oc1ccccc1',
  'c1ccc2[nH]c(-c3ccncc3)nc2c1',
  'Cc1ccc2nc(N)sc2c1',
  'O=c1cc[nH]c(=O)[nH]1',
  'C1=CC=CC2=CC=CC=C12',
  'OC(=O)c1ccc2ccc3cccc4ccc1c2c34',
  'CC(C)=CCC/C(C)=C/CO',
];

/** Queries: the five benchmark queries, common groups, charged and aromatic variants. */
const QUERIES = [
  'c1ccccc1',
  'NC=O',
  'NS(=O)=O',
  'c1ccncc1',
  'c1ccc2[nH]ccc2c1',
  'CC',
  'C=C',
  'C:C',
  'CO',
  'C(=O)O',
  'CN',
  'C1CCNCC1',
  'c1ccsc1',
  'c1ccoc1',
  'c1cc[nH]c1',
  'C#N',
  'Cl',
  '[N+](=O)[O-]',
  '[N+]',
  'O=C(N)c1ccccc1',
  'C1CC1',
  'c1ccc(cc1)-c1ccccc1',
  'CC(C)(C)OC(=O)N',
  'N1CCOCC1',
  'C=CC=C',
  'OC(=O)C(N)C',
  'c1ccc2ccccc2c1',
  'c1cnc2ccccc2c1',
  '[2H]C',
  'CC=C(C)C',
  'O=c1cc[nH]c(=O)[nH]1',
  'S',
];

const index = new StructureSearchIndex();
const molecules: Molecule[] = [];

function exhaustive(query: Molecule): number[] {
  const fragment = query.getCompactCopy();
  fragment.setFragment(true);
  const searcher = new SSSearcher();
  searcher.setFragment(fragment);
  return molecules.flatMap((mol, id) => {
    searcher.setMolecule(mol);
    return searcher.isFragmentInMolecule() ? [id] : [];
  });
}

/** Connected pieces cut out of library molecules (deterministic), as drawn queries rather than SMILES. */
function cutFragments(count: number): Molecule[] {
  const fragments: Molecule[] = [];
  for (let i = 0; fragments.length < count; i += 7) {
    const mol = molecules[i % molecules.length];
    mol.ensureHelperArrays(Molecule.cHelperRings);
    const size = 3 + (i % 6);
    const keep = new Array<boolean>(mol.getAllAtoms()).fill(false);
    const queue = [i % mol.getAtoms()];
    keep[queue[0]] = true;
    for (let k = 0, taken = 1; k < queue.length && taken < size; k++) {
      for (let n = 0; n < mol.getConnAtoms(queue[k]) && taken < size; n++) {
        const next = mol.getConnAtom(queue[k], n);
        if (!keep[next]) {
          keep[next] = true;
          queue.push(next);
          taken++;
        }
      }
    }
    const fragment = new Molecule(0, 0);
    mol.copyMoleculeByAtoms(fragment, keep, true, null);
    fragments.push(fragment);
  }
  return fragments;
}

beforeAll(async () => {
  const idcodes = LIBRARY.map((smiles) => parseStructure(smiles).molecule.getIDCode());
  const keys = await searchKeysForIdcodes(idcodes);
  idcodes.forEach((idcode, id) => {
    index.upsert({ id, idcode, fingerprint: keys.fingerprints[id], graph: keys.graphs[id] });
    molecules.push(Molecule.fromIDCode(idcode, false));
  });
});
afterAll(() => closeFingerprintPool());

describe('substructure search (fingerprint pre-screen, then exact match)', () => {
  it.each(QUERIES)('finds exactly what SSSearcher finds checking every molecule for %s', (smiles) => {
    const query = parseStructure(smiles).molecule;
    expect(index.substructure(query).ids.sort((a, b) => a - b)).toEqual(exhaustive(query));
  });

  it('agrees with SSSearcher on 60 pieces cut from library molecules', () => {
    for (const fragment of cutFragments(60)) {
      expect(index.substructure(fragment).ids.sort((a, b) => a - b)).toEqual(exhaustive(fragment));
    }
  });

  it('decides plain queries with the fast matcher alone and leaves radical-bearing fragments to SSSearcher', () => {
    const plain = index.substructure(parseStructure('NC=O').molecule);
    expect(plain.searcherChecks).toBe(0);
    expect(plain.fastChecks).toBe(plain.candidates);
    const special = index.substructure(parseStructure('[N+](=O)[O-]').molecule);
    expect(special.fastChecks).toBe(0);
    expect(special.searcherChecks).toBe(special.candidates);
  });

  it('stops after the limit and forgets removed compounds', () => {
    const benzene = parseStructure('c1ccccc1').molecule;
    const all = index.substructure(benzene).ids;
    expect(index.substructure(benzene, { limit: 5 }).ids).toEqual(all.slice(0, 5));
    const local = new StructureSearchIndex();
    const idcode = parseStructure('c1ccccc1CCO').molecule.getIDCode();
    local.upsert({ id: 1, idcode, fingerprint: Molecule.fromIDCode(idcode, false).getIndex() });
    expect(local.substructure(benzene).ids).toEqual([1]);
    local.remove(1);
    expect(local.substructure(benzene).ids).toEqual([]);
  });
});
