import { Link, useParams } from 'react-router-dom';
import { buttonClass } from '../components/ui/button';
import { Card } from '../components/ui/card';
import { Chip } from '../components/ui/chip';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { RecordRows } from '../components/record-rows';
import { useClassDetail } from '../features/classes/api/classes';
import { RfScatter, StrengthHistogram } from '../features/classes/components/class-charts';
import { SolventPairs, UsageList } from '../features/classes/components/class-usage';
import { OutcomeBar } from '../features/classes/components/outcome-bar';

/** One compound class: its records' outcomes, solvent pairs, eluent strength, Rf against composition, stains and additives. */
export default function ClassPage() {
  const { key = '' } = useParams();
  const detail = useClassDetail(key);
  if (detail.isLoading) return <PageLoading label="Loading the class…" />;
  if (detail.error || !detail.data)
    return (
      <p role="alert" className="text-failed">
        {detail.error?.message ?? 'Class not found.'}
      </p>
    );
  const item = detail.data;
  const searchAll = `/search?class=${encodeURIComponent(item.key)}&view=compounds`;
  return (
    <section className="space-y-4">
      <header className="space-y-2">
        <p className="text-sm">
          <Link to="/classes" className="inline-block min-h-6 py-0.5 text-front hover:underline">
            Compound classes
          </Link>{' '}
          ›
        </p>
        <h1 className="text-2xl font-semibold">{item.name}</h1>
        <p className="max-w-3xl text-sm text-ink-soft">{item.description}</p>
        <p className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
          Defined by the fragments{' '}
          {item.fragments.map((fragment) => (
            <Chip key={fragment}>
              <code className="figure">{fragment}</code>
            </Chip>
          ))}
        </p>
        <div className="flex flex-wrap items-center gap-4 text-sm">
          <span>
            <strong className="figure">{item.compoundCount}</strong> compounds ·{' '}
            <strong className="figure">{item.recordCount}</strong> active records
          </span>
          <OutcomeBar outcomes={item.outcomes} />
          <Link to={searchAll} className={buttonClass('secondary', 'sm')}>
            Search all of them
          </Link>
        </div>
      </header>
      {item.recordCount === 0 ? (
        <EmptyState
          title="No records for this class yet"
          action={
            <Link to="/contribute" className={buttonClass('secondary', 'sm')}>
              Contribute a record
            </Link>
          }
        >
          When someone records a purification of a compound of this class, its conditions are summed up here.
        </EmptyState>
      ) : (
        <>
          <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
            <Card title="Eluent strength (ε°)">
              <StrengthHistogram strength={item.strength} className={item.name} />
            </Card>
            <Card title="Rf against composition">
              {item.rf ? (
                <RfScatter rf={item.rf} />
              ) : (
                <p className="text-sm text-ink-soft">No isocratic pair with a target Rf yet.</p>
              )}
            </Card>
          </div>
          <div className="grid grid-cols-1 gap-4 lg:grid-cols-3">
            <Card title="Solvents used">
              <SolventPairs pairs={item.solventPairs} />
            </Card>
            <Card title="Visualisation that showed it">
              <UsageList items={item.stains} empty="No visualisation recorded." />
            </Card>
            <Card title="Additives">
              <UsageList items={item.additives} empty="No additive was needed in any record." />
            </Card>
          </div>
          <Card
            title={`Newest records (${Math.min(item.records.length, item.recordCount)} of ${item.recordCount})`}
            actions={
              <Link to={searchAll} className="inline-block min-h-6 py-0.5 text-front hover:underline">
                All in search
              </Link>
            }
          >
            <RecordRows records={item.records} />
          </Card>
        </>
      )}
    </section>
  );
}
