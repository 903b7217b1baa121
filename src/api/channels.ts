/** Kiosk channels: the list, one channel with its slides and screens, and every edit of one. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ChannelCreateInput,
  ChannelUpdateInput,
  ChannelDetailDto,
  ChannelRowDto,
  SlideCreateInput,
  SlideSourcesDto,
  SlideUpdateInput,
} from '@shared/schemas/channel.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

/** Every query key for channels, written once. */
export const channelKeys = {
  all: ['channels'] as const,
  list: () => [...channelKeys.all, 'list'] as const,
  detail: (id: string) => [...channelKeys.all, 'detail', id] as const,
  slideSources: () => [...channelKeys.all, 'slide-sources'] as const,
};

export const channelsQueryOptions = () =>
  queryOptions({
    queryKey: channelKeys.list(),
    queryFn: async () => (await api.get<ApiData<ChannelRowDto[]>>('/channels')).data,
  });

/** Every channel. */
export const useChannels = () => useQuery(channelsQueryOptions());

export const channelQueryOptions = (id: string) =>
  queryOptions({
    queryKey: channelKeys.detail(id),
    queryFn: async () => (await api.get<ApiData<ChannelDetailDto>>(`/channels/${id}`)).data,
  });

/** One channel with its slides and screens. */
export const useChannel = (id: string) => useQuery(channelQueryOptions(id));

export const slideSourcesQueryOptions = () =>
  queryOptions({
    queryKey: channelKeys.slideSources(),
    queryFn: async () => (await api.get<ApiData<SlideSourcesDto>>('/channels/slide-sources')).data,
  });

/** What a slide can be made from: published pages and publishable images. */
export const useSlideSources = () => useQuery(slideSourcesQueryOptions());

/** Adds a channel. */
export function useCreateChannel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ChannelCreateInput) => (await api.post<ApiData<ChannelDetailDto>>('/channels', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: channelKeys.all }),
  });
}

/** Every edit of one channel answers with the whole channel, which replaces the cached one. */
function useChannelEdit<V>(id: string, fn: (vars: V) => Promise<ChannelDetailDto>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (channel) => {
      queryClient.setQueryData(channelKeys.detail(id), channel);
      void queryClient.invalidateQueries({ queryKey: channelKeys.list() });
    },
  });
}

/** Renames the channel. */
export const useRenameChannel = (id: string) =>
  useChannelEdit(id, async (name: string) => (await api.patch<ApiData<ChannelDetailDto>>(`/channels/${id}`, { name })).data);
/** Shows or hides QR codes on object slides; sets after how many minutes a silent screen is e-mailed to admins. */
export const useChannelSettings = (id: string) =>
  useChannelEdit(
    id,
    async (input: Pick<ChannelUpdateInput, 'showQr' | 'silenceAlertMinutes'>) =>
      (await api.patch<ApiData<ChannelDetailDto>>(`/channels/${id}`, input)).data,
  );
/** Adds a slide at the end. */
export const useAddSlide = (id: string) =>
  useChannelEdit(
    id,
    async (input: SlideCreateInput) => (await api.post<ApiData<ChannelDetailDto>>(`/channels/${id}/slides`, input)).data,
  );
/** Changes a slide. */
export const useUpdateSlide = (id: string) =>
  useChannelEdit(
    id,
    async ({ slideId, ...input }: SlideUpdateInput & { slideId: string }) =>
      (await api.patch<ApiData<ChannelDetailDto>>(`/channels/${id}/slides/${slideId}`, input)).data,
  );
/** Removes a slide on the server (no cache update: for a delete sent as a screen closes). */
export const removeSlide = async (id: string, slideId: string) =>
  (await api.delete<ApiData<ChannelDetailDto>>(`/channels/${id}/slides/${slideId}`)).data;
/** Removes a slide. */
export const useRemoveSlide = (id: string) => useChannelEdit(id, (slideId: string) => removeSlide(id, slideId));
/** Puts the slides in a new order. */
export const useReorderSlides = (id: string) =>
  useChannelEdit(
    id,
    async (slideIds: string[]) => (await api.put<ApiData<ChannelDetailDto>>(`/channels/${id}/slide-order`, { slideIds })).data,
  );
/** Chooses the screens that show the channel. */
export const useAssignScreens = (id: string) =>
  useChannelEdit(
    id,
    async (screenIds: string[]) => (await api.put<ApiData<ChannelDetailDto>>(`/channels/${id}/screens`, { screenIds })).data,
  );

/** Deletes a channel. */
export function useDeleteChannel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => api.delete<void>(`/channels/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: channelKeys.all }),
  });
}

/** Sets the languages the channel plays, in order (its name is sent unchanged). */
export const useSetChannelLanguages = (id: string) =>
  useChannelEdit(
    id,
    async (input: { name: string; languages: string[] }) =>
      (await api.patch<ApiData<ChannelDetailDto>>(`/channels/${id}`, input)).data,
  );
