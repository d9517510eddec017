import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { adminUserListSchema, adminUserSchema, type AdminUserUpdate } from '../../../../shared/schemas/accounts';
import { sessionKeys } from '../../../lib/session';
import { peopleKeys } from './keys';

const usersQueryOptions = queryOptions({
  queryKey: peopleKeys.users(),
  queryFn: () => api('/api/admin/users', {}, adminUserListSchema),
});

export function useUsers() {
  return useQuery(usersQueryOptions);
}

function updateUser(id: number, change: AdminUserUpdate) {
  return api(`/api/admin/users/${id}`, { method: 'PATCH', body: change }, adminUserSchema);
}

/** A role or status change; the admin's own session is re-read in case they changed themselves. */
export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: AdminUserUpdate }) => updateUser(id, change),
    onSettled: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: peopleKeys.users() }),
        qc.invalidateQueries({ queryKey: sessionKeys.me }),
      ]),
  });
}
