import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mergePreviewSchema } from '../../../../shared/schemas/curation';
import { curationKeys } from './keys';

const getMergePreview = (ids: readonly number[]) =>
  api(`/api/curation/merge-preview?ids=${ids.join(',')}`, {}, mergePreviewSchema);

const mergePreviewQueryOptions = (ids: readonly number[]) =>
  queryOptions({ queryKey: curationKeys.preview(ids), queryFn: () => getMergePreview(ids), enabled: ids.length >= 2 });

/** Side-by-side values and united counts for a proposed merge. */
export function useMergePreview(ids: readonly number[]) {
  return useQuery(mergePreviewQueryOptions(ids));
}
