import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { techniqueLabels } from '../../../../shared/schemas/record-parts';
import type { SearchRecordHit } from '../../../../shared/schemas/search';
import { PlateStrip } from '../../../components/plate-strip';
import { StructureImage } from '../../../components/structure-image';
import { DemoMark } from '../../../components/ui/demo-mark';
import { OutcomeBadge } from '../../../components/ui/outcome-badge';
import { Score } from './score';
import { formatDate } from '../../../lib/dates';
import { strongShareLabel } from '../../../lib/strong-share';
import { TableBody } from '../../../components/ui/table-body';

const column = createColumnHelper<SearchRecordHit>();
const nameOf = (hit: SearchRecordHit) => hit.record.compound.name ?? hit.record.compound.canonicalSmiles;

function columns(action?: (hit: SearchRecordHit) => ReactNode) {
  return [
    ...(action
      ? [
          column.display({
            id: 'action',
            header: () => <span className="sr-only">Bookmark</span>,
            cell: ({ row }) => action(row.original),
          }),
        ]
      : []),
    column.display({
      id: 'structure',
      header: 'Structure',
      cell: ({ row }) => <StructureImage compoundId={row.original.compoundId} name={nameOf(row.original)} size="sm" />,
    }),
    column.display({
      id: 'compound',
      header: 'Compound · record',
      cell: ({ row }) => (
        <div className="min-w-40">
          <Link
            to={`/records/${row.original.recordId}`}
            className="inline-block min-h-6 py-0.5 font-medium text-front hover:underline"
          >
            {nameOf(row.original)}
          </Link>
          {row.original.record.demo && <DemoMark className="ml-1" />}
          <p className="figure text-2xs text-ink-soft">
            record #{row.original.recordId} · {row.original.record.compound.formula}
          </p>
        </div>
      ),
    }),
    column.display({
      id: 'score',
      header: 'Score',
      cell: ({ row }) => <Score similarity={row.original.similarity} relevance={row.original.relevance} />,
    }),
    column.display({
      id: 'plate',
      header: 'Plate',
      cell: ({ row }) => (
        <PlateStrip
          lanes={[{ spots: row.original.record.spots.map((spot) => ({ rf: spot.rf, role: spot.role })) }]}
          title={`Plate of record ${row.original.recordId}`}
        />
      ),
    }),
    column.display({
      id: 'eluent',
      header: 'Eluent',
      cell: ({ row }) => {
        const { eluentSummary, eluent } = row.original.record;
        return (
          <div className="figure text-xs">
            <p>{eluentSummary.notation}</p>
            {eluentSummary.strongPercent !== null && eluent.components.length > 1 && (
              <p className="text-ink-soft">{strongShareLabel(eluentSummary)}</p>
            )}
          </div>
        );
      },
    }),
    column.display({
      id: 'phase',
      header: 'Phase · technique',
      cell: ({ row }) => (
        <span className="text-xs">
          {row.original.record.stationaryPhaseLabel}
          <br />
          {techniqueLabels[row.original.record.technique]}
        </span>
      ),
    }),
    column.display({
      id: 'rf',
      header: 'Target Rf',
      cell: ({ row }) => <span className="figure">{row.original.record.targetRf?.toFixed(2) ?? '—'}</span>,
    }),
    column.display({
      id: 'stains',
      header: 'Visualisation',
      cell: ({ row }) => (
        <span className="text-xs">{row.original.record.visualisations.map((item) => item.label).join(', ')}</span>
      ),
    }),
    column.display({
      id: 'outcome',
      header: 'Outcome',
      cell: ({ row }) => <OutcomeBadge outcome={row.original.record.outcome} />,
    }),
    column.display({
      id: 'who',
      header: 'Contributor · added',
      cell: ({ row }) => (
        <span className="text-xs">
          {row.original.record.author.name}
          <br />
          <time className="figure" dateTime={row.original.record.createdAt}>
            {formatDate(row.original.record.createdAt)}
          </time>
        </span>
      ),
    }),
  ];
}

/** Record hits as a table for scanning: one row per set of conditions, with the structure, the plate and the score. */
export function ResultsTable({
  hits,
  action,
}: {
  hits: SearchRecordHit[];
  action?: (hit: SearchRecordHit) => ReactNode;
}) {
  const table = useReactTable({
    data: hits,
    columns: columns(action),
    getCoreRowModel: getCoreRowModel(),
    getRowId: (hit) => String(hit.recordId),
  });
  return (
    <div className="relative overflow-x-auto rounded-plate border border-line bg-surface">
      <table className="w-full text-sm">
        <thead className="border-b border-line bg-plate text-left text-xs text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-3 py-2 font-medium">
                  {flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <TableBody
          table={table}
          rowClassName="border-b border-line/70 align-middle last:border-0 hover:bg-plate/60"
          cellClassName="px-3 py-2"
        />
      </table>
    </div>
  );
}
