import { additiveByKey } from '../../../shared/catalogue/additives';
import { solventByKey } from '../../../shared/catalogue/solvents';
import type { RecordListItem } from '../../../shared/schemas/record';
import type { ConditionSummary, SearchCompoundHit, SearchRecordHit } from '../../../shared/schemas/search';
import type { RankedRow } from './search-rank';

/** The conditions of one record as results show them (eluent notation, % strong solvent, Rf, stains, outcome). */
function presentConditions(record: RecordListItem): ConditionSummary {
  const strong = record.eluentSummary.strongSolvent;
  return {
    recordId: record.id,
    technique: record.technique,
    stationaryPhaseLabel: record.stationaryPhaseLabel,
    eluent: record.eluentSummary.notation,
    strongSolvent: strong ? (solventByKey(strong)?.label ?? strong) : null,
    strongPercent: record.eluentSummary.strongPercent,
    targetRf: record.targetRf,
    stains: record.visualisations.map((item) => item.label),
    additives: record.eluent.additives.map(
      (item) => `${item.percent}% ${additiveByKey(item.additive)?.label ?? item.additive}`,
    ),
    outcome: record.outcome,
  };
}

const round = (value: number | null) => (value === null ? null : Math.round(value * 1000) / 1000);

export function presentRecordHit(row: RankedRow, record: RecordListItem): SearchRecordHit {
  return {
    kind: 'record',
    recordId: row.id,
    compoundId: row.compoundId,
    similarity: round(row.similarity),
    relevance: round(row.relevance),
    record,
  };
}

const outcomeRank = { clean: 0, partial: 1, failed: 2 } as const;

/** The records of a compound hit worth showing first: clean before partial before failed, then in rank order. */
export function conditionsFirst(rows: RankedRow[], count: number): RankedRow[] {
  return rows
    .map((row, index) => ({ row, index }))
    .sort((a, b) => outcomeRank[a.row.outcome] - outcomeRank[b.row.outcome] || a.index - b.index)
    .slice(0, count)
    .map(({ row }) => row);
}

export function presentCompoundHit(rows: RankedRow[], shown: RecordListItem[]): SearchCompoundHit {
  const outcomes = { clean: 0, partial: 0, failed: 0 };
  for (const row of rows) outcomes[row.outcome] += 1;
  const relevance = rows.some((row) => row.relevance !== null)
    ? Math.max(...rows.map((row) => row.relevance ?? 0))
    : null;
  return {
    kind: 'compound',
    id: rows[0].compoundId,
    compound: shown[0].compound,
    similarity: round(rows[0].similarity),
    relevance: round(relevance),
    recordCount: rows.length,
    outcomes,
    conditions: shown.map(presentConditions),
  };
}
