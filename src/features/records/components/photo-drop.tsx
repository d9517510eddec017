import { useId, useState, type DragEvent } from 'react';
import { MAX_PHOTO_BYTES } from '../api/photos';
import { Button } from '../../../components/ui/button';

const acceptedTypes = ['image/jpeg', 'image/png', 'image/webp'];

/** Checks what the browser can know before upload; the server checks the content itself. */
export function photoProblem(file: File): string | null {
  if (file.size > MAX_PHOTO_BYTES) return `${file.name} is ${(file.size / 1048576).toFixed(1)} MB; the limit is 10 MB.`;
  if (file.type && !acceptedTypes.includes(file.type)) return `${file.name} is not a JPEG, PNG or WebP image.`;
  return null;
}

interface PhotoDropProps {
  files: File[];
  onChange: (files: File[]) => void;
}

/** Drop or choose plate photos (JPEG, PNG or WebP, up to 10 MB each); they upload with the record. */
export function PhotoDrop({ files, onChange }: PhotoDropProps) {
  const id = useId();
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
        onDragOver={(event) => { event.preventDefault(); setDragging(true); }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={`mt-1 rounded-plate border border-dashed p-4 text-sm ${dragging ? 'border-front bg-front-light' : 'border-line bg-plate'}`}
      >
        <label htmlFor={id} className="cursor-pointer text-front underline underline-offset-2">Choose photos</label> or drop them here — JPEG, PNG or WebP, up to 10 MB each.
        <input id={id} type="file" accept={acceptedTypes.join(',')} multiple className="sr-only" onChange={(event) => { take(event.target.files); event.target.value = ''; }} />
        {files.length > 0 && (
          <ul className="mt-2 space-y-1">
            {files.map((file, index) => (
              <li key={`${file.name}-${index}`} className="flex items-center gap-2">
                <span className="figure text-xs">{file.name}</span>
                <span className="text-xs text-ink-soft">{(file.size / 1024).toFixed(0)} kB</span>
                <Button size="sm" variant="quiet" onClick={() => onChange(files.filter((_, other) => other !== index))} aria-label={`Remove ${file.name}`}>Remove</Button>
              </li>
            ))}
          </ul>
        )}
      </div>
      {problems.map((problem) => <p key={problem} role="alert" className="mt-1 text-sm text-failed">{problem}</p>)}
    </div>
  );
}
