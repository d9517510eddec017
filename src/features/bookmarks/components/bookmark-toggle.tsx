import { useBookmarks } from '../api/bookmarks';
import { useToggleBookmark } from '../api/change-bookmark';

interface BookmarkToggleProps {
  recordId?: number;
  compoundId?: number;
  /** What is bookmarked, for the accessible name (e.g. "record 12, benzyl alcohol"). */
  label: string;
  className?: string;
}

/**
 * A star that bookmarks a record or a compound for the signed-in user (viewers too). Its state comes from
 * the user's one bookmark list, so every star on a page agrees; aria-pressed carries the state, not colour.
 */
const toggleBase =
  'inline-grid h-8 w-8 shrink-0 place-items-center rounded-plate border text-base leading-none transition-colors disabled:opacity-55';

export function BookmarkToggle({ recordId, compoundId, label, className = '' }: BookmarkToggleProps) {
  const bookmarks = useBookmarks();
  const toggle = useToggleBookmark();
  const on = !!bookmarks.data?.items.some((item) =>
    recordId !== undefined ? item.recordId === recordId : item.compoundId === compoundId,
  );
  const target = recordId !== undefined ? { recordId } : { compoundId: compoundId as number };
  const problem = toggle.error ? `Could not change the bookmark: ${toggle.error.message}` : undefined;
  return (
    <button
      type="button"
      aria-pressed={on}
      aria-label={`Bookmark ${label}`}
      title={problem ?? (on ? `Bookmarked — click to remove ${label} from your bookmarks` : `Bookmark ${label}`)}
      disabled={bookmarks.isLoading || toggle.isPending}
      onClick={() => toggle.mutate({ target, on: !on })}
      className={`${toggleBase} ${
        on
          ? 'border-spot/50 bg-spot-light text-spot-dark'
          : 'border-transparent text-ink-soft hover:border-line hover:text-ink'
      } ${problem ? 'ring-1 ring-failed' : ''} ${className}`}
    >
      <span aria-hidden="true">{on ? '★' : '☆'}</span>
    </button>
  );
}
