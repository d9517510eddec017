import { Molecule } from 'openchemlib';
import { describe, expect, it } from 'vitest';
import { StructureError } from '../../../server/chem/errors';
import { parseStructure } from '../../../server/chem/parse';

/** Phenol as OpenChemLib writes it in V3000 (MDL CTfile format, V3000 connection table). */
const phenolV3000 = () => Molecule.fromSmiles('Oc1ccccc1').toMolfileV3().split('\n');
const atomLine = (lines: string[], n: number) =>
  lines.findIndex((line) => line.startsWith(`M  V30 ${n} `) && !line.includes('COUNTS'));

function refusal(text: string): StructureError {
  try {
    parseStructure(text);
  } catch (error) {
    if (error instanceof StructureError) return error;
    throw error;
  }
  throw new Error('the molfile was accepted');
}

describe('V3000 molfiles whose atom and bond blocks do not fit together (found by fuzzing)', () => {
  it('reads the intact file', () => {
    expect(parseStructure(phenolV3000().join('\n')).molecule.getAllAtoms()).toBeGreaterThanOrEqual(7);
  });

  it('when an atom line is replaced by another keyword, then 400 molfile_invalid naming that line, not a crash', () => {
    const lines = phenolV3000();
    const at = atomLine(lines, 4);
    lines[at] = 'M  V30 BEGIN CTAB';
    const error = refusal(lines.join('\n'));
    expect(error).toMatchObject({ status: 400, code: 'molfile_invalid', details: { line: at + 1 } });
    expect(error.message).toMatch(/expected atom 4 of 7/);
  });

  it('when a bond names an atom the ATOM block does not have, then 400 molfile_invalid naming the bond line', () => {
    const lines = phenolV3000();
    const bond = lines.findIndex((line) => line.startsWith('M  V30 BEGIN BOND')) + 1;
    lines[bond] = lines[bond].replace(/^(M {2}V30 \d+ \d+ )\d+/, '$199');
    const error = refusal(lines.join('\n'));
    expect(error).toMatchObject({ status: 400, code: 'molfile_invalid', details: { line: bond + 1 } });
    expect(error.message).toMatch(/between atoms of the ATOM block/);
  });
});
