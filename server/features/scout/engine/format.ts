import { requireSolvent } from '../../../../shared/catalogue/solvents';
import { formatEluent, strongPercentOf } from '../../../../shared/domain/eluent-summary';
import { formatNumber, formatParts } from '../../../../shared/domain/format-number';
import type { ScoutMeasurement, SolventPair } from './types';

/** A measurement's eluent as records write it ("EtOAc : hexanes 1 : 4 + 1% Et3N"); a gradient names its last step. */
export function measurementNotation(measurement: ScoutMeasurement): string {
  const notation = formatEluent({
    components: measurement.components,
    additives: measurement.additives,
    mode: 'isocratic',
    steps: [],
  });
  return measurement.mode === 'gradient' ? `gradient ending ${notation}` : notation;
}

export const measurementStrongPercent = (measurement: ScoutMeasurement) =>
  strongPercentOf(measurement.components, measurement.phase);

/** % v/v with at most one decimal ("20", "16.7"). */
export const formatPercent = (percent: number) => formatNumber(percent, 1);

export interface RatioLabel {
  notation: string;
  label: string;
  components: { solvent: string; parts: number }[];
}

/** "EtOAc : hexanes 1 : 4" and "EtOAc : hexanes 1 : 4 (20 % EtOAc)" for strong : weak parts; pure solvents as "100 % EtOAc". */
export function ratioLabel(pair: SolventPair, parts: readonly [number, number]): RatioLabel {
  const strong = requireSolvent(pair.strong).label;
  const weak = requireSolvent(pair.weak).label;
  const [strongParts, weakParts] = parts;
  if (weakParts === 0)
    return { notation: `100 % ${strong}`, label: `100 % ${strong}`, components: [{ solvent: pair.strong, parts: 1 }] };
  if (strongParts === 0)
    return {
      notation: `100 % ${weak}`,
      label: `100 % ${weak} (no ${strong})`,
      components: [{ solvent: pair.weak, parts: 1 }],
    };
  const notation = `${strong} : ${weak} ${formatParts(strongParts)} : ${formatParts(weakParts)}`;
  const percent = (100 * strongParts) / (strongParts + weakParts);
  return {
    notation,
    label: `${notation} (${formatPercent(percent)} % ${strong})`,
    components: [
      { solvent: pair.strong, parts: strongParts },
      { solvent: pair.weak, parts: weakParts },
    ],
  };
}

/** "0.82" — similarities and Rf values with two decimals. */
export const two = (value: number) => value.toFixed(2);
