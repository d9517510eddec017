import { useState } from 'react';
import { Link } from 'react-router-dom';
import { buttonClass, Button } from '../../../components/ui/button';
import type { DuplicateGroup } from '../../../../shared/schemas/curation';
import { CertaintyMeter } from './certainty-meter';
import { DismissForm } from './dismiss-form';
import { GroupRecordsTable } from './group-records-table';

const kindTitle: Record<DuplicateGroup['kind'], string> = {
  'same-conditions': 'Same conditions recorded more than once',
  'same-structure': 'One structure entered as several compounds',
};

/** One candidate group: why it was flagged, how sure, its records; compare-and-merge or dismiss. */
export function DuplicateGroupCard({ group }: { group: DuplicateGroup }) {
  const [selected, setSelected] = useState<Set<number>>(() => new Set(group.recordIds.slice(0, 6)));
  const [dismissing, setDismissing] = useState(false);
  const toggle = (id: number) =>
    setSelected((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  const chosen = group.recordIds.filter((id) => selected.has(id));
  return (
    <article
      aria-label={`Candidate group ${group.recordIds.map((id) => `#${id}`).join(', ')}`}
      className="rounded-plate border border-line bg-surface"
    >
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-line px-4 py-2.5">
        <h3 className="text-sm font-semibold">
          {kindTitle[group.kind]} · {group.recordIds.length} records
        </h3>
        <CertaintyMeter score={group.score} />
      </header>
      <div className="space-y-3 p-4">
        <ul className="list-disc space-y-0.5 pl-5 text-sm text-ink-soft">
          {group.reasons.map((reason) => (
            <li key={reason}>{reason}</li>
          ))}
        </ul>
        <GroupRecordsTable records={group.records} selected={selected} onToggle={toggle} />
        <div className="flex flex-wrap items-center gap-2">
          {chosen.length >= 2 ? (
            <Link to={`/curation/merge?ids=${chosen.join(',')}`} className={buttonClass('primary', 'sm')}>
              Compare and merge {chosen.length} records
            </Link>
          ) : (
            <span className="text-sm text-ink-soft">Tick at least two records to compare them.</span>
          )}
          {!dismissing && (
            <Button size="sm" variant="quiet" onClick={() => setDismissing(true)}>
              Not duplicates…
            </Button>
          )}
        </div>
        {dismissing && <DismissForm recordIds={group.recordIds} onDone={() => setDismissing(false)} />}
      </div>
    </article>
  );
}
