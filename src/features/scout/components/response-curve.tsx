import { Scatter } from '../../../components/ui/chart';
import { solventByKey } from '../../../../shared/catalogue/solvents';
import type { ScoutResult } from '../../../../shared/schemas/scout';
import { neighbourPointsInPair } from './neighbour-spots';

/** The predicted Rf across compositions of the pair, with the neighbours' recorded plates as points. */
export function ResponseCurve({ result }: { result: ScoutResult }) {
  const suggestion = result.suggestion;
  if (!suggestion) return null;
  const curve = [...suggestion.curve].sort((a, b) => a.strongPercent - b.strongPercent);
  const at = (percent: number) => {
    const upper = curve.findIndex((point) => point.strongPercent >= percent);
    if (upper <= 0) return curve[Math.max(upper, 0)].rf;
    const a = curve[upper - 1];
    const b = curve[upper];
    return a.rf + ((percent - a.strongPercent) / (b.strongPercent - a.strongPercent)) * (b.rf - a.rf);
  };
  const strong = solventByKey(suggestion.pair.strong)?.label ?? suggestion.pair.strong;
  const points = [...neighbourPointsInPair(result), { x: suggestion.strongPercent, y: suggestion.predictedRf, label: `suggested: ${suggestion.label}`, highlight: true }];
  return (
    <Scatter
      title={`Rf against % ${strong}`}
      x={{ label: `% ${strong}`, unit: 'v/v', domain: [0, 100] }}
      y={{ label: 'Rf', domain: [0, 1] }}
      points={points}
      fit={{ f: at, label: 'the query’s predicted curve (Scout)' }}
    />
  );
}
