import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { statusChangeResultSchema } from '../../../../shared/schemas/curation';
import { curationKeys, recordsKey } from './keys';

const retireRecord = ({ id, reason }: { id: number; reason: string }) =>
  api(`/api/records/${id}/retire`, { method: 'POST', body: { reason } }, statusChangeResultSchema);

const restoreRecord = (id: number) => api(`/api/records/${id}/restore`, { method: 'POST' }, statusChangeResultSchema);

function useStatusChange<I>(fn: (input: I) => Promise<unknown>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSettled: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: recordsKey }),
        qc.invalidateQueries({ queryKey: curationKeys.all }),
      ]),
  });
}

/** Retires a record (it leaves lists, search and Scout; it is kept and can be restored). */
export const useRetireRecord = () => useStatusChange(retireRecord);

/** Restores a retired record to active. */
export const useRestoreRecord = () => useStatusChange(restoreRecord);
