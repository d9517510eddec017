import { describe, expect, it } from 'vitest';
import { readNumber, readOutcome, readTechnique, splitVisualisations } from '../../server/features/imports/cells';
import { sniffDelimiter } from '../../server/features/imports/csv-source';

describe('cells of a spreadsheet', () => {
  it.each([
    ['0.35', 0.35],
    ['0,35', 0.35],
    ['~0.3', 0.3],
    ['ca. 0.3', 0.3],
    [' 0.4 ', 0.4],
    ['.5', 0.5],
    ['1.2e-1', 0.12],
    ['', null],
  ])('reads the number "%s" as %s', (cell, value) => {
    expect(readNumber(cell, 'Rf')).toEqual({ ok: true, value });
  });

  it('reads a percentage only where one is expected, and refuses ranges and words with the cell quoted', () => {
    expect(readNumber('85 %', 'Yield', { percent: true })).toEqual({ ok: true, value: 85 });
    expect(readNumber('85 %', 'Rf')).toEqual({ ok: false, message: 'Rf "85 %" is not a number.' });
    expect(readNumber('0.3-0.35', 'Rf').ok).toBe(false);
    expect(readNumber('baseline', 'Rf')).toEqual({ ok: false, message: 'Rf "baseline" is not a number.' });
    expect(readNumber('Rf = 0.3', 'Rf', { prefix: /^rf\s*[=:]?/i })).toEqual({ ok: true, value: 0.3 });
  });

  it.each([
    ['UV, KMnO4', ['UV', 'KMnO4']],
    ['UV 254 + CAM', ['UV 254', 'CAM']],
    ['iodine; PMA', ['iodine', 'PMA']],
    ['UV and anisaldehyde', ['UV', 'anisaldehyde']],
    ['UV 254/365', ['UV 254', 'UV 365']],
    ['KMnO4 dip (heat)', ['KMnO4']],
    ["Hanessian's stain", ["Hanessian's stain"]],
    ['UV/ninhydrin', ['UV', 'ninhydrin']],
  ])('splits the visualisation cell "%s" into %j', (cell, parts) => {
    expect(splitVisualisations(cell)).toEqual(parts);
  });

  it('reads outcomes and techniques from the words people write, and names the allowed ones otherwise', () => {
    expect(['Pure', 'mixed', 'no separation'].map((cell) => readOutcome(cell))).toEqual([
      { ok: true, value: 'clean' },
      { ok: true, value: 'partial' },
      { ok: true, value: 'failed' },
    ]);
    expect(readOutcome('meh')).toEqual({
      ok: false,
      message: 'Unknown outcome "meh" (expected clean, partial or failed).',
    });
    expect(['TLC', 'column', 'prep TLC'].map((cell) => readTechnique(cell))).toEqual([
      { ok: true, value: 'tlc' },
      { ok: true, value: 'flash' },
      { ok: true, value: 'prep_tlc' },
    ]);
  });
});

describe('sniffDelimiter', () => {
  it('picks the semicolon of a European sheet with decimal commas, the tab of a pasted table, and the comma of a plain CSV', () => {
    expect(sniffDelimiter('name;smiles;rf\nA;CCO;0,3\nB;CCN;0,4\n')).toBe(';');
    expect(sniffDelimiter('name\tsmiles\trf\nA\tCCO\t0.3\n')).toBe('\t');
    expect(sniffDelimiter('name,eluent,rf\nA,"hexane:EtOAc, 9:1",0.3\nB,"DCM/MeOH; 9:1",0.4\n')).toBe(',');
  });
});
