import { requireSolvent } from '../catalogue/solvents';
import type { Adsorbent, SolventHazard, SourcedValue } from '../catalogue/types';
import {
  blendAt,
  mixtureStrength,
  strengthEquation,
  strongFractionForStrength,
  type MixturePart,
} from './eluent-strength';
import { formatComposition } from './eluent-notation';
import { formatNumber } from './format-number';

/** The pair to translate into: a weak and a strong side, each one solvent or a fixed blend (e.g. EtOAc/EtOH 3:1). */
export interface TranslationTarget {
  weak: readonly MixturePart[];
  strong: readonly MixturePart[];
}

interface SolventHazardSummary {
  solvent: string;
  name: string;
  hazards: readonly SolventHazard[];
  hazardNote: string;
}

export type EluentTranslation =
  | {
      ok: true;
      adsorbent: Adsorbent;
      source: { components: MixturePart[]; epsilon: number; description: string };
      /** The equal-strength mixture, parts in % v/v. */
      target: { components: MixturePart[]; strongVolumeFraction: number; epsilon: number; description: string };
      reach: 'within' | 'below-range' | 'above-range';
      /** ε° of the target pair's pure weak and pure strong sides. */
      targetRange: [number, number];
      warnings: string[];
      hazards: { source: SolventHazardSummary[]; target: SolventHazardSummary[] };
      /** Every ε° and adsorbed area used, with its provenance. */
      values: { solvent: string; quantity: 'ε°' | 'n_b'; value: SourcedValue }[];
      equation: string;
    }
  | { ok: false; missing: string[]; message: string };

const hazardsOf = (parts: readonly MixturePart[]): SolventHazardSummary[] =>
  parts.map(({ solvent }) => {
    const { name, hazards, hazardNote } = requireSolvent(solvent);
    return { solvent, name, hazards, hazardNote };
  });

const sideName = (side: readonly MixturePart[]) => side.map((part) => requireSolvent(part.solvent).label).join('/');

/**
 * Translates an eluent into the mixture of another pair with the same Snyder strength ε° on the adsorbent
 * (Snyder's mixed-solvent equation, see eluent-strength.ts). Equal ε° is an estimate of equal overall
 * strength; selectivity can differ, so the result says to confirm it on a TLC plate (common practice).
 */
export function translateEluent(
  source: readonly MixturePart[],
  target: TranslationTarget,
  adsorbent: Adsorbent = 'silica',
): EluentTranslation {
  const start = mixtureStrength(source, adsorbent);
  if (!start.ok) return { ok: false, missing: start.missing, message: start.message };
  const solution = strongFractionForStrength(target.weak, target.strong, start.epsilon, adsorbent);
  if (!solution.ok) return solution;
  const blend = blendAt(target.weak, target.strong, solution.strongVolumeFraction).map((part) => ({
    solvent: part.solvent,
    parts: 100 * part.parts,
  }));
  const end = mixtureStrength(blend, adsorbent);
  const pair = `${sideName(target.weak)} → ${sideName(target.strong)}`;
  const warnings: string[] = [];
  if (solution.reach === 'below-range') {
    warnings.push(
      `${pair} cannot be made as weak as the source (ε° ${formatNumber(start.epsilon, 3)} below ` +
        `${formatNumber(solution.range[0], 3)}); the pure weak side is given.`,
    );
  }
  if (solution.reach === 'above-range') {
    warnings.push(
      `${pair} cannot reach the source's strength (ε° ${formatNumber(start.epsilon, 3)} above ` +
        `${formatNumber(solution.range[1], 3)}); the pure strong side is given.`,
    );
  }
  const values = [start, ...(end.ok ? [end] : [])].flatMap((result) => [
    ...result.components.map((part) => ({ solvent: part.solvent, quantity: 'ε°' as const, value: part.epsilon })),
    { solvent: result.area.solvent, quantity: 'n_b' as const, value: result.area },
  ]);
  const unique = values.filter(
    (item, index) =>
      values.findIndex((other) => other.solvent === item.solvent && other.quantity === item.quantity) === index,
  );
  if (unique.some((item) => item.value.provenance !== 'confirmed')) {
    warnings.push('Some ε° or n_b values are from memory or estimated, so the translated ratio is an estimate.');
  }
  warnings.push(
    'Equal ε° matches overall strength, not selectivity: spots may move apart or change order. Run a ' +
      'TLC plate in the new eluent before the column (common practice).',
  );
  return {
    ok: true,
    adsorbent,
    source: { components: [...source], epsilon: start.epsilon, description: formatComposition(source) },
    target: {
      components: blend,
      strongVolumeFraction: solution.strongVolumeFraction,
      epsilon: solution.epsilon,
      description: formatComposition(blend),
    },
    reach: solution.reach,
    targetRange: solution.range,
    warnings,
    hazards: { source: hazardsOf(source), target: hazardsOf(blend) },
    values: unique,
    equation: strengthEquation,
  };
}
