import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { ConditionRecord } from '../../db/models';
import { NotFoundError } from '../../http/errors';
import {
  mergeableFieldLabels,
  mergeableFields,
  type MergeableField,
  type MergePreview,
} from '../../../shared/schemas/curation';
import { techniqueLabels } from '../../../shared/schemas/record-parts';
import { eluentSummary } from '../../../shared/domain/eluent-summary';
import { solventByKey } from '../../../shared/catalogue/solvents';
import { formatNumber } from '../../../shared/domain/format-number';
import { presentCurationRecord } from './presenters';
import { phaseLabel, visualisationLabel } from '../../core/record-presenter';
import { curationRowsByIds, type CurationRow } from './records';
import { hasBookmarks } from './snapshot';
import { readStereo } from './structures';

const dash = '—';
const amount = (value: number | null, unit: string) => (value === null ? dash : `${formatNumber(value, 2)} ${unit}`);
const text = (value: string | null) => value ?? dash;

/** A field's value as the merge screen shows it, with units. */
function display(field: MergeableField, record: ConditionRecord, row: CurationRow): string {
  switch (field) {
    case 'compound':
      return `${row.compoundName ?? 'unnamed'} (compound ${row.compoundId}, ${row.canonicalSmiles})`;
    case 'technique':
      return techniqueLabels[record.technique];
    case 'stationaryPhase':
      return phaseLabel(record.stationaryPhase, record.stationaryPhaseOther);
    case 'eluent': {
      const summary = eluentSummary(record.eluent, record.stationaryPhase);
      const strong =
        summary.strongPercent === null
          ? ''
          : ` (${formatNumber(summary.strongPercent, 1)} % ` +
            `${solventByKey(summary.strongSolvent ?? '')?.label ?? summary.strongSolvent} v/v)`;
      return `${summary.notation}${strong}`;
    }
    case 'outcome':
      return record.outcomeReason ? `${record.outcome} — ${record.outcomeReason}` : record.outcome;
    case 'column.diameterMm':
      return amount(record.columnDiameterMm, 'mm');
    case 'column.cartridgeSize':
      return text(record.cartridgeSize);
    case 'column.silicaG':
      return amount(record.silicaG, 'g');
    case 'column.sampleMg':
      return amount(record.sampleMg, 'mg');
    case 'column.loadMethod':
      return record.loadMethod ? `${record.loadMethod} load` : dash;
    case 'column.fractionMl':
      return amount(record.fractionMl, 'mL');
    case 'column.fractionsPooled':
      return text(record.fractionsPooled);
    case 'column.yieldPercent':
      return amount(record.yieldPercent, '%');
    case 'column.purityNote':
      return text(record.purityNote);
    case 'notebookRef':
      return text(record.notebookRef);
  }
}

