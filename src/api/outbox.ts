/** The e-mail outbox (what Starproof sent, and whether the local mail catcher is there). */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxMessageDto } from '@shared/schemas/outbox.ts';
import { api } from '@/lib/api-client.ts';

/** Every query key for the outbox, written once. */
export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
};

export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: outboxKeys.list(),
    queryFn: () => api.get<{ data: OutboxMessageDto[]; meta: { catcher: boolean } }>('/outbox'),
    staleTime: 5_000,
  });

/** The outbox, refreshed every 10 seconds. */
export const useOutbox = () => useQuery({ ...outboxQueryOptions(), refetchInterval: 10_000 });
