import { useState } from 'react';
import type { ImportDto } from '../../../../shared/schemas/import';
import { Button, buttonClass } from '../../../components/ui/button';
import { useResumeImport } from '../api/resume';
import { useUndoImport } from '../api/undo';

/** Download the rejected rows, resume a failed import, undo one (after a confirmation naming what it retires). */
export function ImportActions({ item, size = 'sm' }: { item: ImportDto; size?: 'sm' | 'md' }) {
  const undo = useUndoImport();
  const resume = useResumeImport();
  const [confirming, setConfirming] = useState(false);
  const error = undo.error ?? resume.error;
  return (
    <div className="flex flex-wrap items-center gap-2">
      {item.rejected > 0 && (
        <a href={`/api/imports/${item.id}/rejected.csv`} download className={buttonClass('secondary', size)}>
          Download {item.rejected} rejected row{item.rejected === 1 ? '' : 's'}
        </a>
      )}
      {item.status === 'failed' && (
        <Button size={size} variant="primary" disabled={resume.isPending} onClick={() => resume.mutate(item.id)}>
          Resume from row {item.lastCommittedRow + 1}
        </Button>
      )}
      {(item.status === 'completed' || item.status === 'failed') &&
        (confirming ? (
          <span className="flex flex-wrap items-center gap-2 text-sm">
            <span>Retire the {item.accepted} record{item.accepted === 1 ? '' : 's'} this import added?</span>
            <Button size={size} variant="danger" disabled={undo.isPending} onClick={() => undo.mutate(item.id, { onSettled: () => setConfirming(false) })}>
              Retire them
            </Button>
            <Button size={size} variant="quiet" onClick={() => setConfirming(false)}>Keep</Button>
          </span>
        ) : (
          <Button size={size} variant="quiet" onClick={() => setConfirming(true)}>Undo import</Button>
        ))}
      {error && <p role="alert" className="text-sm text-failed">{error.message}</p>}
    </div>
  );
}
