import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recordHistorySchema } from '../../../../shared/schemas/record';
import { recordKeys } from './keys';

const getRecordHistory = (id: number) => api(`/api/records/${id}/history`, {}, recordHistorySchema);

const recordHistoryQueryOptions = (id: number) =>
  queryOptions({ queryKey: recordKeys.history(id), queryFn: () => getRecordHistory(id) });

/** Every revision of a record, newest first. */
export function useRecordHistory(id: number) {
  return useQuery(recordHistoryQueryOptions(id));
}
