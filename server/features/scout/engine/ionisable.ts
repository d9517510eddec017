import { Molecule } from 'openchemlib';

/**
 * The groups that decide an eluent additive on silica (common practice): a basic amine or pyridine-like
 * nitrogen streaks on the acidic silanols unless a base (Et3N, NH3) is added; a carboxylic or sulfonic acid tails
 * unless an acid (AcOH) keeps it protonated. Anilines, amides and sulfonamides are too weakly basic or acidic to
 * need one. An amino acid has both groups.
 */
export interface IonisableGroups {
  acid: boolean;
  base: boolean;
}

const baseClasses = new Set([
  'primary-amine',
  'secondary-amine',
  'tertiary-amine',
  'pyridine',
  'imidazole',
  'amino-acid',
  'ammonium-salt',
]);
const acidClasses = new Set(['carboxylic-acid', 'amino-acid']);
const sulfonicCache = new Map<string, boolean>();

/** An S with two S=O and an OH (or O−): a sulfonic acid (no compound class names it). */
function hasSulfonicAcid(smiles: string): boolean {
  let found = sulfonicCache.get(smiles);
  if (found !== undefined) return found;
  found = false;
  try {
    const mol = Molecule.fromSmiles(smiles);
    for (let atom = 0; atom < mol.getAtoms() && !found; atom++) {
      if (mol.getAtomicNo(atom) !== 16) continue;
      let doubleO = 0;
      let acidicO = 0;
      for (let i = 0; i < mol.getConnAtoms(atom); i++) {
        const other = mol.getConnAtom(atom, i);
        if (mol.getAtomicNo(other) !== 8) continue;
        if (mol.getConnBondOrder(atom, i) === 2) doubleO += 1;
        else if (mol.getConnAtoms(other) === 1 && (mol.getAllHydrogens(other) > 0 || mol.getAtomCharge(other) < 0))
          acidicO += 1;
      }
      found = doubleO >= 2 && acidicO >= 1;
    }
  } catch {
    found = false;
  }
  if (sulfonicCache.size > 5000) sulfonicCache.clear();
  sulfonicCache.set(smiles, found);
  return found;
}

export function ionisableGroups(compound: { smiles: string; classes: readonly string[] }): IonisableGroups {
  return {
    base: compound.classes.some((key) => baseClasses.has(key)),
    acid:
      compound.classes.some((key) => acidClasses.has(key)) ||
      (compound.smiles.includes('S') && hasSulfonicAcid(compound.smiles)),
  };
}

/** Groups the other compound has that the query lacks (a neighbour's failure caused by one is no warning for the query). */
export function groupsQueryLacks(query: IonisableGroups, other: IonisableGroups): ('acid' | 'base')[] {
  return (['acid', 'base'] as const).filter((group) => other[group] && !query[group]);
}

export const sameGroups = (a: IonisableGroups, b: IonisableGroups) => a.acid === b.acid && a.base === b.base;

export const groupWords = {
  base: 'a basic amine or pyridine-like nitrogen',
  acid: 'a carboxylic or sulfonic acid',
} as const;
