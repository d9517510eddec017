import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { useUpdateBookmarkNote } from '../api/change-bookmark';

/** A bookmark's note, shown as text and edited in place. */
export function BookmarkNote({ id, note, label }: { id: number; note: string | null; label: string }) {
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(note ?? '');
  const save = useUpdateBookmarkNote();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate({ id, note: draft.trim() || null }, { onSuccess: () => setEditing(false) });
  };
  if (!editing) {
    return (
      <div className="flex flex-wrap items-baseline gap-2 text-sm">
        {note ? <p className="text-ink">{note}</p> : <p className="text-ink-soft">No note.</p>}
        <Button
          size="sm"
          variant="quiet"
          onClick={() => {
            setDraft(note ?? '');
            setEditing(true);
          }}
          aria-label={`${note ? 'Edit' : 'Add'} the note on ${label}`}
        >
          {note ? 'Edit note' : 'Add a note'}
        </Button>
      </div>
    );
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-start gap-2">
      <label className="sr-only" htmlFor={`bookmark-note-${id}`}>
        Note on {label}
      </label>
      <textarea
        id={`bookmark-note-${id}`}
        className={`${controlClass} min-w-64 flex-1 text-sm`}
        rows={2}
        maxLength={1000}
        value={draft}
        onChange={(event) => setDraft(event.target.value)}
      />
      <Button type="submit" size="sm" variant="primary" disabled={save.isPending}>
        Save
      </Button>
      <Button size="sm" onClick={() => setEditing(false)}>
        Cancel
      </Button>
      {save.error && (
        <p role="alert" className="w-full text-sm text-failed">
          {save.error.message}
        </p>
      )}
    </form>
  );
}
