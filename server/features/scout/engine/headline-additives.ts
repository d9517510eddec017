import { additiveByKey, type AdditivePurpose } from '../../../../shared/catalogue/additives';
import { closeSimilarity } from './additive-advice';
import { groupWords, ionisableGroups, sameGroups, type IonisableGroups } from './ionisable';
import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';
import type { ScoutQuery } from './types';

export interface HeadlineAdditive {
  additive: string;
  label: string;
  percent: number;
}

const firstChoice: Record<AdditivePurpose, string> = { base: 'triethylamine', acid: 'acetic-acid' };

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor((sorted.length - 1) / 2)];
};

/**
 * The additives of the first plate, from the query's own groups (ionisable.ts): a base for a basic amine or
 * pyridine-like N, an acid for a carboxylic or sulfonic acid, never one for a group the query lacks. Which
 * additive and how much follow the clean records of close neighbours with the same groups; the group's
 * additive is left out only when those neighbours mostly ran clean without it and none failed without it.
 * With no such neighbours: 1 % Et3N or 1 % AcOH (common practice). An amino acid (both groups) with no evidence
 * gets the acid only (common practice: acidic eluents for free amino acids).
 */
export function chooseAdditives(
  model: ScoutModel,
  query: ScoutQuery,
  ranked: readonly SimilarCompound[],
  groups: IonisableGroups,
): { additives: HeadlineAdditive[]; notes: string[] } {
  const own = query.id !== null ? model.indexOf(query.id) : undefined;
  const peers = ranked
    .filter((item) => item.index !== own && item.similarity >= closeSimilarity)
    .slice(0, 16)
    .filter(({ index }) => sameGroups(groups, ionisableGroups(model.compounds[index])));
  const records = peers.flatMap(({ index }) => model.measurementsOf[index]);
  const additives: HeadlineAdditive[] = [];
  const notes: string[] = [];
  for (const purpose of ['base', 'acid'] as const) {
    if (!groups[purpose]) continue;
    const hasPurpose = (record: (typeof records)[number]) =>
      record.additives.some((item) => additiveByKey(item.additive)?.purpose === purpose);
    const clean = records.filter((record) => record.outcome === 'clean');
    const withIt = clean.filter(hasPurpose);
    const without = clean.length - withIt.length;
    const failedWithout = records.filter((record) => record.outcome === 'failed' && !hasPurpose(record)).length;
    if (clean.length > 0 && without > withIt.length && failedWithout === 0) {
      notes.push(
        `No ${purpose} added: ${without} of ${clean.length} clean records of close neighbours with the same groups ran without one.`,
      );
      continue;
    }
    if (purpose === 'base' && groups.acid && withIt.length === 0) continue;
    const used = new Map<string, number[]>();
    for (const record of withIt)
      for (const item of record.additives)
        if (additiveByKey(item.additive)?.purpose === purpose)
          used.set(item.additive, [...(used.get(item.additive) ?? []), item.percent]);
    const [key, percents] = [...used].sort((a, b) => b[1].length - a[1].length)[0] ?? [firstChoice[purpose], [1]];
    const additive = additiveByKey(key);
    const entry = { additive: key, label: additive?.label ?? key, percent: median(percents) };
    additives.push(entry);
    notes.push(
      withIt.length > 0
        ? `+ ${entry.percent} % ${entry.label}: the query has ${groupWords[purpose]}; ${withIt.length} ` +
            `of ${clean.length} clean records of close neighbours with the same groups used ` +
            `it${failedWithout ? `, and ${failedWithout} without a ${purpose} failed` : ''}.`
        : `+ ${entry.percent} % ${entry.label}: the query has ${groupWords[purpose]}, which streaks ` +
            `or tails on silica without a ${purpose} (common ` +
            `practice)${failedWithout ? `; ${failedWithout} record${failedWithout === 1 ? '' : 's'} ` : ''}` +
            `${failedWithout ? 'of close neighbours without one failed' : ''}.`,
    );
  }
  return { additives, notes };
}
