/** Stable keys of the compound classes (other features, e.g. stain suggestions, rely on them). */
export const compoundClassKeys = [
  'carboxylic-acid',
  'ester',
  'lactone',
  'amide',
  'lactam',
  'carbamate',
  'urea',
  'primary-amine',
  'secondary-amine',
  'tertiary-amine',
  'aniline',
  'pyridine',
  'indole',
  'imidazole',
  'heteroaromatic',
  'aromatic',
  'alcohol',
  'phenol',
  'diol',
  'ether',
  'acetal',
  'aldehyde',
  'ketone',
  'alkene',
  'alkyne',
  'nitrile',
  'nitro',
  'aryl-halide',
  'alkyl-halide',
  'sulfonamide',
  'sulfone',
  'sulfide',
  'thiol',
  'boronic',
  'silyl-ether',
  'epoxide',
  'ammonium-salt',
  'amino-acid',
  'phosphine-oxide',
  'conjugated',
] as const;

export type CompoundClassKey = (typeof compoundClassKeys)[number];

type CompoundClassGroup =
  'acid-base' | 'carbonyl' | 'nitrogen' | 'oxygen' | 'aromatic' | 'unsaturation' | 'halogen' | 'other-elements';

/**
 * A compound class defined as substructures. A structure belongs to the class when one of the
 * `include` fragments matches and that match passes the class's check in server code (described
 * in `check`), and no `exclude` fragment matches on the same first atom (the anchor: the first
 * atom written in each fragment). `minMatches` counts matches with distinct anchors.
 * Fragments are plain SMILES read in fragment mode: hydrogens written in brackets are ignored,
 * open valences may carry anything, charges in the molecule are not required to match.
 */
export interface CompoundClass {
  key: CompoundClassKey;
  name: string;
  description: string;
  group: CompoundClassGroup;
  include: readonly string[];
  exclude?: readonly string[];
  /** What the server-side check adds to the fragments, in words (see server/chem/class-checks.ts). */
  check?: string;
  minMatches?: number;
}
