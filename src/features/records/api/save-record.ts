import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recordDtoSchema, type RecordInput, type RecordUpdate } from '../../../../shared/schemas/record';
import { compoundsKey, recordKeys } from './keys';

const createRecord = (input: RecordInput) => api('/api/records', { method: 'POST', body: input }, recordDtoSchema);

const updateRecord = ({ id, patch }: { id: number; patch: RecordUpdate }) =>
  api(`/api/records/${id}`, { method: 'PATCH', body: patch }, recordDtoSchema);

function useRecordMutation<I, O>(fn: (input: I) => Promise<O>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: recordKeys.all }),
        qc.invalidateQueries({ queryKey: compoundsKey }),
      ]),
  });
}

export const useCreateRecord = () => useRecordMutation(createRecord);
export const useUpdateRecord = () => useRecordMutation(updateRecord);
