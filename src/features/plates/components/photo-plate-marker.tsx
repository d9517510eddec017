import { useEffect, useState } from 'react';
import type { PlateAnnotation } from '../../../../shared/schemas/plates';
import { Button } from '../../../components/ui/button';
import { useAnnotation, useAnnotationRevisions, useSaveAnnotation } from '../api/annotation';
import { useReadPlate } from '../api/read-plate';
import { annotationFromReading, PlateEditor } from './plate-editor';

type Photo = { id: number; url: string; width: number; height: number };

/**
 * On a record's photo: the saved plate annotation drawn over it (or, when none is saved, the photo read afresh),
 * corrected on the overlay and saved as a new revision; earlier revisions stay listed.
 */
function PhotoPlateMarker({ photo, canEdit }: { photo: Photo; canEdit: boolean }) {
  const saved = useAnnotation(photo.id);
  const revisions = useAnnotationRevisions(photo.id);
  const read = useReadPlate();
  const save = useSaveAnnotation();
  const [annotation, setAnnotation] = useState<PlateAnnotation | null>(null);
  const [message, setMessage] = useState<string | null>(null);

  useEffect(() => {
    if (saved.data && !annotation) setAnnotation(saved.data.annotation);
  }, [saved.data, annotation]);

  const readPhoto = async () => {
    setMessage(null);
    try {
      const blob = await (await fetch(photo.url, { credentials: 'same-origin' })).blob();
      setAnnotation(annotationFromReading(await read.mutateAsync(blob)));
    } catch (error) {
      setMessage((error as Error).message);
    }
  };

  if (saved.isLoading) return <p className="text-sm text-ink-soft">Loading the plate marks…</p>;
  return (
    <div className="space-y-2">
      {!annotation &&
        (canEdit ? (
          <Button size="sm" onClick={() => void readPhoto()} disabled={read.isPending}>
            {read.isPending ? 'Reading the plate…' : 'Read the plate from this photo'}
          </Button>
        ) : (
          <p className="text-sm text-ink-soft">No plate marks saved for this photo.</p>
        ))}
      {message && (
        <p role="alert" className="text-sm text-failed">
          {message}
        </p>
      )}
      {annotation && (
        <PlateEditor
          src={photo.url}
          width={photo.width}
          height={photo.height}
          value={annotation}
          onChange={canEdit ? setAnnotation : () => undefined}
        />
      )}
      {annotation && canEdit && (
        <Button
          variant="primary"
          size="sm"
          disabled={save.isPending}
          onClick={() =>
            save.mutate(
              { photoId: photo.id, annotation },
              {
                onSuccess: (result) => setMessage(`Saved as revision ${result.revision}.`),
                onError: (error) => setMessage(error.message),
              },
            )
          }
        >
          {save.isPending ? 'Saving…' : 'Save the plate marks'}
        </Button>
      )}
      {revisions.data && revisions.data.items.length > 0 && (
        <details className="text-xs text-ink-soft">
          <summary className="cursor-pointer">
            {revisions.data.items.length} saved revision{revisions.data.items.length === 1 ? '' : 's'}
          </summary>
          <ul className="mt-1 space-y-0.5">
            {revisions.data.items.map((item) => (
              <li key={item.revision}>
                <button
                  type="button"
                  className="text-front underline underline-offset-2"
                  onClick={() => setAnnotation(item.annotation)}
                >
                  revision {item.revision}
                </button>{' '}
                · {item.savedBy ?? 'someone'} · {new Date(item.savedAt).toLocaleString()}
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}

/** The marker folded under a photo; it loads (and reads the full photo) only once opened. */
export function PhotoPlateMarks({ photo, canEdit }: { photo: Photo; canEdit: boolean }) {
  const [open, setOpen] = useState(false);
  return (
    <details
      className="max-w-[min(100%,40rem)]"
      onToggle={(event) => setOpen((event.target as HTMLDetailsElement).open)}
    >
      <summary className="cursor-pointer py-1 text-sm text-front">Plate marks</summary>
      {open && <PhotoPlateMarker photo={photo} canEdit={canEdit} />}
    </details>
  );
}
