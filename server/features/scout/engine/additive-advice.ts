import { additiveByKey, additives } from '../../../../shared/catalogue/additives';
import type { AdditiveAdvice } from '../../../../shared/schemas/scout';
import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';

/** Neighbours at least this similar (Tanimoto) are the ones whose additives, stains and failures are reported. */
export const closeSimilarity = 0.5;

const firstChoice = { base: 'triethylamine', acid: 'acetic-acid' } as const;

/**
 * Additives the close neighbours' records used, with counts ("Et3N in 3 of 4 neighbour records"). When the
 * neighbours used none but the query has a class an additive helps (amines → base, acids → acid; the additive
 * catalogue's `helpsClasses`), the usual first choice is listed with count 0 as common practice.
 */
export function additiveAdvice(
  model: ScoutModel,
  close: readonly SimilarCompound[],
  queryClasses: readonly string[],
): AdditiveAdvice[] {
  const records = close.flatMap(({ index }) => model.measurementsOf[index]);
  const counts = new Map<string, number[]>();
  for (const record of records)
    for (const item of record.additives)
      counts.set(item.additive, [...(counts.get(item.additive) ?? []), record.recordId ?? -1]);
  const classes = new Set(queryClasses);
  const advice: AdditiveAdvice[] = [...counts].map(([key, recordIds]) => {
    const additive = additiveByKey(key);
    const helped = additive?.helpsClasses.filter((name) => classes.has(name)) ?? [];
    return {
      additive: key,
      label: additive?.label ?? key,
      purpose: additive?.purpose ?? 'base',
      typicalPercent: [...(additive?.typicalPercent ?? [0.1, 1])] as [number, number],
      count: recordIds.length,
      of: records.length,
      recordIds: recordIds.filter((id) => id > 0),
      why:
        `${recordIds.length} of ${records.length} records of compounds with similarity ≥ ` +
        `${closeSimilarity} used ` +
        `it${
          helped.length
            ? `; the query is ${helped.map((name) => name.replace(/-/g, ' ')).join(', ')}, ` +
              `which it usually helps (additive catalogue, common practice)`
            : ''
        }.`,
    };
  });
  for (const purpose of ['base', 'acid'] as const) {
    if (advice.some((item) => item.purpose === purpose)) continue;
    const additive = additiveByKey(firstChoice[purpose]) ?? additives.find((item) => item.purpose === purpose)!;
    const helped = additive.helpsClasses.filter((name) => classes.has(name));
    if (helped.length === 0) continue;
    advice.push({
      additive: additive.key,
      label: additive.label,
      purpose,
      typicalPercent: [...additive.typicalPercent] as [number, number],
      count: 0,
      of: records.length,
      recordIds: [],
      why:
        `No close neighbour's record used a ${purpose}; the query is ` +
        `${helped.map((name) => name.replace(/-/g, ' ')).join(', ')}: common practice adds ` +
        `${additive.typicalPercent[0]}–${additive.typicalPercent[1]} % ${additive.label} if the spot streaks.`,
    });
  }
  return advice.sort((a, b) => b.count - a.count || a.label.localeCompare(b.label));
}
