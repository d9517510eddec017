import { Molecule } from 'openchemlib';
import { MAX_HEAVY_ATOMS, StructureError, type StructureErrorDetails } from './errors';
import { valenceProblem } from './valence';

/** Where heavy atom i (in the order the input wrote them) sits in the input text. */
export interface AtomLocator {
  describe(heavyAtomIndex: number): { where: string; details: StructureErrorDetails };
  /** Whether the input wrote this heavy atom in lower case (aromatic SMILES). */
  writtenAromatic?(heavyAtomIndex: number): boolean;
}

function heavyAtoms(mol: Molecule): number[] {
  const atoms: number[] = [];
  for (let a = 0; a < mol.getAllAtoms(); a++) if (mol.getAtomicNo(a) !== 1) atoms.push(a);
  return atoms;
}

function fail(code: 'valence' | 'aromaticity' | 'pseudo_atom', message: string, details: StructureErrorDetails): never {
  throw new StructureError(422, code, message, details);
}

/**
 * Refuses chemistry OpenChemLib accepts silently (../shared/STACK.md): no atoms, too many heavy
 * atoms, wildcard/pseudo atoms and atom lists, atoms over their valence (after
 * `ensureHelperArrays(cHelperNeighbours)`: `getFreeValence(a) < 0`, or an uncharged atom written with
 * an abnormal valence such as `[CH5]`; charged atoms such as ammonium N+, nitro N+/O− or PF6− are
 * fine while their free valence is not negative), uncharged atoms with a valence their element cannot have
 * (valence.ts: e.g. bromine inside a ring, `C1=NC=CBr=C1`), and aromatic rings that could not be given
 * alternating double bonds (the parser leaves an unpaired electron on a lower-case atom, e.g. `c1cccc1`).
 */
export function checkMolecule(mol: Molecule, locate: AtomLocator): void {
  mol.ensureHelperArrays(Molecule.cHelperNeighbours);
  const atoms = heavyAtoms(mol);
  if (atoms.length === 0) throw new StructureError(422, 'structure_empty', 'The structure has no atoms.');
  if (atoms.length > MAX_HEAVY_ATOMS) {
    throw new StructureError(
      422,
      'structure_too_many_atoms',
      `The structure has ${atoms.length} heavy atoms; the limit is ${MAX_HEAVY_ATOMS}.`,
    );
  }
  atoms.forEach((a, i) => {
    const { where, details } = locate.describe(i);
    const label = mol.getAtomLabel(a);
    if (mol.getAtomicNo(a) === 0 || mol.getAtomList(a) !== null) {
      fail('pseudo_atom', `${where} is a wildcard, pseudo atom or atom list; a compound needs real elements.`, details);
    }
    const charged = mol.getAtomCharge(a) !== 0;
    if (mol.getFreeValence(a) < 0) {
      fail(
        'valence',
        `${where} (${label}) has ${mol.getOccupiedValence(a)} bonds; ${charged ? 'with its charge ' : ''}${label} ` +
          `allows ${mol.getMaxValence(a)}.`,
        details,
      );
    }
    if (!charged && mol.getAtomAbnormalValence(a) !== -1) {
      fail(
        'valence',
        `${where} (${label}) is written with valence ${mol.getAtomAbnormalValence(a)}, which uncharged ${label} does not have.`,
        details,
      );
    }
    const problem = valenceProblem(mol, a);
    if (problem) fail('valence', `${where} (${label}) ${problem}.`, { ...details, token: label });
    if (mol.getAtomRadical(a) !== 0 && locate.writtenAromatic?.(i)) {
      fail(
        'aromaticity',
        `${where} (${label}) sits in an aromatic ring that cannot be given alternating double bonds; ` +
          `write ring N–H as [nH] or give a Kekulé structure.`,
        details,
      );
    }
  });
}
