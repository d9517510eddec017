import { useEffect, useRef, useState } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { liveSummary } from './eluent-builder';
import type { RecordFormValues } from './record-form-values';

const hasRf = (spots: RecordFormValues['spots']) => spots.some((spot) => spot.rf !== null && Number.isFinite(spot.rf));

/**
 * An Rf belongs to the eluent it was run in. When the ratio (or a solvent) changes after an Rf was typed,
 * ask whether the Rf values still hold — the plate may have been run in the new eluent — or should be cleared.
 */
export function RfStillHolds() {
  const { control, setValue, getValues } = useFormContext<RecordFormValues>();
  const eluent = useWatch({ control, name: 'eluent' });
  const phase = useWatch({ control, name: 'stationaryPhase' });
  const spots = useWatch({ control, name: 'spots' });
  const notation = liveSummary(eluent, phase)?.notation ?? null;
  const enteredWith = useRef<string | null>(null);
  const [asked, setAsked] = useState<{ from: string; to: string } | null>(null);

  useEffect(() => {
    if (!hasRf(spots)) {
      enteredWith.current = null;
      setAsked(null);
      return;
    }
    if (enteredWith.current === null) enteredWith.current = notation;
    else if (notation && notation !== enteredWith.current) setAsked({ from: enteredWith.current, to: notation });
  }, [notation, spots]);

  if (!asked || !notation) return null;
  const keep = () => {
    enteredWith.current = notation;
    setAsked(null);
  };
  const clear = () => {
    getValues('spots').forEach((_, index) => {
      setValue(`spots.${index}.rf`, null, { shouldDirty: true });
      setValue(`spots.${index}.spotDistanceMm`, null, { shouldDirty: true });
      setValue(`spots.${index}.frontDistanceMm`, null, { shouldDirty: true });
    });
    enteredWith.current = null;
    setAsked(null);
  };
  return (
    <div role="alert" className="space-y-2 rounded-plate border border-spot/50 bg-spot-light p-3 text-sm">
      <p>
        The Rf values were typed for <span className="figure">{asked.from}</span>; the eluent is now{' '}
        <span className="figure">{asked.to}</span>. Do they still hold — was the plate run in{' '}
        <span className="figure">{asked.to}</span>?
      </p>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" variant="primary" onClick={keep}>
          Yes, run in {asked.to}
        </Button>
        <Button size="sm" onClick={clear}>
          No, clear the Rf values
        </Button>
      </div>
    </div>
  );
}
