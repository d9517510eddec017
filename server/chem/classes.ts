import { Molecule, SSSearcher } from 'openchemlib';
import { compoundClasses, type CompoundClass, type CompoundClassKey } from '../../shared/catalogue/compound-classes';
import { classChecks } from './class-checks';
import type { FragmentSummary } from './fragments';

/** A class's fragment, with the heavy elements a match needs (atom → count), for a cheap prescreen. */
interface Query {
  mol: Molecule;
  needs: [number, number][];
}

interface CompiledClass {
  entry: CompoundClass;
  include: Query[];
  exclude: Query[];
}

/** Atoms by atomic number, explicit hydrogens left out when `heavyOnly` (atom lists and pseudo atoms never counted). */
function elementCounts(mol: Molecule, heavyOnly: boolean): Map<number, number> {
  const counts = new Map<number, number>();
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    const element = mol.getAtomicNo(a);
    // An atom list or pseudo atom can match several elements: it asks for none in particular.
    if (element === 0 || (heavyOnly && element === 1) || mol.getAtomList(a) !== null) continue;
    counts.set(element, (counts.get(element) ?? 0) + 1);
  }
  return counts;
}

function fragment(smiles: string): Query {
  const mol = Molecule.fromSmiles(smiles, { noCoordinates: true });
  mol.setFragment(true);
  return { mol, needs: [...elementCounts(mol, true)] };
}

let compiled: CompiledClass[] | null = null;

function compile(): CompiledClass[] {
  compiled ??= compoundClasses.map((entry) => ({
    entry,
    include: entry.include.map(fragment),
    exclude: (entry.exclude ?? []).map(fragment),
  }));
  return compiled;
}

/**
 * One molecule matched against many fragments: it is handed to the searcher once (its features are then
 * computed once), and a fragment needing an element more often than the molecule has it is not searched.
 */
class Target {
  private readonly counts: Map<number, number>;
  private readonly searcher = new SSSearcher();

  constructor(readonly mol: Molecule) {
    this.counts = elementCounts(mol, false);
    this.searcher.setMolecule(mol);
  }

  /** Every match of the fragment in the molecule, as fragment atom → molecule atom lists. */
  matches(query: Query): number[][] {
    if (query.needs.some(([element, count]) => (this.counts.get(element) ?? 0) < count)) return [];
    this.searcher.setFragment(query.mol);
    if (this.searcher.findFragmentInMolecule({ countMode: 'rigorous' }) === 0) return [];
    return this.searcher.getMatchList();
  }
}

function anchors(target: Target, queries: Query[]): Set<number> {
  return new Set(queries.flatMap((query) => target.matches(query).map((match) => match[0])));
}

/** The molecule (in helper state cHelperRings) belongs to this class; see CompoundClass. */
function belongs(compiledClass: CompiledClass, target: Target, neutralAcidPresent: boolean): boolean {
  const { entry, include, exclude } = compiledClass;
  const excluded = anchors(target, exclude);
  const check = classChecks[entry.key];
  const found = new Set<number>();
  include.forEach((query, index) => {
    for (const match of target.matches(query)) {
      if (excluded.has(match[0]) || found.has(match[0])) continue;
      if (!check || check({ mol: target.mol, match, include: index, neutralAcidPresent })) found.add(match[0]);
    }
  });
  return found.size >= (entry.minMatches ?? 1);
}

/** Options for classify: the input as entered, for classes judged on the salt form. */
export interface ClassifyInput {
  molecule: Molecule;
  fragments: FragmentSummary[];
}

/**
 * The compound classes (catalogue shared/catalogue/compound-classes.ts) of a neutral parent, in
 * catalogue order. `ammonium-salt` is judged on the input as entered (pass `input`), every other
 * class on the parent. Fragments are matched with OpenChemLib's SSSearcher, then refined by the
 * per-class checks in class-checks.ts.
 */
export function classify(parent: Molecule, input?: ClassifyInput): CompoundClassKey[] {
  parent.ensureHelperArrays(Molecule.cHelperRings);
  const neutralAcidPresent = input?.fragments.some((f) => f.role === 'counter-ion' && f.charge === 0) ?? false;
  const asEntered = input?.molecule ?? parent;
  asEntered.ensureHelperArrays(Molecule.cHelperRings);
  const parentTarget = new Target(parent);
  let enteredTarget: Target | undefined;
  return compile()
    .filter((compiledClass) => {
      const target =
        compiledClass.entry.key === 'ammonium-salt'
          ? (enteredTarget ??= asEntered === parent ? parentTarget : new Target(asEntered))
          : parentTarget;
      return belongs(compiledClass, target, neutralAcidPresent);
    })
    .map((compiledClass) => compiledClass.entry.key);
}
