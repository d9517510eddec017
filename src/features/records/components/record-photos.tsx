import { useState, type ReactNode } from 'react';
import type { RecordDto } from '../../../../shared/schemas/record';
import { Button } from '../../../components/ui/button';
import { useRemovePhoto, useUploadPhoto } from '../api/photos';
import { PhotoDrop } from './photo-drop';

/** Plate photos as thumbnails opening the full image; editors add and remove them here. */
export function RecordPhotos({
  record,
  photoMarks,
}: {
  record: RecordDto;
  photoMarks?: (photo: RecordDto['photos'][number]) => ReactNode;
}) {
  const upload = useUploadPhoto();
  const remove = useRemovePhoto(record.id);
  const [files, setFiles] = useState<File[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const send = async () => {
    setMessage(null);
    for (const file of files) {
      try {
        await upload.mutateAsync({ recordId: record.id, file });
      } catch (error) {
        setMessage(`${file.name}: ${(error as Error).message}`);
      }
    }
    setFiles([]);
  };
  return (
    <div className="space-y-3">
      {record.photos.length === 0 ? (
        <p className="text-sm text-ink-soft">
          No plate photo yet.
          {record.canEdit ? ' Add one below: a photo under UV or after staining helps others read the plate.' : ''}
        </p>
      ) : (
        <ul className="flex flex-wrap gap-3">
          {record.photos.map((photo) => (
            <li key={photo.id} className="space-y-1">
              <a
                href={photo.url}
                target="_blank"
                rel="noreferrer"
                className="block rounded-plate border border-line bg-plate"
              >
                <img
                  src={photo.thumbUrl}
                  alt={`Plate photo ${photo.id}, ${photo.width} × ${photo.height} px`}
                  className="h-40 w-auto object-contain"
                  loading="lazy"
                />
              </a>
              <p className="text-2xs text-ink-soft">
                {photo.uploadedBy.name} · <span className="figure">{(photo.byteSize / 1024).toFixed(0)} kB</span>
              </p>
              {record.canEdit && (
                <Button
                  size="sm"
                  variant="quiet"
                  onClick={() => remove.mutate(photo.id)}
                  aria-label={`Remove photo ${photo.id}`}
                >
                  Remove
                </Button>
              )}
              {photoMarks?.(photo)}
            </li>
          ))}
        </ul>
      )}
      {record.canEdit && record.status !== 'merged' && (
        <div className="space-y-2">
          <PhotoDrop files={files} onChange={setFiles} />
          {files.length > 0 && (
            <Button variant="primary" size="sm" disabled={upload.isPending} onClick={() => void send()}>
              {upload.isPending ? 'Uploading…' : `Upload ${files.length} photo${files.length === 1 ? '' : 's'}`}
            </Button>
          )}
          {message && (
            <p role="alert" className="text-sm text-failed">
              {message}
            </p>
          )}
        </div>
      )}
    </div>
  );
}
