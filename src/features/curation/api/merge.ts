import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mergeResultSchema, type MergeInput } from '../../../../shared/schemas/curation';
import { curationKeys, recordsKey } from './keys';

const mergeRecords = (input: MergeInput) =>
  api('/api/curation/merge', { method: 'POST', body: input }, mergeResultSchema);

/** Merges records into a survivor; every curation and record view is refreshed after. */
export function useMergeRecords() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: mergeRecords,
    onSettled: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: curationKeys.all }),
        qc.invalidateQueries({ queryKey: recordsKey }),
      ]),
  });
}
