import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ChannelCreateInput,
  ChannelDetailDto,
  ChannelRowDto,
  SlideCreateInput,
  SlideSourcesDto,
  SlideUpdateInput,
} from '@shared/schemas/channel.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export const channelsQueryOptions = () =>
  queryOptions({ queryKey: ['channels'], queryFn: async () => (await api.get<ApiData<ChannelRowDto[]>>('/channels')).data });

export const channelQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['channels', id],
    queryFn: async () => (await api.get<ApiData<ChannelDetailDto>>(`/channels/${id}`)).data,
  });

export const slideSourcesQueryOptions = () =>
  queryOptions({
    queryKey: ['channels', 'slide-sources'],
    queryFn: async () => (await api.get<ApiData<SlideSourcesDto>>('/channels/slide-sources')).data,
  });

export const useChannels = () => useQuery(channelsQueryOptions());
export const useChannel = (id: string) => useQuery(channelQueryOptions(id));
export const useSlideSources = () => useQuery(slideSourcesQueryOptions());

export function useCreateChannel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ChannelCreateInput) => (await api.post<ApiData<ChannelDetailDto>>('/channels', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['channels'] }),
  });
}

/** Every edit of one channel answers with the whole channel, which replaces the cached one. */
function useChannelEdit<V>(id: string, fn: (vars: V) => Promise<ChannelDetailDto>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (channel) => {
      queryClient.setQueryData(channelQueryOptions(id).queryKey, channel);
      void queryClient.invalidateQueries({ queryKey: ['channels'], exact: true });
    },
  });
}

export const useRenameChannel = (id: string) =>
  useChannelEdit(id, async (name: string) => (await api.patch<ApiData<ChannelDetailDto>>(`/channels/${id}`, { name })).data);
export const useAddSlide = (id: string) =>
  useChannelEdit(
    id,
    async (input: SlideCreateInput) => (await api.post<ApiData<ChannelDetailDto>>(`/channels/${id}/slides`, input)).data,
  );
export const useUpdateSlide = (id: string) =>
  useChannelEdit(
    id,
    async ({ slideId, ...input }: SlideUpdateInput & { slideId: string }) =>
      (await api.patch<ApiData<ChannelDetailDto>>(`/channels/${id}/slides/${slideId}`, input)).data,
  );
export const useRemoveSlide = (id: string) =>
  useChannelEdit(
    id,
    async (slideId: string) => (await api.delete<ApiData<ChannelDetailDto>>(`/channels/${id}/slides/${slideId}`)).data,
  );
export const useReorderSlides = (id: string) =>
  useChannelEdit(
    id,
    async (slideIds: string[]) => (await api.put<ApiData<ChannelDetailDto>>(`/channels/${id}/slide-order`, { slideIds })).data,
  );
export const useAssignScreens = (id: string) =>
  useChannelEdit(
    id,
    async (screenIds: string[]) => (await api.put<ApiData<ChannelDetailDto>>(`/channels/${id}/screens`, { screenIds })).data,
  );

export function useDeleteChannel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => api.delete<void>(`/channels/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['channels'] }),
  });
}
