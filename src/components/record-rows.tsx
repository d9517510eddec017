import { Link } from 'react-router-dom';
import type { RecordListItem } from '../../shared/schemas/record';
import { PlateStrip } from './plate-strip';
import { StructureImage } from './structure-image';
import { DemoMark } from './ui/demo-mark';
import { OutcomeBadge } from './ui/outcome-badge';

/** Records as compact rows: structure, plate strip, eluent and Rf, outcome; each links to its record. */
export function RecordRows({ records }: { records: RecordListItem[] }) {
  return (
    <ul className="divide-y divide-line">
      {records.map((record) => (
        <li key={record.id} className="flex items-center gap-3 py-2">
          <StructureImage compoundId={record.compound.id} name={record.compound.name ?? undefined} size="sm" />
          <PlateStrip lanes={[{ spots: record.spots.map((spot) => ({ rf: spot.rf, role: spot.role })) }]} title={`Plate of record ${record.id}`} />
          <div className="min-w-0 flex-1">
            <Link to={`/records/${record.id}`} className="font-medium text-front hover:underline">{record.compound.name ?? record.compound.canonicalSmiles}</Link>
            {record.demo && <DemoMark className="ml-1" />}
            <p className="figure truncate text-xs">{record.eluentSummary.notation} · Rf {record.targetRf?.toFixed(2) ?? '—'}</p>
            <p className="text-2xs text-ink-soft">{record.stationaryPhaseLabel} · {record.author.name} · {record.createdAt.slice(0, 10)}</p>
          </div>
          <OutcomeBadge outcome={record.outcome} />
        </li>
      ))}
    </ul>
  );
}
