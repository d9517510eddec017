import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { NotFoundError } from '../../http/errors';
import { compoundClassByKey, compoundClasses } from '../../../shared/catalogue/compound-classes';
import type { ClassDetail, ClassIndex } from '../../../shared/schemas/classes';
import { presentRecordListItem } from '../../core/record-presenter';
import {
  additiveUsage,
  countOutcomes,
  rfInTopPair,
  solventPairs,
  stainUsage,
  strengthOnSilica,
  type ClassRecordRow,
} from './stats';
import { loadListRecords } from '../../core/record-queries';

/** Records listed on a class page (newest first); the page links to the search for all of them. */
const LISTED = 20;

interface CountRow {
  cls: string;
  compounds: string;
  records: string;
  clean: string;
  partial: string;
  failed: string;
}

/** Every catalogue class with its compounds and active records, and their outcomes. */
export async function classIndex(): Promise<ClassIndex> {
  const rows = await sequelize.query<CountRow>(
    `SELECT cls, count(DISTINCT r.compound_id) AS compounds, count(r.id) AS records,
            count(r.id) FILTER (WHERE r.outcome = 'clean') AS clean, count(r.id) FILTER (WHERE r.outcome = 'partial') AS partial,
            count(r.id) FILTER (WHERE r.outcome = 'failed') AS failed
     FROM compounds c CROSS JOIN LATERAL unnest(c.classes) AS cls
     JOIN condition_records r ON r.compound_id = c.id AND r.status = 'active'
     GROUP BY cls`,
    { type: QueryTypes.SELECT },
  );
  const byClass = new Map(rows.map((row) => [row.cls, row]));
  return {
    items: compoundClasses.map((entry) => {
      const row = byClass.get(entry.key);
      return {
        key: entry.key,
        name: entry.name,
        description: entry.description,
        group: entry.group,
        compoundCount: Number(row?.compounds ?? 0),
        recordCount: Number(row?.records ?? 0),
        outcomes: {
          clean: Number(row?.clean ?? 0),
          partial: Number(row?.partial ?? 0),
          failed: Number(row?.failed ?? 0),
        },
      };
    }),
  };
}

async function classRecords(key: string): Promise<(ClassRecordRow & { compoundId: number; createdAt: Date })[]> {
  return sequelize.query(
    `SELECT r.id, r.compound_id AS "compoundId", r.outcome, r.stationary_phase AS "stationaryPhase", r.eluent,
      r.strong_percent AS "strongPercent",
            r.target_rf AS "targetRf", r.created_at AS "createdAt", r.demo,
            coalesce((SELECT array_agg(v.method ORDER BY v.position) FROM record_visualisations v WHERE v.record_id = r.id), '{}') AS stains
     FROM condition_records r JOIN compounds c ON c.id = r.compound_id
     WHERE r.status = 'active' AND :key = ANY(c.classes)
     ORDER BY r.created_at DESC, r.id DESC`,
    { replacements: { key }, type: QueryTypes.SELECT },
  );
}

/** A class page: outcomes, solvent pairs, ε° distribution, Rf against % strong solvent, stains and additives that worked. */
export async function classDetail(key: string): Promise<ClassDetail> {
  const entry = compoundClassByKey(key);
  if (!entry) throw new NotFoundError('Compound class');
  const rows = await classRecords(key);
  const { records, photoCounts } = await loadListRecords(rows.slice(0, LISTED).map((row) => row.id));
  return {
    key: entry.key,
    name: entry.name,
    description: entry.description,
    group: entry.group,
    fragments: [...entry.include],
    compoundCount: new Set(rows.map((row) => row.compoundId)).size,
    recordCount: rows.length,
    outcomes: countOutcomes(rows),
    solventPairs: solventPairs(rows),
    strength: strengthOnSilica(rows),
    rf: rfInTopPair(rows),
    stains: stainUsage(rows),
    additives: additiveUsage(rows),
    records: records.map((record) => presentRecordListItem(record, photoCounts.get(record.id) ?? 0)),
  };
}
