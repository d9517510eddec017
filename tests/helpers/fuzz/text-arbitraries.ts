import fc from 'fast-check';
import { realSmiles, smilesLike } from './chem-arbitraries';

const solventWords = [
  'EtOAc',
  'hexanes',
  'hexane',
  'DCM',
  'MeOH',
  'Et2O',
  'PE',
  'petroleum ether',
  'toluene',
  'acetone',
  'THF',
  'heptane',
  'CHCl3',
  'water',
  'iPrOH',
  'unobtainium',
];
const additiveWords = ['Et3N', 'TEA', 'AcOH', 'NH3', 'TFA', 'formic acid', 'pyridine'];
const ratioPieces = [
  '1:4',
  '1 : 4',
  '1/4',
  '10%',
  '0:0',
  '-1:2',
  '1e309:1',
  '1:0',
  '3:1:1',
  '1::4',
  '∞:1',
  '1:4:',
  'NaN:1',
  '٣:١',
];
const separators = ['/', ':', ' / ', '-', ' in ', ', ', ' + ', '–', '＋', '', ' '];

/** Eluent notation as people type it, and as they mistype it: solvents, ratios, additives, stray symbols, odd numbers. */
export const eluentLike: fc.Arbitrary<string> = fc.oneof(
  {
    weight: 4,
    arbitrary: fc
      .tuple(
        fc.array(fc.constantFrom(...solventWords), { minLength: 1, maxLength: 4 }),
        fc.constantFrom(...separators),
        fc.constantFrom(...ratioPieces),
        fc.option(fc.tuple(fc.double({ min: -5, max: 200 }), fc.constantFrom(...additiveWords))),
      )
      .map(
        ([solvents, separator, ratio, additive]) =>
          `${solvents.join(separator)} ${ratio}${additive ? ` + ${additive[0]}% ${additive[1]}` : ''}`,
      ),
  },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  {
    weight: 1,
    arbitrary: fc.constantFrom(
      '',
      ' ',
      '%',
      '+',
      '1:4',
      'EtOAc',
      'EtOAc/hexanes 1:4 + 1% Et3N + 1% Et3N',
      'EtOAc/EtOAc 1:1',
      'gradient 0→100% EtOAc in hexanes',
      'x'.repeat(400),
    ),
  },
);

/** File names a hostile or careless client sends: path traversal, NUL bytes, control characters, very long names. */
export const hostileFileName: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(
    '../../etc/passwd',
    '..\\..\\windows\\win.ini',
    '/etc/shadow',
    'plate\u0000.png',
    'history.csv\u0000.exe',
    '.',
    '..',
    '',
    ' ',
    'CON',
    'a/b/c.csv',
    '%2e%2e%2fetc%2fpasswd',
    '\u202egnp.exe',
    '"quoted".csv',
    'x'.repeat(1000) + '.csv',
  ),
  fc.string({ unit: 'binary', maxLength: 30 }).map((name) => `${name}.csv`),
);

const delimiters = [',', ';', '\t', '|', ' ', ''];
const cell = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...realSmiles) },
  { weight: 2, arbitrary: smilesLike },
  { weight: 2, arbitrary: eluentLike },
  {
    weight: 2,
    arbitrary: fc.oneof(
      fc.double().map(String),
      fc.constantFrom('0.3', '1.5', '-0.1', '0,35', 'NaN', '', 'clean', 'failed', 'KMnO4', 'UV 254'),
    ),
  },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 20 }) },
  {
    weight: 1,
    arbitrary: fc.constantFrom('"', '""', '"unclosed', 'a"b', '\r\n', '\n', '=HYPERLINK("x")', '\u0000', '\ufeff'),
  },
  { weight: 1, arbitrary: fc.integer({ min: 10_000, max: 200_000 }).map((n) => 'y'.repeat(n)) },
);
const header = fc.oneof(
  fc.constantFrom(
    'name',
    'smiles',
    'eluent',
    'rf',
    'stain',
    'outcome',
    'notes',
    'Rf (product)',
    'SMILES',
    'solvent system',
    '',
  ),
  fc.string({ maxLength: 12 }),
);

/** CSV-like files: random delimiters and quoting, byte-order marks, ragged rows, huge fields, binary junk. */
export const csvLike: fc.Arbitrary<string | Buffer> = fc.oneof(
  {
    weight: 6,
    arbitrary: fc
      .tuple(
        fc.constantFrom(...delimiters),
        fc.array(header, { minLength: 1, maxLength: 8 }),
        fc.array(fc.array(cell, { maxLength: 9 }), { maxLength: 8 }),
        fc.boolean(),
        fc.constantFrom('\n', '\r\n', '\r'),
      )
      .map(
        ([delimiter, headers, rows, bom, newline]) =>
          `${bom ? '\ufeff' : ''}${[headers, ...rows].map((row) => row.join(delimiter)).join(newline)}`,
      ),
  },
  { weight: 1, arbitrary: fc.uint8Array({ maxLength: 400 }).map((bytes) => Buffer.from(bytes)) },
  {
    weight: 1,
    arbitrary: fc.constantFrom(
      '',
      '\ufeff',
      'name,smiles,eluent,rf',
      '\u0000\u0000',
      'a,b\n"1,2\n3,4',
      '$$$$\n',
      'M  END\n$$$$\n',
    ),
  },
);
