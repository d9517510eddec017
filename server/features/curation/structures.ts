import { Molecule } from 'openchemlib';

/** A compound's structure with its stereo read out: the skeleton key and how much stereo was drawn. */
export interface StereoReading {
  /** OpenChemLib ID code of the parent with every stereo feature stripped. */
  skeleton: string;
  /** Stereocentres and stereo double bonds. */
  stereoElements: number;
  /** Of those, how many were left undefined. */
  undefinedElements: number;
}

const cache = new Map<string, StereoReading>();

/**
 * Reads a compound's ID code (server/chem/identity: the neutral parent, stereo as drawn) and returns the
 * same structure without stereo, with counts of defined and undefined stereo elements (atom parities and
 * double-bond E/Z parities from OpenChemLib). Two compounds with one skeleton are one structure entered
 * with its stereo drawn differently: an enantiomer, its racemate, or the same drawing with and without wedges.
 */
export function readStereo(idcode: string): StereoReading {
  const cached = cache.get(idcode);
  if (cached) return cached;
  const molecule = Molecule.fromIDCode(idcode);
  molecule.ensureHelperArrays(Molecule.cHelperParities);
  let stereoElements = 0;
  let undefinedElements = 0;
  for (let atom = 0; atom < molecule.getAtoms(); atom++) {
    if (!molecule.isAtomStereoCenter(atom)) continue;
    stereoElements++;
    if (molecule.getAtomParity(atom) === Molecule.cAtomParityUnknown) undefinedElements++;
  }
  for (let bond = 0; bond < molecule.getBonds(); bond++) {
    const parity = molecule.getBondParity(bond);
    if (parity === Molecule.cBondParityNone) continue;
    stereoElements++;
    if (parity === Molecule.cBondParityUnknown) undefinedElements++;
  }
  const skeleton = Molecule.fromIDCode(idcode);
  skeleton.stripStereoInformation();
  const reading = { skeleton: skeleton.getIDCode(), stereoElements, undefinedElements };
  if (cache.size > 50_000) cache.clear();
  cache.set(idcode, reading);
  return reading;
}

/** Whether a compound's stereo is at least partly drawn (some stereo element defined). */
export const hasDefinedStereo = (reading: StereoReading) => reading.stereoElements > reading.undefinedElements;

/** Lower-cased, space-collapsed names of a compound, for comparing entries. */
export function namesOf(compound: { name: string | null; synonyms: readonly string[] }): Set<string> {
  return new Set(
    [compound.name, ...compound.synonyms].flatMap((name) =>
      name ? [name.trim().replace(/\s+/g, ' ').toLowerCase()] : [],
    ),
  );
}

/**
 * How sure we are that several compound entries are one substance entered more than once (the product's
 * own weighting): 0.5 for one skeleton; + 0.3 when the entries share a name or synonym; + 0.15 when at most
 * one entry has its stereo drawn (the others leave it open), − 0.2 when two or more entries draw defined
 * stereo (different stereoisomers, which differ on chiral phases and, for E/Z isomers, on silica too);
 * + 0.05 when records of different entries also meet the same-conditions rules.
 */
export function structureScore(options: {
  sharedName: boolean;
  definedEntries: number;
  conditionsMatch: boolean;
}): number {
  let score = 0.5;
  if (options.sharedName) score += 0.3;
  score += options.definedEntries <= 1 ? 0.15 : -0.2;
  if (options.conditionsMatch) score += 0.05;
  return Math.round(Math.min(1, Math.max(0.05, score)) * 100) / 100;
}
