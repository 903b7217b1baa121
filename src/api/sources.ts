/** Sources (the papers and catalogues measurements cite). */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SourceDto, SourceInput } from '@shared/schemas/source.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { catalogueKeys } from './catalogue-objects.ts';

export const sourcesQueryOptions = () =>
  queryOptions({
    queryKey: catalogueKeys.sources(),
    queryFn: async () => (await api.get<ApiData<SourceDto[]>>('/catalogue/sources')).data,
  });

/** Every source (up to 500, by citation): the list page and the measurement form's choices. */
export const useSources = () => useQuery(sourcesQueryOptions());

/** Adds a source. */
export function useCreateSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SourceInput) => (await api.post<ApiData<SourceDto>>('/catalogue/sources', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.sources() }),
  });
}

/** Corrects a source; every catalogue query may show its citation, so all are refreshed. */
export function useUpdateSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, ...input }: SourceInput & { id: string }) =>
      (await api.patch<ApiData<SourceDto>>(`/catalogue/sources/${id}`, input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}
