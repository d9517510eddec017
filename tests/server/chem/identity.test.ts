import { Molecule } from 'openchemlib';
import { describe, expect, it } from 'vitest';
import { identify } from '../../../server/chem/identity';
import { parseStructure } from '../../../server/chem/parse';

const idOf = (text: string) => identify(parseStructure(text).molecule);

/** The same compounds written as different SMILES (atom order, ring labels, Kekulé vs aromatic, branches). */
const SAME_COMPOUND: Record<string, string[]> = {
  aspirin: [
    'CC(=O)Oc1ccccc1C(=O)O',
    'OC(=O)c1ccccc1OC(C)=O',
    'CC(=O)OC1=CC=CC=C1C(O)=O',
    'c1cccc(C(=O)O)c1OC(=O)C',
    'O=C(O)c1c(OC(C)=O)cccc1',
  ],
  caffeine: ['Cn1cnc2c1c(=O)n(C)c(=O)n2C', 'CN1C=NC2=C1C(=O)N(C)C(=O)N2C', 'O=c1n(C)c(=O)c2n(C)cnc2n1C'],
  naphthalene: ['c1ccc2ccccc2c1', 'C1=CC=C2C=CC=CC2=C1', 'c12ccccc1cccc2'],
  indole: ['c1ccc2[nH]ccc2c1', 'N1C=CC2=CC=CC=C12', '[nH]1ccc2ccccc12'],
  'L-alanine': ['C[C@H](N)C(=O)O', 'N[C@@H](C)C(=O)O', 'OC(=O)[C@H](C)N', 'C[C@@H](C(=O)O)N'],
  'trans-2-butene': ['C/C=C/C', 'C\\C=C\\C', 'C(\\C)=C/C'],
  ibuprofen: ['CC(C)Cc1ccc(cc1)C(C)C(=O)O', 'OC(=O)C(C)c1ccc(CC(C)C)cc1', 'CC(C(O)=O)C1=CC=C(CC(C)C)C=C1'],
  quinoline: ['c1ccc2ncccc2c1', 'n1cccc2ccccc12', 'C1=CC=C2N=CC=CC2=C1'],
};

describe('one compound, one identity', () => {
  it.each(Object.entries(SAME_COMPOUND))('every way of writing %s gives one ID code', (_name, variants) => {
    expect(new Set(variants.map((smiles) => idOf(smiles).idcode)).size).toBe(1);
  });

  it('different compounds get different ID codes', () => {
    const codes = Object.values(SAME_COMPOUND).map((variants) => idOf(variants[0]).idcode);
    expect(new Set(codes).size).toBe(codes.length);
  });

  it.each(Object.entries(SAME_COMPOUND))('%s survives a V2000 and a V3000 molfile round trip', (_name, [smiles]) => {
    const { idcode, molfile } = idOf(smiles);
    const v3000 = Molecule.fromSmiles(smiles).toMolfileV3();
    expect(idOf(molfile).idcode).toBe(idcode);
    expect(idOf(v3000).idcode).toBe(idcode);
  });

  it('reads a V2000 molfile with chiral flag 0 as the configuration drawn, not as racemic', () => {
    const molfile = Molecule.fromSmiles('C[C@H](N)C(=O)O').toMolfile();
    const lines = molfile.split('\n');
    lines[3] = `${lines[3].slice(0, 12)}  0${lines[3].slice(15)}`;
    expect(idOf(lines.join('\n')).idcode).toBe(idOf('C[C@H](N)C(=O)O').idcode);
  });
});

describe('salts, solvates and mixtures map to the parent', () => {
  it.each([
    ['CN', ['CN.Cl', 'C[NH3+].[Cl-]', 'Cl.CN', 'C[NH3+]']],
    ['CC(=O)O', ['CC(=O)[O-].[Na+]', 'CC(=O)O.O', '[K+].CC([O-])=O']],
    ['C[C@H](N)C(=O)O', ['C[C@H]([NH3+])C([O-])=O', 'C[C@H](N)C(=O)O.Cl', 'C[C@H]([NH3+])C(=O)O.OC(=O)C(F)(F)F']],
    ['c1ccncc1', ['c1cc[nH+]cc1.[Cl-]', 'c1ccncc1.OS(=O)(=O)O']],
    ['CCCCN', ['CCCC[NH3+].[O-]C(=O)C(F)(F)F', 'CCCCN.Cc1ccc(cc1)S(=O)(=O)O']],
  ])('%s is the parent of its salts and hydrates', (parent, inputs) => {
    for (const input of inputs) expect(idOf(input).idcode).toBe(idOf(parent).idcode);
  });

  it('keeps the whole input apart from the identity and marks the salt', () => {
    const identity = idOf('CN.Cl');
    expect(identity.isSalt).toBe(true);
    expect(identity.inputIdcode).not.toBe(identity.idcode);
    expect(identity.fragments.map((f) => f.role)).toEqual(['parent', 'counter-ion']);
  });

  it('keeps a quaternary ammonium charged (no proton to remove) and drops its bromide', () => {
    const identity = idOf('C[N+](C)(C)C.[Br-]');
    expect(identity.canonicalSmiles).toBe(idOf('C[N+](C)(C)C').canonicalSmiles);
    expect(identity.isSalt).toBe(true);
  });

  it('keeps nitro groups and N-oxides as drawn (their charges cancel on neighbours)', () => {
    expect(idOf('O=[N+]([O-])c1ccccc1').idcode).toBe(Molecule.fromSmiles('O=[N+]([O-])c1ccccc1').getIDCode());
    expect(idOf('[O-][n+]1ccccc1').idcode).not.toBe(idOf('c1ccncc1').idcode);
  });

  it('flags two unrelated organic components as a mixture and takes the larger as parent', () => {
    const identity = idOf('CCN.CCCCCCc1ccccc1');
    expect(identity.isMixture).toBe(true);
    expect(identity.idcode).toBe(idOf('CCCCCCc1ccccc1').idcode);
  });

  it('counts a listed solvent as solvate, not as mixture or salt', () => {
    const identity = idOf('CS(C)=O.Oc1ccccc1C(=O)O');
    expect(identity).toMatchObject({ isSalt: false, isMixture: false });
    const solvate = identity.fragments.find((f) => f.role === 'solvent');
    expect(idOf(solvate?.smiles ?? '').idcode).toBe(idOf('CS(C)=O').idcode);
  });
});

describe('stereo counts as drawn', () => {
  it('the two enantiomers of alanine are different compounds', () => {
    expect(idOf('C[C@H](N)C(=O)O').idcode).not.toBe(idOf('C[C@@H](N)C(=O)O').idcode);
  });

  it('alanine with its stereocentre undefined is a third compound, flagged as undefined', () => {
    const undefinedCentre = idOf('CC(N)C(=O)O');
    expect([idOf('C[C@H](N)C(=O)O').idcode, idOf('C[C@@H](N)C(=O)O').idcode]).not.toContain(undefinedCentre.idcode);
    expect(undefinedCentre.undefinedStereocentres).toBe(1);
    expect(idOf('C[C@H](N)C(=O)O').undefinedStereocentres).toBe(0);
  });

  it('E and Z alkenes are different compounds', () => {
    expect(idOf('C/C=C/C').idcode).not.toBe(idOf('C/C=C\\C').idcode);
  });
});
