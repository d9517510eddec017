import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '../../../lib/api-client';
import { meResponseSchema, type LoginInput, type Role, roleAtLeast } from '../../../../shared/schemas/auth';

export const sessionKeys = { me: ['session', 'me'] as const };

export const meQueryOptions = queryOptions({
  queryKey: sessionKeys.me,
  queryFn: () => api('/api/auth/me', {}, meResponseSchema),
  staleTime: 60_000,
});

export function useMe() {
  return useQuery(meQueryOptions);
}

/** True when the signed-in user has at least this role (the server stays the authority). */
export function useHasRole(least: Role): boolean {
  const { data } = useMe();
  return !!data?.user && roleAtLeast(data.user.role, least);
}

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) =>
      api<{ csrfToken: string }>('/api/auth/login', { method: 'POST', body: input }),
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
