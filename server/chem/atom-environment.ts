import type { Molecule } from 'openchemlib';

/** Small questions about one atom, asked by the class checks (helper arrays at cHelperRings). */

export function neighbours(mol: Molecule, atom: number): number[] {
  const list: number[] = [];
  for (let i = 0; i < mol.getConnAtoms(atom); i++) list.push(mol.getConnAtom(atom, i));
  return list;
}

export function isElement(mol: Molecule, atom: number, atomicNo: number): boolean {
  return mol.getAtomicNo(atom) === atomicNo;
}

export function isUncharged(mol: Molecule, atom: number): boolean {
  return mol.getAtomCharge(atom) === 0;
}

export function hydrogens(mol: Molecule, atom: number): number {
  return mol.getAllHydrogens(atom);
}

/** Carbon with only single bonds, not aromatic. */
export function isSp3Carbon(mol: Molecule, atom: number): boolean {
  return isElement(mol, atom, 6) && !mol.isAromaticAtom(atom) && mol.getAtomPi(atom) === 0;
}

export function isAromaticCarbon(mol: Molecule, atom: number): boolean {
  return isElement(mol, atom, 6) && mol.isAromaticAtom(atom);
}

/** Neighbours that are neither carbon nor hydrogen. */
export function heteroNeighbourCount(mol: Molecule, atom: number): number {
  return neighbours(mol, atom).filter((n) => mol.getAtomicNo(n) !== 6 && mol.getAtomicNo(n) !== 1).length;
}

/** The atom has a double or triple bond to O, N or S (a carbonyl-type carbon, for example). */
export function hasMultipleBondToHetero(mol: Molecule, atom: number): boolean {
  for (let i = 0; i < mol.getConnAtoms(atom); i++) {
    const element = mol.getAtomicNo(mol.getConnAtom(atom, i));
    if (mol.getConnBondOrder(atom, i) >= 2 && (element === 7 || element === 8 || element === 16)) return true;
  }
  return false;
}

export function isRingBond(mol: Molecule, a: number, b: number): boolean {
  const bond = mol.getBond(a, b);
  return bond >= 0 && mol.isRingBond(bond);
}

export function hasNegativeNeighbour(mol: Molecule, atom: number): boolean {
  return neighbours(mol, atom).some((n) => mol.getAtomCharge(n) < 0);
}

export function hasTripleBond(mol: Molecule, atom: number): boolean {
  for (let i = 0; i < mol.getConnAtoms(atom); i++) if (mol.getConnBondOrder(atom, i) === 3) return true;
  return false;
}

/** Uncharged, non-aromatic N without multiple bonds whose neighbours are all sp3 carbons. */
export function isAliphaticAmineN(mol: Molecule, atom: number): boolean {
  return (
    isElement(mol, atom, 7) &&
    isUncharged(mol, atom) &&
    !mol.isAromaticAtom(atom) &&
    mol.getAtomPi(atom) === 0 &&
    neighbours(mol, atom).every((n) => isSp3Carbon(mol, n))
  );
}

/** Uncharged aromatic N without H and with two neighbours in a six-membered ring. */
export function isPyridineLikeN(mol: Molecule, atom: number): boolean {
  return (
    isElement(mol, atom, 7) &&
    mol.isAromaticAtom(atom) &&
    isUncharged(mol, atom) &&
    hydrogens(mol, atom) === 0 &&
    mol.getConnAtoms(atom) === 2 &&
    mol.getAtomRingSize(atom) === 6
  );
}
