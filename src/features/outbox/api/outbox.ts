import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxMessageDto } from '@shared/schemas/outbox.ts';
import { api } from '@/lib/api-client.ts';

export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: ['outbox'],
    queryFn: () => api.get<{ data: OutboxMessageDto[]; meta: { catcher: boolean } }>('/outbox'),
    staleTime: 5_000,
  });

export const useOutbox = () => useQuery({ ...outboxQueryOptions(), refetchInterval: 10_000 });
