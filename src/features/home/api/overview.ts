import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { overviewSchema } from '../../../../shared/schemas/overview';

const getOverview = () => api('/api/overview', {}, overviewSchema);

export const overviewQueryOptions = queryOptions({
  queryKey: ['overview'] as const,
  queryFn: getOverview,
  staleTime: 60_000,
});

/** Counts of the group's base, in total and since the month began. */
export function useOverview() {
  return useQuery(overviewQueryOptions);
}
