/**
 * Earth's timeline ("when the light set out"): every member of staff reads it, admins edit it.
 * An edit recomputes statements on the server; their cached copies are refreshed here too.
 */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { TimelineEntryCreateInput, TimelineEntryDto, TimelineEntryUpdateInput } from '@shared/schemas/timeline.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { statementKeys } from './statements.ts';

/** Every query key for the timeline, written once. */
export const timelineKeys = {
  all: ['timeline'] as const,
  list: () => [...timelineKeys.all, 'list'] as const,
};

export const timelineQueryOptions = () =>
  queryOptions({
    queryKey: timelineKeys.list(),
    queryFn: async () => (await api.get<ApiData<TimelineEntryDto[]>>('/timeline')).data,
  });

/** The timeline, oldest entry first. */
export const useTimeline = () => useQuery(timelineQueryOptions());

function useRefreshTimeline() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: timelineKeys.all }),
      queryClient.invalidateQueries({ queryKey: statementKeys.all }),
    ]);
}

/** Adds an entry. */
export function useCreateTimelineEntry() {
  const refresh = useRefreshTimeline();
  return useMutation({
    mutationFn: async (input: TimelineEntryCreateInput) => (await api.post<ApiData<TimelineEntryDto>>('/timeline', input)).data,
    onSuccess: refresh,
  });
}

/** Changes an entry. */
export function useUpdateTimelineEntry() {
  const refresh = useRefreshTimeline();
  return useMutation({
    mutationFn: async ({ id, input }: { id: string; input: TimelineEntryUpdateInput }) =>
      (await api.patch<ApiData<TimelineEntryDto>>(`/timeline/${id}`, input)).data,
    onSuccess: refresh,
  });
}

/** Removes an entry. */
export function useDeleteTimelineEntry() {
  const refresh = useRefreshTimeline();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/timeline/${id}`),
    onSuccess: refresh,
  });
}
