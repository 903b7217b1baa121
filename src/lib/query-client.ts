import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './api-client.ts';

/** Calm defaults: data stays fresh a minute, no refetch on focus, no retry of 4xx answers. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 60_000,
        refetchOnWindowFocus: false,
        retry: (failures, error) =>
          !(error instanceof ApiRequestError && error.status >= 400 && error.status < 500) && failures < 2,
      },
    },
  });
}
