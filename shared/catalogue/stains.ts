export interface Stain {
  key: string;
  label: string;
  name: string;
  synonyms: readonly string[];
  /** Compound class keys (see compound-classes.ts) that this visualisation shows well. */
  detects: readonly string[];
  /** specific: shows few classes and says which; broad: many classes; general: nearly anything. */
  selectivity: 'specific' | 'broad' | 'general';
  /** usually: most compounds of the classes show; sometimes: only some do (e.g. only fluorescent ones under UV 365). */
  hitRate: 'usually' | 'sometimes';
  /** What it shows, in words. */
  shows: string;
  appearance: string;
  needsHeat: boolean;
  /** True for UV: needs a plate with fluorescent indicator and leaves the plate unchanged. */
  nonDestructive: boolean;
  preparationHazards: string;
  /**
   * Where what it shows comes from. All common practice: the team's notes marked six rows as read in a published
   * stain table but did not record which, so no published source is cited (docs/references.md).
   */
  source: string;
}

const stainTable = (what: string) => `common practice (standard TLC stain tables: ${what})`;
const commonPractice = 'common practice';

const oxidisable = [
  'alkene',
  'alkyne',
  'alcohol',
  'diol',
  'aldehyde',
  'primary-amine',
  'secondary-amine',
  'sulfide',
  'thiol',
  'phenol',
];
const aromaticLike = [
  'aromatic',
  'heteroaromatic',
  'conjugated',
  'aniline',
  'pyridine',
  'indole',
  'imidazole',
  'phenol',
  'aryl-halide',
];
const hydroxylsAndCarbonyls = ['alcohol', 'diol', 'phenol', 'aldehyde', 'ketone', 'acetal'];

