import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recordDtoSchema } from '../../../../shared/schemas/record';
import { recordKeys } from './keys';

const getRecord = (id: number) => api(`/api/records/${id}`, {}, recordDtoSchema);

const recordQueryOptions = (id: number) =>
  queryOptions({ queryKey: recordKeys.detail(id), queryFn: () => getRecord(id) });

/** A record with every field, and whether the signed-in user may edit it. */
export function useRecord(id: number) {
  return useQuery(recordQueryOptions(id));
}
