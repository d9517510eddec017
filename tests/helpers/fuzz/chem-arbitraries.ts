import fc from 'fast-check';
import { Molecule } from 'openchemlib';
import { readOpenTlc, type TlcRow } from '../../shared/support/open-tlc';

/** Real structures to mutate: the compounds of the open TLC dataset (Xu et al., Chem 2022, Apache-2.0). */
export const realSmiles: readonly string[] = [...new Set(readOpenTlc<TlcRow>('tlc-rf.csv').map((row) => row.smiles))];

const smilesAtoms = [
  'C',
  'c',
  'N',
  'n',
  'O',
  'o',
  'S',
  's',
  'P',
  'F',
  'Cl',
  'Br',
  'I',
  'B',
  '[nH]',
  '[NH4+]',
  '[O-]',
  '[Na+]',
  '[Fe+3]',
  '[2H]',
  '[C@@H]',
  '[13C]',
  '*',
];
const smilesSyntax = [
  '(',
  ')',
  '[',
  ']',
  '=',
  '#',
  '$',
  ':',
  '/',
  '\\',
  '.',
  '@',
  '@@',
  '+',
  '-',
  '%',
  '%10',
  '%99',
  '1',
  '2',
  '9',
  '0',
];

/** Characters no structure text should contain: controls, NUL, bidi overrides, a BOM, lookalike letters. */
const hostileChars = [
  '\u0000',
  '\u0007',
  '\u001b',
  '\u007f',
  '\u202e',
  '\ufeff',
  '\u2028',
  '\uFFFD',
  'С',
  'Ⅽ',
  '＝',
  '\ud800',
  '\n',
  '\r',
  '\t',
];

/** One edit of a string: insert, delete or replace a slice at a position, or cut it short. */
const mutate = (pieces: fc.Arbitrary<string>) => (text: string) =>
  fc
    .tuple(
      fc.nat({ max: Math.max(0, text.length) }),
      fc.nat({ max: 6 }),
      pieces,
      fc.constantFrom('insert', 'delete', 'replace', 'truncate'),
    )
    .map(([at, span, piece, how]) => {
      if (how === 'insert') return text.slice(0, at) + piece + text.slice(at);
      if (how === 'delete') return text.slice(0, at) + text.slice(at + span);
      if (how === 'truncate') return text.slice(0, at);
      return text.slice(0, at) + piece + text.slice(at + span);
    });

const piece = fc.oneof(
  fc.constantFrom(...smilesAtoms, ...smilesSyntax),
  fc.constantFrom(...hostileChars),
  fc.string({ unit: 'binary', maxLength: 3 }),
);

/** Real SMILES after one to three edits: unbalanced brackets, broken ring closures, stray charges, odd characters. */
const mutatedSmiles = fc.constantFrom(...realSmiles).chain((smiles) =>
  fc.integer({ min: 1, max: 3 }).chain((edits) => {
    let arbitrary: fc.Arbitrary<string> = fc.constant(smiles);
    for (let i = 0; i < edits; i++) arbitrary = arbitrary.chain(mutate(piece));
    return arbitrary;
  }),
);

/** SMILES-like text: mutated real SMILES, token soup, unicode and control characters, and huge inputs. */
export const smilesLike: fc.Arbitrary<string> = fc.oneof(
  { weight: 5, arbitrary: mutatedSmiles },
  {
    weight: 3,
    arbitrary: fc
      .array(fc.constantFrom(...smilesAtoms, ...smilesSyntax), { maxLength: 40 })
      .map((tokens) => tokens.join('')),
  },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 60 }) },
  { weight: 1, arbitrary: fc.constantFrom(...realSmiles).map((smiles) => smiles + hostileChars.join('')) },
  {
    weight: 1,
    arbitrary: fc
      .tuple(fc.constantFrom('C', 'c1ccccc1', '(C', 'C1', '['), fc.integer({ min: 2_000, max: 60_000 }))
      .map(([unit, n]) => unit.repeat(Math.ceil(n / unit.length))),
  },
  {
    weight: 1,
    arbitrary: fc.constantFrom(
      '',
      ' ',
      '()',
      '[]',
      'C1CC',
      'c1cccc1',
      'C(C',
      '[Xx]',
      'C%',
      'C%1',
      '[C@@@H]',
      'C=#C',
      '.',
      '..',
      'C..C',
      '[H+]',
      '[U+92]',
      'C'.repeat(500),
    ),
  },
);

const moleculeOf = (smiles: string) => {
  try {
    return Molecule.fromSmiles(smiles);
  } catch {
    return null;
  }
};

/** V2000 and V3000 molfiles of real compounds (OpenChemLib writes them), the material molfile mutations start from. */
const realMolfiles: readonly string[] = realSmiles.slice(0, 40).flatMap((smiles) => {
  const molecule = moleculeOf(smiles);
  return molecule ? [molecule.toMolfile(), molecule.toMolfileV3()] : [];
});

const molfileLine = fc.oneof(
  fc.constantFrom(
    'M  END',
    '$$$$',
    'M  V30 BEGIN CTAB',
    'M  V30 COUNTS 3 2 0 0 0',
    'M  V30 END CTAB',
    'M  CHG  1   1   1',
    '  999999  0  0  0  0  0  0  0  0  0999 V2000',
    '  2  1  0  0  0  0  0  0  0  0999 V3000',
  ),
  fc.string({ maxLength: 80 }),
  fc
    .tuple(fc.double({ noNaN: false }), fc.double(), fc.constantFrom('C', 'Xx', 'N', ''))
    .map(([x, y, atom]) => `${x} ${y} 0.0000 ${atom}   0  0`),
);

/** Edits whole lines of a real molfile: drops, duplicates, replaces, or cuts it off; wrong counts lines follow. */
const mutatedMolfile = fc.constantFrom(...realMolfiles).chain((molfile) => {
  const lines = molfile.split('\n');
  const how = fc.constantFrom('drop', 'duplicate', 'replace', 'truncate', 'counts');
  return fc
    .tuple(fc.nat({ max: lines.length }), how, molfileLine, fc.constantFrom('\n', '\r\n', '\r'))
    .map(([at, edit, line, newline]) => {
      const out = [...lines];
      if (edit === 'drop') out.splice(at, 1);
      else if (edit === 'duplicate') out.splice(at, 0, out[at] ?? '');
      else if (edit === 'replace') out[at] = line;
      else if (edit === 'truncate') out.length = at;
      else out[3] = line;
      return out.join(newline);
    });
});

/** Molfile-like text: mutated V2000/V3000 files, V3000 fragments, headers with nothing after, and line soup. */
export const molfileLike: fc.Arbitrary<string> = fc.oneof(
  { weight: 5, arbitrary: mutatedMolfile },
  {
    weight: 1,
    arbitrary: fc.array(molfileLine, { minLength: 3, maxLength: 12 }).map((lines) => `\n  fuzz\n\n${lines.join('\n')}`),
  },
  {
    weight: 1,
    arbitrary: fc.constantFrom(
      '\n\n\n  0  0  0  0  0  0            999 V2000\nM  END\n',
      'M  V30 BEGIN CTAB\nM  V30 END CTAB\nM  END',
      '\n\n\n',
      'title only\n',
    ),
  },
);
