import { useEffect, useId, useMemo, useState, type DragEvent } from 'react';
import { MAX_PHOTO_BYTES } from '../api/photos';
import { Button, buttonClass } from '../../../components/ui/button';

const acceptedTypes = ['image/jpeg', 'image/png', 'image/webp'];

/** Checks what the browser can know before upload; the server checks the content itself. */
function photoProblem(file: File): string | null {
  if (file.size > MAX_PHOTO_BYTES) return `${file.name} is ${(file.size / 1048576).toFixed(1)} MB; the limit is 10 MB.`;
  if (file.type && !acceptedTypes.includes(file.type)) return `${file.name} is not a JPEG, PNG or WebP image.`;
  return null;
}

interface PhotoDropProps {
  files: File[];
  onChange: (files: File[]) => void;
}

/** Object URLs of the chosen files for a preview, revoked when the list changes or the form closes. */
function usePreviews(files: File[]): string[] {
  const urls = useMemo(() => files.map((file) => URL.createObjectURL(file)), [files]);
  useEffect(() => () => urls.forEach((url) => URL.revokeObjectURL(url)), [urls]);
  return urls;
}

/**
 * Take a plate photo with the phone's camera, or drop or choose photos (JPEG, PNG or WebP, up to 10 MB each);
 * each is previewed before it is saved with the record.
 */
export function PhotoDrop({ files, onChange }: PhotoDropProps) {
  const id = useId();
  const cameraId = `${id}-camera`;
  const previews = usePreviews(files);
  const [dragging, setDragging] = useState(false);
  const [problems, setProblems] = useState<string[]>([]);
  const take = (list: FileList | null) => {
    if (!list) return;
    const incoming = [...list];
    setProblems(incoming.map(photoProblem).filter((problem): problem is string => problem !== null));
    onChange([...files, ...incoming.filter((file) => photoProblem(file) === null)]);
  };
  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    take(event.dataTransfer.files);
  };
  return (
    <div>
      <p className="text-sm font-medium">Plate photos</p>
      <div
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={
          `mt-1 rounded-plate border border-dashed p-4 text-sm ` +
          `${dragging ? 'border-front bg-front-light' : 'border-line bg-plate'}`
        }
      >
        <div className="flex flex-wrap items-center gap-2">
          <label htmlFor={cameraId} className={`${buttonClass('secondary')} cursor-pointer`}>
            Take a photo
          </label>
          <input
            id={cameraId}
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            onChange={(event) => {
              take(event.target.files);
              event.target.value = '';
            }}
          />
          <label htmlFor={id} className={`${buttonClass('quiet')} cursor-pointer`}>
            Choose photos
          </label>
          <input
            id={id}
            type="file"
            accept={acceptedTypes.join(',')}
            multiple
            className="sr-only"
            onChange={(event) => {
              take(event.target.files);
              event.target.value = '';
            }}
          />
        </div>
        <p className="mt-1 text-xs text-ink-soft">Or drop them here — JPEG, PNG or WebP, up to 10 MB each.</p>
        {files.length > 0 && (
          <ul className="mt-2 flex flex-wrap gap-3" aria-label="Photos to save">
            {files.map((file, index) => (
              <li key={`${file.name}-${index}`} className="flex w-36 flex-col gap-1">
                <img
                  src={previews[index]}
                  alt={`Preview of ${file.name}`}
                  className="h-28 w-36 rounded-plate border border-line bg-surface object-contain"
                />
                <span className="figure truncate text-xs" title={file.name}>
                  {file.name}
                </span>
                <span className="text-xs text-ink-soft">{(file.size / 1024).toFixed(0)} kB</span>
                <Button
                  size="sm"
                  variant="quiet"
                  onClick={() => onChange(files.filter((_, other) => other !== index))}
                  aria-label={`Remove ${file.name}`}
                >
                  Remove
                </Button>
              </li>
            ))}
          </ul>
        )}
      </div>
      {problems.map((problem) => (
        <p key={problem} role="alert" className="mt-1 text-sm text-failed">
          {problem}
        </p>
      ))}
    </div>
  );
}
