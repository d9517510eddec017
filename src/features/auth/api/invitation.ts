import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '../../../lib/api-client';
import { signedInResponseSchema, type InvitationAccept } from '../../../../shared/schemas/auth';
import { invitationPreviewSchema } from '../../../../shared/schemas/accounts';

const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['invitation', token],
    queryFn: () => api(`/api/auth/invitations/${encodeURIComponent(token)}`, {}, invitationPreviewSchema),
    retry: false,
    staleTime: Infinity,
  });

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}

function acceptInvitation(token: string, input: InvitationAccept) {
  return api(
    `/api/auth/invitations/${encodeURIComponent(token)}/accept`,
    { method: 'POST', body: input },
    signedInResponseSchema,
  );
}

/** Accepting signs the invitee in: the session and every cached query start afresh. */
export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationAccept) => acceptInvitation(token, input),
    onSuccess: (res) => {
      setCsrfToken(res.csrfToken);
      // Everything but the invitation itself: it is used now, and asking again would answer 410.
      return qc.invalidateQueries({ predicate: (query) => query.queryKey[0] !== 'invitation' });
    },
  });
}
