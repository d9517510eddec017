import { strongSolventOf } from './eluent-summary';

interface Part {
  solvent: string;
  parts: number;
}

/** What two condition records are compared on when looking for duplicates. */
export interface ComparableConditions {
  technique: string;
  stationaryPhase: string;
  stationaryPhaseOther: string | null;
  eluent: {
    components: readonly Part[];
    additives: readonly { additive: string; percent: number }[];
    mode: 'isocratic' | 'gradient';
  };
  targetRf: number | null;
  notebookRef: string | null;
}

/**
 * Tolerances of the duplicate rules (the curation brief's own thresholds, not a published standard):
 * target Rf within 0.05 absolute; eluent ratios within 5 % relative (see compareMixtures).
 */
export const duplicateTolerances = { rf: 0.05, ratioRelative: 0.05 } as const;

interface FractionDifference {
  solvent: string;
  /** Volume fractions (0–1) of this solvent in each mixture. */
  a: number;
  b: number;
  /** |a − b| / max(a, b). */
  relative: number;
}

export interface MixtureComparison {
  sameSolvents: boolean;
  /** 'strong-solvent': two-solvent mixtures compare the strong solvent; otherwise every component. */
  basis: 'strong-solvent' | 'every-component';
  compared: FractionDifference[];
  maxRelative: number;
  within: boolean;
}

const fractions = (components: readonly Part[]) => {
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  return new Map(components.map((part) => [part.solvent, part.parts / total]));
};

/** Relative difference |a − b| / max(a, b) of two fractions; 0 when both are 0. */
export function relativeDifference(a: number, b: number): number {
  const larger = Math.max(Math.abs(a), Math.abs(b));
  return larger === 0 ? 0 : Math.abs(a - b) / larger;
}

/**
 * Compares two eluent mixtures by volume fraction. The rule: the same solvents, and
 * - for a mixture of two solvents whose strong solvent is known (highest Snyder ε° on normal phases,
 *   see strongSolventOf), the strong solvent's volume fraction within 5 % relative
 *   (|φa − φb| ≤ 0.05 · max(φa, φb); 1 : 4 = 20 % vs 1 : 3.8 = 20.8 % passes, 1 : 4 vs 1 : 3 = 25 % does not);
 * - otherwise (one solvent, three or more, or an unknown strength) every component's volume fraction
 *   within 5 % relative.
 * Relative rather than absolute, because at 2 % MeOH in CH2Cl2 a step of 0.05 absolute would be a
 * different eluent altogether (common practice: polar modifiers are tuned in steps of 1–2 %).
 */
export function compareMixtures(a: readonly Part[], b: readonly Part[], phaseKey?: string): MixtureComparison {
  const fa = fractions(a);
  const fb = fractions(b);
  const sameSolvents = fa.size === fb.size && [...fa.keys()].every((solvent) => fb.has(solvent));
  if (!sameSolvents)
    return {
      sameSolvents,
      basis: 'every-component',
      compared: [],
      maxRelative: Number.POSITIVE_INFINITY,
      within: false,
    };
  const strong = fa.size === 2 ? strongSolventOf(a, phaseKey) : null;
  const basis = strong ? 'strong-solvent' : 'every-component';
  const solvents = strong ? [strong] : [...fa.keys()].sort();
  const compared = solvents.map((solvent) => {
    const x = fa.get(solvent) as number;
    const y = fb.get(solvent) as number;
    return { solvent, a: x, b: y, relative: relativeDifference(x, y) };
  });
  const maxRelative = Math.max(0, ...compared.map((item) => item.relative));
  return {
    sameSolvents,
    basis,
    compared,
    maxRelative,
    within: maxRelative <= duplicateTolerances.ratioRelative + 1e-9,
  };
}

const additiveSet = (eluent: ComparableConditions['eluent']) =>
  eluent.additives
    .map((item) => `${item.additive}@${item.percent}`)
    .sort()
    .join(',');

const norm = (text: string | null) => (text ? text.trim().replace(/\s+/g, ' ').toLowerCase() : null);

export interface ConditionComparison {
  duplicate: boolean;
  samePhase: boolean;
  sameMode: boolean;
  mixture: MixtureComparison;
  /** |ΔRf| of the target spots, or null when either has none. */
  rfDifference: number | null;
  sameTechnique: boolean;
  sameAdditives: boolean;
  sameNotebookRef: boolean;
  /** 0–1; see conditionScore. */
  score: number;
}

/**
 * How sure a duplicate is, 0–1 (the product's own weighting, documented here):
 * 0.5 for meeting every rule, + 0.3 × (1 − the larger of ΔRf/0.05 and Δratio/0.05) for closeness,
 * + 0.1 for the same additives, + 0.05 for the same technique, + 0.05 for the same notebook reference.
 */
export function conditionScore(
  rfDifference: number,
  maxRelative: number,
  same: { additives: boolean; technique: boolean; notebookRef: boolean },
): number {
  const spread = Math.min(
    1,
    Math.max(rfDifference / duplicateTolerances.rf, maxRelative / duplicateTolerances.ratioRelative),
  );
  const score =
    0.5 + 0.3 * (1 - spread) + (same.additives ? 0.1 : 0) + (same.technique ? 0.05 : 0) + (same.notebookRef ? 0.05 : 0);
  return Math.round(score * 100) / 100;
}

/**
 * Whether two records of one compound look like the same purification entered twice: the same stationary
 * phase, the same eluent mode and solvents with ratios within 5 % (compareMixtures), and target Rf within
 * 0.05. Differences in technique, additives or notebook reference lower the score but do not rule it out.
 */
export function compareConditions(a: ComparableConditions, b: ComparableConditions): ConditionComparison {
  const samePhase =
    a.stationaryPhase === b.stationaryPhase && norm(a.stationaryPhaseOther) === norm(b.stationaryPhaseOther);
  const sameMode = a.eluent.mode === b.eluent.mode;
  const mixture = compareMixtures(a.eluent.components, b.eluent.components, a.stationaryPhase);
  const rfDifference = a.targetRf !== null && b.targetRf !== null ? Math.abs(a.targetRf - b.targetRf) : null;
  const rfWithin = rfDifference !== null && rfDifference <= duplicateTolerances.rf + 1e-9;
  const same = {
    technique: a.technique === b.technique,
    additives: additiveSet(a.eluent) === additiveSet(b.eluent),
    notebookRef: norm(a.notebookRef) !== null && norm(a.notebookRef) === norm(b.notebookRef),
  };
  const duplicate = samePhase && sameMode && mixture.within && rfWithin;
  return {
    duplicate,
    samePhase,
    sameMode,
    mixture,
    rfDifference,
    sameTechnique: same.technique,
    sameAdditives: same.additives,
    sameNotebookRef: same.notebookRef,
    score: duplicate ? conditionScore(rfDifference as number, mixture.maxRelative, same) : 0,
  };
}
