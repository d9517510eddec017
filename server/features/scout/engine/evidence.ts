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
import type { SimilarCompound } from './neighbours';
import { closeSimilarity } from './additive-advice';

const sourceWords = {
  measured: 'measured there',
  'own-line': 'read off its own line',
  'other-pair': 'carried over from another pair',
} as const;

function strengthSource(suggestion: RatioSuggestion, adsorbent: Adsorbent): string {
  const solvent = (key: string) => {
    const entry = requireSolvent(key);
    const strength = entry.strength[adsorbent];
    return `${entry.label} ${strength?.value} (${strength?.provenance}; ${strength?.source})`;
  };
  const area = adsorbedArea(suggestion.pair.strong);
  return (
    `Snyder's mixed-solvent equation on ${adsorbent}: ε° of ${solvent(suggestion.pair.weak)} and ` +
    `${solvent(suggestion.pair.strong)}, α ${defaultActivity[adsorbent].value} (${defaultActivity[adsorbent].source}), ` +
    `n_b ${area.value.toFixed(1)} (${area.source}); volume fractions → mole fractions through density and molar mass.`
  );
}

/** The "why" of every number Scout shows: ratio, predicted Rf and interval, ε°, similarities. */
export function suggestionEvidence(
  model: ScoutModel,
  suggestion: RatioSuggestion,
  adsorbent: Adsorbent,
  targetRf: number,
  top: readonly WeightedContribution[],
  label: string,
  ranked: readonly SimilarCompound[] = [],
): Evidence[] {
  const data = suggestion.found.curve.data;
  const close = ranked.filter((item) => item.similarity >= closeSimilarity && data.points.has(item.index));
  const plates = close.reduce((sum, item) => sum + (data.points.get(item.index)?.length ?? 0), 0);
  const demo = close.reduce(
    (sum, item) => sum + model.measurementsOf[item.index].filter((m) => m.demo && m.rf !== null).length,
    0,
  );
  const plain =
    close.length > 0
      ? `Fitted to ${plates} plate${plates === 1 ? '' : 's'} of ${close.length} close ` +
        `compound${close.length === 1 ? '' : 's'} in ${pairLabel(data.pair)} (similarity ≥ ${closeSimilarity}) ` +
        `and the descriptors of ${model.compounds.length} recorded ` +
        `compounds${demo > 0 ? `; ${demo} of the close compounds' plates are invented demo data` : ''}.`
      : `No close compound was run in ${pairLabel(data.pair)}: estimated from the descriptors of ` +
        `${model.compounds.length} recorded compounds.`;
  const anchors = suggestion.point.from
    .map(({ anchor }) => `${formatPercent(100 * data.anchors[anchor].fraction)} %`)
    .join(' and ');
  const measured = model
    .anchorFits(data, suggestion.found.curve.variant)
    .map((fit) => fit.training.sources.filter((source) => source === 'measured').length);
  const names = top.slice(0, 3).map((item) => {
    const compound = model.compounds[item.index];
    return `${compound.name ?? compound.smiles} (${Math.round(100 * item.share)} %, Rf ${two(item.rf)} ${sourceWords[item.source]})`;
  });
  const lines: Evidence[] = [
    {
      quantity: 'in plain words',
      value: plain,
      source:
        `A Gaussian-process regression of RM = log10((1 − Rf)/Rf) over the recorded compounds, ` +
        `at the compositions most plates were run at in ${pairLabel(data.pair)}, weighting each compound by ` +
        `its similarity (structure and polar groups) to yours; the curve between those compositions follows ` +
        `Snyder's solvent strength. The lines below give each number's working.`,
    },
    {
      quantity: 'ratio',
      value: label,
      source:
        `The query's predicted curve in ${pairLabel(data.pair)} solved for Rf ${two(targetRf)} ` +
        `(RM = log10((1 − Rf)/Rf) = ${two(rfToRm(targetRf))}) gives ${formatPercent(100 * suggestion.exactStrongFraction)} ` +
        `% ${requireSolvent(suggestion.pair.strong).label}; rounded to the written ratio whose predicted Rf is closest to the target.`,
    },
    {
      quantity: 'predicted Rf',
      value: `${two(suggestion.rf)} (90 %: ${two(suggestion.interval[0])}–${two(suggestion.interval[1])})`,
      source:
        `Gaussian-process regression of RM at the recorded composition${suggestion.point.from.length > 1 ? 's' : ''} ` +
        `${anchors}${suggestion.point.from.length > 1 ? ', interpolated linearly in ε°' : ''}${
          suggestion.point.extrapolated
            ? `, extended ` + `beyond them with the pair's pooled Soczewiński slope (dRM/dε° ${data.slope.toFixed(1)})`
            : ''
        }; ` +
        `${Math.max(...measured)} compounds measured at an anchor, the others read off their own Soczewiński ` +
        `lines. Largest weights: ${names.join('; ') || 'none'}. Kernel: Tanimoto on OpenChemLib fingerprints ` +
        `+ descriptors (cLogP, TPSA, donors, acceptors, rings, formula) + classes. Interval: 90 %, from the ` +
        `predictive spread scaled by leave-one-out residuals on the recorded compounds.`,
    },
    { quantity: 'ε°', value: suggestion.epsilon.toFixed(3), source: strengthSource(suggestion, adsorbent) },
    {
      quantity: 'similarity',
      value: 'Tanimoto 0–1',
      source:
        'Tanimoto coefficient on 512-bit OpenChemLib fingerprints (Willett, J. Chem. Inf. Comput. Sci. 1998, 38, 983).',
    },
  ];
  if (suggestion.found.borrowedFrom) {
    lines.push({
      quantity: 'pair translation',
      value: `${pairLabel(suggestion.found.borrowedFrom)} → ${pairLabel(suggestion.pair)}`,
      source:
        `Nothing is recorded in ${pairLabel(suggestion.pair)}: the curve predicted in ` +
        `${pairLabel(suggestion.found.borrowedFrom)} was read at equal Snyder ε°, which matches overall strength but not selectivity.`,
    });
  }
  return lines;
}
