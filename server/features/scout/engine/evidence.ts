import { requireSolvent } from '../../../../shared/catalogue/solvents';
import type { Adsorbent } from '../../../../shared/catalogue/types';
import { adsorbedArea, defaultActivity } from '../../../../shared/domain/eluent-strength';
import { rfToRm } from '../../../../shared/domain/rf';
import type { Evidence } from '../../../../shared/schemas/scout';
import { formatPercent, two } from './format';
import type { ScoutModel } from './model';
import { pairLabel } from './eluent-position';
import type { WeightedContribution } from './prediction-weights';
import type { RatioSuggestion } from './suggest-ratio';

const sourceWords = { measured: 'measured there', 'own-line': 'read off its own line', 'other-pair': 'carried over from another pair' } as const;

function strengthSource(suggestion: RatioSuggestion, adsorbent: Adsorbent): string {
  const solvent = (key: string) => {
    const entry = requireSolvent(key);
    const strength = entry.strength[adsorbent];
    return `${entry.label} ${strength?.value} (${strength?.provenance}; ${strength?.source})`;
  };
  const area = adsorbedArea(suggestion.pair.strong);
  return `Snyder's mixed-solvent equation on ${adsorbent}: ε° of ${solvent(suggestion.pair.weak)} and ${solvent(suggestion.pair.strong)}, α ${defaultActivity[adsorbent].value} (${defaultActivity[adsorbent].source}), n_b ${area.value.toFixed(1)} (${area.source}); volume fractions → mole fractions through density and molar mass.`;
}

/** The "why" of every number Scout shows: ratio, predicted Rf and interval, ε°, similarities. */
export function suggestionEvidence(model: ScoutModel, suggestion: RatioSuggestion, adsorbent: Adsorbent, targetRf: number, top: readonly WeightedContribution[], label: string): Evidence[] {
  const data = suggestion.found.curve.data;
  const anchors = suggestion.point.from.map(({ anchor }) => `${formatPercent(100 * data.anchors[anchor].fraction)} %`).join(' and ');
  const measured = model.anchorFits(data, suggestion.found.curve.variant).map((fit) => fit.training.sources.filter((source) => source === 'measured').length);
  const names = top.slice(0, 3).map((item) => {
    const compound = model.compounds[item.index];
    return `${compound.name ?? compound.smiles} (${Math.round(100 * item.share)} %, Rf ${two(item.rf)} ${sourceWords[item.source]})`;
  });
  const lines: Evidence[] = [
    {
      quantity: 'ratio',
      value: label,
      source: `The query's predicted curve in ${pairLabel(data.pair)} solved for Rf ${two(targetRf)} (RM = log10((1 − Rf)/Rf) = ${two(rfToRm(targetRf))}) gives ${formatPercent(100 * suggestion.exactStrongFraction)} % ${requireSolvent(suggestion.pair.strong).label}; rounded to the written ratio whose predicted Rf is closest to the target.`,
    },
    {
      quantity: 'predicted Rf',
      value: `${two(suggestion.rf)} (90 %: ${two(suggestion.interval[0])}–${two(suggestion.interval[1])})`,
      source: `Gaussian-process regression of RM at the recorded composition${suggestion.point.from.length > 1 ? 's' : ''} ${anchors}${suggestion.point.from.length > 1 ? ', interpolated linearly in ε°' : ''}${suggestion.point.extrapolated ? `, extended beyond them with the pair's pooled Soczewiński slope (dRM/dε° ${data.slope.toFixed(1)})` : ''}; ${Math.max(...measured)} compounds measured at an anchor, the others read off their own Soczewiński lines. Largest weights: ${names.join('; ') || 'none'}. Kernel: Tanimoto on OpenChemLib fingerprints + descriptors (cLogP, TPSA, donors, acceptors, rings, formula) + classes. Interval: 90 %, from the predictive spread scaled by leave-one-out residuals on the recorded compounds.`,
    },
    { quantity: 'ε°', value: suggestion.epsilon.toFixed(3), source: strengthSource(suggestion, adsorbent) },
    { quantity: 'similarity', value: 'Tanimoto 0–1', source: 'Tanimoto coefficient on 512-bit OpenChemLib fingerprints (Willett, J. Chem. Inf. Comput. Sci. 1998, 38, 983).' },
  ];
  if (suggestion.found.borrowedFrom) {
    lines.push({
      quantity: 'pair translation',
      value: `${pairLabel(suggestion.found.borrowedFrom)} → ${pairLabel(suggestion.pair)}`,
      source: `Nothing is recorded in ${pairLabel(suggestion.pair)}: the curve predicted in ${pairLabel(suggestion.found.borrowedFrom)} was read at equal Snyder ε°, which matches overall strength but not selectivity.`,
    });
  }
  return lines;
}
