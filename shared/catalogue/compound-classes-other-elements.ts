import type { CompoundClass } from './compound-class-types';

const HALOGEN_ON_CARBON = ['FC', 'ClC', 'BrC', 'IC'];

/** Unsaturation, halogen, sulfur, boron, silicon and phosphorus classes (common practice). */
export const otherElementClasses: readonly CompoundClass[] = [
  {
    key: 'alkene',
    name: 'Alkene',
    group: 'unsaturation',
    description: 'A non-aromatic C=C (enol ethers, enones and styrenes included).',
    include: ['C=C'],
    check: 'neither atom nor the bond is aromatic',
  },
  {
    key: 'alkyne',
    name: 'Alkyne',
    group: 'unsaturation',
    description: 'C≡C.',
    include: ['C#C'],
  },
  {
    key: 'aryl-halide',
    name: 'Aryl halide',
    group: 'halogen',
    description: 'F, Cl, Br or I on an aromatic carbon.',
    include: HALOGEN_ON_CARBON,
    check: 'the carbon is aromatic',
  },
  {
    key: 'alkyl-halide',
    name: 'Alkyl halide',
    group: 'halogen',
    description: 'F, Cl, Br or I on an sp3 carbon (CF3 groups included; vinyl and acyl halides not).',
    include: HALOGEN_ON_CARBON,
    check: 'the carbon has no multiple bonds and is not aromatic',
  },
  {
    key: 'sulfonamide',
    name: 'Sulfonamide',
    group: 'other-elements',
    description: 'S(=O)2–N.',
    include: ['S(=O)(=O)N'],
    check: 'the N is uncharged',
  },
  {
    key: 'sulfone',
    name: 'Sulfone',
    group: 'other-elements',
    description: 'C–S(=O)2–C.',
    include: ['S(=O)(=O)(C)C'],
  },
  {
    key: 'sulfide',
    name: 'Sulfide (thioether)',
    group: 'other-elements',
    description: 'C–S–C with a divalent S (thiophenes, sulfoxides and disulfides excluded).',
    include: ['S(C)C'],
    check: 'uncharged, non-aromatic S with exactly two neighbours and no multiple bonds',
  },
  {
    key: 'thiol',
    name: 'Thiol',
    group: 'other-elements',
    description: 'R–SH (thiophenols included).',
    include: ['SC'],
    check: 'the S carries H and is uncharged',
  },
  {
    key: 'boronic',
    name: 'Boronic acid / ester',
    group: 'other-elements',
    description: 'C–B(OR)2: boronic acids and their esters (pinacol, MIDA excluded as it is tetracoordinate).',
    include: ['B(C)(O)O'],
    check: 'the B has exactly three neighbours',
  },
  {
    key: 'silyl-ether',
    name: 'Silyl ether',
    group: 'other-elements',
    description: 'Si–O–C: TMS, TES, TBS, TIPS, TBDPS ethers (silyl esters excluded).',
    include: ['[Si]OC'],
    exclude: ['[Si]OC=O'],
  },
  {
    key: 'phosphine-oxide',
    name: 'Phosphine oxide',
    group: 'other-elements',
    description: 'R3P=O with three carbon substituents (phosphates and phosphonates excluded).',
    include: ['P(=O)(C)(C)C', 'P(O)(C)(C)C'],
    check: 'drawn P=O, or P+–O− in the charge-separated form',
  },
];
