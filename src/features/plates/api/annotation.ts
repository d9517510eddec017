import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, ApiRequestError } from '../../../lib/api-client';
import {
  photoAnnotationHistorySchema,
  photoAnnotationSchema,
  type PlateAnnotation,
} from '../../../../shared/schemas/plates';
import { plateKeys } from './keys';

/** The current annotation of a record photo, or null when none was saved yet. */
async function getAnnotation(photoId: number) {
  try {
    return await api(`/api/plates/photos/${photoId}/annotation`, {}, photoAnnotationSchema);
  } catch (error) {
    if (error instanceof ApiRequestError && error.status === 404 && error.message.startsWith('Annotation')) return null;
    throw error;
  }
}

const annotationQueryOptions = (photoId: number) =>
  queryOptions({ queryKey: plateKeys.annotation(photoId), queryFn: () => getAnnotation(photoId) });
export const useAnnotation = (photoId: number, enabled = true) =>
  useQuery({ ...annotationQueryOptions(photoId), enabled });

const annotationRevisionsQueryOptions = (photoId: number) =>
  queryOptions({
    queryKey: plateKeys.revisions(photoId),
    queryFn: () => api(`/api/plates/photos/${photoId}/annotation/revisions`, {}, photoAnnotationHistorySchema),
  });
export const useAnnotationRevisions = (photoId: number, enabled = true) =>
  useQuery({ ...annotationRevisionsQueryOptions(photoId), enabled });

function saveAnnotation({ photoId, annotation }: { photoId: number; annotation: PlateAnnotation }) {
  return api(`/api/plates/photos/${photoId}/annotation`, { method: 'PUT', body: annotation }, photoAnnotationSchema);
}

export function useSaveAnnotation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: saveAnnotation,
    onSuccess: (_saved, { photoId }) => qc.invalidateQueries({ queryKey: plateKeys.annotation(photoId) }),
  });
}
