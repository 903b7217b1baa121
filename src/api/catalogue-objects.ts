/**
 * Catalogue objects: the table, the pickers' searches, one object, creating and editing. Every
 * catalogue query (objects, measurements, sources) lives under `catalogueKeys.all`.
 */
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SkyObjectDto, SkyObjectInput, SkyObjectListQuery, SkyObjectPageDto } from '@shared/schemas/sky-object.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';

/** The table's query as the URL and the API know it (all optional but sort, dir, page, pageSize). */
export type CatalogueQuery = Partial<Pick<SkyObjectListQuery, 'q' | 'kind' | 'missing' | 'after'>> &
  Pick<SkyObjectListQuery, 'sort' | 'dir' | 'page' | 'pageSize'>;

/** Every query key for the catalogue, written once. */
export const catalogueKeys = {
  all: ['catalogue'] as const,
  objectLists: () => [...catalogueKeys.all, 'objects'] as const,
  objectList: (query: Partial<SkyObjectListQuery>) => [...catalogueKeys.objectLists(), query] as const,
  object: (id: string) => [...catalogueKeys.all, 'object', id] as const,
  measurements: (objectId: string) => [...catalogueKeys.object(objectId), 'measurements'] as const,
  history: (objectId: string) => [...catalogueKeys.object(objectId), 'history'] as const,
  sources: () => [...catalogueKeys.all, 'sources'] as const,
  proposals: () => [...catalogueKeys.all, 'proposals'] as const,
};

export const skyObjectsQueryOptions = (query: Partial<SkyObjectListQuery>) =>
  queryOptions({
    queryKey: catalogueKeys.objectList(query),
    queryFn: async () => (await api.get<ApiData<SkyObjectPageDto>>(`/catalogue/objects${queryString(query)}`)).data,
    placeholderData: keepPreviousData,
  });

/** One page of the catalogue table, kept on screen while the next page loads. */
export const useSkyObjects = (query: CatalogueQuery) => useQuery(skyObjectsQueryOptions(query));

/** The first 20 objects matching typed text (name or designation), for the pickers, with how many match in all. */
export const useObjectSearch = (q: string) =>
  useQuery({
    ...skyObjectsQueryOptions({ pageSize: 20, q }),
    select: (page) => ({ rows: page.rows, total: page.total, totalExact: page.totalExact }),
  });

export const skyObjectQueryOptions = (id: string) =>
  queryOptions({
    queryKey: catalogueKeys.object(id),
    queryFn: async () => (await api.get<ApiData<SkyObjectDto>>(`/catalogue/objects/${id}`)).data,
  });

/** One object. */
export const useSkyObject = (id: string) => useQuery(skyObjectQueryOptions(id));

/** Adds an object to the catalogue. */
export function useCreateSkyObject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SkyObjectInput) => (await api.post<ApiData<SkyObjectDto>>('/catalogue/objects', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.objectLists() }),
  });
}

/** Changes an object. */
export function useUpdateSkyObject(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SkyObjectInput) => (await api.patch<ApiData<SkyObjectDto>>(`/catalogue/objects/${id}`, input)).data,
    onSuccess: (object) => {
      queryClient.setQueryData(catalogueKeys.object(id), object);
      return queryClient.invalidateQueries({ queryKey: catalogueKeys.objectLists() });
    },
  });
}
