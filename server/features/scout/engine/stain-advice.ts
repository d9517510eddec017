import { stainByKey } from '../../../../shared/catalogue/stains';
import { suggestStains } from '../../../../shared/domain/stain-suggestions';
import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';

export interface StainAdvice {
  stain: string;
  label: string;
  shows: string;
  reasons: string[];
  neighbourCount: number;
  source: string;
}

const limit = 5;

/**
 * Stains likely to show the query: the class-based ranking of shared/domain/stain-suggestions.ts, raised by how
 * often the close neighbours' records were seen with each stain (one point per record share).
 */
export function stainAdvice(
  model: ScoutModel,
  close: readonly SimilarCompound[],
  queryClasses: readonly string[],
): StainAdvice[] {
  const records = close.flatMap(({ index }) => model.measurementsOf[index]);
  const used = new Map<string, number>();
  for (const record of records)
    for (const method of new Set(record.visualisations))
      if (stainByKey(method)) used.set(method, (used.get(method) ?? 0) + 1);
  const byClass = new Map(suggestStains(queryClasses).map((suggestion) => [suggestion.stain.key, suggestion]));
  const classes = new Set(queryClasses);
  // A specific stain a neighbour was seen with (bromocresol green for acids) is advised only if the query has a class it shows.
  const shows = (key: string) =>
    stainByKey(key)!.selectivity !== 'specific' || stainByKey(key)!.detects.some((name) => classes.has(name));
  const keys = new Set([...byClass.keys(), ...[...used.keys()].filter(shows)]);
  return [...keys]
    .map((key) => {
      const stain = stainByKey(key)!;
      const suggestion = byClass.get(key);
      const neighbourCount = used.get(key) ?? 0;
      const reasons: string[] = [];
      if (suggestion?.matchedClasses.length)
        reasons.push(`the query is ${suggestion.matchedClasses.map((name) => name.replace(/-/g, ' ')).join(', ')}`);
      if (suggestion?.matchedClasses.length && stain.nonDestructive)
        reasons.push('non-destructive: look before dipping in any stain');
      if (suggestion && suggestion.matchedClasses.length === 0 && stain.selectivity === 'general')
        reasons.push('general stain');
      if (neighbourCount > 0)
        reasons.push(`seen with it in ${neighbourCount} of ${records.length} close neighbours' records`);
      return {
        stain: key,
        label: stain.label,
        shows: stain.shows,
        reasons,
        neighbourCount,
        source: stain.source,
        score: (suggestion?.score ?? 0) + (records.length ? (3 * neighbourCount) / records.length : 0),
      };
    })
    .sort((a, b) => b.score - a.score || a.label.localeCompare(b.label))
    .slice(0, limit)
    .map(({ score: _score, ...advice }) => advice);
}
