import initRDKitModule from '@rdkit/rdkit';

/**
 * RDKit MinimalLib (`@rdkit/rdkit`, test-only) as an independent reference implementation:
 * formula (counted from the atom table of get_json), descriptors, Morgan fingerprints.
 */

export interface RdkitMol {
  get_json(): string;
  get_descriptors(): string;
  get_morgan_fp(details: string): string;
  /** JSON: `{"atoms":[…],"bonds":[…]}` for the first match, `{}` for none. */
  get_substruct_match(query: RdkitMol): string;
  /** JSON: an array of `{"atoms":[…],"bonds":[…]}`, or `{}` for none. */
  get_substruct_matches(query: RdkitMol): string;
  delete(): void;
}
export interface RdkitModule {
  get_mol(input: string): RdkitMol | null;
  get_qmol(smarts: string): RdkitMol | null;
}

const SYMBOLS: Record<number, string> = {
  1: 'H',
  5: 'B',
  6: 'C',
  7: 'N',
  8: 'O',
  9: 'F',
  11: 'Na',
  14: 'Si',
  15: 'P',
  16: 'S',
  17: 'Cl',
  19: 'K',
  34: 'Se',
  35: 'Br',
  53: 'I',
};

let module: Promise<RdkitModule> | null = null;

export function rdkit(): Promise<RdkitModule> {
  module ??= (initRDKitModule as unknown as () => Promise<RdkitModule>)();
  return module;
}

export async function withMol<T>(smiles: string, read: (mol: RdkitMol) => T): Promise<T> {
  const mol = (await rdkit()).get_mol(smiles);
  if (!mol) throw new Error(`RDKit could not read ${smiles}`);
  try {
    return read(mol);
  } finally {
    mol.delete();
  }
}

/** Hill formula from RDKit's atom table (implicit H included), charge appended as "+", "2-"… */
export function rdkitFormula(smiles: string): Promise<string> {
  return withMol(smiles, (mol) => {
    const json = JSON.parse(mol.get_json());
    const defaults = json.defaults.atom;
    const counts = new Map<string, number>();
    let charge = 0;
    for (const atom of json.molecules[0].atoms) {
      const z = atom.z ?? defaults.z;
      const symbol = SYMBOLS[z];
      if (!symbol) throw new Error(`No symbol for Z=${z} in the test table.`);
      counts.set(symbol, (counts.get(symbol) ?? 0) + 1);
      counts.set('H', (counts.get('H') ?? 0) + (atom.impHs ?? defaults.impHs));
      charge += atom.chg ?? defaults.chg;
    }
    if (counts.get('H') === 0) counts.delete('H');
    const rest = [...counts.keys()].filter((s) => s !== 'C' && s !== 'H').sort();
    const order = counts.has('C') ? ['C', ...(counts.has('H') ? ['H'] : []), ...rest] : [...counts.keys()].sort();
    const body = order.map((s) => `${s}${counts.get(s) === 1 ? '' : counts.get(s)}`).join('');
    return charge === 0 ? body : `${body}${Math.abs(charge) === 1 ? '' : Math.abs(charge)}${charge > 0 ? '+' : '-'}`;
  });
}

export interface RdkitDescriptors {
  amw: number;
  exactmw: number;
  tpsa: number;
  NumHBD: number;
  lipinskiHBA: number;
  /** Wildman & Crippen atom-contribution log P. */
  CrippenClogP: number;
  /** RDKit's strict definition (excludes amide/ester C–X, CF3, t-Bu and bonds next to triple bonds). */
  NumRotatableBonds: number;
  NumAromaticRings: number;
  /** Specified and unspecified tetrahedral stereocentres. */
  NumAtomStereoCenters: number;
}

export function rdkitDescriptors(smiles: string): Promise<RdkitDescriptors> {
  return withMol(smiles, (mol) => JSON.parse(mol.get_descriptors()) as RdkitDescriptors);
}

/** Morgan (ECFP4-like) fingerprint, radius 2, 2048 bits, as the set bit positions. */
export function morganBits(smiles: string): Promise<Set<number>> {
  return withMol(smiles, (mol) => {
    const bits = mol.get_morgan_fp(JSON.stringify({ radius: 2, nBits: 2048 }));
    const set = new Set<number>();
    for (let i = 0; i < bits.length; i++) if (bits[i] === '1') set.add(i);
    return set;
  });
}

/** Does the molecule contain the query (a SMILES read as a molecule, or a SMARTS pattern)? */
export async function rdkitHas(smiles: string, query: string, as: 'smiles' | 'smarts'): Promise<boolean> {
  const lib = await rdkit();
  const pattern = as === 'smarts' ? lib.get_qmol(query) : lib.get_mol(query);
  if (!pattern) throw new Error(`RDKit could not read the query ${query}`);
  try {
    return await withMol(smiles, (mol) => Object.keys(JSON.parse(mol.get_substruct_match(pattern))).length > 0);
  } finally {
    pattern.delete();
  }
}

/** Distinct bonds matched by a two-atom SMARTS pattern (e.g. a rotatable-bond definition). */
export async function rdkitBondCount(smiles: string, smarts: string): Promise<number> {
  const pattern = (await rdkit()).get_qmol(smarts);
  if (!pattern) throw new Error(`RDKit could not read the SMARTS ${smarts}`);
  try {
    return await withMol(smiles, (mol) => {
      const matches = JSON.parse(mol.get_substruct_matches(pattern)) as { bonds: number[] }[] | Record<string, never>;
      return new Set((Array.isArray(matches) ? matches : []).flatMap((match) => match.bonds)).size;
    });
  } finally {
    pattern.delete();
  }
}
