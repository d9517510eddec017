/**
 * How the demo invents plausible Rf values. Soczewiński's relation (Anal. Chem. 1969, 41, 179; details from
 * memory) says RM = log10((1 − Rf)/Rf) is close to linear in log10 of the strong solvent's fraction x, with a
 * negative slope; the demo uses RM(x) = RM(0.3) − n·log10(x / x30), where x30 is the invented fraction
 * giving Rf 0.3 for a compound (seeders/demo-compounds.ts) and n a slope between 1.1 and 1.9.
 * So more polar compounds (higher x30) run lower, and more strong solvent moves every spot further.
 * The values are INVENTED for the demo; they are not measurements.
 */

/** A small deterministic PRNG (mulberry32) so the demo is the same on every machine. */
export function randomSource(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    between: (low: number, high: number) => low + (high - low) * next(),
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)],
    chance: (probability: number) => next() < probability,
  };
}
export type Random = ReturnType<typeof randomSource>;

const rmAt30 = Math.log10(0.7 / 0.3);

/** The demo's Rf at strong-solvent fraction x (0 < x ≤ 1), rounded to 0.01 and kept within [0.03, 0.95]. */
export function demoRf(x30: number, slope: number, x: number, noise = 0): number {
  const rm = rmAt30 - slope * Math.log10(x / x30);
  const rf = 1 / (1 + 10 ** rm) + noise;
  return Math.round(Math.min(0.95, Math.max(0.03, rf)) * 100) / 100;
}

/** A solvent pair the demo uses: catalogue keys and the ratios (weak : strong parts) chemists write. */
export interface DemoSystem {
  weak: string;
  strong: string;
  phase: 'silica' | 'c18';
  ladder: readonly (readonly [number, number])[];
}

export const demoSystems: Record<'EH' | 'DM' | 'EP' | 'RP', DemoSystem> = {
  EH: {
    weak: 'hexanes',
    strong: 'ethyl-acetate',
    phase: 'silica',
    ladder: [
      [100, 1],
      [50, 1],
      [20, 1],
      [10, 1],
      [9, 1],
      [5, 1],
      [4, 1],
      [3, 1],
      [2, 1],
      [3, 2],
      [1, 1],
      [1, 2],
      [1, 4],
    ],
  },
  DM: {
    weak: 'dichloromethane',
    strong: 'methanol',
    phase: 'silica',
    ladder: [
      [100, 1],
      [50, 1],
      [30, 1],
      [20, 1],
      [15, 1],
      [10, 1],
      [9, 1],
      [5, 1],
    ],
  },
  EP: {
    weak: 'pentane',
    strong: 'diethyl-ether',
    phase: 'silica',
    ladder: [
      [200, 1],
      [100, 1],
      [50, 1],
      [20, 1],
      [10, 1],
      [5, 1],
    ],
  },
  RP: {
    weak: 'water',
    strong: 'acetonitrile',
    phase: 'c18',
    ladder: [
      [9, 1],
      [4, 1],
      [7, 3],
      [3, 2],
      [1, 1],
      [2, 3],
    ],
  },
};

export const fractionOf = ([weak, strong]: readonly [number, number]) => strong / (weak + strong);

/** Index of the ladder step whose strong fraction is closest (on a log scale) to x30. */
export function closestStep(system: DemoSystem, x30: number): number {
  let best = 0;
  system.ladder.forEach((step, index) => {
    if (Math.abs(Math.log(fractionOf(step) / x30)) < Math.abs(Math.log(fractionOf(system.ladder[best]) / x30)))
      best = index;
  });
  return best;
}
