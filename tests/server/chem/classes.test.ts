import { describe, expect, it } from 'vitest';
import { compoundClasses, compoundClassKeys, type CompoundClassKey } from '../../../shared/catalogue/compound-classes';
import { classify } from '../../../server/chem/classes';
import { parentOf } from '../../../server/chem/identity';
import { parseStructure } from '../../../server/chem/parse';

function classesOf(smiles: string): CompoundClassKey[] {
  const input = parseStructure(smiles).molecule;
  const { parent, fragments } = parentOf(input);
  return classify(parent, { molecule: input, fragments });
}

/**
 * Hand-checked examples for every class (functional-group assignments by common practice).
 * `must` structures belong to the class, `mustNot` structures are near misses that do not.
 */
const EXAMPLES: Record<CompoundClassKey, { must: string[]; mustNot: string[] }> = {
  'carboxylic-acid': {
    must: ['CC(=O)O', 'OC(=O)c1ccccc1', 'CC(=O)[O-].[Na+]', 'OC(=O)CCC(=O)O'],
    mustNot: ['CC(=O)OC', 'CC(N)=O', 'OC(=O)OC', 'CC=O'],
  },
  ester: {
    must: ['CC(=O)OC', 'CC(=O)Oc1ccccc1', 'O=C1CCCCO1', 'O=COC'],
    mustNot: ['CC(=O)O', 'COC(=O)OC', 'CC(=O)OC(C)=O', 'CNC(=O)OC', 'CC(=O)SC'],
  },
  lactone: { must: ['O=C1CCCO1', 'O=C1CCCCO1', 'O=C1OCc2ccccc12'], mustNot: ['CC(=O)OC', 'O=C1CCCN1', 'O=C1OCCO1'] },
  amide: {
    must: ['CC(N)=O', 'CNC(=O)c1ccccc1', 'CN(C)C=O', 'O=C1CCCN1', 'CC(=O)Nc1ccccc1'],
    mustNot: ['NC(N)=O', 'CNC(=O)OC(C)(C)C', 'CS(N)(=O)=O', 'CCN', 'CC(=O)O'],
  },
  lactam: {
    must: ['O=C1CCCN1', 'O=C1CCCCCN1', 'O=C1Nc2ccccc2C1'],
    mustNot: ['CC(=O)N1CCCC1', 'CNC(C)=O', 'O=C1NCCN1'],
  },
  carbamate: {
    must: ['CNC(=O)OC(C)(C)C', 'O=C(NCc1ccccc1)OCc1ccccc1', 'O=C1OCCN1'],
    mustNot: ['CC(N)=O', 'NC(N)=O', 'COC(=O)OC'],
  },
  urea: {
    must: ['NC(N)=O', 'CNC(=O)NC', 'O=C1NCCN1', 'O=C(Nc1ccccc1)N1CCCC1'],
    mustNot: ['CC(N)=O', 'CNC(=O)OC', 'NC(N)=S'],
  },
  'primary-amine': {
    must: ['CCN', 'NCc1ccccc1', 'NC1CCCCC1', 'CN.Cl'],
    mustNot: ['Nc1ccccc1', 'CC(N)=O', 'CNC', 'NS(=O)(=O)c1ccccc1', 'NN'],
  },
  'secondary-amine': {
    must: ['CNC', 'C1CCNCC1', 'C1CCNC1', 'CNCc1ccccc1'],
    mustNot: ['CNc1ccccc1', 'CNC(C)=O', 'CN(C)C', 'c1cc[nH]c1', 'CCN'],
  },
  'tertiary-amine': {
    must: ['CCN(CC)CC', 'CN1CCCCC1', 'CN1CCOCC1'],
    mustNot: ['CN(C)c1ccccc1', 'CN(C)C=O', 'CNC', 'C[N+](C)(C)C', 'Cn1ccnc1'],
  },
  aniline: {
    must: ['Nc1ccccc1', 'CNc1ccccc1', 'CN(C)c1ccccc1', 'c1ccc(Nc2ccccc2)cc1', 'Nc1ccncc1'],
    mustNot: ['CC(=O)Nc1ccccc1', 'NCc1ccccc1', 'CS(=O)(=O)Nc1ccccc1', 'c1ccncc1'],
  },
  pyridine: {
    must: ['c1ccncc1', 'c1ccc2ncccc2c1', 'c1cncnc1', 'Cc1ccccn1'],
    mustNot: ['c1cc[nH]c1', 'C[n+]1ccccc1', '[O-][n+]1ccccc1', 'c1cnc[nH]1', 'C1CCNCC1'],
  },
  indole: {
    must: ['c1ccc2[nH]ccc2c1', 'Cn1ccc2ccccc21', 'NCCc1c[nH]c2ccccc12'],
    mustNot: ['c1ccc2ncccc2c1', 'c1cc[nH]c1', 'c1ccc2[nH]cnc2c1', 'C1Cc2ccccc2N1'],
  },
  imidazole: {
    must: ['c1cnc[nH]1', 'Cn1ccnc1', 'c1ccc2[nH]cnc2c1', 'Cc1ncc[nH]1'],
    mustNot: ['c1cn[nH]c1', 'c1cocn1', 'c1ccncc1', 'C1CNC=N1'],
  },
  heteroaromatic: {
    must: ['c1ccncc1', 'c1ccoc1', 'c1ccsc1', 'c1ccc2[nH]ccc2c1', 'c1nnn[nH]1'],
    mustNot: ['c1ccccc1', 'C1CCOC1', 'c1ccc2ccccc2c1', 'C1=CCNC=C1'],
  },
  aromatic: {
    must: ['c1ccccc1', 'c1ccncc1', 'c1ccoc1', 'Cc1ccccc1'],
    mustNot: ['C1=CCC=CC1', 'C1CCCCC1', 'CC=CC=C', 'O=C1C=CC(=O)C=C1'],
  },
  alcohol: {
    must: ['CCO', 'OC1CCCCC1', 'CC(C)(C)O', 'OCc1ccccc1'],
    mustNot: ['Oc1ccccc1', 'CC(=O)O', 'COC', 'CC=O', 'C=CO'],
  },
  phenol: {
    must: ['Oc1ccccc1', 'Cc1ccc(O)cc1', 'Oc1ccccc1O'],
    mustNot: ['OCc1ccccc1', 'COc1ccccc1', 'CC(=O)Oc1ccccc1'],
  },
  diol: {
    must: ['OCCO', 'OCC(O)CO', 'OC1CCCCC1O', 'OC[C@H]1O[C@H](O)[C@H](O)[C@@H](O)[C@@H]1O'],
    mustNot: ['CCO', 'Oc1ccccc1O', 'OCCOC', 'OC(=O)CC(=O)O'],
  },
  ether: {
    must: ['CCOCC', 'COc1ccccc1', 'C1CCOC1', 'c1ccc(Oc2ccccc2)cc1'],
    mustNot: ['CC(=O)OC', 'C1CO1', 'COCOC', 'c1ccoc1', 'CO[Si](C)(C)C', 'CCO'],
  },
  acetal: {
    must: ['COC(C)OC', 'C1OCCO1', 'COCOC', 'CC1(C)OCCO1', 'COC1CCCCO1'],
    mustNot: ['CCOCC', 'COC(C)=O', 'OC(O)C', 'COC(=O)OC'],
  },
  aldehyde: { must: ['CC=O', 'O=Cc1ccccc1', 'C=O'], mustNot: ['CC(C)=O', 'O=COC', 'NC=O', 'OC=O'] },
  ketone: {
    must: ['CC(C)=O', 'O=C1CCCCC1', 'CC(=O)c1ccccc1', 'O=C1C=CC(=O)C=C1'],
    mustNot: ['CC=O', 'CC(=O)OC', 'CC(N)=O', 'CC(=O)O'],
  },
  alkene: {
    must: ['C=C', 'CC=CC', 'C1=CCCCC1', 'C=CC(=O)OC', 'C=Cc1ccccc1'],
    mustNot: ['c1ccccc1', 'c1ccoc1', 'CC(C)=O', 'C#C'],
  },
  alkyne: { must: ['C#C', 'CC#CC', 'C#Cc1ccccc1'], mustNot: ['C=C', 'CC#N'] },
  nitrile: { must: ['CC#N', 'N#Cc1ccccc1', 'N#CCC#N'], mustNot: ['[C-]#[N+]C', 'C#C', 'CN=C=O'] },
  nitro: {
    must: ['C[N+](=O)[O-]', 'O=[N+]([O-])c1ccccc1', 'CN(=O)=O'],
    mustNot: ['CO[N+](=O)[O-]', 'CON=O', '[O-][n+]1ccccc1'],
  },
  'aryl-halide': {
    must: ['Clc1ccccc1', 'Brc1ccncc1', 'Ic1ccccc1', 'Fc1ccccc1'],
    mustNot: ['ClCc1ccccc1', 'CCBr', 'ClC=C', 'CC(=O)Cl'],
  },
  'alkyl-halide': {
    must: ['CCBr', 'ClCc1ccccc1', 'ClCCl', 'FC(F)(F)c1ccccc1'],
    mustNot: ['Clc1ccccc1', 'ClC=C', 'CC(=O)Cl'],
  },
  sulfonamide: {
    must: ['CS(N)(=O)=O', 'CS(=O)(=O)Nc1ccccc1', 'Cc1ccc(cc1)S(=O)(=O)N1CCCC1'],
    mustNot: ['CS(C)(=O)=O', 'CS(=O)(=O)OC', 'CC(N)=O'],
  },
  sulfone: {
    must: ['CS(C)(=O)=O', 'O=S1(=O)CCCC1', 'CS(=O)(=O)c1ccccc1'],
    mustNot: ['CS(C)=O', 'CS(N)(=O)=O', 'CS(=O)(=O)O'],
  },
  sulfide: { must: ['CSC', 'C1CCSC1', 'CSc1ccccc1'], mustNot: ['CS(C)=O', 'c1ccsc1', 'CCS', 'CSSC'] },
  thiol: { must: ['CCS', 'Sc1ccccc1', 'OCCS'], mustNot: ['CSC', 'c1ccsc1', 'CC(=O)SC'] },
  boronic: {
    must: ['OB(O)c1ccccc1', 'CC1(C)OB(c2ccccc2)OC1(C)C', 'CCCCB(O)O'],
    mustNot: ['OB(O)O', 'COB(OC)OC', 'F[B-](F)(F)c1ccccc1'],
  },
  'silyl-ether': {
    must: ['CO[Si](C)(C)C', 'CC(C)(C)[Si](C)(C)OCC', 'C[Si](C)(C)Oc1ccccc1'],
    mustNot: ['C[Si](C)(C)C', 'CC(=O)O[Si](C)(C)C', 'C[Si](C)(C)O[Si](C)(C)C'],
  },
  epoxide: { must: ['C1CO1', 'CC1OC1C', 'c1ccc(cc1)C1CO1'], mustNot: ['C1COC1', 'CCOCC', 'C1CN1'] },
  'ammonium-salt': {
    must: ['C[N+](C)(C)C.[Br-]', 'C[NH3+].[Cl-]', 'CN.Cl', 'c1cc[nH+]cc1.[Cl-]', 'CCCC[N+](CCCC)(CCCC)CCCC'],
    mustNot: ['CN', '[NH3+]CC([O-])=O', 'O=[N+]([O-])c1ccccc1', 'CC(N)=O.Cl', 'CC(=O)[O-].[Na+]'],
  },
  'amino-acid': {
    must: [
      'NCC(=O)O',
      'C[C@H](N)C(=O)O',
      'CC(C)(C)OC(=O)N[C@@H](C)C(=O)O',
      'NCCC(=O)O',
      '[NH3+]CC([O-])=O',
      'OC(=O)[C@@H]1CCCN1',
    ],
    mustNot: ['NCC(=O)OC', 'Nc1ccccc1C(=O)O', 'NCCCCC(=O)O', 'CC(N)=O'],
  },
  'phosphine-oxide': {
    must: ['O=P(c1ccccc1)(c1ccccc1)c1ccccc1', 'CP(C)(C)=O', 'C[P+](C)(C)[O-]'],
    mustNot: ['COP(=O)(OC)OC', 'CP(C)C', 'COP(C)(=O)OC'],
  },
  conjugated: {
    must: ['c1ccccc1', 'C=CC=C', 'C=CC(C)=O', 'C=CC#N', 'CC#CC=O'],
    mustNot: ['C=CCC=C', 'CC(C)=O', 'CCC#N', 'C1CCCCC1'],
  },
};

