import { Link, useLocation, useParams } from 'react-router-dom';
import { cautionsFor } from '../../shared/catalogue/cautions';
import { techniqueLabels } from '../../shared/schemas/record-parts';
import { Card } from '../components/ui/card';
import { Chip } from '../components/ui/chip';
import { DemoMark } from '../components/ui/demo-mark';
import { HazardLine } from '../components/ui/hazard-line';
import { OutcomeBadge } from '../components/ui/outcome-badge';
import { PageLoading } from '../components/ui/page-loading';
import { buttonClass } from '../components/ui/button';
import { PlateStrip } from '../components/plate-strip';
import { StructureImage } from '../components/structure-image';
import { useRecord } from '../features/records/api/get-record';
import { EluentView } from '../features/records/components/eluent-view';
import { SpotList } from '../features/records/components/spot-list';
import { RecordPhotos } from '../features/records/components/record-photos';
import { PhotoPlateMarks } from '../features/plates/components/photo-plate-marker';
import { HistoryList } from '../features/records/components/history-list';
import { ColumnDetailsView } from '../features/records/components/column-details-view';
import { MergedNotice } from '../features/curation/components/merged-notice';
import { RetireControl } from '../features/curation/components/retire-control';
import { BookmarkToggle } from '../features/bookmarks/components/bookmark-toggle';
import { ColumnPlanPanel } from '../features/tools/components/column-plan-panel';
import { formatDate } from '../lib/dates';

