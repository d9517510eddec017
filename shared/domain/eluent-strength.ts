import { requireSolvent } from '../catalogue/solvents';
import type { Adsorbent, SourcedValue } from '../catalogue/types';
import { mixtureFractions, type MixturePart } from './mixture-fractions';

export {
  mixtureFractions,
  moleFractionFromVolume,
  volumeFractionFromMole,
  type MixturePart,
} from './mixture-fractions';

/**
 * Adsorbent activity α in Snyder's equation (L. R. Snyder, Principles of Adsorption Chromatography, 1968). From
 * memory: α ≈ 0.6–0.7 for silica; 0.6 is used for both adsorbents because activity depends on water content and
 * no published value has been checked.
 */
export const defaultActivity: Record<Adsorbent, SourcedValue> = {
  silica: {
    value: 0.6,
    provenance: 'from-memory',
    source: 'Snyder 1968, from memory: α ≈ 0.6–0.7 for silica; 0.6 used',
  },
  alumina: {
    value: 0.6,
    provenance: 'from-memory',
    source: 'Snyder 1968, from memory: α about 0.6 for standard-activity alumina',
  },
};

const ethylAcetateArea = 5.2;

/**
 * Snyder's adsorbed area n_b of a solvent (units of an aromatic carbon's area): the catalogue value where one
 * is recalled; otherwise an estimate scaled from molar volume, n_b ≈ 5.2 × (V_m / V_m,EtOAc)^(2/3)
 * (area grows as volume^(2/3); an approximation, not a handbook value).
 */
export function adsorbedArea(solventKey: string): SourcedValue {
  const solvent = requireSolvent(solventKey);
  if (solvent.adsorbedArea) return solvent.adsorbedArea;
  const ethylAcetate = requireSolvent('ethyl-acetate');
  const molarVolume = solvent.molarMassGPerMol / solvent.densityGPerMl;
  const reference = ethylAcetate.molarMassGPerMol / ethylAcetate.densityGPerMl;
  return {
    value: ethylAcetateArea * (molarVolume / reference) ** (2 / 3),
    provenance: 'estimate',
    source: 'estimate: 5.2 × (molar volume / molar volume of EtOAc)^(2/3); no recalled value',
  };
}

/**
 * Snyder's strength of a binary eluent (Snyder 1968, Principles of Adsorption Chromatography; equation from memory):
 * ε°_AB = ε°_A + log10(N_B·10^(α·n_b·(ε°_B − ε°_A)) + 1 − N_B) / (α·n_b),
 * with N_B the mole fraction of the strong solvent B, n_b its adsorbed area and α the adsorbent activity.
 */
export function snyderBinaryStrength(
  epsilonA: number,
  epsilonB: number,
  moleFractionB: number,
  areaB: number,
  activity: number,
): number {
  const scale = activity * areaB;
  return epsilonA + Math.log10(moleFractionB * 10 ** (scale * (epsilonB - epsilonA)) + 1 - moleFractionB) / scale;
}

interface StrengthComponent {
  solvent: string;
  moleFraction: number;
  epsilon: SourcedValue;
}

export type MixtureStrength =
  | {
      ok: true;
      /** ε° of the mixture on the adsorbent, dimensionless. */
      epsilon: number;
      adsorbent: Adsorbent;
      activity: SourcedValue;
      /** The strongest solvent's adsorbed area, used for the whole mixture. */
      area: SourcedValue & { solvent: string };
      components: StrengthComponent[];
      equation: string;
    }
  | { ok: false; adsorbent: Adsorbent; missing: string[]; message: string };

export const strengthEquation =
  'Snyder 1968 (equation from memory): ε° = ε°_A + log10(Σ N_i·10^(α·n_b·(ε°_i − ε°_A))) / (α·n_b), ' +
  'A the weakest solvent, n_b the strongest solvent’s adsorbed area; for two solvents this is Snyder’s binary equation';

/**
 * Solvent strength ε° of an eluent on silica or alumina. Two solvents: Snyder's binary equation exactly.
 * More: the same equation summed over all solvents, 10^(α·n_b·(ε° − ε°_A)) = Σ N_i·10^(α·n_b·(ε°_i − ε°_A)),
 * with one adsorbed area (the strongest solvent's); this reduces to the binary form and to each pure solvent's
 * ε°, and is this project's documented generalisation, not a published multi-solvent equation.
 * Volume parts become mole fractions through density and molar mass.
 */
