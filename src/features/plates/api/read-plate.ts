import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { plateReadingSchema } from '../../../../shared/schemas/plates';

/** Sends a plate photo to be read (nothing is stored): plates, lines, lanes and spots in the photo's pixels. */
function readPlate(file: Blob) {
  const form = new FormData();
  form.append('photo', file, file instanceof File ? file.name : 'plate.jpg');
  return api('/api/plates/read', { method: 'POST', form }, plateReadingSchema);
}

export function useReadPlate() {
  return useMutation({ mutationFn: readPlate });
}
