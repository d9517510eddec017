import { useState } from 'react';
import type { ImportDto, UndoPlan } from '../../../../shared/schemas/import';
import { Button, buttonClass } from '../../../components/ui/button';
import { useResumeImport } from '../api/resume';
import { getUndoPlan, useUndoImport } from '../api/undo';

/**
 * Download the rejected rows and the rows that came in with warnings, resume a failed import, undo one (after a
 * confirmation that says what the undo does to records merged or edited since).
 */
export function ImportActions({ item, size = 'sm' }: { item: ImportDto; size?: 'sm' | 'md' }) {
  const undo = useUndoImport();
  const resume = useResumeImport();
  const [plan, setPlan] = useState<UndoPlan | null>(null);
  const [planError, setPlanError] = useState<string | null>(null);
  const error = undo.error ?? resume.error;
  const ask = () => {
    setPlanError(null);
    getUndoPlan(item.id).then(setPlan, (failure: Error) => setPlanError(failure.message));
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      {item.rejected > 0 && (
        <a href={`/api/imports/${item.id}/rejected.csv`} download className={buttonClass('secondary', size)}>
          Download {item.rejected} rejected row{item.rejected === 1 ? '' : 's'}
        </a>
      )}
      {item.warned > 0 && (
        <a href={`/api/imports/${item.id}/warnings.csv`} download className={buttonClass('secondary', size)}>
          Download {item.warned} warning{item.warned === 1 ? '' : 's'}
        </a>
      )}
      {item.status === 'failed' && (
        <Button size={size} variant="primary" disabled={resume.isPending} onClick={() => resume.mutate(item.id)}>
          Resume from row {item.lastCommittedRow + 1}
        </Button>
      )}
      {(item.status === 'completed' || item.status === 'failed') &&
        (plan ? (
          <span className="flex flex-wrap items-center gap-2 text-sm" data-testid="undo-plan">
            <span>{plan.summary}</span>
            <Button
              size={size}
              variant="danger"
              disabled={undo.isPending}
              onClick={() => undo.mutate(item.id, { onSettled: () => setPlan(null) })}
            >
              Undo it
            </Button>
            <Button size={size} variant="quiet" onClick={() => setPlan(null)}>
              Keep
            </Button>
          </span>
        ) : (
          <Button size={size} variant="quiet" onClick={ask}>
            Undo import
          </Button>
        ))}
      {(error || planError) && (
        <p role="alert" className="text-sm text-failed">
          {error?.message ?? planError}
        </p>
      )}
    </div>
  );
}