describe('the compound class catalogue', () => {
  it('has every agreed key once, each with a name, description, group and fragments', () => {
    expect(compoundClasses.map((c) => c.key).sort()).toEqual([...compoundClassKeys].sort());
    for (const entry of compoundClasses) {
      expect(entry.name.length * entry.description.length * entry.include.length).toBeGreaterThan(0);
    }
  });
});

describe.each(compoundClassKeys)('class %s', (key) => {
  const { must, mustNot } = EXAMPLES[key];
  it.each(must)(`includes %s`, (smiles) => {
    expect(classesOf(smiles)).toContain(key);
  });
  it.each(mustNot)(`excludes %s`, (smiles) => {
    expect(classesOf(smiles)).not.toContain(key);
  });
});

describe('classes of whole molecules', () => {
  it('aspirin is a carboxylic acid, an ester, aromatic and conjugated, and nothing else', () => {
    expect(classesOf('CC(=O)Oc1ccccc1C(=O)O').sort()).toEqual(['aromatic', 'carboxylic-acid', 'conjugated', 'ester']);
  });

  it('Boc-alanine is a carbamate-protected amino acid, not an amine or an amide', () => {
    const classes = classesOf('CC(C)(C)OC(=O)N[C@@H](C)C(=O)O');
    expect(classes).toEqual(expect.arrayContaining(['carbamate', 'amino-acid', 'carboxylic-acid']));
    expect(classes).not.toEqual(expect.arrayContaining(['amide']));
    expect(classes.filter((c) => c.endsWith('-amine'))).toEqual([]);
  });
});
