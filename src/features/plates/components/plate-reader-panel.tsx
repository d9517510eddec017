import { useEffect, useState } from 'react';
import type { PlateAnnotation, PlateReading } from '../../../../shared/schemas/plates';
import { Button } from '../../../components/ui/button';
import { useReadPlate } from '../api/read-plate';
import { annotationFromReading, PlateEditor, type FormSpot } from './plate-editor';

interface PlateReaderPanelProps {
  /** The photos chosen in the form; the chemist picks which one to read. */
  files: File[];
  onUseSpots: (spots: FormSpot[]) => void;
  onUsePool: (summary: string) => void;
}

/** In the record form: read a chosen plate photo, correct it on the overlay, and fill the form's spots and pool. */
export function PlateReaderPanel({ files, onUseSpots, onUsePool }: PlateReaderPanelProps) {
  const [index, setIndex] = useState(0);
  const file = files[Math.min(index, files.length - 1)];
  const [url, setUrl] = useState<string | null>(null);
  const [reading, setReading] = useState<PlateReading | null>(null);
  const [annotation, setAnnotation] = useState<PlateAnnotation | null>(null);
  const read = useReadPlate();

  useEffect(() => {
    if (!file) return undefined;
    const objectUrl = URL.createObjectURL(file);
    setUrl(objectUrl);
    setReading(null);
    setAnnotation(null);
    return () => URL.revokeObjectURL(objectUrl);
  }, [file]);

  if (!file) return null;
  const start = async () => {
    const answer = await read.mutateAsync(file).catch(() => null);
    if (answer) {
      setReading(answer);
      setAnnotation(annotationFromReading(answer));
    }
  };
  return (
    <section className="space-y-2" aria-label="Read the plate from the photo">
      <div className="flex flex-wrap items-center gap-2">
        {files.length > 1 && (
          <select
            aria-label="Photo to read"
            className="min-h-8 rounded-plate border border-line bg-surface px-2 text-sm"
            value={index}
            onChange={(event) => setIndex(Number(event.target.value))}
          >
            {files.map((candidate, i) => (
              <option key={`${candidate.name}-${i}`} value={i}>
                {candidate.name}
              </option>
            ))}
          </select>
        )}
        <Button size="sm" onClick={() => void start()} disabled={read.isPending}>
          {read.isPending ? 'Reading the plate…' : reading ? 'Read again' : 'Read the plate from the photo'}
        </Button>
        <span className="text-xs text-ink-soft">
          Spots, lanes, origin and front are found for you; drag anything that is off.
        </span>
      </div>
      {read.error && (
        <p role="alert" className="text-sm text-failed">
          {read.error.message}
        </p>
      )}
      {reading?.warnings?.map((warning) => (
        <p key={warning} className="text-sm text-partial">
          {warning}
        </p>
      ))}
      {reading && annotation && url && (
        <PlateEditor
          src={url}
          width={reading.width}
          height={reading.height}
          value={annotation}
          onChange={setAnnotation}
          onUseSpots={onUseSpots}
          onUsePool={onUsePool}
        />
      )}
    </section>
  );
}
