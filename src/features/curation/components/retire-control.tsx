import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { useMe } from '../../../lib/session';
import { roleAtLeast } from '../../../../shared/schemas/auth';
import type { RecordDto } from '../../../../shared/schemas/record';
import { useRestoreRecord, useRetireRecord } from '../api/retire';
import { formatDate } from '../../../lib/dates';

type RetirableRecord = Pick<RecordDto, 'id' | 'status' | 'retiredReason' | 'retiredAt' | 'author'>;

function RetireForm({ recordId, onDone }: { recordId: number; onDone: () => void }) {
  const [reason, setReason] = useState('');
  const retire = useRetireRecord();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    retire.mutate({ id: recordId, reason }, { onSuccess: onDone });
  };
  return (
    <form onSubmit={submit} className="space-y-2 rounded-plate border border-line bg-plate p-3">
      <TextAreaField
        label="Why retire this record?"
        hint="It leaves lists, search and Scout but is kept whole, and can be restored."
        rows={2}
        value={reason}
        onChange={(event) => setReason(event.target.value)}
        error={retire.error?.message}
        required
        minLength={3}
      />
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="danger" disabled={retire.isPending || reason.trim().length < 3}>
          Retire record
        </Button>
        <Button size="sm" variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/**
 * Retire / restore for a record page. Shown to curators and admins, and to the record's author (who may
 * retire their own record and restore it if they retired it themselves; the server decides).
 */
export function RetireControl({ record }: { record: RetirableRecord }) {
  const me = useMe().data?.user;
  const [open, setOpen] = useState(false);
  const restore = useRestoreRecord();
  if (!me || record.status === 'merged') return null;
  const curator = roleAtLeast(me.role, 'curator');
  const author = me.id === record.author.id && roleAtLeast(me.role, 'member');
  if (!curator && !author) return null;
  if (record.status === 'retired') {
    return (
      <div
        role="status"
        className="flex flex-wrap items-center gap-3 rounded-plate border border-failed/40 bg-surface px-3 py-2 text-sm"
      >
        <span>
          <strong className="text-failed">Retired</strong>
          {record.retiredAt && <> on {formatDate(record.retiredAt)}</>}
          {record.retiredReason && <>: {record.retiredReason}</>}
        </span>
        <Button size="sm" disabled={restore.isPending} onClick={() => restore.mutate(record.id)}>
          Restore
        </Button>
        {restore.error && (
          <span role="alert" className="text-failed">
            {restore.error.message}
          </span>
        )}
      </div>
    );
  }
  return open ? (
    <RetireForm recordId={record.id} onDone={() => setOpen(false)} />
  ) : (
    <Button size="sm" variant="quiet" onClick={() => setOpen(true)}>
      Retire…
    </Button>
  );
}
