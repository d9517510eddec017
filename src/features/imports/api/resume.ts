import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importDtoSchema } from '../../../../shared/schemas/import';
import { importKeys } from './keys';
import { watchImport } from './watch';

/** POST /api/imports/:id/resume: continues a failed import from the row after its last committed one. */
const resumeImport = (id: number) => api(`/api/imports/${id}/resume`, { method: 'POST' }, importDtoSchema);

export function useResumeImport() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: resumeImport,
    onSuccess: (resumed) => {
      qc.setQueryData(importKeys.detail(resumed.id), resumed);
      watchImport(qc, resumed);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: importKeys.list() }),
  });
}
