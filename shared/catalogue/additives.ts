/** What an eluent additive is for. */
export type AdditivePurpose = 'base' | 'acid';

export interface Additive {
  key: string;
  label: string;
  name: string;
  synonyms: readonly string[];
  purpose: AdditivePurpose;
  /** Why chemists add it, in a sentence. */
  use: string;
  /** Usual amount, % v/v of the eluent (common practice). */
  typicalPercent: readonly [number, number];
  /** Compound class keys it usually helps (see compound-classes.ts). */
  helpsClasses: readonly string[];
  hazards: string;
}

const amineClasses = [
  'primary-amine',
  'secondary-amine',
  'tertiary-amine',
  'pyridine',
  'imidazole',
  'amino-acid',
  'ammonium-salt',
];
const acidClasses = ['carboxylic-acid', 'amino-acid', 'phenol', 'boronic'];

/**
 * Eluent additives that suppress tailing of basic or acidic compounds on silica. Amounts, uses and
 * hazards: common practice; follow the safety data sheet of each reagent.
 */
export const additives: readonly Additive[] = [
  {
    key: 'triethylamine',
    label: 'Et3N',
    name: 'triethylamine',
    synonyms: ['triethylamine', 'Et3N', 'NEt3', 'TEA'],
    purpose: 'base',
    use: 'Blocks acidic silanol sites so amines run as tight spots.',
    typicalPercent: [0.1, 3],
    helpsClasses: amineClasses,
    hazards: 'Flammable, corrosive, strong odour; work in a fume hood.',
  },
  {
    key: 'diisopropylethylamine',
    label: 'DIPEA',
    name: 'N,N-diisopropylethylamine',
    synonyms: [
      'diisopropylethylamine',
      'N,N-diisopropylethylamine',
      'DIPEA',
      'DIEA',
      'iPr2NEt',
      "Hünig's base",
      'Hunigs base',
    ],
    purpose: 'base',
    use: 'A hindered base used like triethylamine.',
    typicalPercent: [0.1, 2],
    helpsClasses: amineClasses,
    hazards: 'Flammable and corrosive.',
  },
  {
    key: 'ammonia',
    label: 'NH3 (aq)',
    name: 'aqueous ammonia',
    synonyms: [
      'aqueous ammonia',
      'ammonia',
      'NH3',
      'NH4OH',
      'aq NH3',
      'aq. NH3',
      'aq. ammonia',
      'ammonium hydroxide',
      'conc. NH3',
      'conc NH3',
      'conc. NH4OH',
      'NH3 (aq)',
    ],
    purpose: 'base',
    use: 'With DCM/MeOH for polar amines; keep MeOH high enough to dissolve the water.',
    typicalPercent: [0.5, 2],
    helpsClasses: amineClasses,
    hazards: 'Corrosive; releases ammonia gas, irritating to eyes and lungs.',
  },
  {
    key: 'pyridine',
    label: 'pyridine',
    name: 'pyridine',
    synonyms: ['pyridine', 'py', 'pyr'],
    purpose: 'base',
    use: 'A weaker base than triethylamine; occasionally used for amines.',
    typicalPercent: [0.1, 2],
    helpsClasses: amineClasses,
    hazards: 'Flammable, harmful, unpleasant odour.',
  },
  {
    key: 'acetic-acid',
    label: 'AcOH',
    name: 'acetic acid',
    synonyms: ['acetic acid', 'AcOH', 'HOAc', 'glacial acetic acid', 'CH3COOH'],
    purpose: 'acid',
    use: 'Keeps carboxylic acids protonated so they run without streaking.',
    typicalPercent: [0.1, 2],
    helpsClasses: acidClasses,
    hazards: 'Flammable and corrosive.',
  },
  {
    key: 'formic-acid',
    label: 'HCO2H',
    name: 'formic acid',
    synonyms: ['formic acid', 'HCOOH', 'HCO2H'],
    purpose: 'acid',
    use: 'A stronger, more volatile acid than acetic acid; evaporates from fractions.',
    typicalPercent: [0.1, 1],
    helpsClasses: acidClasses,
    hazards: 'Corrosive; toxic vapour.',
  },
  {
    key: 'trifluoroacetic-acid',
    label: 'TFA',
    name: 'trifluoroacetic acid',
    synonyms: ['trifluoroacetic acid', 'TFA', 'CF3COOH', 'CF3CO2H'],
    purpose: 'acid',
    use: 'Strong acid, mostly for reversed phase; can cleave acid-labile groups.',
    typicalPercent: [0.05, 1],
    helpsClasses: acidClasses,
    hazards: 'Severely corrosive; causes deep burns.',
  },
];

export const additiveKeys = additives.map((additive) => additive.key) as [string, ...string[]];

const byKey = new Map(additives.map((additive) => [additive.key, additive]));

/** The additive with this catalogue key, or undefined. */
export function additiveByKey(key: string): Additive | undefined {
  return byKey.get(key);
}
