import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recordPageSchema, type RecordListQuery } from '../../../../shared/schemas/record';
import { recordKeys } from './keys';

/** The query string of a records list request; empty values are left out. */
function recordQueryString(query: RecordListQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, Array.isArray(value) ? value.join(',') : String(value));
  }
  return params.toString();
}

const getRecords = (query: RecordListQuery) => api(`/api/records?${recordQueryString(query)}`, {}, recordPageSchema);

const recordsQueryOptions = (query: RecordListQuery) =>
  queryOptions({
    queryKey: recordKeys.list(query),
    queryFn: () => getRecords(query),
    placeholderData: keepPreviousData,
  });

/** One page of records, sorted and filtered on the server; the previous page stays while the next loads. */
export function useRecords(query: RecordListQuery) {
  return useQuery(recordsQueryOptions(query));
}
