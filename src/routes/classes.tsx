import { useMemo, useState } from 'react';
import { PageLoading } from '../components/ui/page-loading';
import { useClassIndex } from '../features/classes/api/classes';
import { ClassTable } from '../features/classes/components/class-table';

/** The compound classes (defined as substructures) with what the group has recorded for each. */
export default function ClassesPage() {
  const index = useClassIndex();
  const [onlyRecorded, setOnlyRecorded] = useState(true);
  const items = useMemo(() => {
    const all = index.data?.items ?? [];
    return (onlyRecorded ? all.filter((item) => item.recordCount > 0) : all)
      .slice()
      .sort((a, b) => b.recordCount - a.recordCount || a.name.localeCompare(b.name));
  }, [index.data, onlyRecorded]);
  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-baseline justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">Compound classes</h1>
          <p className="mt-1 max-w-3xl text-sm text-ink-soft">
            Classes are found by substructure when a compound is stored; a compound can be in several. Open a class to
            see which eluents, stains and additives worked for it.
          </p>
        </div>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={onlyRecorded} onChange={(event) => setOnlyRecorded(event.target.checked)} />
          Only classes with records
        </label>
      </header>
      {index.isLoading ? (
        <PageLoading label="Loading classes…" />
      ) : index.error ? (
        <p role="alert" className="text-failed">
          {index.error.message}
        </p>
      ) : (
        <ClassTable classes={items} />
      )}
    </section>
  );
}
