import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { RecordListItem } from '../../../../shared/schemas/record';
import { RecordRows } from '../../../components/record-rows';
import { StructureImage } from '../../../components/structure-image';

/** Consecutive records of one compound, in the order the server sent them (sorted by compound when grouped). */
function groupByCompound(
  records: RecordListItem[],
): { compound: RecordListItem['compound']; records: RecordListItem[] }[] {
  const groups: { compound: RecordListItem['compound']; records: RecordListItem[] }[] = [];
  for (const record of records) {
    const last = groups.at(-1);
    if (last && last.compound.id === record.compound.id) last.records.push(record);
    else groups.push({ compound: record.compound, records: [record] });
  }
  return groups;
}

/** The records under one heading per compound: the structure and name once, then each record's conditions. */
export function RecordGroups({
  records,
  action,
}: {
  records: RecordListItem[];
  action?: (record: RecordListItem) => ReactNode;
}) {
  return (
    <ul className="space-y-3">
      {groupByCompound(records).map((group) => {
        const name = group.compound.name ?? group.compound.canonicalSmiles;
        return (
          <li
            key={`${group.compound.id}-${group.records[0]!.id}`}
            className="rounded-plate border border-line bg-surface"
          >
            <header className="flex items-center gap-3 border-b border-line px-3 py-2">
              <StructureImage compoundId={group.compound.id} name={name} size="sm" className="max-sm:w-16" />
              <div className="min-w-0">
                <h2 className="font-semibold">
                  <Link
                    to={`/compounds/${group.compound.id}`}
                    className="inline-block min-h-6 py-0.5 text-front hover:underline"
                  >
                    {name}
                  </Link>
                </h2>
                <p className="figure text-2xs text-ink-soft">
                  {group.compound.formula} · {group.records.length} record{group.records.length === 1 ? '' : 's'} on
                  this page
                </p>
              </div>
            </header>
            <div className="px-3">
              <RecordRows records={group.records} showCompound={false} action={action} />
            </div>
          </li>
        );
      })}
    </ul>
  );
}
