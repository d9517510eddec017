import { Card } from '../components/ui/card';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { useDuplicates } from '../features/curation/api/duplicates';
import { DuplicateGroupCard } from '../features/curation/components/duplicate-group-card';
import { MergeHistory } from '../features/curation/components/merge-history';

/** Curation queue: suspected duplicates with reasons and scores, and the history of merges with Unmerge. */
export default function CurationPage() {
  const duplicates = useDuplicates();
  const data = duplicates.data;
  return (
    <section className="space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">Curation queue</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Suspected duplicates among active records. Same conditions: one compound, one stationary phase, the same
          solvents with the strong solvent's share within {data ? data.rules.ratioRelativeTolerance * 100 : 5} %
          relative (every component for three or more), and target Rf within {data?.rules.rfTolerance ?? 0.05}. Same
          structure: compounds identical once stereo is set aside, entered under different names. A merge keeps every
          spot, photo, note, bookmark and contributor, and can be undone once.
        </p>
      </header>
      <section aria-labelledby="duplicates-heading" className="space-y-3">
        <h2 id="duplicates-heading" className="text-lg font-semibold">
          Suspected duplicates{data ? ` (${data.groups.length})` : ''}
          {data && data.dismissedCount > 0 && (
            <span className="ml-2 text-sm font-normal text-ink-soft">{data.dismissedCount} dismissed</span>
          )}
        </h2>
        {duplicates.isLoading ? (
          <PageLoading label="Looking for duplicates…" />
        ) : duplicates.error ? (
          <p role="alert" className="text-failed">
            {duplicates.error.message}
          </p>
        ) : data!.groups.length === 0 ? (
          <EmptyState title="Nothing to review">
            No active records look like duplicates right now. New records and edits are checked each time this page
            opens.
          </EmptyState>
        ) : (
          data!.groups.map((group) => <DuplicateGroupCard key={group.signature} group={group} />)
        )}
      </section>
      <Card title="Merge history">
        <MergeHistory />
      </Card>
    </section>
  );
}
