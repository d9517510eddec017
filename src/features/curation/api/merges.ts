import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mergeHistorySchema, unmergeResultSchema } from '../../../../shared/schemas/curation';
import { curationKeys, recordsKey } from './keys';

const getMerges = (recordId?: number) =>
  api(`/api/curation/merges${recordId ? `?recordId=${recordId}` : ''}`, {}, mergeHistorySchema);

const mergesQueryOptions = (recordId?: number) =>
  queryOptions({ queryKey: curationKeys.merges(recordId), queryFn: () => getMerges(recordId) });

/** Recent merges (or those involving one record), each saying whether it can still be undone. */
export function useMerges(recordId?: number) {
  return useQuery(mergesQueryOptions(recordId));
}

const unmergeRecords = (mergeId: number) =>
  api(`/api/curation/unmerge/${mergeId}`, { method: 'POST' }, unmergeResultSchema);

/** Undoes a merge; curation lists and record views are refreshed after. */
export function useUnmerge() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: unmergeRecords,
    onSettled: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: curationKeys.all }),
        qc.invalidateQueries({ queryKey: recordsKey }),
      ]),
  });
}
