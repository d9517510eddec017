import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importDtoSchema, undoPlanSchema } from '../../../../shared/schemas/import';
import { changedByImports, importKeys } from './keys';

/** DELETE /api/imports/:id: retires every record the import added (kept, reason "import N undone"). */
const undoImport = (id: number) => api(`/api/imports/${id}`, { method: 'DELETE' }, importDtoSchema);

/** GET /api/imports/:id/undo-plan: what the undo would do to records merged or edited since, read before confirming. */
export const getUndoPlan = (id: number) => api(`/api/imports/${id}/undo-plan`, {}, undoPlanSchema);

export function useUndoImport() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: undoImport,
    onSuccess: (undone) => qc.setQueryData(importKeys.detail(undone.id), undone),
    onSettled: () =>
      Promise.all([importKeys.all, ...changedByImports].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}
