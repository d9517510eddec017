import { stationaryPhaseByKey } from '../../../../shared/catalogue/stationary-phases';
import { solventByKey } from '../../../../shared/catalogue/solvents';
import { strongSolventOf } from '../../../../shared/domain/eluent-summary';
import { fitPair, predictPairRf, type PairFit } from '../../../../shared/domain/soczewinski-pair';
import type { RecordListItem } from '../../../../shared/schemas/record';

export interface RfSeries {
  /** e.g. "EtOAc in hexanes on silica". */
  title: string;
  weak: string;
  strong: string;
  points: { percent: number; rf: number; recordId: number }[];
  fit: PairFit | null;
}

/**
 * Target Rf against % v/v of the strong solvent, one series per solvent pair and adsorbent, from TLC records
 * with a two-solvent isocratic eluent (failed plates and gradients left out). With two or more different
 * ratios a Soczewiński line is fitted (shared/domain/soczewinski-pair, mole fractions).
 */
export function rfSeries(records: readonly RecordListItem[]): RfSeries[] {
  const groups = new Map<string, RfSeries>();
  for (const record of records) {
    const target = record.spots.find((spot) => spot.role === 'target');
    if (
      !target ||
      record.outcome === 'failed' ||
      record.technique === 'flash' ||
      record.eluent.mode !== 'isocratic' ||
      record.eluent.components.length !== 2
    )
      continue;
    const strong = strongSolventOf(record.eluent.components, record.stationaryPhase);
    if (!strong) continue;
    const weak = record.eluent.components.find((part) => part.solvent !== strong)?.solvent as string;
    const phase = stationaryPhaseByKey(record.stationaryPhase);
    const surface = phase?.adsorbent ?? phase?.key ?? record.stationaryPhase;
    const additives = record.eluent.additives
      .map((item) => item.additive)
      .sort()
      .join('+');
    const key = `${weak}|${strong}|${surface}|${additives}`;
    const total = record.eluent.components.reduce((sum, part) => sum + part.parts, 0);
    const strongParts = record.eluent.components.find((part) => part.solvent === strong)?.parts ?? 0;
    const series = groups.get(key) ?? {
      title:
        `${solventByKey(strong)?.label ?? strong} in ${solventByKey(weak)?.label ?? weak} on ` +
        `${surface}${additives ? ` with ${additives}` : ''}`,
      weak,
      strong,
      points: [],
      fit: null,
    };
    series.points.push({ percent: (100 * strongParts) / total, rf: target.rf, recordId: record.id });
    groups.set(key, series);
  }
  for (const series of groups.values()) {
    if (new Set(series.points.map((point) => point.percent.toFixed(3))).size >= 2) {
      try {
        series.fit = fitPair(
          series.weak,
          series.strong,
          series.points.map((point) => ({ weakParts: 100 - point.percent, strongParts: point.percent, rf: point.rf })),
        );
      } catch {
        series.fit = null;
      }
    }
  }
  return [...groups.values()].sort((a, b) => b.points.length - a.points.length);
}

/** The fitted Rf at a % v/v of the strong solvent, or NaN outside (0, 100]. */
export function fittedRfAt(fit: PairFit, percent: number): number {
  if (!(percent > 0 && percent <= 100)) return Number.NaN;
  return predictPairRf(fit, percent / 100).rf;
}
