import type { outcomes } from '../../../../shared/schemas/record-parts';
import type { CompoundDescriptors } from '../../../chem/descriptors';

type Outcome = (typeof outcomes)[number];

/** Descriptors the Scout model reads: the compound's stored descriptors but its exact mass. */
export type ScoutDescriptors = Omit<CompoundDescriptors, 'exactMass'>;

/** A compound as Scout sees it: identity for display, descriptors, classes and the stored fingerprint (16 int32). */
export interface ScoutCompound {
  id: number;
  name: string | null;
  smiles: string;
  descriptors: ScoutDescriptors;
  classes: readonly string[];
  fingerprint: ArrayLike<number>;
}

/** The molecule Scout is asked about; `id` is set when it is already a compound of the knowledge set. */
export interface ScoutQuery {
  id: number | null;
  smiles: string;
  descriptors: ScoutDescriptors;
  classes: readonly string[];
  fingerprint: ArrayLike<number>;
}

/**
 * One recorded plate or column of a compound (a condition record): phase, eluent parts and additives, the
 * target spot's Rf (null when none was recorded), outcome with reason, and how the plate was seen.
 */
export interface ScoutMeasurement {
  recordId: number | null;
  compoundId: number;
  phase: string;
  components: readonly { solvent: string; parts: number }[];
  additives: readonly { additive: string; percent: number }[];
  mode: 'isocratic' | 'gradient';
  rf: number | null;
  outcome: Outcome;
  outcomeReason: string | null;
  visualisations: readonly string[];
  /** An invented demo record (seeders/), shown marked as such wherever Scout cites it. */
  demo?: boolean;
}

/** What the engine learns from: compounds and their measurements, with a version that changes when they do. */
export interface KnowledgeSet {
  version: string;
  compounds: readonly ScoutCompound[];
  measurements: readonly ScoutMeasurement[];
}

/** A solvent pair, weak (lower ε°) side first, as catalogue keys. */
export interface SolventPair {
  weak: string;
  strong: string;
}

export interface ScoutOptions {
  /** Rf the suggestion aims at; default 0.3, allowed 0.15–0.45 (flash columns work best at 0.2–0.35, Still 1978). */
  targetRf?: number;
  solventPair?: SolventPair;
  /** Stationary phase catalogue key; default silica gel. */
  phase?: string;
  /** How many neighbours to list; default 8. */
  k?: number;
}
