import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { searchContributorsSchema } from '../../../../shared/schemas/search';
import { searchKeys } from './keys';

const getContributors = () => api('/api/search/contributors', {}, searchContributorsSchema);

const contributorsQueryOptions = queryOptions({
  queryKey: searchKeys.contributors(),
  queryFn: getContributors,
  staleTime: 5 * 60_000,
});

/** People credited on active records, for the contributor filter. */
export function useContributors() {
  return useQuery(contributorsQueryOptions);
}
