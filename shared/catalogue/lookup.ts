import Fuse from 'fuse.js';
import { additives, type Additive } from './additives';
import { solvents } from './solvents';
import { stains, type Stain } from './stains';
import { stationaryPhases, type StationaryPhase } from './stationary-phases';
import type { Solvent } from './types';

export type Resolution<T> = { ok: true; value: T } | { ok: false; input: string; suggestion: string | null };

/**
 * The form in which names are compared: lower case, accents and subscripts folded,
 * and spaces, dots, hyphens, underscores and apostrophes removed ("Et₂O" → "et2o", "pet. ether" → "petether").
 */
export function normaliseName(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/[\s.\-‐‑‒–—_'’]/g, '');
}

/** Longest query the suggester searches (the longest catalogue name, normalised, is 44 characters). */
const SUGGEST_MAX_LENGTH = 64;

interface Named {
  key: string;
  name: string;
  synonyms: readonly string[];
}

/** Resolves names of one catalogue exactly (after normalising) and suggests the closest name otherwise. */
export class NameIndex<T extends Named> {
  private readonly exact = new Map<string, T>();
  private readonly fuse: Fuse<{ text: string; normalised: string }>;

  constructor(readonly entries: readonly T[]) {
    const names: { text: string; normalised: string }[] = [];
    for (const entry of entries) {
      for (const [index, text] of [entry.key, entry.name, ...entry.synonyms].entries()) {
        const normalised = normaliseName(text);
        const clash = this.exact.get(normalised);
        if (clash && clash !== entry) throw new Error(`"${text}" names both ${clash.key} and ${entry.key}.`);
        this.exact.set(normalised, entry);
        if (index > 0) names.push({ text, normalised });
      }
    }
    // Matches anchored near the start of a name (distance 10) rank "methanl" with methanol, not dichloromethane.
    this.fuse = new Fuse(names, { keys: ['normalised'], threshold: 0.5, location: 0, distance: 10 });
  }

  /** Every normalised name this index knows, for scanning free text. */
  normalisedNames(): IterableIterator<[string, T]> {
    return this.exact.entries();
  }

  /** The entry for a name, key or abbreviation in any case and spacing, or the closest known name. */
  resolve(input: string): Resolution<T> {
    const found = this.exact.get(normaliseName(input));
    if (found) return { ok: true, value: found };
    return { ok: false, input, suggestion: this.suggest(input) };
  }

  /**
   * The known name closest to a misspelt one, or null when nothing is reasonably close. Fuse's bitap search grows
   * faster than the query's length, so a query longer than SUGGEST_MAX_LENGTH (about twice the longest known name)
   * is close to nothing and is not searched at all.
   */
  suggest(input: string): string | null {
    if (input.length > SUGGEST_MAX_LENGTH * 4) return null;
    const query = normaliseName(input);
    if (!query || query.length > SUGGEST_MAX_LENGTH) return null;
    const [best] = this.fuse.search(query);
    return best ? best.item.text : null;
  }
}

export const solventIndex = new NameIndex<Solvent>(solvents);
/** Solvents and additives together, as eluent notations mix them ("DCM/MeOH/NH4OH 90:9:1"). */
export const eluentNameIndex = new NameIndex<Solvent | Additive>([...solvents, ...additives]);
const additiveIndex = new NameIndex<Additive>(additives);
export const stainIndex = new NameIndex<Stain>(stains);
const phaseIndex = new NameIndex<StationaryPhase>(stationaryPhases);

/** A solvent by name, abbreviation, formula or key (e.g. "AcOEt", "CH2Cl2", "pet ether"). */
export const resolveSolvent = (input: string) => solventIndex.resolve(input);
/** An eluent additive by name or abbreviation (e.g. "TEA", "NEt3", "aq. NH3"). */
export const resolveAdditive = (input: string) => additiveIndex.resolve(input);
/** A visualisation by name or abbreviation (e.g. "UV (254 nm)", "permanganate", "CAM"). */
export const resolveStain = (input: string) => stainIndex.resolve(input);
/** A stationary phase by name or abbreviation (e.g. "SiO2", "RP-18", "Al2O3"). */
export const resolvePhase = (input: string) => phaseIndex.resolve(input);
