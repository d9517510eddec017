import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import {
  apiTokenListSchema,
  apiTokenSchema,
  createdTokenSchema,
  type TokenCreate,
} from '../../../../shared/schemas/tokens';

/** Query keys of the API tokens, general to specific. */
const tokenKeys = {
  all: ['tokens'] as const,
  mine: () => [...tokenKeys.all, 'mine'] as const,
  everyone: () => [...tokenKeys.all, 'everyone'] as const,
};

const myTokensQueryOptions = queryOptions({
  queryKey: tokenKeys.mine(),
  queryFn: () => api('/api/tokens', {}, apiTokenListSchema),
});

const allTokensQueryOptions = queryOptions({
  queryKey: tokenKeys.everyone(),
  queryFn: () => api('/api/admin/tokens', {}, apiTokenListSchema),
});

export const useMyTokens = () => useQuery(myTokensQueryOptions);
export const useAllTokens = (enabled: boolean) => useQuery({ ...allTokensQueryOptions, enabled });

const createToken = (input: TokenCreate) => api('/api/tokens', { method: 'POST', body: input }, createdTokenSchema);
const revokeToken = (id: number) => api(`/api/tokens/${id}`, { method: 'DELETE' }, apiTokenSchema);

function useTokenMutation<I, O>(fn: (input: I) => Promise<O>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSettled: () => qc.invalidateQueries({ queryKey: tokenKeys.all }) });
}

export const useCreateToken = () => useTokenMutation(createToken);
export const useRevokeToken = () => useTokenMutation(revokeToken);
