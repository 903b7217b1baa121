/** The comments on a page. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PageCommentDto } from '@shared/schemas/page.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { pageKeys } from './pages.ts';

export const commentsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: pageKeys.comments(id),
    queryFn: async () => (await api.get<ApiData<PageCommentDto[]>>(`/pages/${id}/comments`)).data,
  });

/** The page's comments. */
export const useComments = (id: string) => useQuery(commentsQueryOptions(id));

/** Adds a comment to the page. */
export function useAddComment(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: string) => (await api.post<ApiData<PageCommentDto>>(`/pages/${id}/comments`, { body })).data,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: pageKeys.comments(id) }),
  });
}
