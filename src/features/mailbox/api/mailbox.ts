import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mailboxSchema } from '../../../../shared/schemas/accounts';

const mailboxQueryOptions = queryOptions({
  queryKey: ['mailbox'],
  queryFn: () => api('/api/dev/mailbox', {}, mailboxSchema),
  refetchInterval: 5_000,
  retry: false,
});

/** The local mail catcher's inbox; refreshed every 5 s while the page is open. */
export function useMailbox() {
  return useQuery(mailboxQueryOptions);
}
