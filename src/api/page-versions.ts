/** A page's language versions: the list shown on each version, and "Add a French version". */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PageDto } from '@shared/schemas/page.ts';
import type { PageVersionsDto } from '@shared/schemas/page-version.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { pageKeys } from './pages.ts';

export const versionsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: pageKeys.versions(id),
    queryFn: async () => (await api.get<ApiData<PageVersionsDto>>(`/pages/${id}/versions`)).data,
  });

/** The page's versions in other languages (itself included) and the locales it could still have. */
export const usePageVersions = (id: string) => useQuery(versionsQueryOptions(id));

/** Makes a version of the page in another locale; every version's list and the page lists refresh. */
export function useAddPageVersion(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (locale: string) => (await api.post<ApiData<PageDto>>(`/pages/${id}/versions`, { locale })).data,
    onSuccess: (page) => {
      queryClient.setQueryData(pageKeys.detail(page.id), page);
      void queryClient.invalidateQueries({ queryKey: pageKeys.versionLists() });
      void queryClient.invalidateQueries({ queryKey: pageKeys.lists() });
    },
  });
}
