import { useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { compoundClasses } from '../../shared/catalogue/compound-classes';
import { solventByKey } from '../../shared/catalogue/solvents';
import { formatParts } from '../../shared/domain/format-number';
import type { RecordListItem } from '../../shared/schemas/record';
import { Card } from '../components/ui/card';
import { Chip } from '../components/ui/chip';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { buttonClass } from '../components/ui/button';
import { PlateStrip, type PlateLane } from '../components/plate-strip';
import { StructureImage } from '../components/structure-image';
import { useHasRole } from '../features/auth/api/session';
import { useCompound } from '../features/compounds/api/get-compound';
import { DescriptorTable } from '../features/compounds/components/descriptor-table';
import { RfStrengthCharts } from '../features/compounds/components/rf-strength-charts';
import { RecordsTable } from '../features/records/components/records-table';
import { BookmarkToggle } from '../features/bookmarks/components/bookmark-toggle';

const className = (key: string) => compoundClasses.find((entry) => entry.key === key)?.name ?? key;

const compare: Record<string, (a: RecordListItem, b: RecordListItem) => number> = {
  createdAt: (a, b) => a.createdAt.localeCompare(b.createdAt),
  targetRf: (a, b) => (a.targetRf ?? -1) - (b.targetRf ?? -1),
  strongPercent: (a, b) => (a.eluentSummary.strongPercent ?? -1) - (b.eluentSummary.strongPercent ?? -1),
  outcome: (a, b) =>
    ['clean', 'partial', 'failed'].indexOf(a.outcome) - ['clean', 'partial', 'failed'].indexOf(b.outcome),
  phase: (a, b) => a.stationaryPhaseLabel.localeCompare(b.stationaryPhaseLabel),
  author: (a, b) => a.author.name.localeCompare(b.author.name),
  compound: () => 0,
};

/** One lane per distinct eluent (the clean or partial plates), side by side, and the solvents they share. */
function lanesOf(records: RecordListItem[]): { lanes: PlateLane[]; shared: string | null } {
  const seen = new Set<string>();
  const picked = records
    .filter((record) => record.outcome !== 'failed' && record.technique !== 'flash')
    .sort((a, b) => (a.eluentSummary.strongPercent ?? 0) - (b.eluentSummary.strongPercent ?? 0))
    .filter((record) => {
      const key = `${record.stationaryPhase}|${record.eluentSummary.strongPercent?.toFixed(1)}|${record.eluent.components
        .map((part) => part.solvent)
        .sort()
        .join('/')}|${record.eluent.additives.map((item) => item.additive).join('/')}`;
      return !seen.has(key) && seen.add(key);
    })
    .slice(0, 8);
  // The ratio is what differs between lanes: when every lane runs the same solvents in the same order, the
  // lanes say only the ratio (4 : 1) and the caption names the solvents once; otherwise each lane gives its eluent.
  const solventsOf = (record: RecordListItem) =>
    record.eluent.components.map((part) => solventByKey(part.solvent)?.label ?? part.solvent).join(' : ');
  const same =
    picked.length > 0 &&
    picked.every(
      (record) =>
        solventsOf(record) === solventsOf(picked[0]!) &&
        record.eluent.mode === 'isocratic' &&
        record.eluent.additives.length === 0,
    );
  const lanes = picked.map((record) => ({
    label: same
      ? record.eluent.components.map((part) => formatParts(part.parts)).join(' : ')
      : record.eluentSummary.notation,
    spots: record.spots.map((spot) => ({ rf: spot.rf, role: spot.role })),
  }));
  return { lanes, shared: same ? solventsOf(picked[0]!) : null };
}

/** A compound: structure, descriptors, classes, all its records, and Rf against eluent strength per solvent pair. */
export default function CompoundPage() {
  const id = Number(useParams().id);
  const { data: compound, isLoading, error } = useCompound(id);
  const canContribute = useHasRole('member');
  const [sort, setSort] = useState<{ key: string; order: 'asc' | 'desc' }>({ key: 'createdAt', order: 'desc' });
  const records = useMemo(() => {
    const list = [...(compound?.records ?? [])].sort(compare[sort.key] ?? compare.createdAt);
    return sort.order === 'desc' ? list.reverse() : list;
  }, [compound?.records, sort]);
  if (isLoading) return <PageLoading label="Loading the compound…" />;
  if (error || !compound)
    return (
      <p role="alert" className="text-failed">
        {error?.message ?? 'Compound not found.'}
      </p>
    );
  const title = compound.name ?? compound.canonicalSmiles;
  const { lanes, shared } = lanesOf(compound.records);
  return (
    <article className="space-y-5">
      <header className="grid grid-cols-1 gap-5 sm:grid-cols-[auto_minmax(0,1fr)] lg:grid-cols-[auto_minmax(0,1fr)_auto]">
        <StructureImage compoundId={compound.id} name={title} size="lg" link={false} className="max-sm:w-full" />
        <div className="min-w-0 space-y-2">
          <p className="text-xs text-ink-soft">
            Compound <span className="figure">#{compound.id}</span>
          </p>
          <div className="flex items-start gap-2">
            <h1 className="min-w-0 flex-1 text-2xl font-semibold">{title}</h1>
            <BookmarkToggle compoundId={compound.id} label={`compound ${title}`} />
          </div>
          {compound.synonyms.length > 0 && (
            <p className="text-sm text-ink-soft">Also: {compound.synonyms.join(', ')}</p>
          )}
          <p className="figure break-all text-sm">{compound.canonicalSmiles}</p>
          <div className="flex flex-wrap gap-1.5">
            {compound.classes.map((key) => (
              <Link key={key} to={`/classes/${key}`} className="inline-flex min-h-6 items-center">
                <Chip tone="front">{className(key)}</Chip>
              </Link>
            ))}
          </div>
          <p className="text-sm">
            <Link
              className="inline-block min-h-6 py-0.5 text-front underline"
              to={`/records?compoundId=${compound.id}&status=all`}
            >
              All records of this compound in the table
            </Link>
          </p>
        </div>
        <Card title="Descriptors" className="sm:col-span-2 lg:col-span-1 lg:min-w-64">
          <DescriptorTable descriptors={compound.descriptors} />
        </Card>
      </header>

      {lanes.length > 0 && (
        <Card
          title={
            shared ? (
              <>
                Plates in <span className="figure">{shared}</span>, one lane per ratio
              </>
            ) : (
              'Plates, one lane per eluent'
            )
          }
        >
          <div className="overflow-x-auto">
            <PlateStrip size="lg" lanes={lanes} title={`Plates of ${title}${shared ? ` in ${shared}` : ''}`} />
          </div>
        </Card>
      )}

      <Card title="Rf against eluent strength">
        <RfStrengthCharts records={compound.records} />
      </Card>

      <Card
        title={`Records (${compound.records.length})`}
        actions={
          canContribute ? (
            <Link to="/contribute" className={buttonClass('secondary', 'sm')}>
              Contribute
            </Link>
          ) : undefined
        }
      >
        {records.length === 0 ? (
          <EmptyState title="No active record for this compound">
            Contribute what you ran, even if it failed.
          </EmptyState>
        ) : (
          <RecordsTable
            records={records}
            visible={[
              'compound',
              'plate',
              'eluent',
              'phase',
              'technique',
              'targetRf',
              'outcome',
              'visualisation',
              'author',
              'createdAt',
            ]}
            sort={sort.key}
            order={sort.order}
            onSort={(key, order) => setSort({ key, order })}
            action={(record) => <BookmarkToggle recordId={record.id} label={`record ${record.id}, ${title}`} />}
          />
        )}
      </Card>
    </article>
  );
}
