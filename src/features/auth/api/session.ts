import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '../../../lib/api-client';
import type { LoginInput } from '../../../../shared/schemas/auth';

export { sessionKeys, useHasRole, useMe } from '../../../lib/session';

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) => api<{ csrfToken: string }>('/api/auth/login', { method: 'POST', body: input }),
    onSuccess: (res) => {
      setCsrfToken(res.csrfToken);
      return qc.invalidateQueries();
    },
  });
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('/api/auth/logout', { method: 'POST' }),
    onSuccess: () => {
      setCsrfToken(null);
      qc.clear();
    },
  });
}
