import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { compoundDetailSchema } from '../../../../shared/schemas/compound';

export const compoundKeys = {
  all: ['compounds'] as const,
  detail: (id: number) => [...compoundKeys.all, 'detail', id] as const,
};

const getCompound = (id: number) => api(`/api/compounds/${id}`, {}, compoundDetailSchema);

const compoundQueryOptions = (id: number) =>
  queryOptions({ queryKey: compoundKeys.detail(id), queryFn: () => getCompound(id) });

/** A compound with its descriptors, classes and active records. */
export function useCompound(id: number) {
  return useQuery(compoundQueryOptions(id));
}
