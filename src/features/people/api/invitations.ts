import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationListSchema, invitationSchema, type InvitationCreate } from '../../../../shared/schemas/accounts';
import { peopleKeys } from './keys';

const invitationsQueryOptions = (status: 'open' | 'all' = 'open') =>
  queryOptions({
    queryKey: peopleKeys.invitations(status),
    queryFn: () => api(`/api/auth/invitations?status=${status}`, {}, invitationListSchema),
  });

export function useInvitations(status: 'open' | 'all' = 'open') {
  return useQuery(invitationsQueryOptions(status));
}

function useInvitationMutation<I, O>(fn: (input: I) => Promise<O>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSettled: () => qc.invalidateQueries({ queryKey: peopleKeys.all }) });
}

const createInvitation = (input: InvitationCreate) =>
  api('/api/auth/invitations', { method: 'POST', body: input }, invitationSchema);
const resendInvitation = (id: number) =>
  api(`/api/auth/invitations/${id}/resend`, { method: 'POST' }, invitationSchema);
const revokeInvitation = (id: number) =>
  api(`/api/auth/invitations/${id}/revoke`, { method: 'POST' }, invitationSchema);

export const useCreateInvitation = () => useInvitationMutation(createInvitation);
export const useResendInvitation = () => useInvitationMutation(resendInvitation);
export const useRevokeInvitation = () => useInvitationMutation(revokeInvitation);
