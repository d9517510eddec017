import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { PasswordResetInput, PasswordResetRequest } from '../../../../shared/schemas/auth';
import { resetPreviewSchema } from '../../../../shared/schemas/accounts';

const requestAnswerSchema = z.object({ message: z.string() });

function requestPasswordReset(input: PasswordResetRequest) {
  return api('/api/auth/password-reset', { method: 'POST', body: input }, requestAnswerSchema);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}

const resetPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['password-reset', token],
    queryFn: () => api(`/api/auth/password-reset/${encodeURIComponent(token)}`, {}, resetPreviewSchema),
    retry: false,
    staleTime: Infinity,
  });

export function useResetPreview(token: string) {
  return useQuery(resetPreviewQueryOptions(token));
}

function completePasswordReset(token: string, input: PasswordResetInput) {
  return api<void>(`/api/auth/password-reset/${encodeURIComponent(token)}`, { method: 'POST', body: input });
}

export function useCompletePasswordReset(token: string) {
  return useMutation({ mutationFn: (input: PasswordResetInput) => completePasswordReset(token, input) });
}