async function countsOf(ids: number[]) {
  const bookmarks = (await hasBookmarks()) ? '(SELECT count(*) FROM bookmarks b WHERE b.record_id = r.id)' : '0';
  const rows = await sequelize.query<{
    id: number;
    spots: string;
    photos: string;
    visualisations: string;
    bookmarks: string;
    contributors: string;
  }>(
    `SELECT r.id,
       (SELECT count(*) FROM record_spots s WHERE s.record_id = r.id) AS spots,
       (SELECT count(*) FROM record_photos p WHERE p.record_id = r.id AND p.removed_at IS NULL) AS photos,
       (SELECT count(*) FROM record_visualisations v WHERE v.record_id = r.id) AS visualisations,
       ${bookmarks} AS bookmarks,
       (SELECT count(DISTINCT c.user_id) FROM record_contributors c WHERE c.record_id = r.id) AS contributors
     FROM condition_records r WHERE r.id IN (:ids)`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return new Map(
    rows.map((row) => [
      row.id,
      {
        spots: Number(row.spots),
        photos: Number(row.photos),
        visualisations: Number(row.visualisations),
        bookmarks: Number(row.bookmarks),
        contributors: Number(row.contributors),
      },
    ]),
  );
}

/** Every record's spots and visualisations in plate order: the values the merge screen lays side by side. */
async function childValues(ids: number[]) {
  const spots = await sequelize.query<{
    recordId: number;
    role: 'target' | 'starting_material' | 'by_product' | 'unknown';
    rf: number;
    label: string | null;
  }>(
    'SELECT record_id AS "recordId", role, rf, label FROM record_spots WHERE record_id IN (:ids) ORDER BY record_id, position, id',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const stains = await sequelize.query<{ recordId: number; method: string; note: string | null }>(
    'SELECT record_id AS "recordId", method, note FROM record_visualisations WHERE record_id IN (:ids) ORDER BY record_id, position, id',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return (id: number) => ({
    spots: spots.filter((spot) => spot.recordId === id).map(({ role, rf, label }) => ({ role, rf: Number(rf), label })),
    stains: stains
      .filter((stain) => stain.recordId === id)
      .map(({ method, note }) => ({ method, note, label: visualisationLabel(method, note) })),
  });
}

async function unitedPeople(ids: number[]) {
  const bookmarkUsers = (await hasBookmarks())
    ? (
        await sequelize.query<{ n: string }>(
          'SELECT count(DISTINCT user_id) AS n FROM bookmarks WHERE record_id IN (:ids)',
          { replacements: { ids }, type: QueryTypes.SELECT },
        )
      )[0].n
    : '0';
  const [people] = await sequelize.query<{ n: string }>(
    'SELECT count(DISTINCT user_id) AS n FROM (SELECT user_id FROM record_contributors WHERE record_id ' +
      'IN (:ids) UNION SELECT author_id FROM condition_records WHERE id IN (:ids)) c',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return { bookmarks: Number(bookmarkUsers), contributors: Number(people.n) };
}

/**
 * What a merge of these records would do (the first id is the proposed survivor): each choosable field
 * side by side, the counts that will be united, and anything that would make the merge refused.
 */
export async function mergePreview(ids: number[]): Promise<MergePreview> {
  const rows = await curationRowsByIds(ids);
  if (rows.length !== ids.length)
    throw new NotFoundError(`Record ${ids.filter((id) => !rows.some((row) => row.id === id)).join(', ')}`);
  const models = new Map((await ConditionRecord.findAll({ where: { id: ids } })).map((record) => [record.id, record]));
  const counts = await countsOf(ids);
  const values = await childValues(ids);
  const records = rows.map((row) => ({
    ...presentCurationRecord(row),
    notes: row.notes,
    counts: counts.get(row.id)!,
    ...values(row.id),
  }));
  const fields = mergeableFields.map((field) => {
    const values = rows.map((row) => ({ recordId: row.id, display: display(field, models.get(row.id)!, row) }));
    return {
      field,
      label: mergeableFieldLabels[field],
      values,
      differs: new Set(values.map((value) => value.display)).size > 1,
    };
  });
  const sum = (key: 'spots' | 'photos' | 'visualisations') =>
    records.reduce((total, record) => total + record.counts[key], 0);
  const problems = rows
    .filter((row) => row.status !== 'active')
    .map((row) => `Record ${row.id} is ${row.status}; only active records can be merged.`);
  if (
    new Set(rows.map((row) => row.compoundId)).size > 1 &&
    new Set(rows.map((row) => readStereo(row.idcode).skeleton)).size > 1
  ) {
    problems.push(
      'The records belong to different compounds; only records of one compound (or one structure entered twice) can be merged.',
    );
  }
  return {
    records,
    fields: fields.filter((field) => field.field !== 'compound' || field.differs),
    united: {
      spots: sum('spots'),
      photos: sum('photos'),
      visualisations: sum('visualisations'),
      ...(await unitedPeople(ids)),
    },
    problems,
  };
}