/** Visualisation methods for TLC plates. */
export const stains: readonly Stain[] = [
  {
    key: 'uv-254',
    label: 'UV 254',
    name: 'UV light, 254 nm',
    synonyms: ['UV 254', 'UV254', 'UV (254 nm)', 'UV 254 nm', 'UV', 'short-wave UV'],
    detects: aromaticLike,
    selectivity: 'broad',
    hitRate: 'usually',
    shows: 'conjugated and aromatic compounds',
    appearance: 'dark spots on a green fluorescent background',
    needsHeat: false,
    nonDestructive: true,
    preparationHazards: 'UV light harms eyes and skin; use the lamp’s shield and UV-blocking glasses.',
    source: commonPractice,
  },
  {
    key: 'uv-365',
    label: 'UV 365',
    name: 'UV light, 365 nm',
    synonyms: ['UV 365', 'UV365', 'UV (365 nm)', 'UV 365 nm', 'long-wave UV'],
    detects: ['conjugated', 'indole'],
    selectivity: 'specific',
    hitRate: 'sometimes',
    shows: 'compounds that fluoresce (extended conjugation)',
    appearance: 'bright blue, green or yellow fluorescence',
    needsHeat: false,
    nonDestructive: true,
    preparationHazards: 'UV light harms eyes and skin; use the lamp’s shield and UV-blocking glasses.',
    source: commonPractice,
  },
  {
    key: 'kmno4',
    label: 'KMnO4',
    name: 'potassium permanganate (basic)',
    synonyms: ['KMnO4', 'permanganate', 'potassium permanganate', 'basic permanganate'],
    detects: oxidisable,
    selectivity: 'broad',
    hitRate: 'usually',
    shows: 'oxidisable groups: alkenes, alkynes, alcohols, aldehydes, amines, sulfides',
    appearance: 'yellow spots on purple',
    needsHeat: false,
    nonDestructive: false,
    preparationHazards: 'Strong oxidiser; keep from organics and acids; stains skin.',
    source: stainTable('general, oxidisable groups'),
  },
  {
    key: 'ninhydrin',
    label: 'ninhydrin',
    name: 'ninhydrin',
    synonyms: ['ninhydrin', 'nin'],
    detects: ['primary-amine', 'secondary-amine', 'amino-acid', 'carbamate'],
    selectivity: 'specific',
    hitRate: 'usually',
    shows: 'primary and secondary amines, amino acids; Boc-amines after strong heating',
    appearance: 'pink to purple spots',
    needsHeat: true,
    nonDestructive: false,
    preparationHazards: 'Harmful; stains skin purple; heat gun near flammable solvent vapour.',
    source: stainTable('primary and secondary amines, amino acids'),
  },
  {
    key: 'dnp',
    label: '2,4-DNP',
    name: '2,4-dinitrophenylhydrazine',
    synonyms: ['2,4-DNP', 'DNP', '2,4-dinitrophenylhydrazine', 'DNPH', "Brady's reagent"],
    detects: ['aldehyde', 'ketone'],
    selectivity: 'specific',
    hitRate: 'usually',
    shows: 'aldehydes and ketones',
    appearance: 'yellow to orange spots',
    needsHeat: false,
    nonDestructive: false,
    preparationHazards: 'Dry 2,4-DNP is shock-sensitive and explosive; the stain contains strong acid.',
    source: stainTable('aldehydes and ketones'),
  },
  {
    key: 'bromocresol-green',
    label: 'bromocresol green',
    name: 'bromocresol green',
    synonyms: ['bromocresol green', 'BCG', 'bromocresol'],
    detects: ['carboxylic-acid', 'amino-acid'],
    selectivity: 'specific',
    hitRate: 'usually',
    shows: 'acids with pKa below about 5',
    appearance: 'yellow spots on blue',
    needsHeat: false,
    nonDestructive: false,
    preparationHazards: 'Ethanolic solution: flammable.',
    source: stainTable('carboxylic acids'),
  },
  {
    key: 'pma',
    label: 'PMA',
    name: 'phosphomolybdic acid',
    synonyms: ['PMA', 'phosphomolybdic acid', 'phosphomolybdic'],
    detects: ['alcohol', 'diol', 'alkene', 'phenol', 'aldehyde'],
    selectivity: 'general',
    hitRate: 'usually',
    shows: 'reducing compounds, lipids, steroids; most organics',
    appearance: 'dark blue-green spots on yellow-green',
    needsHeat: true,
    nonDestructive: false,
    preparationHazards: 'Oxidiser in ethanol: flammable; heat gun near solvent vapour.',
    source: stainTable('reducing compounds, lipids, steroids'),
  },
  {
    key: 'iodine',
    label: 'iodine',
    name: 'iodine vapour',
    synonyms: ['iodine', 'I2', 'iodine vapour', 'iodine vapor', 'iodine chamber'],
    detects: ['alkene', 'alkyne', 'aromatic', 'sulfide', 'thiol', 'tertiary-amine', 'secondary-amine', 'primary-amine'],
    selectivity: 'general',
    hitRate: 'usually',
    shows: 'general; strongest for unsaturated and aromatic compounds',
    appearance: 'brown spots that fade',
    needsHeat: false,
    nonDestructive: false,
    preparationHazards: 'Iodine vapour is corrosive and irritating; keep the chamber closed.',
    source: stainTable('general'),
  },
  {
    key: 'cam',
    label: 'CAM',
    name: 'ceric ammonium molybdate (Hanessian’s stain)',
    synonyms: ['CAM', 'ceric ammonium molybdate', "Hanessian's stain", 'Hanessian', 'cerium molybdate'],
    detects: ['alcohol', 'diol', 'phenol', 'acetal', 'silyl-ether', 'epoxide'],
    selectivity: 'general',
    hitRate: 'usually',
    shows: 'near universal; strong for hydroxyl groups',
    appearance: 'dark blue spots on light blue',
    needsHeat: true,
    nonDestructive: false,
    preparationHazards: 'Contains concentrated sulfuric acid: corrosive; heat gun.',
    source: commonPractice,
  },
  {
    key: 'p-anisaldehyde',
    label: 'p-anisaldehyde',
    name: 'p-anisaldehyde',
    synonyms: ['p-anisaldehyde', 'anisaldehyde', 'PAA', '4-methoxybenzaldehyde'],
    detects: [...hydroxylsAndCarbonyls, 'indole'],
    selectivity: 'broad',
    hitRate: 'usually',
    shows: 'nucleophiles, alcohols, carbonyls, sugars, terpenes',
    appearance: 'varied colours on pink',
    needsHeat: true,
    nonDestructive: false,
    preparationHazards: 'Contains sulfuric acid in ethanol: corrosive and flammable; heat gun.',
    source: commonPractice,
  },
  {
    key: 'vanillin',
    label: 'vanillin',
    name: 'vanillin',
    synonyms: ['vanillin'],
    detects: hydroxylsAndCarbonyls,
    selectivity: 'broad',
    hitRate: 'usually',
    shows: 'alcohols, carbonyls, terpenes',
    appearance: 'varied colours on light background',
    needsHeat: true,
    nonDestructive: false,
    preparationHazards: 'Contains sulfuric acid in ethanol: corrosive and flammable; heat gun.',
    source: commonPractice,
  },
  {
    key: 'dragendorff',
    label: 'Dragendorff',
    name: 'Dragendorff reagent',
    synonyms: ["Dragendorff's reagent", 'Dragendorff', 'Dragendorff reagent'],
    detects: ['tertiary-amine', 'ammonium-salt', 'pyridine'],
    selectivity: 'specific',
    hitRate: 'usually',
    shows: 'alkaloids, tertiary amines and quaternary ammonium salts',
    appearance: 'orange spots on yellow',
    needsHeat: false,
    nonDestructive: false,
    preparationHazards: 'Bismuth salt in acid: irritant.',
    source: commonPractice,
  },
  {
    key: 'ferric-chloride',
    label: 'FeCl3',
    name: 'ferric chloride',
    synonyms: ['ferric chloride', 'FeCl3', 'iron(III) chloride'],
    detects: ['phenol'],
    selectivity: 'specific',
    hitRate: 'usually',
    shows: 'phenols and enols',
    appearance: 'blue, violet or green spots',
    needsHeat: false,
    nonDestructive: false,
    preparationHazards: 'Corrosive.',
    source: commonPractice,
  },
  {
    key: 'ehrlich',
    label: 'Ehrlich',
    name: 'Ehrlich’s reagent (p-dimethylaminobenzaldehyde)',
    synonyms: ["Ehrlich's reagent", 'Ehrlich', 'DMAB', 'p-dimethylaminobenzaldehyde'],
    detects: ['indole', 'aniline'],
    selectivity: 'specific',
    hitRate: 'usually',
    shows: 'indoles and primary aromatic amines',
    appearance: 'pink to purple spots',
    needsHeat: true,
    nonDestructive: false,
    preparationHazards: 'Contains strong acid: corrosive.',
    source: commonPractice,
  },
];

const byKey = new Map(stains.map((stain) => [stain.key, stain]));

/** The stain with this catalogue key, or undefined. */
export function stainByKey(key: string): Stain | undefined {
  return byKey.get(key);
}
