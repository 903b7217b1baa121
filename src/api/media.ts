/**
 * The image library: the list (also the editor's image picker), one image (also the editor's image
 * blocks), changes, and suggestions of objects to link. One image is cached under one key,
 * `mediaKeys.detail(id)`, whichever screen asks.
 */
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { MediaDetailDto, MediaDto, MediaListMeta, MediaListQuery, MediaUpdateInput } from '@shared/media/schemas.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';

/** Every query key for the library, written once. */
export const mediaKeys = {
  all: ['media'] as const,
  lists: () => [...mediaKeys.all, 'list'] as const,
  list: (params: MediaListQuery) => [...mediaKeys.lists(), params] as const,
  detail: (id: string) => [...mediaKeys.all, 'detail', id] as const,
  objectSuggestions: (text: string) => [...mediaKeys.all, 'object-suggestions', text] as const,
};

const busy = (items: MediaDto[]) => items.some((m) => m.renditionsStatus === 'pending' || m.renditionsStatus === 'processing');

/** The library, searched; polls while renditions are being made. */
export const mediaListQueryOptions = (params: MediaListQuery = {}) =>
  queryOptions({
    queryKey: mediaKeys.list(params),
    queryFn: () => api.get<ApiData<MediaDto[]> & { meta: MediaListMeta }>(`/media${queryString(params)}`),
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data && busy(query.state.data.data) ? 1500 : false),
  });

/** One page of the library with its paging. */
export const useMediaList = (params: MediaListQuery) => useQuery(mediaListQueryOptions(params));

/** Library images matching typed text, for the editor's image picker. */
export const useMediaSearch = (q: string) => useQuery({ ...mediaListQueryOptions({ q }), select: (answer) => answer.data });

/** One image with where it is used; polls while its renditions are being made. */
export const mediaQueryOptions = (id: string) =>
  queryOptions({
    queryKey: mediaKeys.detail(id),
    queryFn: async () => (await api.get<ApiData<MediaDetailDto>>(`/media/${id}`)).data,
    refetchInterval: (query) => (query.state.data && busy([query.state.data]) ? 1500 : false),
  });

/** One image, or nothing asked while `id` is null. */
export const useMedia = (id: string | null) => useQuery({ ...mediaQueryOptions(id ?? ''), enabled: !!id });

/** Refreshes every library query (after an upload or a change). */
export function useRefreshMedia() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: mediaKeys.all });
}

/** Changes an image's details. */
export function useUpdateMedia() {
  const refresh = useRefreshMedia();
  return useMutation({
    mutationFn: async ({ id, ...input }: MediaUpdateInput & { id: string }) =>
      (await api.patch<ApiData<MediaDto>>(`/media/${id}`, input)).data,
    onSuccess: refresh,
  });
}

/** Deletes an image. */
export function useDeleteMedia() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/media/${id}`),
    // Only the lists: the deleted image's own query would answer 403 if refetched while its panel closes.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mediaKeys.lists() }),
  });
}

/** Makes an image's renditions again after they failed. */
export function useRetryRenditions() {
  const refresh = useRefreshMedia();
  return useMutation({
    mutationFn: (id: string) => api.post<ApiData<{ status: string }>>(`/media/${id}/renditions`),
    onSuccess: refresh,
  });
}

export const objectSuggestionsQueryOptions = (text: string) =>
  queryOptions({
    queryKey: mediaKeys.objectSuggestions(text),
    queryFn: async () =>
      (await api.get<ApiData<Array<{ id: string; name: string }>>>(`/media/object-suggestions${queryString({ q: text })}`)).data,
    staleTime: 30_000,
  });

/** Catalogue objects matching typed text, for linking an image to what it shows (nothing asked for blank text). */
export const useObjectSuggestions = (text: string) =>
  useQuery({ ...objectSuggestionsQueryOptions(text), enabled: text.trim().length > 0 });
