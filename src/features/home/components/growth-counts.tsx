import { DemoMark } from '../../../components/ui/demo-mark';
import type { Overview } from '../../../../shared/schemas/overview';

const tiles: { key: keyof Omit<Overview, 'monthStart' | 'demoRecords'>; label: string; hint: string }[] = [
  { key: 'records', label: 'Condition records', hint: 'active records (merged and retired ones not counted)' },
  {
    key: 'compounds',
    label: 'Compounds',
    hint: 'compounds with at least one active record; new = first record this month',
  },
  {
    key: 'contributors',
    label: 'Contributors',
    hint: 'people who wrote an active record; new = first record this month',
  },
  {
    key: 'classes',
    label: 'Compound classes',
    hint: 'classes with at least one active record; new = first record this month',
  },
];

/** How the base grows: each count in total, with this month's share and what came before. */
export function GrowthCounts({ overview }: { overview: Overview }) {
  const month = new Date(overview.monthStart).toLocaleDateString(undefined, {
    month: 'long',
    year: 'numeric',
    timeZone: 'UTC',
  });
  return (
    <>
      <dl className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {tiles.map((tile) => {
          const count = overview[tile.key];
          return (
            <div key={tile.key} className="rounded-plate border border-line bg-surface px-4 py-3" title={tile.hint}>
              <dt className="text-xs text-ink-soft">{tile.label}</dt>
              <dd className="figure text-2xl font-semibold">{count.total}</dd>
              <dd className="figure text-xs text-ink-soft">
                <span className={count.thisMonth > 0 ? 'text-clean' : ''}>
                  +{count.thisMonth} in {month}
                </span>{' '}
                · {count.total - count.thisMonth} before
              </dd>
            </div>
          );
        })}
      </dl>
      {overview.demoRecords > 0 && (
        <p className="mt-2 text-xs text-ink-soft" data-testid="demo-count">
          <DemoMark /> {overview.demoRecords} of the {overview.records.total} records are invented demo data, counted
          above.
        </p>
      )}
    </>
  );
}
