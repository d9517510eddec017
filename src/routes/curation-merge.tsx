import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { Button, buttonClass } from '../components/ui/button';
import { Card } from '../components/ui/card';
import { PageLoading } from '../components/ui/page-loading';
import type { MergeableField, MergeResult } from '../../shared/schemas/curation';
import { useMergePreview } from '../features/curation/api/merge-preview';
import { useMergeRecords } from '../features/curation/api/merge';
import { MergeFieldTable } from '../features/curation/components/merge-field-table';
import { MergeSummary } from '../features/curation/components/merge-summary';

const parseIds = (text: string | null) => [
  ...new Set(
    (text ?? '')
      .split(',')
      .map(Number)
      .filter((id) => Number.isInteger(id) && id > 0),
  ),
];

function MergedPanel({ result }: { result: MergeResult }) {
  return (
    <Card title={`Merge #${result.mergeId} done`}>
      <p className="text-sm">
        {result.merged.map((record) => `#${record.id}`).join(', ')} now point to{' '}
        <Link to={`/records/${result.survivor.id}`} className="inline-block min-h-6 py-0.5 text-front hover:underline">
          record #{result.survivor.id}
        </Link>
        .
      </p>
      <div className="mt-3 flex gap-2">
        <Link to={`/records/${result.survivor.id}`} className={buttonClass('primary', 'sm')}>
          Open the survivor
        </Link>
        <Link to="/curation" className={buttonClass('secondary', 'sm')}>
          Back to the queue (Unmerge is there)
        </Link>
      </div>
    </Card>
  );
}

/** Side-by-side merge: pick the survivor and, per differing field, the record to take it from; see what is united; confirm. */
export default function CurationMergePage() {
  const [params, setParams] = useSearchParams();
  const ids = parseIds(params.get('ids'));
  const survivorId = ids.includes(Number(params.get('survivor'))) ? Number(params.get('survivor')) : ids[0];
  const [choices, setChoices] = useState<Partial<Record<MergeableField, number>>>({});
  const preview = useMergePreview(ids);
  const merge = useMergeRecords();
  const mergedIds = ids.filter((id) => id !== survivorId);

  if (ids.length < 2)
    return (
      <p role="alert">
        Choose at least two records to compare, from the{' '}
        <Link to="/curation" className="text-front underline">
          curation queue
        </Link>
        .
      </p>
    );
  if (merge.data) return <MergedPanel result={merge.data} />;
  const setSurvivor = (id: number) =>
    setParams(
      (current) => {
        current.set('survivor', String(id));
        return current;
      },
      { replace: true },
    );
  const confirm = () =>
    merge.mutate({
      survivorId,
      mergedIds,
      fields: Object.fromEntries(Object.entries(choices).filter(([, from]) => ids.includes(from as number))),
    });

  return (
    <section className="space-y-5">
      <header>
        <p className="text-sm">
          <Link to="/curation" className="inline-block min-h-6 py-0.5 text-front hover:underline">
            Curation queue
          </Link>{' '}
          /
        </p>
        <h1 className="text-2xl font-semibold">Merge records {ids.map((id) => `#${id}`).join(', ')}</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          The survivor keeps its own value for every field unless you pick another record's. Spots, plate photos,
          visualisations, notes, bookmarks and contributor credits of all records are united on the survivor — one
          target spot, each stain once; nothing is deleted.
        </p>
      </header>
      {preview.isLoading ? (
        <PageLoading label="Comparing records…" />
      ) : preview.error ? (
        <p role="alert" className="text-failed">
          {preview.error.message}
        </p>
      ) : (
        <>
          {preview.data!.problems.length > 0 && (
            <div role="alert" className="rounded-plate border border-failed/40 bg-surface p-3 text-sm text-failed">
              {preview.data!.problems.map((problem) => (
                <p key={problem}>{problem}</p>
              ))}
            </div>
          )}
          <Card title="Field by field">
            <MergeFieldTable
              preview={preview.data!}
              survivorId={survivorId}
              choices={choices}
              onChoose={(field, id) => setChoices((current) => ({ ...current, [field]: id }))}
              onSurvivor={setSurvivor}
            />
          </Card>
          <Card title="After the merge">
            <MergeSummary
              survivorId={survivorId}
              united={preview.data!.united}
              mergedIds={mergedIds}
              records={preview.data!.records}
            />
            <div className="mt-4 flex flex-wrap items-center gap-3">
              <Button
                variant="primary"
                disabled={merge.isPending || preview.data!.problems.length > 0}
                onClick={confirm}
              >
                Merge into #{survivorId}
              </Button>
              {merge.error && (
                <span role="alert" className="text-sm text-failed">
                  {merge.error.message}
                </span>
              )}
            </div>
          </Card>
        </>
      )}
    </section>
  );
}
