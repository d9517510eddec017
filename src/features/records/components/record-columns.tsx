import { Link } from 'react-router-dom';
import type { ColumnDef } from '@tanstack/react-table';
import type { RecordListItem } from '../../../../shared/schemas/record';
import { techniqueLabels, type recordSortKeys } from '../../../../shared/schemas/record';
import { formatNumber } from '../../../../shared/domain/format-number';
import { PlateStrip } from '../../../components/plate-strip';
import { StructureImage } from '../../../components/structure-image';
import { OutcomeBadge } from '../../../components/ui/outcome-badge';
import { DemoMark } from '../../../components/ui/demo-mark';
import { strongShareLabel } from '../../../lib/strong-share';
import { formatDate } from '../../../lib/dates';

type SortKey = (typeof recordSortKeys)[number];
export type RecordColumn = ColumnDef<RecordListItem> & { id: string; meta: { label: string; sortKey?: SortKey } };

const name = (record: RecordListItem) => record.compound.name ?? record.compound.canonicalSmiles;

/** The records table's columns; `meta.sortKey` names the server sort each sortable column uses. */
export const recordColumns: RecordColumn[] = [
  {
    id: 'structure',
    meta: { label: 'Structure' },
    header: 'Structure',
    cell: ({ row }) => <StructureImage compoundId={row.original.compound.id} name={name(row.original)} size="sm" />,
  },
  {
    id: 'compound',
    meta: { label: 'Compound', sortKey: 'compound' },
    header: 'Compound',
    cell: ({ row }) => (
      <div className="min-w-40">
        <Link
          to={`/records/${row.original.id}`}
          className="inline-block min-h-6 py-0.5 font-medium text-front hover:underline"
        >
          {name(row.original)}
        </Link>
        {row.original.demo && <DemoMark className="ml-1" />}
        {row.original.status !== 'active' && (
          <span className="ml-1 text-2xs uppercase text-failed">{row.original.status}</span>
        )}
        <p className="figure text-2xs text-ink-soft">
          #{row.original.id} · {row.original.compound.formula}
        </p>
      </div>
    ),
  },
  {
    id: 'plate',
    meta: { label: 'Plate' },
    header: 'Plate',
    cell: ({ row }) => (
      <PlateStrip
        lanes={[{ spots: row.original.spots.map((spot) => ({ rf: spot.rf, role: spot.role })) }]}
        title={`Plate of record ${row.original.id}`}
      />
    ),
  },
  {
    id: 'eluent',
    meta: { label: 'Eluent (share of the stronger solvent)', sortKey: 'strongPercent' },
    header: 'Eluent',
    cell: ({ row }) => (
      <div className="figure text-xs">
        <p>{row.original.eluentSummary.notation}</p>
        {row.original.eluentSummary.strongPercent !== null && row.original.eluent.components.length > 1 && (
          <p className="text-ink-soft">{strongShareLabel(row.original.eluentSummary)}</p>
        )}
      </div>
    ),
  },
  {
    id: 'phase',
    meta: { label: 'Phase', sortKey: 'phase' },
    header: 'Phase',
    cell: ({ row }) => <span className="text-xs">{row.original.stationaryPhaseLabel}</span>,
  },
  {
    id: 'technique',
    meta: { label: 'Technique', sortKey: 'technique' },
    header: 'Technique',
    cell: ({ row }) => techniqueLabels[row.original.technique],
  },
  {
    id: 'targetRf',
    meta: { label: 'Target Rf', sortKey: 'targetRf' },
    header: 'Target Rf',
    cell: ({ row }) => <span className="figure">{row.original.targetRf?.toFixed(2) ?? '—'}</span>,
  },
  {
    id: 'outcome',
    meta: { label: 'Outcome', sortKey: 'outcome' },
    header: 'Outcome',
    cell: ({ row }) => <OutcomeBadge outcome={row.original.outcome} />,
  },
  {
    id: 'visualisation',
    meta: { label: 'Visualisation' },
    header: 'Visualisation',
    cell: ({ row }) => (
      <span className="text-xs">{row.original.visualisations.map((item) => item.label).join(', ')}</span>
    ),
  },
  {
    id: 'yield',
    meta: { label: 'Yield (%)', sortKey: 'yieldPercent' },
    header: 'Yield',
    cell: ({ row }) => (
      <span className="figure">
        {row.original.yieldPercent !== null ? `${formatNumber(row.original.yieldPercent, 0)} %` : '—'}
      </span>
    ),
  },
  {
    id: 'notebook',
    meta: { label: 'Notebook' },
    header: 'Notebook',
    cell: ({ row }) => <span className="figure text-xs">{row.original.notebookRef ?? ''}</span>,
  },
  {
    id: 'author',
    meta: { label: 'Contributor', sortKey: 'author' },
    header: 'Contributor',
    cell: ({ row }) => <span className="text-xs">{row.original.author.name}</span>,
  },
  {
    id: 'createdAt',
    meta: { label: 'Added', sortKey: 'createdAt' },
    header: 'Added',
    cell: ({ row }) => (
      <time className="figure text-xs" dateTime={row.original.createdAt}>
        {formatDate(row.original.createdAt)}
      </time>
    ),
  },
];
