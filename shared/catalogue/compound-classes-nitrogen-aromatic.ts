import type { CompoundClass } from './compound-class-types';

const ANY_AROMATIC_ATOM = ['C', 'N', 'O', 'S'];

/** Nitrogen and aromatic classes. Definitions: common practice; "check" is applied in server code. */
export const nitrogenAndAromaticClasses: readonly CompoundClass[] = [
  {
    key: 'primary-amine',
    name: 'Primary amine',
    group: 'nitrogen',
    description: 'R–NH2 on an sp3 carbon; not amides, sulfonamides or anilines.',
    include: ['N'],
    check: 'uncharged, non-aromatic N with two H and one neighbour, an sp3 carbon',
  },
  {
    key: 'secondary-amine',
    name: 'Secondary amine',
    group: 'nitrogen',
    description: 'R2NH with both R sp3 carbons (cyclic amines such as piperidine included).',
    include: ['N'],
    check: 'uncharged, non-aromatic N with one H and two neighbours, both sp3 carbons',
  },
  {
    key: 'tertiary-amine',
    name: 'Tertiary amine',
    group: 'nitrogen',
    description: 'R3N with all R sp3 carbons (N-methylpiperidine, triethylamine).',
    include: ['N'],
    check: 'uncharged, non-aromatic N without H and three neighbours, all sp3 carbons',
  },
  {
    key: 'aniline',
    name: 'Aniline (aryl amine)',
    group: 'nitrogen',
    description: 'An amine N on an aromatic carbon (primary, secondary, tertiary, diaryl); not anilides.',
    include: ['N'],
    check:
      'uncharged, non-aromatic N without multiple bonds; one neighbour is an aromatic carbon and every ' +
      'neighbour is an aromatic or sp3 carbon',
  },
  {
    key: 'pyridine',
    name: 'Pyridine-like nitrogen',
    group: 'nitrogen',
    description:
      'An aromatic N in a six-membered ring with no H (pyridines, pyrimidines, quinolines); azoles are not included.',
    include: ['N'],
    check: 'uncharged aromatic N without H, two neighbours, smallest ring six-membered',
  },
  {
    key: 'indole',
    name: 'Indole',
    group: 'aromatic',
    description: 'Indole ring system, N-substituted indoles included.',
    include: ['c1ccc2[nH]ccc2c1'],
  },
  {
    key: 'imidazole',
    name: 'Imidazole',
    group: 'aromatic',
    description: 'Imidazole ring, N-substituted and benzimidazoles included.',
    include: ['c1cnc[nH]1'],
  },
  {
    key: 'heteroaromatic',
    name: 'Heteroaromatic',
    group: 'aromatic',
    description: 'An aromatic ring containing N, O or S.',
    include: ['N', 'O', 'S'],
    check: 'the atom is aromatic',
  },
  {
    key: 'aromatic',
    name: 'Aromatic',
    group: 'aromatic',
    description: 'Any aromatic ring, carbocyclic or heterocyclic.',
    include: ANY_AROMATIC_ATOM,
    check: 'the atom is aromatic',
  },
  {
    key: 'conjugated',
    name: 'Conjugated π-system',
    group: 'unsaturation',
    description:
      'An aromatic ring, or two multiple bonds joined by one single bond (dienes, enones, ynones, acrylonitriles).',
    include: ['C=CC=C', 'C=CC=O', 'C=CC=N', 'C=CC#C', 'C=CC#N', 'C#CC#C', 'C#CC=O', ...ANY_AROMATIC_ATOM],
    check: 'single-atom fragments only count when the atom is aromatic',
  },
  {
    key: 'nitrile',
    name: 'Nitrile',
    group: 'nitrogen',
    description: 'R–C≡N (isonitriles excluded).',
    include: ['C#N'],
    check: 'both atoms uncharged; the N has no other neighbour',
  },
  {
    key: 'nitro',
    name: 'Nitro',
    group: 'nitrogen',
    description: 'C–NO2 (nitrate esters and nitrites excluded).',
    include: ['[N+](=O)([O-])C'],
  },
  {
    key: 'ammonium-salt',
    name: 'Ammonium salt',
    group: 'acid-base',
    description:
      'Checked on the structure as entered: a protonated or quaternary N (net positive fragment), or ' +
      'a basic amine drawn with a separate neutral acid (e.g. "CN.Cl").',
    include: ['N'],
    check:
      'cationic N without triple bond or anionic neighbour in a fragment with net positive charge; or ' +
      'a basic amine N (aliphatic amine or pyridine-like) when a neutral counter-ion acid is present',
  },
  {
    key: 'amino-acid',
    name: 'Amino acid',
    group: 'acid-base',
    description:
      'An α- or β-amino acid with a free carboxylic acid; N-protected (Boc, Cbz, acyl) included, esters not.',
    include: ['NCC(=O)O', 'NCCC(=O)O'],
    check: 'non-aromatic N; the carbons between N and C(=O) are sp3; the acid O carries H or a negative charge',
  },
];
