/**
 * The steps a page goes through: submit, send back, sign-offs, flags, publishing. Each answers with
 * the page as it is now (see `usePageChange`).
 */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PageDto } from '@shared/schemas/page.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { pageKeys, usePageChange } from './pages.ts';

const post = (url: string, body?: unknown) => api.post<ApiData<PageDto>>(url, body);

/** Sends the page for review, from the version the writer last saved. */
export const useSubmitPage = (id: string) =>
  usePageChange(id, (input: { version: number; flagNotes?: Array<{ text: string; reason: string }> }) =>
    post(`/pages/${id}/submit`, input),
  );
export const useWithdrawPage = (id: string) => usePageChange(id, () => post(`/pages/${id}/withdraw`));
/** Sends the page back to its writer with a comment. */
export const useSendBack = (id: string) => usePageChange(id, (comment: string) => post(`/pages/${id}/send-back`, { comment }));
/** Signs off one statement on the page. */
export const useSignOffStatement = (id: string) =>
  usePageChange(id, (statementId: string) => post(`/pages/${id}/signoffs/statements`, { statementId }));
/** Signs off the page as a whole. */
export const useSignOffPage = (id: string) => usePageChange(id, () => post(`/pages/${id}/signoffs/page`));
/** Resolves a number flag (a number typed in the text) with a reason. */
export const useResolveFlag = (id: string) =>
  usePageChange(id, (input: { text: string; reason: string }) => post(`/pages/${id}/flags`, input));
/** Publishes the approved revision now. */
export const usePublishPage = (id: string) => usePageChange(id, () => post(`/pages/${id}/publish`));
/** Takes the page off the public site and screens. */
export const useUnpublishPage = (id: string) => usePageChange(id, () => post(`/pages/${id}/unpublish`));
/** Schedules publishing at a time, or clears the schedule with null. */
export const useSchedulePage = (id: string) =>
  usePageChange(id, (at: string | null) => api.put<ApiData<PageDto>>(`/pages/${id}/schedule`, { at }));
/** Archives the page (hidden from lists and every public output), with the person's reason. */
export const useArchivePage = (id: string) => usePageChange(id, (reason: string) => post(`/pages/${id}/archive`, { reason }));
/** Brings an archived page back to the desk; it goes live again only when an editor publishes it. */
export const useRestorePage = (id: string) => usePageChange(id, (reason: string) => post(`/pages/${id}/restore`, { reason }));

/** Deletes a page that was never published, for good; its queries are dropped and the lists refreshed. */
export function useDeletePage(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => api.delete<void>(`/pages/${id}?reason=${encodeURIComponent(reason)}`),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: pageKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: pageKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: pageKeys.dashboard() });
    },
  });
}
