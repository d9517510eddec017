import {
  compareConditions,
  duplicateTolerances,
  type ConditionComparison,
} from '../../../shared/domain/duplicate-conditions';
import { formatNumber } from '../../../shared/domain/format-number';
import { solventByKey } from '../../../shared/catalogue/solvents';
import { techniqueLabels } from '../../../shared/schemas/record-parts';
import type { DuplicateGroup, DuplicatePair } from '../../../shared/schemas/curation';
import { presentCurationRecord } from './presenters';
import { phaseLabel } from '../../core/record-presenter';
import { groupSignature, type CurationRow } from './records';

const label = (key: string) => solventByKey(key)?.label ?? key;
const percent = (fraction: number) => `${formatNumber(fraction * 100, 1)} %`;

/** The pair's comparison in the shape the API answers with. */
export function pairOf(a: CurationRow, b: CurationRow, comparison: ConditionComparison): DuplicatePair {
  return {
    a: a.id,
    b: b.id,
    score: comparison.score,
    rfDifference: Math.round((comparison.rfDifference ?? 0) * 1000) / 1000,
    ratioBasis: comparison.mixture.basis,
    fractions: comparison.mixture.compared,
    sameTechnique: comparison.sameTechnique,
    sameAdditives: comparison.sameAdditives,
    sameNotebookRef: comparison.sameNotebookRef,
  };
}

/** Records that could only match each other: one compound, phase, eluent mode and set of solvents. */
function bucketKey(row: CurationRow, byCompound: boolean): string {
  const solvents = row.eluent.components
    .map((part) => part.solvent)
    .sort()
    .join('+');
  return [
    byCompound ? row.compoundId : '',
    row.stationaryPhase,
    (row.stationaryPhaseOther ?? '').toLowerCase(),
    row.eluent.mode,
    solvents,
  ].join('|');
}

/** Every matching pair among rows, comparing only rows in one bucket (same compound unless `acrossCompounds`). */
export function matchingPairs(rows: readonly CurationRow[], acrossCompounds = false) {
  const buckets = new Map<string, CurationRow[]>();
  for (const row of rows) {
    const key = bucketKey(row, !acrossCompounds);
    buckets.set(key, [...(buckets.get(key) ?? []), row]);
  }
  const pairs: { a: CurationRow; b: CurationRow; comparison: ConditionComparison }[] = [];
  for (const bucket of buckets.values()) {
    for (let i = 0; i < bucket.length; i++) {
      for (let j = i + 1; j < bucket.length; j++) {
        if (acrossCompounds && bucket[i].compoundId === bucket[j].compoundId) continue;
        const comparison = compareConditions(bucket[i], bucket[j]);
        if (comparison.duplicate) pairs.push({ a: bucket[i], b: bucket[j], comparison });
      }
    }
  }
  return pairs;
}

function reasonsFor(rows: CurationRow[], pairs: DuplicatePair[]): string[] {
  const first = rows[0];
  const maxRf = Math.max(...pairs.map((pair) => pair.rfDifference));
  const worst = pairs.flatMap((pair) => pair.fractions).reduce((a, b) => (b.relative > a.relative ? b : a));
  const basis =
    pairs[0].ratioBasis === 'strong-solvent' ? `strong solvent ${label(worst.solvent)}` : `${label(worst.solvent)}`;
  const reasons = [
    `Same compound (${first.compoundName ?? first.canonicalSmiles}) and stationary phase ` +
      `(${phaseLabel(first.stationaryPhase, first.stationaryPhaseOther)}), same ${first.eluent.mode} eluent ` +
      `of ${first.eluent.components.map((part) => label(part.solvent)).join(', ')}.`,
    `Ratios within ${duplicateTolerances.ratioRelative * 100} % relative: ${basis} ${percent(worst.a)} ` +
      `vs ${percent(worst.b)} v/v (${formatNumber(worst.relative * 100, 1)} % relative at most).`,
    `Target Rf within ${duplicateTolerances.rf}: largest ΔRf ${formatNumber(maxRf, 3)} ` +
      `(${rows.map((row) => `#${row.id} ${formatNumber(row.targetRf ?? 0, 3)}`).join(', ')}).`,
  ];
  if (pairs.every((pair) => pair.sameNotebookRef)) reasons.push(`Same notebook reference (${first.notebookRef}).`);
  if (pairs.some((pair) => !pair.sameAdditives))
    reasons.push('Additives differ between some of the records (score lowered).');
  if (pairs.some((pair) => !pair.sameTechnique))
    reasons.push(
      `Techniques differ (${[...new Set(rows.map((row) => techniqueLabels[row.technique]))].join(', ')}; score lowered).`,
    );
  return reasons;
}

/** Connected sets of records joined by matching pairs. */
function connectedSets(pairs: ReturnType<typeof matchingPairs>): Map<number, CurationRow[]> {
  const parent = new Map<number, number>();
  const find = (id: number): number => {
    const up = parent.get(id) ?? id;
    if (up === id) return id;
    const root = find(up);
    parent.set(id, root);
    return root;
  };
  const rows = new Map<number, CurationRow>();
  for (const { a, b } of pairs) {
    rows.set(a.id, a);
    rows.set(b.id, b);
    parent.set(find(a.id), find(b.id));
  }
  const sets = new Map<number, CurationRow[]>();
  for (const row of rows.values()) sets.set(find(row.id), [...(sets.get(find(row.id)) ?? []), row]);
  return sets;
}

/**
 * Groups of active records of one compound that meet the same-conditions rules pairwise
 * (shared/domain/duplicate-conditions), joined transitively; the group's score is its weakest pair's.
 */
export function sameConditionGroups(rows: readonly CurationRow[]): DuplicateGroup[] {
  const pairs = matchingPairs(rows);
  return [...connectedSets(pairs).values()].map((members) => {
    members.sort((a, b) => a.id - b.id);
    const ids = new Set(members.map((row) => row.id));
    const groupPairs = pairs
      .filter((pair) => ids.has(pair.a.id))
      .map(({ a, b, comparison }) => pairOf(a, b, comparison));
    return {
      kind: 'same-conditions' as const,
      signature: groupSignature(members),
      recordIds: members.map((row) => row.id),
      score: Math.min(...groupPairs.map((pair) => pair.score)),
      reasons: reasonsFor(members, groupPairs),
      pairs: groupPairs,
      structures: [],
      records: members.map(presentCurationRecord),
    };
  });
}
