import { Molecule } from 'openchemlib';
import { describe, expect, it } from 'vitest';
import { StructureError } from '../../../server/chem/errors';
import { parseSdf, parseStructure } from '../../../server/chem/parse';

function refusal(text: string): StructureError {
  try {
    parseStructure(text);
  } catch (error) {
    if (error instanceof StructureError) return error;
    throw error;
  }
  throw new Error(`"${text.slice(0, 30)}" was accepted`);
}

const alanineMolfile = Molecule.fromSmiles('C[C@H](N)C(=O)O').toMolfile();

describe('parseStructure reads the formats it is given', () => {
  it('reads SMILES and keeps a name written after it, as in SMILES files', () => {
    const parsed = parseStructure('CCO ethanol, absolute');
    expect(parsed.format).toBe('smiles');
    expect(parsed.name).toBe('ethanol, absolute');
    expect(parsed.molecule.getMolecularFormula().formula).toBe('C2H6O');
  });

  it('reads a V2000 molfile and a V3000 molfile of one compound to the same ID code', () => {
    const v3000 = Molecule.fromSmiles('C[C@H](N)C(=O)O').toMolfileV3();
    expect(parseStructure(alanineMolfile).format).toBe('molfile');
    expect(parseStructure(v3000).molecule.getIDCode()).toBe(parseStructure(alanineMolfile).molecule.getIDCode());
  });

  it('reads a molfile whose blank header lines were trimmed away when pasted', () => {
    expect(parseStructure(alanineMolfile.trimStart()).molecule.getIDCode()).toBe(
      parseStructure(alanineMolfile).molecule.getIDCode(),
    );
  });

  it('reads one SDF record with its data items', () => {
    const parsed = parseStructure(`${alanineMolfile}> <name>\nL-alanine\n\n> <cas>\n56-41-7\n\n$$$$\n`);
    expect(parsed.format).toBe('sdf');
    expect(parsed.fields).toEqual({ name: 'L-alanine', cas: '56-41-7' });
  });

  it('accepts charged atoms within their valence: ammonium, nitro, N-oxide, hexafluorophosphate', () => {
    for (const smiles of ['C[N+](C)(C)C', 'C[N+](=O)[O-]', '[O-][n+]1ccccc1', 'F[P-](F)(F)(F)(F)F', 'CN(=O)=O']) {
      expect(() => parseStructure(smiles)).not.toThrow();
    }
  });
});

