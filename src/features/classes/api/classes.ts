import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classDetailSchema, classIndexSchema } from '../../../../shared/schemas/classes';
import { classKeys } from './keys';

const getClassIndex = () => api('/api/classes', {}, classIndexSchema);
const getClassDetail = (key: string) => api(`/api/classes/${encodeURIComponent(key)}`, {}, classDetailSchema);

const classIndexQueryOptions = queryOptions({
  queryKey: classKeys.index(),
  queryFn: getClassIndex,
  staleTime: 60_000,
});
const classDetailQueryOptions = (key: string) =>
  queryOptions({ queryKey: classKeys.detail(key), queryFn: () => getClassDetail(key), staleTime: 60_000 });

/** Every compound class with its counts. */
export function useClassIndex() {
  return useQuery(classIndexQueryOptions);
}

/** One class's statistics and newest records. */
export function useClassDetail(key: string) {
  return useQuery(classDetailQueryOptions(key));
}
