import { Link } from 'react-router-dom';
import type { MergeableField, MergePreview } from '../../../../shared/schemas/curation';
import { spotRoleLabels } from '../../../../shared/schemas/record-parts';
import { day } from './format';

interface Props {
  preview: MergePreview;
  survivorId: number;
  choices: Partial<Record<MergeableField, number>>;
  onChoose: (field: MergeableField, recordId: number) => void;
  onSurvivor: (recordId: number) => void;
}

const countRows = [
  ['photos', 'Plate photos'],
  ['bookmarks', 'Bookmarks'],
  ['contributors', 'People credited'],
] as const;

/** A record's spots as a chemist reads them: "target Rf 0.30 · starting material Rf 0.55 (SM)". */
export function spotsText(spots: MergePreview['records'][number]['spots']): string {
  if (spots.length === 0) return '—';
  return spots
    .map((spot) => `${spotRoleLabels[spot.role]} Rf ${spot.rf.toFixed(2)}${spot.label ? ` (${spot.label})` : ''}`)
    .join(' · ');
}

/** Records side by side: a survivor radio per record, a radio per differing field, notes and counts below. */
export function MergeFieldTable({ preview, survivorId, choices, onChoose, onSurvivor }: Props) {
  const { records } = preview;
  const blank = (field: MergePreview['fields'][number]) =>
    !field.differs && field.values.every((value) => value.display === '—');
  const fields = preview.fields.filter((field) => !blank(field));
  const unrecorded = preview.fields.filter(blank).map((field) => field.label);
  return (
    <div className="overflow-x-auto">
      <table className="w-full table-fixed text-left text-sm">
        <thead>
          <tr className="border-b border-line align-top">
            <th className="w-44 py-2 pr-3 text-xs font-medium text-ink-soft">Field</th>
            {records.map((record) => (
              <th key={record.id} className="py-2 pr-3 font-normal">
                <Link to={`/records/${record.id}`} className="figure font-semibold text-front hover:underline">
                  #{record.id}
                </Link>
                <span className="block text-xs text-ink-soft">
                  {record.author.name}, {day(record.createdAt)} · {record.status}
                </span>
                <label className="mt-1 inline-flex items-center gap-1.5 text-sm">
                  <input
                    type="radio"
                    name="survivor"
                    className="accent-front"
                    checked={survivorId === record.id}
                    onChange={() => onSurvivor(record.id)}
                  />
                  Keep as survivor
                </label>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {fields.map((field) => (
            <tr key={field.field} className="border-b border-line/60 align-top">
              <th scope="row" className="py-2 pr-3 font-medium">
                {field.label}
                {field.differs && (
                  <span className="ml-1 rounded-full bg-spot-light px-1.5 text-xs font-normal text-spot-dark">
                    differs
                  </span>
                )}
              </th>
              {field.differs ? (
                field.values.map((value) => (
                  <td key={value.recordId} className="py-2 pr-3">
                    <label className="flex items-start gap-1.5">
                      <input
                        type="radio"
                        name={`field-${field.field}`}
                        aria-label={`${field.label} from record ${value.recordId}`}
                        className="mt-1 accent-front"
                        checked={(choices[field.field] ?? survivorId) === value.recordId}
                        onChange={() => onChoose(field.field, value.recordId)}
                      />
                      <span className={field.field === 'eluent' ? 'figure' : ''}>{value.display}</span>
                    </label>
                  </td>
                ))
              ) : (
                <td colSpan={records.length} className="py-2 pr-3 text-ink-soft">
                  <span className={field.field === 'eluent' ? 'figure' : ''}>{field.values[0]?.display}</span>{' '}
                  <span className="text-xs">(same in all)</span>
                </td>
              )}
            </tr>
          ))}
          {unrecorded.length > 0 && (
            <tr className="border-b border-line/60">
              <th scope="row" className="py-2 pr-3 font-medium">
                Not recorded
              </th>
              <td colSpan={records.length} className="py-2 pr-3 text-ink-soft">
                In none of the records: {unrecorded.join(', ')}.
              </td>
            </tr>
          )}
          <tr className="border-b border-line/60 align-top">
            <th scope="row" className="py-2 pr-3 font-medium">
              Notes{' '}
              <span className="block text-xs font-normal text-ink-soft">
                all kept: appended to the survivor's with record, author and date
              </span>
            </th>
            {records.map((record) => (
              <td key={record.id} className="whitespace-pre-wrap py-2 pr-3 text-ink-soft">
                {record.notes ?? '—'}
              </td>
            ))}
          </tr>
          <tr className="border-b border-line/60 align-top">
            <th scope="row" className="py-2 pr-3 font-medium">
              Spots
            </th>
            {records.map((record) => (
              <td key={record.id} className="figure py-2 pr-3 text-xs">
                {spotsText(record.spots)}
              </td>
            ))}
          </tr>
          <tr className="border-b border-line/60 align-top">
            <th scope="row" className="py-2 pr-3 font-medium">
              Visualisation
            </th>
            {records.map((record) => (
              <td key={record.id} className="py-2 pr-3">
                {record.stains.map((stain) => stain.label).join(', ') || '—'}
              </td>
            ))}
          </tr>
          {countRows.map(([key, label]) => (
            <tr key={key} className="border-b border-line/60 last:border-0">
              <th scope="row" className="py-1.5 pr-3 font-medium">
                {label}
              </th>
              {records.map((record) => (
                <td key={record.id} className="figure py-1.5 pr-3">
                  {record.counts[key]}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