describe('parseStructure refuses bad input with a reason and a place', () => {
  it('refuses empty text with 400', () => {
    expect(refusal('   \n ')).toMatchObject({ status: 400, code: 'structure_empty' });
  });

  it('refuses text over 20 kB with 413 before parsing', () => {
    expect(refusal(`C${'C'.repeat(20_000)}`)).toMatchObject({ status: 413, code: 'structure_too_large' });
  });

  it('refuses more than 250 heavy atoms with 422', () => {
    expect(refusal('C'.repeat(251))).toMatchObject({ status: 422, code: 'structure_too_many_atoms' });
  });

  it('refuses an unclosed branch (which OpenChemLib reads as propane) and says where it opened', () => {
    const error = refusal('CC(C');
    expect(error).toMatchObject({ status: 400, code: 'smiles_unclosed_branch', details: { position: 3 } });
    expect(error.message).toContain('position 3');
  });

  it('refuses a ring bond that is never closed', () => {
    expect(refusal('C1CC')).toMatchObject({ code: 'smiles_unclosed_ring', details: { position: 2 } });
  });

  it('refuses a ")" without "(" and an empty branch', () => {
    expect(refusal('CC)C')).toMatchObject({ code: 'smiles_syntax', details: { position: 3 } });
    expect(refusal('C()C')).toMatchObject({ code: 'smiles_syntax', details: { position: 2 } });
  });

  it('refuses a pentavalent carbon (which OpenChemLib reads as C6H15) and names the atom', () => {
    const error = refusal('C(C)(C)(C)(C)C');
    expect(error).toMatchObject({ status: 422, code: 'valence', details: { atom: 1, position: 1 } });
    expect(error.message).toMatch(/5 bonds; C allows 4/);
  });

  it('refuses an uncharged four-bonded nitrogen but accepts the ammonium ion', () => {
    expect(refusal('CN(C)(C)C')).toMatchObject({ code: 'valence', details: { atom: 2 } });
    expect(() => parseStructure('C[N+](C)(C)C')).not.toThrow();
  });

  it('refuses an atom written with a valence it does not have, such as [CH5]', () => {
    expect(refusal('[CH5]')).toMatchObject({ code: 'valence' });
  });

  it('refuses an aromatic ring that cannot be kekulised and points at the atom', () => {
    expect(refusal('c1ccnc1')).toMatchObject({ status: 422, code: 'aromaticity', details: { position: 6 } });
  });

  it('refuses wildcard atoms', () => {
    expect(refusal('c1ccccc1*')).toMatchObject({ code: 'pseudo_atom', details: { position: 9 } });
  });

  it("passes on the SMILES parser's own reason with the position counted from 1", () => {
    const error = refusal('CCQ');
    expect(error.code).toBe('smiles_syntax');
    expect(error.details?.position).toBe(3);
  });

  it('refuses text after a space when that text is itself a structure', () => {
    expect(refusal('CC O')).toMatchObject({ code: 'smiles_syntax', details: { position: 3 } });
  });

  it('refuses several lines of SMILES', () => {
    expect(refusal('CCO\nCCN')).toMatchObject({ status: 422, code: 'structure_several' });
  });

  it('refuses a truncated molfile and names the missing line', () => {
    const truncated = alanineMolfile.split('\n').slice(0, 7).join('\n');
    expect(refusal(truncated)).toMatchObject({ status: 400, code: 'molfile_invalid', details: { line: 8 } });
  });

  it('refuses a molfile without "M  END"', () => {
    expect(refusal(alanineMolfile.replace('M  END', ''))).toMatchObject({ code: 'molfile_invalid' });
  });

  it('refuses a garbage molfile whose counts line OpenChemLib would read as an empty molecule', () => {
    expect(refusal('\n\n\n  0  0  0  0  0  0  0  0  0  0999 V2000\nM  END\n')).toMatchObject({
      code: 'structure_empty',
    });
    expect(refusal('title\nprogram\n\n  x  y  0  0  0  0  0  0  0  0999 V2000\n')).toMatchObject({
      code: 'molfile_invalid',
      details: { line: 4 },
    });
  });

  it('refuses an unknown element in a molfile as a pseudo atom on its line', () => {
    expect(refusal(alanineMolfile.replace(' N   0', ' Xx  0'))).toMatchObject({
      code: 'pseudo_atom',
      details: { line: 7 },
    });
  });

  it('refuses SDF text with several records when one structure is expected', () => {
    expect(refusal(`${alanineMolfile}$$$$\n${alanineMolfile}$$$$\n`)).toMatchObject({
      status: 422,
      code: 'sdf_several_records',
    });
  });
});

describe('parseSdf reads every record and keeps going past bad ones', () => {
  it('returns structures, fields and per-record errors in file order', () => {
    const bad = Molecule.fromSmiles('C(C)(C)(C)(C)C').toMolfile();
    const records = parseSdf(`${alanineMolfile}> <id>\nA1\n\n$$$$\n${bad}> <id>\nA2\n\n$$$$\n${alanineMolfile}$$$$\n`);
    expect(records.map((r) => r.index)).toEqual([1, 2, 3]);
    expect(records[0].fields).toEqual({ id: 'A1' });
    expect(records[0].structure?.molecule.getMolecularFormula().formula).toBe('C3H7NO2');
    expect(records[1].error).toMatchObject({ code: 'valence' });
    expect(records[1].fields).toEqual({ id: 'A2' });
    expect(records[2].structure?.molecule.getMolecularFormula().formula).toBe('C3H7NO2');
  });
});
