import type { Molecule } from 'openchemlib';
import type { CompoundClassKey } from '../../shared/catalogue/compound-classes';
import {
  hasMultipleBondToHetero,
  hasNegativeNeighbour,
  hasTripleBond,
  heteroNeighbourCount,
  hydrogens,
  isAliphaticAmineN,
  isAromaticCarbon,
  isElement,
  isPyridineLikeN,
  isRingBond,
  isSp3Carbon,
  isUncharged,
  neighbours,
} from './atom-environment';

/** What a class check sees: the molecule, one fragment match (fragment atom → molecule atom). */
interface ClassMatch {
  mol: Molecule;
  match: number[];
  /** Which of the class's include fragments matched. */
  include: number;
  /** A neutral listed acid (e.g. HCl drawn as "Cl") accompanied the input; for ammonium-salt. */
  neutralAcidPresent: boolean;
}

type Check = (m: ClassMatch) => boolean;

const acidOxygen = (mol: Molecule, o: number) => hydrogens(mol, o) > 0 || mol.getAtomCharge(o) === -1;
const aromaticOnly: Check = ({ mol, match }) => mol.isAromaticAtom(match[0]);
const alcohol: Check = ({ mol, match: [o, c] }) => hydrogens(mol, o) > 0 && isUncharged(mol, o) && isSp3Carbon(mol, c);
const esterO: Check = ({ mol, match }) => isUncharged(mol, match[2]);
const amideN: Check = ({ mol, match }) => isUncharged(mol, match[2]) && !mol.isAromaticAtom(match[2]);

function amineN(h: number, degree: number): Check {
  return ({ mol, match: [n] }) =>
    isAliphaticAmineN(mol, n) && hydrogens(mol, n) === h && mol.getConnAtoms(n) === degree;
}

function etherCarbon(mol: Molecule, c: number): boolean {
  const oxygenOrNitrogen = neighbours(mol, c).filter((n) => isElement(mol, n, 8) || isElement(mol, n, 7)).length;
  return isElement(mol, c, 6) && !hasMultipleBondToHetero(mol, c) && oxygenOrNitrogen === 1;
}

function aniline({ mol, match: [n] }: ClassMatch): boolean {
  if (!isUncharged(mol, n) || mol.isAromaticAtom(n) || mol.getAtomPi(n) !== 0) return false;
  const around = neighbours(mol, n);
  return (
    around.some((a) => isAromaticCarbon(mol, a)) && around.every((a) => isAromaticCarbon(mol, a) || isSp3Carbon(mol, a))
  );
}

function ammoniumSalt({ mol, match: [n], neutralAcidPresent }: ClassMatch): boolean {
  if (mol.getAtomCharge(n) === 1) {
    if (hasNegativeNeighbour(mol, n) || hasTripleBond(mol, n)) return false;
    const fragmentAtoms = mol.getFragmentAtoms(n, false);
    return fragmentAtoms.reduce((sum, a) => sum + mol.getAtomCharge(a), 0) > 0;
  }
  return neutralAcidPresent && (isAliphaticAmineN(mol, n) || isPyridineLikeN(mol, n));
}

function aminoAcid({ mol, match }: ClassMatch): boolean {
  const n = match[0];
  const acidO = match[match.length - 1];
  const carbonyl = match[match.length - 3];
  const chain = match.slice(1, match.length - 3);
  return (
    !mol.isAromaticAtom(n) &&
    !hasNegativeNeighbour(mol, n) &&
    chain.every((c) => isSp3Carbon(mol, c)) &&
    heteroNeighbourCount(mol, carbonyl) === 2 &&
    acidOxygen(mol, acidO)
  );
}

/**
 * Checks that refine a class's fragment matches where a plain fragment cannot say enough
 * (hydrogen counts, aromaticity, charges, ring bonds); documented per class in the catalogue.
 */
export const classChecks: Partial<Record<CompoundClassKey, Check>> = {
  'carboxylic-acid': ({ mol, match }) => acidOxygen(mol, match[2]),
  ester: esterO,
  lactone: (m) => esterO(m) && isRingBond(m.mol, m.match[0], m.match[2]),
  amide: amideN,
  lactam: (m) => amideN(m) && isRingBond(m.mol, m.match[0], m.match[2]),
  aldehyde: ({ mol, match: [c] }) =>
    hydrogens(mol, c) > 0 && !mol.isAromaticAtom(c) && heteroNeighbourCount(mol, c) === 1,
  ketone: ({ mol, match: [c] }) => !mol.isAromaticAtom(c),
  alcohol,
  phenol: ({ mol, match: [o, c] }) => hydrogens(mol, o) > 0 && isUncharged(mol, o) && isAromaticCarbon(mol, c),
  diol: alcohol,
  ether: ({ mol, match: [o, c1, c2] }) =>
    isUncharged(mol, o) &&
    !mol.isAromaticAtom(o) &&
    mol.getAtomRingSize(o) !== 3 &&
    etherCarbon(mol, c1) &&
    etherCarbon(mol, c2),
  acetal: ({ mol, match: [c, o1, r1, o2, r2] }) =>
    isSp3Carbon(mol, c) &&
    isUncharged(mol, o1) &&
    isUncharged(mol, o2) &&
    !hasMultipleBondToHetero(mol, r1) &&
    !hasMultipleBondToHetero(mol, r2),
  'primary-amine': amineN(2, 1),
  'secondary-amine': amineN(1, 2),
  'tertiary-amine': amineN(0, 3),
  aniline,
  pyridine: ({ mol, match: [n] }) => isPyridineLikeN(mol, n),
  heteroaromatic: aromaticOnly,
  aromatic: aromaticOnly,
  conjugated: (m) => m.match.length > 1 || aromaticOnly(m),
  nitrile: ({ mol, match: [c, n] }) => isUncharged(mol, c) && isUncharged(mol, n) && mol.getConnAtoms(n) === 1,
  'ammonium-salt': ammoniumSalt,
  'amino-acid': aminoAcid,
  alkene: ({ mol, match: [a, b] }) =>
    !mol.isAromaticAtom(a) && !mol.isAromaticAtom(b) && !mol.isAromaticBond(mol.getBond(a, b)),
  'aryl-halide': ({ mol, match: [, c] }) => isAromaticCarbon(mol, c),
  'alkyl-halide': ({ mol, match: [, c] }) => isSp3Carbon(mol, c),
  sulfonamide: ({ mol, match }) => isUncharged(mol, match[3]),
  sulfide: ({ mol, match: [s] }) =>
    isUncharged(mol, s) && !mol.isAromaticAtom(s) && mol.getConnAtoms(s) === 2 && mol.getAtomPi(s) === 0,
  thiol: ({ mol, match: [s] }) => hydrogens(mol, s) > 0 && isUncharged(mol, s),
  boronic: ({ mol, match: [b] }) => mol.getConnAtoms(b) === 3,
  'phosphine-oxide': ({ mol, match: [p, o], include }) =>
    include === 0 ? isUncharged(mol, o) : mol.getAtomCharge(p) === 1 && mol.getAtomCharge(o) === -1,
};
