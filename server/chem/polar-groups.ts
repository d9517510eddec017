import { Molecule } from 'openchemlib';

/**
 * Counts of the groups that hold a molecule on silica or alumina, for Scout's regression.
 *
 * Why counts: the RM of a compound on a polar adsorbent is close to a sum of group contributions
 * (Martin's additivity rule, Bate-Smith & Westall 1950 — attribution from memory; Snyder's adsorption energy
 * as a sum over groups, from memory). The groups are told apart by what a chromatographer knows moves a spot:
 * a phenol OH from an alcohol OH, a ketone from an ester, a primary from a tertiary amine. Two corrections of
 * the trade (common practice): a donor X–H that can close a six-membered ring by an intramolecular hydrogen
 * bond to a carbonyl or nitro group next door (2-hydroxyacetophenone, salicylaldehyde, 2-nitrophenol) runs
 * far less polar than its count suggests, and a ring nitrogen whose neighbours carry substituents
 * (2,6-lutidine) is shielded from the silanols.
 */
export const polarGroupKeys = [
  'ketone',
  'aldehyde',
  'ester',
  'carboxylic-acid',
  'amide-carbonyl',
  'aryl-ether',
  'alkyl-ether',
  'aromatic-o',
  'phenol-oh',
  'alcohol-oh',
  'oxime-oh',
  'nitro',
  'nitrile',
  'pyridine-n',
  'pyridine-n-shielded',
  'aromatic-n-substituted',
  'pyrrole-nh',
  'aniline-nh2',
  'aniline-nh',
  'aniline-n',
  'amine-nh2',
  'amine-nh',
  'amine-n',
  'amide-nh2',
  'amide-nh',
  'amide-n',
  'imine',
  'sulfonyl',
  'sulfinyl',
  'sulfonamide-nh',
  'sulfide',
  'thiophene-s',
  'thiol',
  'other-polar',
  'fluorine',
  'chlorine',
  'bromine',
  'iodine',
  'alkene-carbon',
  'aromatic-carbon',
  'aliphatic-carbon',
  'intramolecular-h-bond',
  'polar-total',
  'no-polar-group',
] as const;

export type PolarGroupKey = (typeof polarGroupKeys)[number];

const notPolar = new Set<PolarGroupKey>([
  'fluorine',
  'chlorine',
  'bromine',
  'iodine',
  'alkene-carbon',
  'aromatic-carbon',
  'aliphatic-carbon',
  'intramolecular-h-bond',
]);

const neighboursOf = (mol: Molecule, atom: number) =>
  Array.from({ length: mol.getConnAtoms(atom) }, (_, i) => mol.getConnAtom(atom, i));

/** The atom carries an exocyclic or ring C=O / C=S double bond to oxygen (a carbonyl carbon). */
function isCarbonylCarbon(mol: Molecule, atom: number): boolean {
  if (mol.getAtomicNo(atom) !== 6) return false;
  for (let i = 0; i < mol.getConnAtoms(atom); i++)
    if (mol.getConnBondOrder(atom, i) === 2 && mol.getAtomicNo(mol.getConnAtom(atom, i)) === 8) return true;
  return false;
}

const isNitroNitrogen = (mol: Molecule, atom: number) =>
  mol.getAtomicNo(atom) === 7 && neighboursOf(mol, atom).filter((other) => mol.getAtomicNo(other) === 8).length === 2;

function carbonylKind(mol: Molecule, carbon: number, oxygen: number): PolarGroupKey {
  const others = neighboursOf(mol, carbon).filter((atom) => atom !== oxygen);
  if (others.some((atom) => mol.getAtomicNo(atom) === 7)) return 'amide-carbonyl';
  const singleOxygens = others.filter((atom) => mol.getAtomicNo(atom) === 8);
  if (singleOxygens.some((atom) => mol.getAllHydrogens(atom) > 0)) return 'carboxylic-acid';
  if (singleOxygens.length > 0) return 'ester';
  return mol.getAllHydrogens(carbon) > 0 ? 'aldehyde' : 'ketone';
}

function oxygenGroup(mol: Molecule, atom: number): PolarGroupKey | null {
  const neighbours = neighboursOf(mol, atom);
  if (neighbours.length === 1 && mol.getConnBondOrder(atom, 0) === 2) {
    const partner = neighbours[0];
    if (mol.getAtomicNo(partner) === 6) return carbonylKind(mol, partner, atom);
    return null; // S=O, N=O, P=O are counted on their central atom
  }
  if (mol.getAtomCharge(atom) !== 0) return null; // nitro O−, counted on N
  if (mol.getAllHydrogens(atom) > 0) {
    const partner = neighbours[0];
    if (partner === undefined) return 'other-polar';
    if (isCarbonylCarbon(mol, partner)) return null; // the acid's OH, counted with its C=O
    if (mol.getAtomicNo(partner) === 7) return 'oxime-oh';
    return mol.isAromaticAtom(partner) ? 'phenol-oh' : 'alcohol-oh';
  }
  if (neighbours.some((other) => isCarbonylCarbon(mol, other))) return null; // ester or acid oxygen
  if (mol.isAromaticAtom(atom)) return 'aromatic-o';
  if (neighbours.some((other) => mol.getAtomicNo(other) === 7 || mol.getAtomicNo(other) === 16)) return null; // counted on N or S
  return neighbours.some((other) => mol.isAromaticAtom(other)) ? 'aryl-ether' : 'alkyl-ether';
}

