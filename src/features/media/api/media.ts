import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { MediaDetailDto, MediaDto, MediaListMeta, MediaListQuery, MediaUpdateInput } from '@shared/media/schemas.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

const busy = (items: MediaDto[]) => items.some((m) => m.renditionsStatus === 'pending' || m.renditionsStatus === 'processing');

function queryString(params: MediaListQuery): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== '') search.set(key, String(value));
  const text = search.toString();
  return text ? `?${text}` : '';
}

/** The library, searched; polls while renditions are being made. */
export const mediaListQueryOptions = (params: MediaListQuery = {}) =>
  queryOptions({
    queryKey: ['media', 'list', params],
    queryFn: () => api.get<ApiData<MediaDto[]> & { meta: MediaListMeta }>(`/media${queryString(params)}`),
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data && busy(query.state.data.data) ? 1500 : false),
  });

export const useMediaList = (params: MediaListQuery) => useQuery(mediaListQueryOptions(params));

/** One image with where it is used. */
export const mediaQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['media', 'detail', id],
    queryFn: async () => (await api.get<ApiData<MediaDetailDto>>(`/media/${id}`)).data,
    refetchInterval: (query) => (query.state.data && busy([query.state.data]) ? 1500 : false),
  });

export const useMedia = (id: string | null) => useQuery({ ...mediaQueryOptions(id ?? ''), enabled: !!id });

function useInvalidateMedia() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: ['media'] });
}

export function useUpdateMedia() {
  const invalidate = useInvalidateMedia();
  return useMutation({
    mutationFn: async ({ id, ...input }: MediaUpdateInput & { id: string }) =>
      (await api.patch<ApiData<MediaDto>>(`/media/${id}`, input)).data,
    onSuccess: invalidate,
  });
}

export function useDeleteMedia() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/media/${id}`),
    // Only the lists: the deleted image's own query would answer 403 if refetched while its panel closes.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['media', 'list'] }),
  });
}

export function useRetryRenditions() {
  const invalidate = useInvalidateMedia();
  return useMutation({
    mutationFn: (id: string) => api.post<ApiData<{ status: string }>>(`/media/${id}/renditions`),
    onSuccess: invalidate,
  });
}

/** Catalogue objects matching typed text, for linking an image to what it shows. */
export const useObjectSuggestions = (text: string) =>
  useQuery({
    queryKey: ['media', 'object-suggestions', text],
    queryFn: async () =>
      (await api.get<ApiData<Array<{ id: string; name: string }>>>(`/media/object-suggestions?q=${encodeURIComponent(text)}`))
        .data,
    enabled: text.trim().length > 0,
    staleTime: 30_000,
  });

/** Call after uploads so the grid shows the new images. */
export const useRefreshMedia = useInvalidateMedia;
