import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importDtoSchema } from '../../../../shared/schemas/import';
import { importKeys } from './keys';

export const getImport = (id: number) => api(`/api/imports/${id}`, {}, importDtoSchema);

/** One import; polled every second while it runs (the progress bar). */
const importQueryOptions = (id: number) =>
  queryOptions({
    queryKey: importKeys.detail(id),
    queryFn: () => getImport(id),
    refetchInterval: (query) => (query.state.data?.status === 'running' ? 1_000 : false),
  });

export const useImport = (id: number | null) => useQuery({ ...importQueryOptions(id ?? 0), enabled: id !== null });
