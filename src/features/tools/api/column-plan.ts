import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { columnPlanResultSchema, type ColumnPlanInput } from '../../../../shared/schemas/tools';
import { toolKeys } from './keys';

/** `POST /api/tools/column-plan`: the flash-column plan of Still, Kahn & Mitra (1978) for a sample and its TLC. */
const getColumnPlan = (input: ColumnPlanInput, signal?: AbortSignal) =>
  api('/api/tools/column-plan', { method: 'POST', body: input, signal }, columnPlanResultSchema);

const columnPlanQueryOptions = (input: ColumnPlanInput) =>
  queryOptions({
    queryKey: toolKeys.columnPlan(input),
    queryFn: ({ signal }) => getColumnPlan(input, signal),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
  });

/** The plan for the inputs, recomputed as they change (a pure calculation, so answers never go stale). */
export function useColumnPlan(input: ColumnPlanInput | null) {
  return useQuery({ ...columnPlanQueryOptions(input ?? { sampleMg: 1, rfTarget: 0.3 }), enabled: input !== null });
}
