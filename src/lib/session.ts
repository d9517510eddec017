import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from './api-client';
import { meResponseSchema, type Role, roleAtLeast } from '../../shared/schemas/auth';

/** Who is signed in: read by every feature (the server stays the authority). */
export const sessionKeys = { me: ['session', 'me'] as const };

const meQueryOptions = queryOptions({
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
