import { CanonizerUtil, Molecule } from 'openchemlib';
import { neutralise } from './neutralise';

/** What a disconnected part of the input is, next to the parent compound. */
type FragmentRole = 'parent' | 'counter-ion' | 'solvent' | 'other';

/** One distinct fragment of the input, with how often it occurs. */
export interface FragmentSummary {
  role: FragmentRole;
  /** Isomeric SMILES of the fragment as entered (charges kept). */
  smiles: string;
  count: number;
  heavyAtoms: number;
  /** Net formal charge as entered. */
  charge: number;
}

/** Crystallisation and work-up solvents that may be drawn with a compound (common practice). */
const SOLVENTS = [
  'O',
  'CO',
  'CCO',
  'CC(C)O',
  'CC(C)=O',
  'CC#N',
  'ClCCl',
  'ClC(Cl)Cl',
  'CCOC(C)=O',
  'CCOCC',
  'C1CCOC1',
  'C1COCCO1',
  'CN(C)C=O',
  'CS(C)=O',
  'Cc1ccccc1',
  'c1ccccc1',
  'CCCCCC',
  'CCCCCCC',
  'COC(C)(C)C',
];

/**
 * Acids and bases that form salts with a compound, in neutral form (common practice): hydrogen
 * halides, sulfuric, phosphoric, nitric, TFA, acetic, formic, methanesulfonic, p-toluenesulfonic,
 * benzenesulfonic, triflic, camphorsulfonic, oxalic, fumaric/maleic, succinic, tartaric, citric acid.
 * Compared in neutral form without stereo (NOSTEREO ID codes of the neutralised fragment).
 */
const COUNTER_IONS = [
  'F',
  'Cl',
  'Br',
  'I',
  'OS(=O)(=O)O',
  'OP(=O)(O)O',
  'O[N+](=O)[O-]',
  'OC(=O)C(F)(F)F',
  'CC(=O)O',
  'OC=O',
  'CS(=O)(=O)O',
  'Cc1ccc(cc1)S(=O)(=O)O',
  'OS(=O)(=O)c1ccccc1',
  'OS(=O)(=O)C(F)(F)F',
  'CC1(C)C2CCC1(CS(=O)(=O)O)C(=O)C2',
  'OC(=O)C(=O)O',
  'OC(=O)C=CC(=O)O',
  'OC(=O)CCC(=O)O',
  'OC(C(O)C(=O)O)C(=O)O',
  'OC(=O)CC(O)(CC(=O)O)C(=O)O',
];

function stereoFreeKey(mol: Molecule): string {
  return CanonizerUtil.getIDCode(neutralise(mol), CanonizerUtil.NOSTEREO);
}

const solventKeys = new Set(SOLVENTS.map((smiles) => stereoFreeKey(Molecule.fromSmiles(smiles))));
const counterIonKeys = new Set(COUNTER_IONS.map((smiles) => stereoFreeKey(Molecule.fromSmiles(smiles))));

interface Fragment {
  mol: Molecule;
  key: string;
  heavyAtoms: number;
  hasCarbon: boolean;
  netCharge: number;
}

function describe(mol: Molecule): Fragment {
  mol.ensureHelperArrays(Molecule.cHelperNeighbours);
  let heavyAtoms = 0;
  let hasCarbon = false;
  let netCharge = 0;
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    if (mol.getAtomicNo(a) !== 1) heavyAtoms++;
    if (mol.getAtomicNo(a) === 6) hasCarbon = true;
    netCharge += mol.getAtomCharge(a);
  }
  return { mol, key: mol.getIDCode(), heavyAtoms, hasCarbon, netCharge };
}

function listedRole(fragment: Fragment): FragmentRole | null {
  const key = stereoFreeKey(fragment.mol);
  if (solventKeys.has(key)) return 'solvent';
  if (counterIonKeys.has(key) || !fragment.hasCarbon) return 'counter-ion';
  return null;
}

function larger(a: Fragment, b: Fragment): Fragment {
  if (a.heavyAtoms !== b.heavyAtoms) return a.heavyAtoms > b.heavyAtoms ? a : b;
  return a.key <= b.key ? a : b;
}

/**
 * Picks the parent compound of an input: the largest fragment (heavy atoms; ties broken by ID code)
 * that contains carbon and is not a listed solvent or counter-ion, else the largest carbon-containing
 * fragment, else the largest fragment. Other fragments are solvents or counter-ions when listed,
 * counter-ions when carbon-free or with a net charge, and "other" (a mixture) otherwise. Returns the parent as
 * drawn and the distinct fragments with their roles and counts.
 */
export function splitParent(input: Molecule): { parent: Molecule; fragments: FragmentSummary[] } {
  const all = input.getFragments().map(describe);
  // A lone fragment is the parent whatever it is, so the (costly, ~2 ms) solvent and counter-ion check is skipped.
  const listed = new Map(all.map((fragment) => [fragment, all.length > 1 ? listedRole(fragment) : null]));
  const pool =
    [all.filter((f) => listed.get(f) === null), all.filter((f) => f.hasCarbon), all].find((list) => list.length > 0) ??
    all;
  const parent = pool.reduce(larger);
  const summaries = new Map<string, FragmentSummary>();
  for (const fragment of all) {
    const existing = summaries.get(fragment.key);
    if (existing) {
      existing.count++;
      continue;
    }
    const role: FragmentRole =
      fragment.key === parent.key
        ? 'parent'
        : (listed.get(fragment) ?? (fragment.netCharge !== 0 ? 'counter-ion' : 'other'));
    summaries.set(fragment.key, {
      role,
      smiles: fragment.mol.toIsomericSmiles(),
      count: 1,
      heavyAtoms: fragment.heavyAtoms,
      charge: fragment.netCharge,
    });
  }
  const order: FragmentRole[] = ['parent', 'other', 'counter-ion', 'solvent'];
  const fragments = [...summaries.values()].sort(
    (a, b) => order.indexOf(a.role) - order.indexOf(b.role) || b.heavyAtoms - a.heavyAtoms,
  );
  return { parent: parent.mol, fragments };
}
