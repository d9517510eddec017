import { useMe } from '../../../lib/session';
import { useRecords } from '../api/list-records';

interface RecentCompoundsProps {
  /** Called with the compound's SMILES and name when one is picked. */
  onPick: (smiles: string, name: string | null) => void;
}

/**
 * The compounds of the reader's latest records (or the group's, when they have none yet) as buttons: on a
 * phone, picking a compound run again beats drawing it with a thumb.
 */
export function RecentCompounds({ onPick }: RecentCompoundsProps) {
  const me = useMe().data?.user;
  const mine = useRecords({
    sort: 'createdAt',
    order: 'desc',
    page: 1,
    pageSize: 30,
    ...(me ? { author: me.id } : {}),
  });
  const group = useRecords({ sort: 'createdAt', order: 'desc', page: 1, pageSize: 30 });
  const items = (mine.data?.items.length ? mine.data.items : group.data?.items) ?? [];
  const seen = new Set<number>();
  const compounds = items
    .filter((record) => !seen.has(record.compound.id) && seen.add(record.compound.id))
    .slice(0, 8)
    .map((record) => record.compound);
  if (compounds.length === 0) return null;
  return (
    <div className="mt-3">
      <p className="text-xs text-ink-soft">
        {mine.data?.items.length ? 'Or pick one of your recent compounds:' : 'Or pick a compound the group ran lately:'}
      </p>
      <ul className="mt-1 flex flex-wrap gap-1.5">
        {compounds.map((compound) => (
          <li key={compound.id}>
            <button
              type="button"
              onClick={() => onPick(compound.canonicalSmiles, compound.name)}
              className="min-h-8 rounded-full border border-line bg-surface px-3 text-sm text-ink hover:border-front hover:text-front-dark"
            >
              {compound.name ?? compound.canonicalSmiles}
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}
