import { Molecule, MoleculeProperties } from 'openchemlib';

/** Descriptors stored on a compound (computed on the neutral parent, see identity.ts). */
export interface CompoundDescriptors {
  /** Hill formula, e.g. "C9H8O4", "C4H12N+" (isotopes counted under their element). */
  formula: string;
  /** Average molecular weight, g/mol (OpenChemLib relativeWeight, standard atomic weights). */
  mw: number;
  /** Monoisotopic mass, Da (OpenChemLib absoluteWeight). */
  exactMass: number;
  /** Octanol/water log P, OpenChemLib's atom-type increment method. */
  clogp: number;
  /** Topological polar surface area, Å² (Ertl et al., J. Med. Chem. 2000, 43, 3714, with S and P; see README). */
  tpsa: number;
  /** H-bond donors: OpenChemLib donorCount (N–H and O–H, as Lipinski). */
  hbd: number;
  /** H-bond acceptors: OpenChemLib acceptorCount (N plus O atoms, as Lipinski). */
  hba: number;
  rotatableBonds: number;
  aromaticRings: number;
  stereocentres: number;
  /** Net formal charge. */
  charge: number;
}

function countElements(mol: Molecule): { counts: Map<string, number>; charge: number } {
  mol.ensureHelperArrays(Molecule.cHelperNeighbours);
  const counts = new Map<string, number>();
  const add = (symbol: string, n: number) => n > 0 && counts.set(symbol, (counts.get(symbol) ?? 0) + n);
  let charge = 0;
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    add(Molecule.cAtomLabel[mol.getAtomicNo(a)], 1);
    add('H', mol.getImplicitHydrogens(a));
    charge += mol.getAtomCharge(a);
  }
  return { counts, charge };
}

/**
 * Molecular formula in Hill order (Hill, J. Am. Chem. Soc. 1900, 22, 478): C first, then H, then
 * the other elements alphabetically; without carbon all elements alphabetically (H included).
 * A net charge is appended: "+", "2+", "-", "2-".
 */
export function hillFormula(mol: Molecule): string {
  const { counts, charge } = countElements(mol);
  const symbols = [...counts.keys()].sort();
  const ordered = counts.has('C')
    ? ['C', ...(counts.has('H') ? ['H'] : []), ...symbols.filter((s) => s !== 'C' && s !== 'H')]
    : symbols;
  const body = ordered.map((symbol) => `${symbol}${counts.get(symbol) === 1 ? '' : counts.get(symbol)}`).join('');
  if (charge === 0) return body;
  return `${body}${Math.abs(charge) === 1 ? '' : Math.abs(charge)}${charge > 0 ? '+' : '-'}`;
}

/** All stored descriptors of a molecule (call with the neutral parent). ~0.05 ms a molecule. */
export function computeDescriptors(mol: Molecule): CompoundDescriptors {
  const weights = mol.getMolecularFormula();
  const properties = new MoleculeProperties(mol);
  const { charge } = countElements(mol);
  return {
    formula: hillFormula(mol),
    mw: weights.relativeWeight,
    exactMass: weights.absoluteWeight,
    clogp: properties.logP,
    tpsa: properties.polarSurfaceArea,
    hbd: properties.donorCount,
    hba: properties.acceptorCount,
    rotatableBonds: properties.rotatableBondCount,
    aromaticRings: mol.getAromaticRingCount(),
    stereocentres: properties.stereoCenterCount,
    charge,
  };
}
