import type { Adsorbent } from './types';

export interface StationaryPhase {
  key: string;
  name: string;
  synonyms: readonly string[];
  /** Which ε° scale the strength model uses on this phase; null where Snyder's model does not apply. */
  adsorbent: Adsorbent | null;
  mode: 'normal' | 'reversed' | 'partition';
  /** True for "other": the record must name the phase. */
  needsName: boolean;
  note: string;
}

/** Stationary phases for TLC and flash columns (common practice descriptions). */
export const stationaryPhases: readonly StationaryPhase[] = [
  {
    key: 'silica-gel',
    name: 'silica gel 40–63 µm',
    adsorbent: 'silica',
    mode: 'normal',
    needsName: false,
    synonyms: [
      'silica gel',
      'silica',
      'SiO2',
      'silica gel 60',
      'flash silica',
      'Kieselgel 60',
      'silica 40-63 um',
      'silica gel 40-63 µm',
    ],
    note: 'Standard flash-column silica; slightly acidic.',
  },
  {
    key: 'silica-tlc-f254',
    name: 'silica TLC plate with fluorescent indicator (F254)',
    adsorbent: 'silica',
    mode: 'normal',
    needsName: false,
    synonyms: [
      'silica TLC plate',
      'TLC plate',
      'silica F254',
      'F254',
      'silica gel 60 F254',
      'SiO2 F254',
      'silica plate',
    ],
    note: 'UV-active compounds show as dark spots on green under 254 nm.',
  },
  {
    key: 'alumina-neutral',
    name: 'alumina, neutral',
    adsorbent: 'alumina',
    mode: 'normal',
    needsName: false,
    synonyms: ['alumina', 'neutral alumina', 'alumina neutral', 'Al2O3', 'neutral Al2O3'],
    note: 'For acid-sensitive compounds.',
  },
  {
    key: 'alumina-basic',
    name: 'alumina, basic',
    adsorbent: 'alumina',
    mode: 'normal',
    needsName: false,
    synonyms: ['basic alumina', 'alumina basic', 'basic Al2O3'],
    note: 'For amines and other bases.',
  },
  {
    key: 'alumina-acidic',
    name: 'alumina, acidic',
    adsorbent: 'alumina',
    mode: 'normal',
    needsName: false,
    synonyms: ['acidic alumina', 'alumina acidic', 'acidic Al2O3'],
    note: 'For acids; rarely needed.',
  },
  {
    key: 'c18',
    name: 'C18 reversed phase',
    adsorbent: null,
    mode: 'reversed',
    needsName: false,
    synonyms: ['C18', 'RP-18', 'RP18', 'reversed phase', 'reverse phase', 'ODS', 'C18 silica', 'RP'],
    note: 'Polar eluents (water/MeCN or water/MeOH); order of elution is reversed.',
  },
  {
    key: 'amine-silica',
    name: 'amine-bonded silica',
    adsorbent: null,
    mode: 'normal',
    needsName: false,
    synonyms: ['amine-bonded silica', 'amine silica', 'NH2 silica', 'aminopropyl silica', 'NH2'],
    note: 'Basic surface; amines often run without an added base.',
  },
  {
    key: 'diol-silica',
    name: 'diol-bonded silica',
    adsorbent: null,
    mode: 'normal',
    needsName: false,
    synonyms: ['diol', 'diol silica', 'diol-bonded silica'],
    note: 'Less retentive and less acidic than bare silica.',
  },
  {
    key: 'cyano-silica',
    name: 'cyano-bonded silica',
    adsorbent: null,
    mode: 'normal',
    needsName: false,
    synonyms: ['cyano', 'CN', 'cyano silica', 'cyanopropyl silica', 'CN silica'],
    note: 'Weakly polar; usable in normal or reversed phase.',
  },
  {
    key: 'paper',
    name: 'paper',
    adsorbent: null,
    mode: 'partition',
    needsName: false,
    synonyms: ['paper', 'chromatography paper', 'cellulose paper'],
    note: 'Partition chromatography on cellulose.',
  },
  {
    key: 'other',
    name: 'other (named)',
    adsorbent: null,
    mode: 'normal',
    needsName: true,
    synonyms: ['other'],
    note: 'Give the phase’s name with the record.',
  },
];

const byKey = new Map(stationaryPhases.map((phase) => [phase.key, phase]));

/** The stationary phase with this catalogue key, or undefined. */
export function stationaryPhaseByKey(key: string): StationaryPhase | undefined {
  return byKey.get(key);
}
