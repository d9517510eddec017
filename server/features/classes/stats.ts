import { additiveByKey } from '../../../shared/catalogue/additives';
import { solventByKey } from '../../../shared/catalogue/solvents';
import { stainByKey } from '../../../shared/catalogue/stains';
import { stationaryPhaseByKey } from '../../../shared/catalogue/stationary-phases';
import { defaultActivity, mixtureStrength, strengthEquation } from '../../../shared/domain/eluent-strength';
import type { Eluent } from '../../../shared/schemas/eluent';
import type { ClassDetail, OutcomeCounts, Usage } from '../../../shared/schemas/classes';

/** What the class statistics read of one active record. */
export interface ClassRecordRow {
  id: number;
  outcome: keyof OutcomeCounts;
  stationaryPhase: string;
  eluent: Eluent;
  strongPercent: number | null;
  targetRf: number | null;
  stains: string[];
  /** An invented demo record: charts count and mark it. */
  demo: boolean;
}

export const countOutcomes = (rows: { outcome: keyof OutcomeCounts }[]): OutcomeCounts => {
  const counts = { clean: 0, partial: 0, failed: 0 };
  for (const row of rows) counts[row.outcome] += 1;
  return counts;
};

const worked = (row: ClassRecordRow) => row.outcome !== 'failed';
const pairKey = (row: ClassRecordRow) =>
  row.eluent.components
    .map((part) => part.solvent)
    .sort()
    .join('+');

/** Solvent combinations used, most used first, with outcomes and the span of % strong solvent. */
export function solventPairs(rows: ClassRecordRow[]): ClassDetail['solventPairs'] {
  const groups = new Map<string, ClassRecordRow[]>();
  for (const row of rows) groups.set(pairKey(row), [...(groups.get(pairKey(row)) ?? []), row]);
  return [...groups.entries()]
    .map(([key, group]) => {
      const solvents = key.split('+');
      const percents = group.flatMap((row) => (row.strongPercent === null ? [] : [row.strongPercent]));
      return {
        solvents,
        labels: solvents.map((solvent) => solventByKey(solvent)?.label ?? solvent),
        records: group.length,
        outcomes: countOutcomes(group),
        strongPercent: percents.length ? ([Math.min(...percents), Math.max(...percents)] as [number, number]) : null,
      };
    })
    .sort((a, b) => b.records - a.records || a.labels.join().localeCompare(b.labels.join()));
}

/**
 * Snyder's ε° on silica of each record's eluent (the final mixture of a gradient), from
 * shared/domain/eluent-strength.ts; records on other phases or with a solvent lacking ε° are counted as skipped.
 */
export function strengthOnSilica(rows: ClassRecordRow[]): ClassDetail['strength'] {
  const points: ClassDetail['strength']['points'] = [];
  let skipped = 0;
  for (const row of rows) {
    const strength =
      stationaryPhaseByKey(row.stationaryPhase)?.adsorbent === 'silica'
        ? mixtureStrength(row.eluent.components, 'silica')
        : null;
    if (strength?.ok)
      points.push({ recordId: row.id, epsilon: strength.epsilon, outcome: row.outcome, demo: row.demo });
    else skipped += 1;
  }
  return {
    adsorbent: 'silica',
    points,
    skipped,
    source: `${strengthEquation}; adsorbent activity α = ${defaultActivity.silica.value} (${defaultActivity.silica.source})`,
  };
}

/** Target Rf against % strong solvent for the most used pair of two solvents (isocratic records only). */
export function rfInTopPair(rows: ClassRecordRow[]): ClassDetail['rf'] {
  const top = solventPairs(rows).find((pair) => pair.solvents.length === 2);
  if (!top) return null;
  const key = top.solvents.join('+');
  const points = rows
    .filter(
      (row) =>
        pairKey(row) === key && row.eluent.mode === 'isocratic' && row.targetRf !== null && row.strongPercent !== null,
    )
    .map((row) => ({
      recordId: row.id,
      strongPercent: row.strongPercent as number,
      rf: row.targetRf as number,
      outcome: row.outcome,
      demo: row.demo,
    }));
  return points.length ? { pair: top.labels, points } : null;
}

function usage(
  rows: ClassRecordRow[],
  keysOf: (row: ClassRecordRow) => string[],
  labelOf: (key: string) => string,
): Usage[] {
  const counts = new Map<string, { records: number; worked: number }>();
  for (const row of rows) {
    for (const key of new Set(keysOf(row))) {
      const entry = counts.get(key) ?? { records: 0, worked: 0 };
      entry.records += 1;
      if (worked(row)) entry.worked += 1;
      counts.set(key, entry);
    }
  }
  return [...counts.entries()]
    .map(([key, entry]) => ({ key, label: labelOf(key), ...entry }))
    .sort((a, b) => b.worked - a.worked || b.records - a.records || a.label.localeCompare(b.label));
}

/** Visualisations used, with how many of their records went clean or partial. */
export const stainUsage = (rows: ClassRecordRow[]) =>
  usage(
    rows,
    (row) => row.stains,
    (key) => stainByKey(key)?.label ?? key,
  );

/** Eluent additives used, with how many of their records went clean or partial. */
export const additiveUsage = (rows: ClassRecordRow[]) =>
  usage(
    rows,
    (row) => row.eluent.additives.map((item) => item.additive),
    (key) => additiveByKey(key)?.label ?? key,
  );
