import { describe, expect, it } from 'vitest';
import { computeDescriptors, hillFormula } from '../../../server/chem/descriptors';
import { parentOf } from '../../../server/chem/identity';
import { parseStructure } from '../../../server/chem/parse';
import { rdkitDescriptors, rdkitFormula } from './rdkit-reference';

const describeSmiles = (smiles: string) => computeDescriptors(parentOf(parseStructure(smiles).molecule).parent);

/** Diverse single-component molecules (drugs, reagents, protecting groups, heteroatoms B/Si/P/S/halogens). */
const DIVERSE = [
  'CC(=O)Oc1ccccc1C(=O)O',
  'Cn1cnc2c1c(=O)n(C)c(=O)n2C',
  'CC(C)Cc1ccc(cc1)C(C)C(=O)O',
  'CC(=O)Nc1ccc(O)cc1',
  'COc1ccc2cc(ccc2c1)[C@@H](C)C(=O)O',
  'OC[C@H]1O[C@H](O)[C@H](O)[C@@H](O)[C@@H]1O',
  'C[C@H](NC(=O)OC(C)(C)C)C(=O)O',
  'O=C(O)CNC(=O)OCC1c2ccccc2-c2ccccc12',
  'O=P(c1ccccc1)(c1ccccc1)c1ccccc1',
  'CS(C)=O',
  'CN(C)c1ccncc1',
  'N[C@@H](Cc1c[nH]c2ccccc12)C(=O)O',
  'O=[N+]([O-])c1ccccc1',
  'N#Cc1ccccc1',
  'CC(C)(C)[Si](C)(C)OCc1ccccc1',
  'OB(O)c1ccccc1',
  'Brc1ccccc1',
  'Ic1ccc(F)cc1',
  'CN(C)CCCN1c2ccccc2Sc2ccc(Cl)cc21',
  'Cc1cc(NS(=O)(=O)c2ccc(N)cc2)no1',
  'CC1(C)S[C@@H]2[C@H](NC(=O)Cc3ccccc3)C(=O)N2[C@H]1C(=O)O',
  'CC(C)[C@@H]1CC[C@@H](C)C[C@H]1O',
  'C1COCCOCCOCCOCCOCCO1',
  'C1C2CC3CC1CC(C2)C3',
  'OC(=O)C(F)(F)F',
  'Fc1c(F)c(F)c(F)c(F)c1F',
  'CN1C(=O)CN=C(c2ccccc2)c2cc(Cl)ccc21',
  'CN1CCC[C@H]1c1cccnc1',
  'C[N+](C)(C)CCO',
  '[2H]C(Cl)(Cl)Cl',
  'CC(=O)O[C@H]1C[C@@H]2CC[C@H]1C2',
];

describe('descriptors against RDKit MinimalLib (independent implementation)', () => {
  it.each(DIVERSE)('%s has the same Hill formula as RDKit', async (smiles) => {
    expect(describeSmiles(smiles).formula).toBe(await rdkitFormula(smiles));
  });

  it.each(DIVERSE)('%s has the average molecular weight of RDKit within 0.01 g/mol', async (smiles) => {
    const reference = await rdkitDescriptors(smiles);
    expect(Math.abs(describeSmiles(smiles).mw - reference.amw)).toBeLessThanOrEqual(0.01);
  });

  it.each(DIVERSE)('%s has the monoisotopic mass of RDKit within 0.01 Da', async (smiles) => {
    const reference = await rdkitDescriptors(smiles);
    expect(Math.abs(describeSmiles(smiles).exactMass - reference.exactmw)).toBeLessThanOrEqual(0.01);
  });

  it.each(DIVERSE)("%s has RDKit's H-bond donor and Lipinski acceptor counts", async (smiles) => {
    const reference = await rdkitDescriptors(smiles);
    const ours = describeSmiles(smiles);
    expect([ours.hbd, ours.hba]).toEqual([reference.NumHBD, reference.lipinskiHBA]);
  });
});

/** IUPAC CIAAW standard atomic weights, conventional values (ciaaw.org; see docs/references.md). */
const CIAAW: Record<string, number> = {
  H: 1.008,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  F: 18.998,
  P: 30.974,
  S: 32.06,
  Cl: 35.45,
  Br: 79.904,
  I: 126.9,
};

function weightByHand(formula: string): number {
  return [...formula.matchAll(/([A-Z][a-z]?)(\d*)/g)].reduce(
    (sum, [, symbol, count]) => sum + CIAAW[symbol] * Number(count || 1),
    0,
  );
}

describe('molecular weight by hand from IUPAC/CIAAW conventional atomic weights', () => {
  it.each([
    ['O', 'H2O'],
    ['CCO', 'C2H6O'],
    ['c1ccccc1', 'C6H6'],
    ['ClC(Cl)Cl', 'CHCl3'],
    ['CC(=O)O', 'C2H4O2'],
    ['Cn1cnc2c1c(=O)n(C)c(=O)n2C', 'C8H10N4O2'],
    ['CS(C)=O', 'C2H6OS'],
    ['BrCCBr', 'C2H4Br2'],
    ['OP(O)(O)=O', 'H3O4P'],
    ['FC(F)(F)I', 'CF3I'],
  ])('%s (%s) weighs the sum of its atoms within 0.01 g/mol', (smiles, formula) => {
    const ours = describeSmiles(smiles);
    expect(ours.formula).toBe(formula);
    expect(Math.abs(ours.mw - weightByHand(formula))).toBeLessThanOrEqual(0.01);
  });
});

describe('Hill formula conventions (Hill 1900)', () => {
  it('puts C then H first, then the rest alphabetically', () => {
    expect(describeSmiles('CS(=O)(=O)Nc1ccc(Br)cc1').formula).toBe('C7H8BrNO2S');
  });

  it('orders every element alphabetically when there is no carbon', () => {
    expect(describeSmiles('OS(=O)(=O)O').formula).toBe('H2O4S');
  });

  it('appends the net charge of an ion that has no proton to lose', () => {
    expect(hillFormula(parseStructure('C[N+](C)(C)C').molecule)).toBe('C4H12N+');
    expect(describeSmiles('C[N+](C)(C)C').charge).toBe(1);
  });
});
