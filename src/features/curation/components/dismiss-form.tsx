import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { useDismissGroup } from '../api/dismiss';

/** "Not duplicates": asks why, then hides the group until one of its records changes. */
export function DismissForm({ recordIds, onDone }: { recordIds: number[]; onDone: () => void }) {
  const [reason, setReason] = useState('');
  const dismiss = useDismissGroup();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    dismiss.mutate({ recordIds, reason }, { onSuccess: onDone });
  };
  return (
    <form onSubmit={submit} className="mt-3 space-y-2 rounded-plate border border-line bg-plate p-3">
      <TextAreaField
        label="Why are these not duplicates?"
        hint="Kept with your name. The group comes back if any of its records changes."
        rows={2}
        value={reason}
        onChange={(event) => setReason(event.target.value)}
        error={dismiss.error?.message}
        required
        minLength={3}
      />
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="primary" disabled={dismiss.isPending || reason.trim().length < 3}>
          Dismiss group
        </Button>
        <Button size="sm" variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
