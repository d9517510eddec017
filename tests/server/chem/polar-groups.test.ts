import { describe, expect, it } from 'vitest';
import { Molecule } from 'openchemlib';
import {
  polarGroupCounts,
  polarGroupCountsOfSmiles,
  polarGroupKeys,
  type PolarGroupKey,
} from '../../../server/chem/polar-groups';

/** The counted groups of a SMILES as a key → count record (zeros left out). */
function groupsOf(smiles: string): Partial<Record<PolarGroupKey, number>> {
  const counts = polarGroupCounts(Molecule.fromSmiles(smiles));
  return Object.fromEntries(
    polarGroupKeys.map((key, index) => [key, counts[index]]).filter(([, count]) => count !== 0),
  );
}

/** Functional-group assignments checked by hand (common practice). */
describe('polar group counts for Scout', () => {
  it.each([
    ['CC(=O)c1ccccc1', { ketone: 1 }],
    ['O=Cc1ccccc1', { aldehyde: 1 }],
    ['CC(=O)OCC', { ester: 1 }],
    ['OC(=O)c1ccccc1', { 'carboxylic-acid': 1 }],
    ['CC(=O)Nc1ccccc1', { 'amide-carbonyl': 1, 'amide-nh': 1 }],
    ['COc1ccccc1', { 'aryl-ether': 1 }],
    ['CCOCC', { 'alkyl-ether': 1 }],
    ['Oc1ccccc1', { 'phenol-oh': 1 }],
    ['OCc1ccccc1', { 'alcohol-oh': 1 }],
    ['[O-][N+](=O)c1ccccc1', { nitro: 1 }],
    ['N#Cc1ccccc1', { nitrile: 1 }],
    ['c1ccncc1', { 'pyridine-n': 1 }],
    ['c1ccc2[nH]ccc2c1', { 'pyrrole-nh': 1 }],
    ['Nc1ccccc1', { 'aniline-nh2': 1 }],
    ['CCN(CC)CC', { 'amine-n': 1 }],
    ['CS(=O)(=O)c1ccccc1', { sulfonyl: 1 }],
    ['CSc1ccccc1', { sulfide: 1 }],
    ['c1ccsc1', { 'thiophene-s': 1 }],
  ])('when %s is counted, then its polar groups are %o', (smiles, expected) => {
    const groups = groupsOf(smiles);
    const polar = Object.fromEntries(
      Object.entries(groups).filter(
        ([key]) => !['aromatic-carbon', 'aliphatic-carbon', 'alkene-carbon', 'polar-total'].includes(key),
      ),
    );
    expect(polar).toEqual(expected);
    expect(groups['polar-total']).toBe(Object.values(expected).reduce((sum, count) => sum + count, 0));
  });

  it(
    'when a donor sits next to a carbonyl or nitro group (salicylaldehyde, 2-nitrophenol), then an ' +
      'intramolecular H-bond is counted, and not for the para isomers',
    () => {
      expect(groupsOf('Oc1ccccc1C=O')['intramolecular-h-bond']).toBe(1);
      expect(groupsOf('Oc1ccccc1[N+](=O)[O-]')['intramolecular-h-bond']).toBe(1);
      expect(groupsOf('Oc1ccc(C=O)cc1')['intramolecular-h-bond']).toBeUndefined();
      expect(groupsOf('Oc1ccc([N+](=O)[O-])cc1')['intramolecular-h-bond']).toBeUndefined();
    },
  );

  it('when both ring neighbours of a pyridine nitrogen carry substituents (2,6-lutidine), then it is counted as shielded', () => {
    expect(groupsOf('Cc1cccc(C)n1')).toMatchObject({ 'pyridine-n-shielded': 1 });
    expect(groupsOf('Cc1ccccn1')).toMatchObject({ 'pyridine-n': 1 });
  });

  it('when a molecule has no polar group (a haloarene, a hydrocarbon), then it is flagged so', () => {
    expect(groupsOf('Brc1ccccc1')).toMatchObject({ bromine: 1, 'no-polar-group': 1, 'aromatic-carbon': 6 });
    expect(groupsOf('CCCCCC')['no-polar-group']).toBe(1);
    expect(groupsOf('CCO')['no-polar-group']).toBeUndefined();
  });

  it('when a SMILES cannot be read, then the counts are all zero rather than an error', () => {
    expect(polarGroupCountsOfSmiles('not a smiles((')).toEqual(polarGroupKeys.map(() => 0));
    expect(polarGroupCountsOfSmiles('CC=O')).toEqual(polarGroupCounts(Molecule.fromSmiles('CC=O')));
  });
});
