import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { searchResponseSchema } from '../../../../shared/schemas/search';
import { searchKeys } from './keys';

/** `GET /api/search` with a prepared query string, the answer checked against the shared schema. */
const getSearch = (query: string, signal?: AbortSignal) =>
  api(`/api/search?${query}`, { signal }, searchResponseSchema);

const searchQueryOptions = (query: string) =>
  queryOptions({
    queryKey: searchKeys.results(query),
    queryFn: ({ signal }) => getSearch(query, signal),
    placeholderData: keepPreviousData,
    staleTime: 15_000,
  });

/** One page of search results; the previous page stays on screen while the next loads. */
export function useSearch(query: string, enabled = true) {
  return useQuery({ ...searchQueryOptions(query), enabled });
}
