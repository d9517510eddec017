import { requireSolvent, solventByKey } from '../../../../shared/catalogue/solvents';
import { stationaryPhaseByKey } from '../../../../shared/catalogue/stationary-phases';
import type { Adsorbent } from '../../../../shared/catalogue/types';
import { mixtureStrength, volumeFractionForStrength } from '../../../../shared/domain/eluent-strength';
import type { SolventPair } from './types';

/** Where an eluent sits on the strength scale: one pure solvent, or a weak/strong pair at a volume fraction. */
export type EluentPosition =
  | { kind: 'pure'; solvent: string; epsilon: number }
  | { kind: 'pair'; pair: SolventPair; key: string; strongFraction: number; epsilon: number };

/** "hexanes|ethyl-acetate": weak side first. */
export const pairKey = (pair: SolventPair) => `${pair.weak}|${pair.strong}`;

/** The adsorbent whose ε° scale applies to a stationary phase (Snyder's model covers silica and alumina only). */
export function adsorbentOf(phaseKey: string): Adsorbent | null {
  return stationaryPhaseByKey(phaseKey)?.adsorbent ?? null;
}

/** ε° of a pure solvent on the adsorbent (catalogue value), or null when none is known. */
export function solventEpsilon(solvent: string, adsorbent: Adsorbent): number | null {
  return solventByKey(solvent)?.strength[adsorbent]?.value ?? null;
}

const strengthCache = new Map<string, number>();

/** Snyder ε° of weak/strong at a volume fraction φ of the strong solvent (shared/domain/eluent-strength.ts), memoised. */
export function pairEpsilon(pair: SolventPair, strongFraction: number, adsorbent: Adsorbent): number {
  const key = `${adsorbent}|${pair.weak}|${pair.strong}|${strongFraction.toFixed(5)}`;
  let epsilon = strengthCache.get(key);
  if (epsilon === undefined) {
    const result = mixtureStrength(
      [
        { solvent: pair.weak, parts: 1 - strongFraction },
        { solvent: pair.strong, parts: strongFraction },
      ].filter((part) => part.parts > 0),
      adsorbent,
    );
    if (!result.ok) throw new RangeError(result.message);
    epsilon = result.epsilon;
    if (strengthCache.size > 50_000) strengthCache.clear();
    strengthCache.set(key, epsilon);
  }
  return epsilon;
}

/** Volume fraction of the strong solvent giving ε° within the pair, clamped to [0, 1] (bisection, eluent-strength.ts). */
export function fractionForEpsilon(pair: SolventPair, epsilon: number, adsorbent: Adsorbent): number {
  const solution = volumeFractionForStrength(pair.weak, pair.strong, epsilon, adsorbent);
  if (!solution.ok) throw new RangeError(solution.message);
  return solution.strongVolumeFraction;
}

/** Orders two solvents weak → strong by ε° on the adsorbent; null when either has no ε° or they are equal. */
export function orderPair(a: string, b: string, adsorbent: Adsorbent): SolventPair | null {
  const ea = solventEpsilon(a, adsorbent);
  const eb = solventEpsilon(b, adsorbent);
  if (ea === null || eb === null || a === b || ea === eb) return null;
  return ea < eb ? { weak: a, strong: b } : { weak: b, strong: a };
}

/**
 * The position of an eluent given as parts by volume: a pure solvent or a two-solvent pair. Mixtures of
 * three or more solvents, and solvents with no ε° on the adsorbent, have no position (null).
 */
export function positionOf(
  components: readonly { solvent: string; parts: number }[],
  adsorbent: Adsorbent,
): EluentPosition | null {
  const present = components.filter((part) => part.parts > 0);
  if (present.length === 1) {
    const epsilon = solventEpsilon(present[0].solvent, adsorbent);
    return epsilon === null ? null : { kind: 'pure', solvent: present[0].solvent, epsilon };
  }
  if (present.length !== 2) return null;
  const pair = orderPair(present[0].solvent, present[1].solvent, adsorbent);
  if (!pair) return null;
  const total = present[0].parts + present[1].parts;
  const strongFraction = (present.find((part) => part.solvent === pair.strong) as { parts: number }).parts / total;
  return {
    kind: 'pair',
    pair,
    key: pairKey(pair),
    strongFraction,
    epsilon: pairEpsilon(pair, strongFraction, adsorbent),
  };
}

/** The pair's label as chemists write it, strong first: "EtOAc/hexanes". */
export function pairLabel(pair: SolventPair): string {
  return `${requireSolvent(pair.strong).label}/${requireSolvent(pair.weak).label}`;
}
