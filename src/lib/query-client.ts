import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './api-client';

export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, err) => !(err instanceof ApiRequestError && err.status < 500) && count < 2,
        refetchOnWindowFocus: false,
      },
    },
  });
}
