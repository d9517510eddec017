import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { meResponseSchema, type PasswordChange, type ProfileUpdate } from '../../../../shared/schemas/auth';
import { sessionKeys } from './session';

function updateProfile(input: ProfileUpdate) {
  return api('/api/auth/me', { method: 'PATCH', body: input }, meResponseSchema);
}

export function useUpdateProfile() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateProfile, onSuccess: (me) => qc.setQueryData(sessionKeys.me, me) });
}

function changePassword(input: PasswordChange) {
  return api<void>('/api/auth/me/password', { method: 'POST', body: input });
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