/** A condition record with every field, its depiction and plate strip, photos, cautions and history. */
export default function RecordPage() {
  const id = Number(useParams().id);
  const location = useLocation();
  const notice = (location.state as { notice?: string } | null)?.notice;
  const { data: record, isLoading, error } = useRecord(id);
  if (isLoading) return <PageLoading label="Loading the record…" />;
  if (error || !record)
    return (
      <p role="alert" className="text-failed">
        {error?.message ?? 'Record not found.'}
      </p>
    );
  const cautions = cautionsFor({
    solventKeys: [
      ...new Set(
        [...record.eluent.components, ...record.eluent.steps.flatMap((step) => step.components)].map(
          (part) => part.solvent,
        ),
      ),
    ],
    stainKeys: record.visualisations.map((item) => item.method),
    flashColumn: record.technique === 'flash',
  });
  const title = record.compound.name ?? record.compound.canonicalSmiles;
  const plateForPlan = columnInputs(record.spots);
  return (
    <article className="space-y-5">
      {notice && (
        <p role="status" className="rounded-plate border border-line bg-surface px-3 py-2 text-sm">
          {notice}
        </p>
      )}
      {record.status === 'merged' && record.mergedIntoId && <MergedNotice mergedIntoId={record.mergedIntoId} />}
      <header className="grid grid-cols-1 gap-5 sm:grid-cols-[auto_minmax(0,1fr)] lg:grid-cols-[auto_minmax(0,1fr)_auto]">
        <StructureImage compoundId={record.compound.id} name={title} size="lg" className="max-sm:w-full" />
        <div className="min-w-0 space-y-2">
          <p className="text-xs text-ink-soft">
            Condition record <span className="figure">#{record.id}</span> · r{record.revision}
          </p>
          <div className="flex items-start gap-2">
            <h1 className="min-w-0 flex-1 text-2xl font-semibold">
              <Link to={`/compounds/${record.compound.id}`} className="hover:underline">
                {title}
              </Link>
            </h1>
            <BookmarkToggle recordId={record.id} label={`record ${record.id}, ${title}`} />
          </div>
          <p className="text-sm text-ink-soft">
            <span className="figure break-all">{record.compound.canonicalSmiles}</span>
            <span className="figure whitespace-nowrap">
              {' '}
              · {record.compound.formula} · {record.compound.mw.toFixed(2)} g/mol
            </span>
          </p>
          <div className="flex flex-wrap items-center gap-2">
            <OutcomeBadge outcome={record.outcome} />
            <Chip>{techniqueLabels[record.technique]}</Chip>
            <Chip>{record.stationaryPhaseLabel}</Chip>
            {record.demo && <DemoMark />}
            {record.status === 'retired' && <Chip tone="spot">retired</Chip>}
          </div>
          <p className="text-sm text-ink-soft">
            {record.runOn && (
              <>
                Plate run on <time dateTime={record.runOn}>{formatDate(record.runOn)}</time> ·{' '}
              </>
            )}
            {record.recordedBy ? (
              <>
                Recorded by {record.recordedBy} (imported by {record.author.name})
              </>
            ) : (
              <>By {record.author.name}</>
            )}{' '}
            on <time dateTime={record.createdAt}>{formatDate(record.createdAt)}</time>
            {record.notebookRef && (
              <>
                {' '}
                · notebook <span className="figure">{record.notebookRef}</span>
              </>
            )}
          </p>
          {record.sourceTexts && Object.keys(record.sourceTexts).length > 0 && (
            <p className="text-xs text-ink-soft" data-testid="source-texts">
              As the imported sheet wrote it:{' '}
              {Object.entries(record.sourceTexts)
                .map(([field, text]) => `${field} “${text}”`)
                .join(' · ')}
            </p>
          )}
          <div className="flex flex-wrap items-center gap-2">
            {record.canEdit && record.status !== 'merged' && (
              <Link to={`/records/${record.id}/edit`} className={buttonClass('primary', 'sm')}>
                Edit record
              </Link>
            )}
            <RetireControl record={record} />
          </div>
        </div>
        <PlateStrip
          size="lg"
          title={`Plate of record ${record.id}`}
          lanes={[
            {
              label: record.eluentSummary.notation,
              spots: record.spots.map((spot) => ({ rf: spot.rf, role: spot.role, note: spot.label ?? undefined })),
            },
          ]}
        />
      </header>

      <div className="grid grid-cols-1 gap-5 lg:grid-cols-2">
        <Card title="Eluent">
          <EluentView record={record} />
          {cautions.length > 0 && (
            <div className="mt-3">
              <HazardLine>{cautions.map((caution) => caution.title).join(' · ')}.</HazardLine>
            </div>
          )}
        </Card>
        <Card title="Spots and visualisation">
          <SpotList spots={record.spots} />
          <div className="mt-3 flex flex-wrap gap-2">
            {record.visualisations.map((item) => (
              <Chip key={`${item.method}-${item.note}`} tone="front">
                {item.label}
              </Chip>
            ))}
            {record.visualisations.length === 0 && (
              <span className="text-sm text-ink-soft">No visualisation recorded.</span>
            )}
          </div>
        </Card>
        <Card title="Outcome">
          <p className="text-sm">
            <OutcomeBadge outcome={record.outcome} />{' '}
            {record.outcomeReason && <span className="ml-2">{record.outcomeReason}</span>}
          </p>
          {record.notes && <p className="mt-3 whitespace-pre-line text-sm">{record.notes}</p>}
        </Card>
        <Card title="Column">
          {record.column ? (
            <ColumnDetailsView column={record.column} />
          ) : (
            <p className="text-sm text-ink-soft">No column details recorded.</p>
          )}
        </Card>
      </div>

      {plateForPlan && (
        <ColumnPlanPanel
          title="Plan a column from this plate"
          rfTarget={plateForPlan.target}
          rfImpurity={plateForPlan.nearest}
          sampleMg={record.column?.sampleMg ?? undefined}
        />
      )}
      <Card title="Plate photos">
        <RecordPhotos
          record={record}
          photoMarks={(photo) => <PhotoPlateMarks photo={photo} canEdit={record.canEdit} />}
        />
      </Card>
      <Card title="Contributors">
        <ul className="flex flex-wrap gap-3 text-sm">
          {record.contributors.map((person) => (
            <li key={`${person.id}-${person.role}`}>
              {person.name} <span className="text-ink-soft">({person.role})</span>
            </li>
          ))}
        </ul>
      </Card>
      <Card title="History">
        <HistoryList recordId={record.id} />
      </Card>
    </article>
  );
}

/** The target's Rf and the closest other spot's, to prefill the column plan from this plate. */
function columnInputs(spots: { role: string; rf: number }[]): { target: number; nearest: number | null } | null {
  const target = spots.find((spot) => spot.role === 'target');
  if (!target) return null;
  const others = spots.filter((spot) => spot !== target).map((spot) => spot.rf);
  const nearest = others.length
    ? others.reduce((a, b) => (Math.abs(b - target.rf) < Math.abs(a - target.rf) ? b : a))
    : null;
  return { target: target.rf, nearest };
}
