import { describe, expect, it } from 'vitest';
import {
  firstSdfRecord,
  firstSmiles,
  looksLikeMolfile,
  structureToSend,
} from '../../src/components/structure-input/structure-text';

// Molfile and SDF layout: the header block of three lines, the counts line ending in V2000, `M  END`,
// data items as `> <NAME>`, records ended by `$$$$` (MDL CTfile formats, the open standard).
const molfile = 'aspirin\n\n\n  1  0  0  0  0  0  0  0  0  0999 V2000\n    0.0000    0.0000    0.0000 C   0  0\nM  END';

describe('structure text helpers', () => {
  it('tells a molfile from a SMILES by its counts line or M  END', () => {
    expect(looksLikeMolfile(molfile)).toBe(true);
    expect(looksLikeMolfile('CC(=O)O')).toBe(false);
  });

  it('trims a SMILES but keeps a molfile’s blank header lines as they are', () => {
    expect(structureToSend('  CCO \n')).toBe('CCO');
    const blankHeader = `\n${molfile.slice('aspirin\n'.length)}`;
    expect(structureToSend(blankHeader)).toBe(blankHeader);
  });

  it('takes the first SDF record and says whether more follow', () => {
    expect(firstSdfRecord(`${molfile}\n$$$$\n${molfile}\n$$$$\n`)).toEqual({ record: `${molfile}\n`, more: true });
    expect(firstSdfRecord(`${molfile}\n$$$$\n\n`)).toEqual({ record: `${molfile}\n`, more: false });
    expect(firstSdfRecord(molfile)).toEqual({ record: molfile, more: false });
  });

  it('reads the first SMILES of a .smi file, skipping blank and comment lines and the name column', () => {
    expect(firstSmiles('# made by hand\n\nc1ccccc1O phenol\nCCO ethanol\n')).toBe('c1ccccc1O');
  });
});
