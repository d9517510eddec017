import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { RecordListItem } from '../../shared/schemas/record';
import { formatDate } from '../lib/dates';
import { PlateStrip } from './plate-strip';
import { StructureImage } from './structure-image';
import { DemoMark } from './ui/demo-mark';
import { OutcomeBadge } from './ui/outcome-badge';

interface RecordRowsProps {
  records: RecordListItem[];
  /** False under a compound's own heading: the row then leads with the eluent instead of repeating the name. */
  showCompound?: boolean;
  /** A control shown at the end of each row (e.g. the bookmark star). */
  action?: (record: RecordListItem) => ReactNode;
}

/** Records as compact rows (cards on a phone): structure, plate strip, eluent and Rf, outcome; each links to its record. */
export function RecordRows({ records, showCompound = true, action }: RecordRowsProps) {
  return (
    <ul className="divide-y divide-line">
      {records.map((record) => (
        <li key={record.id} className="flex items-center gap-3 py-2">
          {showCompound && (
            <StructureImage
              compoundId={record.compound.id}
              name={record.compound.name ?? undefined}
              size="sm"
              className="max-sm:w-16"
            />
          )}
          <PlateStrip
            lanes={[{ spots: record.spots.map((spot) => ({ rf: spot.rf, role: spot.role })) }]}
            title={`Plate of record ${record.id}`}
          />
          <div className="min-w-0 flex-1">
            {showCompound ? (
              <>
                <Link
                  to={`/records/${record.id}`}
                  className="inline-block min-h-6 py-0.5 font-medium text-front hover:underline"
                >
                  {record.compound.name ?? record.compound.canonicalSmiles}
                </Link>
                {record.demo && <DemoMark className="ml-1" />}
                <p className="figure text-xs">
                  {record.eluentSummary.notation} · Rf {record.targetRf?.toFixed(2) ?? '—'}
                </p>
              </>
            ) : (
              <p className="text-sm">
                <Link
                  to={`/records/${record.id}`}
                  className="figure inline-block min-h-6 py-0.5 text-front hover:underline"
                >
                  {record.eluentSummary.notation} · Rf {record.targetRf?.toFixed(2) ?? '—'}
                </Link>
                {record.demo && <DemoMark className="ml-1" />}
              </p>
            )}
            <p className="text-2xs text-ink-soft">
              {record.stationaryPhaseLabel} · {record.author.name} ·{' '}
              <time dateTime={record.createdAt}>{formatDate(record.createdAt)}</time>
            </p>
          </div>
          <div className="flex shrink-0 flex-col items-end gap-1">
            <OutcomeBadge outcome={record.outcome} />
            {action?.(record)}
          </div>
        </li>
      ))}
    </ul>
  );
}
