import { Molecule } from 'openchemlib';
import { splitParent, type FragmentSummary } from './fragments';
import { neutralise } from './neutralise';

export type { FragmentSummary } from './fragments';

/**
 * The identity of a compound, decided once for the whole knowledge base:
 *
 * - `idcode` (the key of a compound row) is OpenChemLib's ID code of the **parent**: the largest
 *   organic fragment (counter-ions and solvates removed, see splitParent) in its **neutral** form
 *   (see neutralise). So the free base, its hydrochloride drawn as `CN.Cl` or `C[NH3+].[Cl-]`, and a
 *   zwitterion map to one compound; the full input is kept apart (`inputIdcode`, and the caller keeps
 *   the text) because the salt form matters at the bench.
 * - **Stereo counts as drawn.** A defined enantiomer, the other enantiomer and the structure with the
 *   stereocentre left undefined are three compounds; an undefined centre means "not specified"
 *   (often racemic). Explicit V3000 enhanced stereo (AND/OR groups) is kept too. V2000 molfiles are
 *   read with the chiral flag set (wedges mean the configuration drawn; see withChiralFlagSet),
 *   otherwise OpenChemLib would read every flag-0 drawing as racemic.
 * - Tautomers are not merged (OpenChemLib's plain ID code; ../shared/STACK.md).
 * - A mixture of unrelated organic fragments keeps its largest as parent and is flagged `isMixture`.
 */
export interface CompoundIdentity {
  /** Identity key: ID code of the neutral parent fragment, stereo as drawn. */
  idcode: string;
  /** ID code of the whole input, counter-ions and solvents included. */
  inputIdcode: string;
  /** Isomeric SMILES of the neutral parent (for display; not used as a key). */
  canonicalSmiles: string;
  /** MDL V2000 molfile of the neutral parent with 2D coordinates. */
  molfile: string;
  /** A counter-ion was present (listed acid, carbon-free or charged fragment). */
  isSalt: boolean;
  /** Another organic fragment that is neither counter-ion nor listed solvent was present. */
  isMixture: boolean;
  /** Stereocentres of the parent whose configuration was left undefined. */
  undefinedStereocentres: number;
  fragments: FragmentSummary[];
}

function countUndefinedStereocentres(mol: Molecule): number {
  mol.ensureHelperArrays(Molecule.cHelperParities);
  let count = 0;
  for (let a = 0; a < mol.getAtoms(); a++) {
    if (mol.isAtomStereoCenter(a) && mol.getAtomParity(a) === Molecule.cAtomParityUnknown) count++;
  }
  return count;
}

/** The neutral parent molecule of an input (see CompoundIdentity) and the fragments it came from. */
export function parentOf(input: Molecule): { parent: Molecule; fragments: FragmentSummary[] } {
  const { parent, fragments } = splitParent(input);
  return { parent: neutralise(parent), fragments };
}

/** Identity of a parsed input; pass `split` when parentOf was already called for it. */
export function identify(input: Molecule, split = parentOf(input)): CompoundIdentity {
  const { parent, fragments } = split;
  return {
    idcode: parent.getIDCode(),
    inputIdcode: input.getIDCode(),
    canonicalSmiles: parent.toIsomericSmiles(),
    molfile: parent.toMolfile(),
    isSalt: fragments.some((fragment) => fragment.role === 'counter-ion'),
    isMixture: fragments.some((fragment) => fragment.role === 'other'),
    undefinedStereocentres: countUndefinedStereocentres(parent),
    fragments,
  };
}
