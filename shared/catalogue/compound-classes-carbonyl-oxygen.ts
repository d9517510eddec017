import type { CompoundClass } from './compound-class-types';

const ACYL_EXCLUDES = ['C(=O)(OC)O', 'C(=O)(OC)N', 'C(=O)OC=O'];

/** Carbonyl and oxygen classes. Definitions: common practice; "check" is applied in server code. */
export const carbonylAndOxygenClasses: readonly CompoundClass[] = [
  {
    key: 'carboxylic-acid', name: 'Carboxylic acid', group: 'acid-base',
    description: 'R–C(=O)OH or its carboxylate; streaks on silica unless the eluent holds a little acid.',
    include: ['C(=O)O'], exclude: ['C(=O)(O)O', 'C(=O)(O)N'],
    check: 'the single-bonded O carries H or a negative charge',
  },
  {
    key: 'ester', name: 'Ester', group: 'carbonyl',
    description: 'R–C(=O)–O–R′ with R′ carbon; lactones (cyclic esters) count as esters too.',
    include: ['C(=O)OC'], exclude: ACYL_EXCLUDES,
    check: 'the ester O is uncharged',
  },
  {
    key: 'lactone', name: 'Lactone', group: 'carbonyl',
    description: 'A cyclic ester: the C(=O)–O bond lies in a ring.',
    include: ['C(=O)OC'], exclude: ACYL_EXCLUDES,
    check: 'the C(=O)–O bond is a ring bond',
  },
  {
    key: 'amide', name: 'Amide', group: 'carbonyl',
    description: 'R–C(=O)–N (primary, secondary, tertiary; lactams and imides included); not ureas or carbamates.',
    include: ['C(=O)N'], exclude: ['C(=O)(N)N', 'C(=O)(N)O'],
    check: 'the N is uncharged and not aromatic',
  },
  {
    key: 'lactam', name: 'Lactam', group: 'carbonyl',
    description: 'A cyclic amide: the C(=O)–N bond lies in a ring.',
    include: ['C(=O)N'], exclude: ['C(=O)(N)N', 'C(=O)(N)O'],
    check: 'the C(=O)–N bond is a ring bond',
  },
  {
    key: 'carbamate', name: 'Carbamate', group: 'carbonyl',
    description: 'N–C(=O)–O–R, e.g. Boc-, Cbz- and Fmoc-protected amines.',
    include: ['C(=O)(N)OC'],
  },
  {
    key: 'urea', name: 'Urea', group: 'carbonyl',
    description: 'N–C(=O)–N.',
    include: ['C(=O)(N)N'],
  },
  {
    key: 'aldehyde', name: 'Aldehyde', group: 'carbonyl',
    description: 'R–CH=O (formaldehyde included).',
    include: ['C=O'],
    check: 'the carbonyl C carries H, is not aromatic and has no other heteroatom neighbour',
  },
  {
    key: 'ketone', name: 'Ketone', group: 'carbonyl',
    description: 'R–C(=O)–R′ with both R carbon (quinones included).',
    include: ['C(=O)(C)C'],
    check: 'the carbonyl C is not aromatic',
  },
  {
    key: 'alcohol', name: 'Alcohol', group: 'oxygen',
    description: 'O–H on an sp3 carbon (hemiacetals included); phenols are their own class.',
    include: ['OC'],
    check: 'the O carries H and is uncharged; the C has no multiple bonds and is not aromatic',
  },
  {
    key: 'phenol', name: 'Phenol', group: 'oxygen',
    description: 'O–H on an aromatic carbon.',
    include: ['OC'],
    check: 'the O carries H and is uncharged; the C is aromatic',
  },
  {
    key: 'diol', name: 'Diol / polyol', group: 'oxygen',
    description: 'Two or more alcohol O–H groups (sugars included); phenolic O–H do not count.',
    include: ['OC'], minMatches: 2,
    check: 'as for alcohol, counted on distinct O atoms',
  },
  {
    key: 'ether', name: 'Ether', group: 'oxygen',
    description: 'C–O–C that is not part of an ester, acetal, epoxide or aromatic ring (aryl ethers included).',
    include: ['O(C)C'],
    check: 'the O is uncharged, not aromatic and not in a three-membered ring; neither C has a double bond to a heteroatom or a second O or N neighbour',
  },
  {
    key: 'acetal', name: 'Acetal / ketal', group: 'oxygen',
    description: 'C(OR)(OR′) on an sp3 carbon: acetals, ketals, MOM and THP ethers, glycosides.',
    include: ['C(OC)OC'],
    check: 'the central C is sp3; both O are uncharged and their outer C is not an acyl carbon',
  },
  {
    key: 'epoxide', name: 'Epoxide', group: 'oxygen',
    description: 'Three-membered cyclic ether (oxirane).',
    include: ['O1CC1'],
  },
];
