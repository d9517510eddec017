import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { DismissInput } from '../../../../shared/schemas/curation';
import { curationKeys } from './keys';

const dismissGroup = (input: DismissInput) => api('/api/curation/duplicates/dismiss', { method: 'POST', body: input });

/** Hides a candidate group until one of its records changes. */
export function useDismissGroup() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: dismissGroup,
    onSettled: () => qc.invalidateQueries({ queryKey: curationKeys.duplicates() }),
  });
}
