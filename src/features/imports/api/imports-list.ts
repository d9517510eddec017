import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importListSchema } from '../../../../shared/schemas/import';
import { importKeys } from './keys';

const getImports = () => api('/api/imports', {}, importListSchema);

/** Past imports, newest first; refreshed every 2 s while one of them runs. */
const importsQueryOptions = () =>
  queryOptions({
    queryKey: importKeys.list(),
    queryFn: getImports,
    refetchInterval: (query) => (query.state.data?.items.some((item) => item.status === 'running') ? 2_000 : false),
  });

export const useImports = () => useQuery(importsQueryOptions());
