import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SkyObjectDto, SkyObjectInput, SkyObjectListQuery, SkyObjectPageDto } from '@shared/schemas/sky-object.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

/** The table's query as the URL and the API know it (all optional but sort, dir, page, pageSize). */
export type CatalogueQuery = Partial<Pick<SkyObjectListQuery, 'q' | 'kind' | 'missing' | 'after'>> &
  Pick<SkyObjectListQuery, 'sort' | 'dir' | 'page' | 'pageSize'>;

const toSearch = (query: CatalogueQuery) => {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, String(value));
  return params.toString();
};

export const skyObjectsQueryOptions = (query: CatalogueQuery) =>
  queryOptions({
    queryKey: ['catalogue', 'objects', query],
    queryFn: async () => (await api.get<ApiData<SkyObjectPageDto>>(`/catalogue/objects?${toSearch(query)}`)).data,
    placeholderData: keepPreviousData,
  });

/** One page of the catalogue table, kept on screen while the next page loads. */
export const useSkyObjects = (query: CatalogueQuery) => useQuery(skyObjectsQueryOptions(query));

export const skyObjectQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['catalogue', 'object', id],
    queryFn: async () => (await api.get<ApiData<SkyObjectDto>>(`/catalogue/objects/${id}`)).data,
  });

export const useSkyObject = (id: string) => useQuery(skyObjectQueryOptions(id));

export function useCreateSkyObject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SkyObjectInput) => (await api.post<ApiData<SkyObjectDto>>('/catalogue/objects', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['catalogue', 'objects'] }),
  });
}

export function useUpdateSkyObject(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SkyObjectInput) => (await api.patch<ApiData<SkyObjectDto>>(`/catalogue/objects/${id}`, input)).data,
    onSuccess: (object) => {
      queryClient.setQueryData(skyObjectQueryOptions(id).queryKey, object);
      return queryClient.invalidateQueries({ queryKey: ['catalogue', 'objects'] });
    },
  });
}
