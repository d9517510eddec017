import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { photoDtoSchema } from '../../../../shared/schemas/record';
import { recordKeys } from './keys';

/** Largest plate photo the server accepts (10 MB); checked here only to answer sooner. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

function uploadPhoto({ recordId, file }: { recordId: number; file: File }) {
  const form = new FormData();
  form.append('photo', file);
  return api(`/api/records/${recordId}/photos`, { method: 'POST', form }, photoDtoSchema);
}

const removePhoto = (photoId: number) => api(`/api/photos/${photoId}`, { method: 'DELETE' });

export function useUploadPhoto() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: uploadPhoto,
    onSuccess: (_photo, { recordId }) => qc.invalidateQueries({ queryKey: recordKeys.detail(recordId) }),
  });
}

export function useRemovePhoto(recordId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: removePhoto,
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: recordKeys.detail(recordId) }),
        qc.invalidateQueries({ queryKey: recordKeys.history(recordId) }),
      ]),
  });
}