export function mixtureStrength(
  mixture: readonly MixturePart[],
  adsorbent: Adsorbent,
  activity = defaultActivity[adsorbent],
): MixtureStrength {
  const present = mixtureFractions(mixture).filter((part) => part.moleFraction > 0);
  const missing = present
    .filter((part) => !requireSolvent(part.solvent).strength[adsorbent])
    .map((part) => part.solvent);
  if (missing.length > 0) {
    const names = missing.map((key) => requireSolvent(key).name).join(', ');
    return { ok: false, adsorbent, missing, message: `No ε° on ${adsorbent} is known for ${names}.` };
  }
  const components = present.map((part) => ({
    solvent: part.solvent,
    moleFraction: part.moleFraction,
    epsilon: requireSolvent(part.solvent).strength[adsorbent] as SourcedValue,
  }));
  const weakest = Math.min(...components.map((part) => part.epsilon.value));
  const strongest = components.reduce((best, part) => (part.epsilon.value > best.epsilon.value ? part : best));
  const area = { ...adsorbedArea(strongest.solvent), solvent: strongest.solvent };
  const scale = activity.value * area.value;
  const sum = components.reduce(
    (total, part) => total + part.moleFraction * 10 ** (scale * (part.epsilon.value - weakest)),
    0,
  );
  return {
    ok: true,
    epsilon: weakest + Math.log10(sum) / scale,
    adsorbent,
    activity,
    area,
    components,
    equation: strengthEquation,
  };
}

/** The mixture holding volume fraction φ of the strong blend and 1 − φ of the weak blend (each taken by its own parts). */
export function blendAt(
  weak: readonly MixturePart[],
  strong: readonly MixturePart[],
  strongFraction: number,
): MixturePart[] {
  const merged = new Map<string, number>();
  const add = (blend: readonly MixturePart[], share: number) => {
    const total = blend.reduce((sum, part) => sum + part.parts, 0);
    for (const part of blend) merged.set(part.solvent, (merged.get(part.solvent) ?? 0) + (share * part.parts) / total);
  };
  add(weak, 1 - strongFraction);
  add(strong, strongFraction);
  return [...merged].filter(([, parts]) => parts > 0).map(([solvent, parts]) => ({ solvent, parts }));
}

export type StrengthSolution =
  | {
      ok: true;
      /** Volume fraction of the strong blend, 0–1. */
      strongVolumeFraction: number;
      /** ε° the returned mixture has; differs from the target when the pair cannot reach it. */
      epsilon: number;
      reach: 'within' | 'below-range' | 'above-range';
      /** ε° of the pure weak and pure strong blends. */
      range: [number, number];
    }
  | { ok: false; missing: string[]; message: string };

/**
 * Volume fraction φ of the strong blend giving a target ε° on the adsorbent, by bisection on φ in [0, 1]
 * (mixtureStrength rises monotonically with φ when the strong blend is the stronger). When the pair cannot
 * reach the target, φ is clamped to 0 or 1 and `reach` says which side fell short.
 */
export function strongFractionForStrength(
  weak: readonly MixturePart[],
  strong: readonly MixturePart[],
  targetEpsilon: number,
  adsorbent: Adsorbent,
  activity = defaultActivity[adsorbent],
): StrengthSolution {
  const strengthAt = (fraction: number) => mixtureStrength(blendAt(weak, strong, fraction), adsorbent, activity);
  const low = strengthAt(0);
  const high = strengthAt(1);
  if (!low.ok || !high.ok) {
    const failed = [low, high].filter((result) => !result.ok);
    return { ok: false, missing: [...new Set(failed.flatMap((result) => result.missing))], message: failed[0].message };
  }
  const range: [number, number] = [low.epsilon, high.epsilon];
  if (high.epsilon <= low.epsilon) {
    return {
      ok: false,
      missing: [],
      message: 'The strong side of the pair is not stronger than the weak side on this adsorbent.',
    };
  }
  if (targetEpsilon <= low.epsilon)
    return {
      ok: true,
      strongVolumeFraction: 0,
      epsilon: low.epsilon,
      reach: targetEpsilon < low.epsilon - 1e-9 ? 'below-range' : 'within',
      range,
    };
  if (targetEpsilon >= high.epsilon)
    return {
      ok: true,
      strongVolumeFraction: 1,
      epsilon: high.epsilon,
      reach: targetEpsilon > high.epsilon + 1e-9 ? 'above-range' : 'within',
      range,
    };
  let lower = 0;
  let upper = 1;
  for (let step = 0; step < 60; step += 1) {
    const middle = (lower + upper) / 2;
    const result = strengthAt(middle);
    if (result.ok && result.epsilon < targetEpsilon) lower = middle;
    else upper = middle;
  }
  const fraction = (lower + upper) / 2;
  const reached = strengthAt(fraction);
  return {
    ok: true,
    strongVolumeFraction: fraction,
    epsilon: reached.ok ? reached.epsilon : targetEpsilon,
    reach: 'within',
    range,
  };
}

/** Volume fraction of solvent B in an A/B pair giving a target ε° (see strongFractionForStrength). */
export function volumeFractionForStrength(
  weakKey: string,
  strongKey: string,
  targetEpsilon: number,
  adsorbent: Adsorbent,
): StrengthSolution {
  return strongFractionForStrength(
    [{ solvent: weakKey, parts: 1 }],
    [{ solvent: strongKey, parts: 1 }],
    targetEpsilon,
    adsorbent,
  );
}
