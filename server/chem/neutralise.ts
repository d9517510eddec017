import { Molecule } from 'openchemlib';

const PROTONATED = new Set([7, 8, 15, 16]); // N, O, P, S cations carrying H: remove one H+
const DEPROTONATED = new Set([7, 8, 16, 34]); // N, O, S, Se anions: add one H+

function hasOppositeNeighbour(mol: Molecule, atom: number, sign: number): boolean {
  for (let i = 0; i < mol.getConnAtoms(atom); i++) {
    if (Math.sign(mol.getAtomCharge(mol.getConnAtom(atom, i))) === -sign) return true;
  }
  return false;
}

/**
 * A copy of one fragment in its neutral form, by adding or removing protons: R–NH3+ → R–NH2,
 * pyridinium → pyridine, R–COO− → R–COOH, phenolate → phenol, zwitterions → neutral form
 * (OpenChemLib's canonizeCharge first pairs charges inside the fragment). Charges that no proton
 * can remove stay: quaternary ammonium, nitro N+/O−, N-oxides, ylides (a charge with an
 * opposite charge on a neighbour is left as drawn). Stereo and coordinates are kept.
 */
export function neutralise(fragment: Molecule): Molecule {
  const mol = fragment.getCompactCopy();
  try {
    mol.canonizeCharge(true);
  } catch {
    // canonizeCharge refuses some unbalanced charge patterns; the proton rules below still apply.
  }
  mol.ensureHelperArrays(Molecule.cHelperNeighbours);
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    const charge = mol.getAtomCharge(a);
    if (charge === 0 || hasOppositeNeighbour(mol, a, Math.sign(charge))) continue;
    const element = mol.getAtomicNo(a);
    const removable = charge === 1 && PROTONATED.has(element) && mol.getAllHydrogens(a) > 0;
    const addable = charge === -1 && DEPROTONATED.has(element);
    if (!removable && !addable) continue;
    mol.setAtomCharge(a, 0);
    mol.ensureHelperArrays(Molecule.cHelperNeighbours);
    if (mol.getFreeValence(a) < 0) mol.setAtomCharge(a, charge);
  }
  mol.ensureHelperArrays(Molecule.cHelperNeighbours);
  return mol;
}
