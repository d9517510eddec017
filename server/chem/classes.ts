import { Molecule, SSSearcher } from 'openchemlib';
import { compoundClasses, type CompoundClass, type CompoundClassKey } from '../../shared/catalogue/compound-classes';
import { classChecks } from './class-checks';
import type { FragmentSummary } from './fragments';

interface CompiledClass {
  entry: CompoundClass;
  include: Molecule[];
  exclude: Molecule[];
}

function fragment(smiles: string): Molecule {
  const mol = Molecule.fromSmiles(smiles, { noCoordinates: true });
  mol.setFragment(true);
  return mol;
}

let compiled: CompiledClass[] | null = null;

function compile(): CompiledClass[] {
  compiled ??= compoundClasses.map((entry) => ({ entry, include: entry.include.map(fragment), exclude: (entry.exclude ?? []).map(fragment) }));
  return compiled;
}

/** Every match of the fragment in the molecule, as fragment atom → molecule atom lists. */
function matches(searcher: SSSearcher, query: Molecule, mol: Molecule): number[][] {
  searcher.setFragment(query);
  searcher.setMolecule(mol);
  if (searcher.findFragmentInMolecule({ countMode: 'rigorous' }) === 0) return [];
  return searcher.getMatchList();
}

function anchors(searcher: SSSearcher, queries: Molecule[], mol: Molecule): Set<number> {
  return new Set(queries.flatMap((query) => matches(searcher, query, mol).map((match) => match[0])));
}

/** The molecule (in helper state cHelperRings) belongs to this class; see CompoundClass. */
function belongs(searcher: SSSearcher, compiledClass: CompiledClass, mol: Molecule, neutralAcidPresent: boolean): boolean {
  const { entry, include, exclude } = compiledClass;
  const excluded = anchors(searcher, exclude, mol);
  const check = classChecks[entry.key];
  const found = new Set<number>();
  include.forEach((query, index) => {
    for (const match of matches(searcher, query, mol)) {
      if (excluded.has(match[0]) || found.has(match[0])) continue;
      if (!check || check({ mol, match, include: index, neutralAcidPresent })) found.add(match[0]);
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
  const searcher = new SSSearcher();
  parent.ensureHelperArrays(Molecule.cHelperRings);
  const neutralAcidPresent = input?.fragments.some((f) => f.role === 'counter-ion' && f.charge === 0) ?? false;
  const target = input?.molecule ?? parent;
  target.ensureHelperArrays(Molecule.cHelperRings);
  return compile()
    .filter((compiledClass) => belongs(searcher, compiledClass, compiledClass.entry.key === 'ammonium-salt' ? target : parent, neutralAcidPresent))
    .map((compiledClass) => compiledClass.entry.key);
}
