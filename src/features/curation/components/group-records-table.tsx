import { Link } from 'react-router-dom';
import { OutcomeBadge } from '../../../components/ui/outcome-badge';
import type { CurationRecord } from '../../../../shared/schemas/curation';
import { formatNumber } from '../../../../shared/domain/format-number';
import { compoundLabel, day, strongShare } from './format';

interface Props {
  records: CurationRecord[];
  selected: ReadonlySet<number>;
  onToggle: (id: number) => void;
}

/** The records of a candidate group, one row each, with a tick to choose which to compare. */
export function GroupRecordsTable({ records, selected, onToggle }: Props) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="text-xs text-ink-soft">
          <tr className="border-b border-line">
            <th className="py-1.5 pr-2 font-medium">
              <span className="sr-only">Compare</span>
            </th>
            <th className="py-1.5 pr-3 font-medium">Record</th>
            <th className="py-1.5 pr-3 font-medium">Compound</th>
            <th className="py-1.5 pr-3 font-medium">Phase</th>
            <th className="py-1.5 pr-3 font-medium">Eluent</th>
            <th className="py-1.5 pr-3 font-medium">Strong solvent (% v/v)</th>
            <th className="py-1.5 pr-3 font-medium">Target Rf</th>
            <th className="py-1.5 pr-3 font-medium">Outcome</th>
            <th className="py-1.5 pr-3 font-medium">By</th>
            <th className="py-1.5 font-medium">Notebook</th>
          </tr>
        </thead>
        <tbody>
          {records.map((record) => (
            <tr key={record.id} className="border-b border-line/60 last:border-0">
              <td className="py-1.5 pr-2">
                <input
                  type="checkbox"
                  aria-label={`Compare record ${record.id}`}
                  checked={selected.has(record.id)}
                  onChange={() => onToggle(record.id)}
                  className="accent-front"
                />
              </td>
              <td className="py-1.5 pr-3">
                <Link
                  to={`/records/${record.id}`}
                  className="inline-block min-h-6 min-w-6 py-0.5 figure text-front hover:underline"
                >
                  #{record.id}
                </Link>
              </td>
              <td className="py-1.5 pr-3">{compoundLabel(record)}</td>
              <td className="py-1.5 pr-3">{record.stationaryPhaseLabel}</td>
              <td className="figure py-1.5 pr-3">{record.eluentNotation}</td>
              <td className="figure py-1.5 pr-3">{strongShare(record)}</td>
              <td className="figure py-1.5 pr-3 text-spot-dark">
                {record.targetRf === null ? '—' : formatNumber(record.targetRf, 3)}
              </td>
              <td className="py-1.5 pr-3">
                <OutcomeBadge outcome={record.outcome} />
              </td>
              <td className="py-1.5 pr-3">
                {record.author.name} <span className="text-xs text-ink-soft">{day(record.createdAt)}</span>
              </td>
              <td className="figure py-1.5">{record.notebookRef ?? '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
