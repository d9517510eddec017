import { Molecule } from 'openchemlib';

/**
 * Valences an uncharged atom may have (bonds counted by order, implicit hydrogens included). OpenChemLib accepts
 * up to an element's highest valence in any arrangement (Br up to 7, so a bromine inside an aromatic ring passes);
 * these sets are the normal valences of the OpenSMILES specification's organic subset (C. A. James et al.,
 * OpenSMILES specification, § "Organic subset": B 3; C 4; N 3, 5; O 2; P 3, 5; S 2, 4, 6; halogens 1 — from
 * memory), with the IUPAC λ-convention's standard bonding numbers for the heavier main-group elements (IUPAC
 * Recommendations 1983, "Treatment of variable valence in organic nomenclature (lambda convention)", Pure Appl.
 * Chem. 56 (1984) 769 — from memory). Elements not listed (metals, noble gases) are left to OpenChemLib.
 */
const NORMAL_VALENCES: Record<string, readonly number[]> = {
  H: [1],
  B: [3],
  C: [4],
  N: [3, 5],
  O: [2],
  F: [1],
  Si: [4],
  P: [3, 5],
  S: [2, 4, 6],
  Cl: [1, 3, 5, 7],
  Ge: [4],
  As: [3, 5],
  Se: [2, 4, 6],
  Br: [1, 3, 5, 7],
  Te: [2, 4, 6],
  I: [1, 3, 5, 7],
};

const HALOGENS = new Set(['Cl', 'Br', 'I']);
/** Atoms a hypervalent halogen binds beyond its first bond (perchlorate, bromate, BrF3, iodanes such as DMP). */
const HALOGEN_PARTNERS = new Set(['O', 'N', 'F', 'Cl', 'Br', 'I']);

const words = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven'];
const list = (values: readonly number[]) =>
  values
    .map((v) => words[v] ?? String(v))
    .join(', ')
    .replace(/, (\w+)$/, ' or $1');

/**
 * Why uncharged atom `a` has a valence its element cannot have, or null. Call after
 * `ensureHelperArrays(cHelperNeighbours)`. A halogen above one bond (3, 5 or 7) must bind at most one carbon,
 * by a single bond, and the rest to O, N or halogens: `C1=NC=CBr=C1` (Br double-bonded to ring carbon) is refused,
 * while perchlorate, BrF3 and hypervalent iodine reagents are kept.
 */
export function valenceProblem(mol: Molecule, a: number): string | null {
  const label = mol.getAtomLabel(a);
  const allowed = NORMAL_VALENCES[label];
  if (!allowed || mol.getAtomCharge(a) !== 0 || mol.getAtomRadical(a) !== 0) return null;
  const valence = mol.getOccupiedValence(a) + mol.getImplicitHydrogens(a);
  if (!allowed.includes(valence)) return `has ${valence} bonds; uncharged ${label} forms ${list(allowed)}`;
  if (!HALOGENS.has(label) || valence === 1) return null;
  let carbons = 0;
  for (let i = 0; i < mol.getConnAtoms(a); i++) {
    const other = mol.getAtomLabel(mol.getConnAtom(a, i));
    if (other === 'C') {
      carbons++;
      if (mol.getConnBondOrder(a, i) > 1)
        return `is double-bonded to carbon; a halogen binds carbon by one single bond`;
    } else if (!HALOGEN_PARTNERS.has(other)) {
      return `has ${valence} bonds, one of them to ${other}; beyond its first bond, ${label} binds only O, N or halogens`;
    }
  }
  if (mol.getImplicitHydrogens(a) > 0)
    return `has ${valence} bonds with hydrogen on it; uncharged ${label} with more than one bond carries no H`;
  if (carbons > 1)
    return `is bonded to ${carbons} carbons; uncharged ${label} binds at most one (write halonium ions with their charge, e.g. [I+])`;
  return null;
}
