import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importDtoSchema } from '../../../../shared/schemas/import';
import { importKeys } from './keys';
import { uploadForm } from './upload-form';
import { watchImport } from './watch';
import type { PreviewInput } from './preview';

/** POST /api/imports: stores the file and imports it; a short file answers finished, a long one keeps running in the background. */
const startImport = ({ file, mapping, choice }: PreviewInput) =>
  api('/api/imports', { method: 'POST', form: uploadForm(file, mapping, choice) }, importDtoSchema);

export function useStartImport() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: startImport,
    onSuccess: (started) => {
      qc.setQueryData(importKeys.detail(started.id), started);
      watchImport(qc, started);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: importKeys.list() }),
  });
}