function nitrogenGroup(mol: Molecule, atom: number): PolarGroupKey {
  if (isNitroNitrogen(mol, atom)) return 'nitro';
  const hydrogens = mol.getAllHydrogens(atom);
  const neighbours = neighboursOf(mol, atom);
  const byHydrogens = (two: PolarGroupKey, one: PolarGroupKey, none: PolarGroupKey) =>
    hydrogens >= 2 ? two : hydrogens === 1 ? one : none;
  if (neighbours.some((other) => isCarbonylCarbon(mol, other))) return byHydrogens('amide-nh2', 'amide-nh', 'amide-n');
  if (
    neighbours.some(
      (other) =>
        mol.getAtomicNo(other) === 16 && neighboursOf(mol, other).filter((o) => mol.getAtomicNo(o) === 8).length >= 2,
    )
  ) {
    return hydrogens > 0 ? 'sulfonamide-nh' : 'amide-n';
  }
  if (mol.isAromaticAtom(atom)) {
    if (hydrogens > 0) return 'pyrrole-nh';
    return mol.getConnAtoms(atom) === 3 ? 'aromatic-n-substituted' : 'pyridine-n';
  }
  if (mol.getAtomPi(atom) === 2) return 'nitrile';
  if (mol.getAtomPi(atom) === 1) return 'imine';
  if (neighbours.some((other) => mol.isAromaticAtom(other)))
    return byHydrogens('aniline-nh2', 'aniline-nh', 'aniline-n');
  return byHydrogens('amine-nh2', 'amine-nh', 'amine-n');
}

function sulfurGroup(mol: Molecule, atom: number): PolarGroupKey {
  const oxygens = neighboursOf(mol, atom).filter((other) => mol.getAtomicNo(other) === 8).length;
  if (oxygens >= 2) return 'sulfonyl';
  if (oxygens === 1) return 'sulfinyl';
  if (mol.isAromaticAtom(atom)) return 'thiophene-s';
  return mol.getAllHydrogens(atom) > 0 ? 'thiol' : 'sulfide';
}

const halogens: Record<number, PolarGroupKey> = { 9: 'fluorine', 17: 'chlorine', 35: 'bromine', 53: 'iodine' };

/** A donor X–H whose atom's neighbour carries a carbonyl carbon or nitro nitrogen: a six-membered H-bonded ring. */
function closesHydrogenBondRing(mol: Molecule, donor: number): boolean {
  for (const first of neighboursOf(mol, donor)) {
    for (const second of neighboursOf(mol, first)) {
      if (second === donor) continue;
      for (const third of neighboursOf(mol, second)) {
        if (third === first) continue;
        if (isCarbonylCarbon(mol, third) || isNitroNitrogen(mol, third)) return true;
      }
    }
  }
  return false;
}

/** A pyridine-type N whose both ring neighbours carry an exocyclic substituent. */
function isShieldedRingNitrogen(mol: Molecule, atom: number): boolean {
  const substituted = neighboursOf(mol, atom).filter((ringAtom) =>
    neighboursOf(mol, ringAtom).some((other) => other !== atom && !mol.isRingBond(mol.getBond(ringAtom, other))),
  );
  return substituted.length >= 2;
}

/** Polar group counts of a molecule (its neutral parent), in the order of `polarGroupKeys`. */
export function polarGroupCounts(input: Molecule): number[] {
  const mol = input.getCompactCopy();
  mol.ensureHelperArrays(Molecule.cHelperRings);
  const counts = new Map<PolarGroupKey, number>();
  const add = (key: PolarGroupKey | null) => key && counts.set(key, (counts.get(key) ?? 0) + 1);
  for (let atom = 0; atom < mol.getAtoms(); atom++) {
    const element = mol.getAtomicNo(atom);
    if (element === 8) add(oxygenGroup(mol, atom));
    else if (element === 7) {
      const group = nitrogenGroup(mol, atom);
      add(group === 'pyridine-n' && isShieldedRingNitrogen(mol, atom) ? 'pyridine-n-shielded' : group);
    } else if (element === 16) add(sulfurGroup(mol, atom));
    else if (halogens[element]) add(halogens[element]);
    else if (element === 6) {
      if (mol.isAromaticAtom(atom)) add('aromatic-carbon');
      else {
        add('aliphatic-carbon');
        if (mol.getAtomPi(atom) > 0 && neighboursOf(mol, atom).every((other) => mol.getAtomicNo(other) === 6))
          add('alkene-carbon');
      }
    } else if (element !== 1) add('other-polar');
    if ((element === 8 || element === 7) && mol.getAllHydrogens(atom) > 0 && closesHydrogenBondRing(mol, atom))
      add('intramolecular-h-bond');
  }
  const polar = [...counts].filter(([key]) => !notPolar.has(key)).reduce((sum, [, count]) => sum + count, 0);
  counts.set('polar-total', polar);
  counts.set('no-polar-group', polar === 0 ? 1 : 0);
  return polarGroupKeys.map((key) => counts.get(key) ?? 0);
}

const cache = new Map<string, number[]>();

/** Polar group counts of a SMILES (cached; an unreadable SMILES gives all zeros, so Scout still answers). */
export function polarGroupCountsOfSmiles(smiles: string): number[] {
  let counts = cache.get(smiles);
  if (!counts) {
    try {
      counts = polarGroupCounts(Molecule.fromSmiles(smiles));
    } catch {
      counts = polarGroupKeys.map(() => 0);
    }
    if (cache.size >= 100_000) cache.clear();
    cache.set(smiles, counts);
  }
  return counts;
}
