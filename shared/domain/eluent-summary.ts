import { solventByKey } from '../catalogue/solvents';
import { additiveByKey } from '../catalogue/additives';
import { stationaryPhaseByKey } from '../catalogue/stationary-phases';
import { formatParts } from './format-number';

interface Part {
  solvent: string;
  parts: number;
}
interface SummarisedEluent {
  components: readonly Part[];
  additives: readonly { additive: string; percent: number }[];
  mode: 'isocratic' | 'gradient';
  steps: readonly { components: readonly Part[]; columnVolumes: number | null }[];
}

/**
 * How strongly a solvent elutes on a normal-phase adsorbent, for ordering only: Snyder's ε° on silica from the
 * catalogue (or on alumina when silica has none). Water has no ε° in the catalogue; it is the strongest
 * eluent on silica (common practice), so it ranks above everything.
 */
function elutionRank(key: string): number | null {
  if (key === 'water') return Number.POSITIVE_INFINITY;
  const solvent = solventByKey(key);
  return solvent?.strength.silica?.value ?? solvent?.strength.alumina?.value ?? null;
}

/**
 * The strong solvent of a mixture: the one with the highest ε° on normal phases, the lowest on reversed
 * phases (where water is the weak solvent). Null when a component has no known strength or there is only one.
 */
export function strongSolventOf(components: readonly Part[], phaseKey?: string): string | null {
  if (components.length < 2) return components.length === 1 ? components[0].solvent : null;
  const ranks = components.map((part) => elutionRank(part.solvent));
  if (ranks.some((rank) => rank === null)) return null;
  const reversed = phaseKey ? stationaryPhaseByKey(phaseKey)?.mode === 'reversed' : false;
  let best = 0;
  ranks.forEach((rank, index) => {
    const better = reversed ? (rank as number) < (ranks[best] as number) : (rank as number) > (ranks[best] as number);
    if (better) best = index;
  });
  return components[best].solvent;
}

/** % v/v of the strong solvent (parts of it / all parts × 100), or null when the strong solvent is unknown. */
export function strongPercentOf(components: readonly Part[], phaseKey?: string): number | null {
  const strong = strongSolventOf(components, phaseKey);
  if (!strong) return null;
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  const strongParts = components.find((part) => part.solvent === strong)?.parts ?? 0;
  return total > 0 ? (100 * strongParts) / total : null;
}

const labelOf = (key: string) => solventByKey(key)?.label ?? key;

/** "EtOAc : hexanes 1 : 4" — solvents in the order given, parts by volume. */
function formatMixture(components: readonly Part[]): string {
  if (components.length === 1) return `100% ${labelOf(components[0].solvent)}`;
  return `${components.map((part) => labelOf(part.solvent)).join(' : ')} ${components.map((part) => formatParts(part.parts)).join(' : ')}`;
}

/** Notation of a whole eluent: mixture (or gradient steps with CV), then additives in % v/v. */
export function formatEluent(eluent: SummarisedEluent): string {
  const stepWords = (step: (typeof eluent.steps)[number]) =>
    `${formatMixture(step.components)}${step.columnVolumes ? ` (${formatParts(step.columnVolumes)} CV)` : ''}`;
  const body =
    eluent.mode === 'gradient' && eluent.steps.length > 0
      ? `gradient ${eluent.steps.map(stepWords).join(' → ')}`
      : formatMixture(eluent.components);
  const extras = eluent.additives.map(
    (item) => `+ ${formatParts(item.percent)}% ${additiveByKey(item.additive)?.label ?? item.additive}`,
  );
  return [body, ...extras].join(' ');
}

/** Notation, strong solvent and its % v/v, as records show them beside the parts. */
export function eluentSummary(eluent: SummarisedEluent, phaseKey?: string) {
  return {
    notation: formatEluent(eluent),
    strongSolvent: strongSolventOf(eluent.components, phaseKey),
    strongPercent: strongPercentOf(eluent.components, phaseKey),
  };
}
