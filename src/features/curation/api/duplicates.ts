import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { duplicatesResponseSchema } from '../../../../shared/schemas/curation';
import { curationKeys } from './keys';

const getDuplicates = () => api('/api/curation/duplicates', {}, duplicatesResponseSchema);

const duplicatesQueryOptions = () => queryOptions({ queryKey: curationKeys.duplicates(), queryFn: getDuplicates });

/** Open candidate duplicate groups, most certain first. */
export function useDuplicates() {
  return useQuery(duplicatesQueryOptions());
}
