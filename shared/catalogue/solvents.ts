import type { Solvent } from './types';
import { hydrocarbonSolvents } from './solvents-hydrocarbons';
import { chlorinatedAndEtherSolvents } from './solvents-chlorinated-ethers';
import { polarSolvents } from './solvents-polar';

export type { Solvent } from './types';

/**
 * Chromatography solvents with physical data, Snyder's ε° on silica and alumina (provenance on each
 * value: published source, from memory or estimate; see docs/references.md), adsorbed areas, hazards and greener
 * alternatives.
 */
export const solvents: readonly Solvent[] = [...hydrocarbonSolvents, ...chlorinatedAndEtherSolvents, ...polarSolvents];

export const solventKeys = solvents.map((solvent) => solvent.key) as [string, ...string[]];

const byKey = new Map(solvents.map((solvent) => [solvent.key, solvent]));

/** The solvent with this catalogue key, or undefined. */
export function solventByKey(key: string): Solvent | undefined {
  return byKey.get(key);
}

/** The solvent with this catalogue key; throws when the key is not in the catalogue. */
export function requireSolvent(key: string): Solvent {
  const solvent = byKey.get(key);
  if (!solvent) throw new RangeError(`Unknown solvent key "${key}".`);
  return solvent;
}
